package org.holdpoint.archive;

import java.util.Locale;
import org.holdpoint.study.ArchiveException;

/** The database products the archive runs on, told apart by the JDBC URL. */
enum Dialect {
    /** H2, the embedded default (a file in the user's data folder). */
    H2("h2"),
    /** PostgreSQL, the shared server. */
    POSTGRESQL("postgresql");

    private final String folder;

    Dialect(String folder) {
        this.folder = folder;
    }

    /** @return the resource folder holding this dialect's migrations */
    String migrationsFolder() {
        return "/org/holdpoint/archive/migrations/" + folder + "/";
    }

    /**
     * The dialect of a JDBC URL.
     *
     * @param url the URL, {@code jdbc:h2:…} or {@code jdbc:postgresql:…}
     * @return the dialect
     * @throws ArchiveException when the URL names another database
     */
    static Dialect of(String url) throws ArchiveException {
        String u = url == null ? "" : url.toLowerCase(Locale.ROOT);
        if (u.startsWith("jdbc:h2:")) {
            return H2;
        }
        if (u.startsWith("jdbc:postgresql:")) {
            return POSTGRESQL;
        }
        throw new ArchiveException(ArchiveException.Reason.DATABASE, "archive URL '" + url
                + "' is not supported: use jdbc:h2:file:PATH (embedded) or jdbc:postgresql://HOST:PORT/DB (shared)");
    }
}
