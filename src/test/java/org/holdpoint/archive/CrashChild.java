package org.holdpoint.archive;

import java.time.Clock;
import java.time.Instant;
import java.time.ZoneId;
import java.time.ZoneOffset;
import java.util.Properties;
import org.holdpoint.study.StudyVersion;

/**
 * Child process for {@link CrashConsistencyTest}: archives and signs studies in a tight loop, printing
 * {@code committed <changeId>} after each call returns, until it is killed (or has done 100,000). With a
 * third argument N it halts the JVM (exit code 3, no shutdown hooks) inside the N-th call of the archive's
 * clock, which every write makes inside its open transaction.
 */
public final class CrashChild {

    private CrashChild() {
    }

    /**
     * @param args the archive URL and a run label
     * @throws Exception on any failure (the parent then sees the exit code)
     */
    public static void main(String[] args) throws Exception {
        Clock clock = Clock.systemUTC();
        if (args.length > 2) {
            clock = new HaltingClock(Integer.parseInt(args[2]));
        }
        try (JdbcArchive archive = JdbcArchive.open(args[0], new Properties(), clock)) {
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

    /** A clock that halts the JVM at its N-th reading. */
    private static final class HaltingClock extends Clock {
        private final int haltAt;
        private int calls;

        HaltingClock(int haltAt) {
            this.haltAt = haltAt;
        }

        @Override
        public Instant instant() {
            if (++calls == haltAt) {
                Runtime.getRuntime().halt(3);
            }
            return Instant.now();
        }

        @Override
        public ZoneId getZone() {
            return ZoneOffset.UTC;
        }

        @Override
        public Clock withZone(ZoneId zone) {
            return this;
        }
    }
}
