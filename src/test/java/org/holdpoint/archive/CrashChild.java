package org.holdpoint.archive;

import java.time.Instant;
import org.holdpoint.study.StudyVersion;

/**
 * Child process for {@link CrashConsistencyTest}: archives and signs studies in a tight loop, printing
 * {@code committed <changeId>} after each call returns, until it is killed (or has done 100,000).
 */
public final class CrashChild {

    private CrashChild() {
    }

    /**
     * @param args the archive URL and a run label
     * @throws Exception on any failure (the parent then sees the exit code)
     */
    public static void main(String[] args) throws Exception {
        try (JdbcArchive archive = JdbcArchive.open(args[0])) {
            System.out.println("open");
            System.out.flush();
            for (int i = 0; i < 100_000; i++) {
                String id = "CRASH-" + args[1] + "-" + i;
                StudyVersion v = archive.add(Fixtures.study(id, "4711", "tooling", "change verified",
                        Instant.parse("2025-05-01T00:00:00Z"), "Bore", "Wall", "Torque"), "child", "crash test");
                if (i % 2 == 0) {
                    archive.sign(v.id(), "Quinn", "quality manager", "approved", Instant.now());
                }
                System.out.println("committed " + id);
                System.out.flush();
            }
        }
    }
}
