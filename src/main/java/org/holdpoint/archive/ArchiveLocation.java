package org.holdpoint.archive;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import org.holdpoint.study.ArchiveException;

/**
 * Where the embedded archive lives: {@code $XDG_DATA_HOME/holdpoint/archive}, or
 * {@code ~/.local/share/holdpoint/archive} when XDG_DATA_HOME is unset or not absolute (XDG Base
 * Directory Specification 0.8).
 */
public final class ArchiveLocation {

    /** H2 options of the embedded archive: write each commit at once, so a crash loses no commit. */
    static final String H2_OPTIONS = ";WRITE_DELAY=0";

    private ArchiveLocation() {
    }

    /**
     * The default archive folder for an environment and home directory.
     *
     * @param env      the environment variables
     * @param userHome the user's home directory
     * @return the folder (not created)
     */
    public static Path defaultFolder(Map<String, String> env, Path userHome) {
        String xdg = env.get("XDG_DATA_HOME");
        Path base = xdg != null && !xdg.isBlank() && Path.of(xdg).isAbsolute() ? Path.of(xdg)
                : userHome.resolve(".local").resolve("share");
        return base.resolve("holdpoint").resolve("archive");
    }

    /**
     * The JDBC URL of an embedded archive file in a folder.
     *
     * @param folder the folder
     * @return {@code jdbc:h2:file:<folder>/holdpoint;WRITE_DELAY=0}
     */
    public static String embeddedUrl(Path folder) {
        return "jdbc:h2:file:" + folder.toAbsolutePath().resolve("holdpoint") + H2_OPTIONS;
    }

    /**
     * Creates the default folder if needed and returns the embedded archive's URL.
     *
     * @return the JDBC URL of the default embedded archive
     * @throws ArchiveException when the folder cannot be created
     */
    public static String defaultUrl() throws ArchiveException {
        Path folder = defaultFolder(System.getenv(), Path.of(System.getProperty("user.home")));
        try {
            Files.createDirectories(folder);
        } catch (IOException e) {
            throw new ArchiveException(ArchiveException.Reason.DATABASE, "cannot create the archive folder "
                    + folder + ": " + e.getMessage() + "; set XDG_DATA_HOME or pass an archive URL", e);
        }
        return embeddedUrl(folder);
    }
}
