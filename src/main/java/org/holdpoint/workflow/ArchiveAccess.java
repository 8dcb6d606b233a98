package org.holdpoint.workflow;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import java.util.Properties;
import org.holdpoint.study.ArchiveException;
import org.holdpoint.study.ChangeRecordArchive;

/**
 * How the use cases reach the change-record archive: through the {@link ChangeRecordArchive} port,
 * opened by the adapter the composition root hands to the command line and the window when it builds
 * them (no global state: two command lines in one process may use two archives). The URL comes from the
 * {@code --archive} option, else from {@code archive.url} in the settings file
 * ({@code $XDG_CONFIG_HOME/holdpoint/settings.properties}, default {@code ~/.config/holdpoint/}), else
 * the embedded default in the user's data folder.
 */
public final class ArchiveAccess {
    /** Opens an archive from a JDBC URL, or the embedded default for null. */
    @FunctionalInterface
    public interface Opener {
        /**
         * @param url a JDBC URL, or null for the embedded default
         * @return the open archive (the caller closes it)
         * @throws ArchiveException when it cannot be opened
         */
        ChangeRecordArchive open(String url) throws ArchiveException;
    }

    private final Opener opener;

    /**
     * @param opener the adapter that opens an archive (the composition root supplies the JDBC one)
     */
    public ArchiveAccess(Opener opener) {
        this.opener = java.util.Objects.requireNonNull(opener, "opener");
    }

    /**
     * For a build without an archive adapter (and tests that never reach the archive): opening says so.
     *
     * @return an access whose every open fails with a plain message
     */
    public static ArchiveAccess none() {
        return new ArchiveAccess(url -> {
            throw new ArchiveException(ArchiveException.Reason.DATABASE, "no archive adapter is wired into this "
                    + "build");
        });
    }

    /**
     * Opens the archive at a URL, at the configured one, or the embedded default.
     *
     * @param url an explicit JDBC URL, or null
     * @return the archive (the caller closes it)
     * @throws ArchiveException when it cannot be opened
     */
    public ChangeRecordArchive open(String url) throws ArchiveException {
        return opener.open(url != null ? url : configuredUrl(System.getenv(), Path.of(System.getProperty("user.home"))));
    }

    /**
     * The archive URL of the settings file, if one is set there.
     *
     * @param env      the environment (for XDG_CONFIG_HOME)
     * @param userHome the user's home folder
     * @return the URL, or null when there is no settings file or it names no archive
     * @throws StudyFileException when the settings file exists but cannot be read
     */
    static String configuredUrl(Map<String, String> env, Path userHome) {
        String xdg = env.get("XDG_CONFIG_HOME");
        Path dir = xdg != null && !xdg.isBlank() ? Path.of(xdg) : userHome.resolve(".config");
        Path file = dir.resolve("holdpoint").resolve("settings.properties");
        if (!Files.isRegularFile(file)) {
            return null;
        }
        Properties p = new Properties();
        try (InputStream in = Files.newInputStream(file)) {
            p.load(in);
        } catch (IOException | IllegalArgumentException e) {
            // never fall back to the embedded archive in silence: records would go to the wrong archive
            throw new StudyFileException("the settings file %s cannot be read (%s); fix or remove it, or name the "
                    + "archive with --archive", file, e.getMessage());
        }
        String url = p.getProperty("archive.url");
        return url == null || url.isBlank() ? null : url.trim();
    }
}
