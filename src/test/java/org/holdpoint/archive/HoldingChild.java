package org.holdpoint.archive;

/** A child process that opens an archive, says so, and holds it open until it is stopped. */
public final class HoldingChild {
    private HoldingChild() {
    }

    /**
     * @param args the archive URL
     * @throws Exception on any failure
     */
    public static void main(String[] args) throws Exception {
        try (JdbcArchive archive = JdbcArchive.open(args[0])) {
            archive.list(org.holdpoint.study.ArchiveQuery.withDefaults());
            System.out.println("open");
            System.out.flush();
            Thread.sleep(120_000);
        }
    }
}
