package org.holdpoint.archive;

import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import org.holdpoint.study.ArchiveException;
import org.holdpoint.study.ArchiveQuery;
import org.holdpoint.study.ChangeRecordArchive;
import org.holdpoint.study.VerificationReport;

/**
 * Shared by the H2 and PostgreSQL concurrency tests: two writers, each with its own archive object, append
 * at once; every call either succeeds or fails with a retryable conflict, nothing half-written remains.
 */
final class ConcurrentWriters {

    /** What two racing writers achieved. */
    record Outcome(int stored, int retryable, VerificationReport report, int listed) {
    }

    private ConcurrentWriters() {
    }

    /**
     * Runs two writers of {@code perWriter} studies each (every second one signed, every third one corrected).
     *
     * @param a         the first writer's archive
     * @param b         the second writer's archive
     * @param perWriter studies per writer
     * @return the outcome, read back through {@code a}
     * @throws Exception when a call fails other than with a retryable conflict
     */
    static Outcome race(ChangeRecordArchive a, ChangeRecordArchive b, int perWriter) throws Exception {
        return race(a, a, b, b, perWriter);
    }

    /**
     * As {@link #race(ChangeRecordArchive, ChangeRecordArchive, int)} with separate archives for signing (an
     * approver's connection beside an author's).
     *
     * @param a         the first writer's archive
     * @param signA     the archive the first writer signs through
     * @param b         the second writer's archive
     * @param signB     the archive the second writer signs through
     * @param perWriter studies per writer
     * @return the outcome, read back through {@code a}
     * @throws Exception when a call fails other than with a retryable conflict
     */
    static Outcome race(ChangeRecordArchive a, ChangeRecordArchive signA, ChangeRecordArchive b,
            ChangeRecordArchive signB, int perWriter) throws Exception {
        CountDownLatch start = new CountDownLatch(1);
        ExecutorService pool = Executors.newFixedThreadPool(2);
        try {
            Future<int[]> fa = pool.submit(writer(a, signA, "A", perWriter, start));
            Future<int[]> fb = pool.submit(writer(b, signB, "B", perWriter, start));
            start.countDown();
            int[] ra = fa.get(120, TimeUnit.SECONDS);
            int[] rb = fb.get(120, TimeUnit.SECONDS);
            int listed = a.list(ArchiveQuery.withDefaults()).size();
            return new Outcome(ra[0] + rb[0], ra[1] + rb[1], a.verify(), listed);
        } finally {
            pool.shutdownNow();
            pool.awaitTermination(60, TimeUnit.SECONDS);
        }
    }

    /**
     * Verifies repeatedly while one writer appends: every report must come from a consistent snapshot.
     *
     * @param writer   the archive that writes
     * @param verifier the archive that verifies (may be the same)
     * @param studies  how many studies to write
     * @return the number of problems seen in all reports during the writes, and the number of reports
     * @throws Exception when a call fails
     */
    static int[] verifyWhileWriting(ChangeRecordArchive writer, ChangeRecordArchive verifier, int studies)
            throws Exception {
        CountDownLatch start = new CountDownLatch(1);
        ExecutorService pool = Executors.newSingleThreadExecutor();
        try {
            Future<int[]> w = pool.submit(writer(writer, writer, "W", studies, start));
            start.countDown();
            int problems = 0;
            int reports = 0;
            while (!w.isDone() || reports == 0) {
                problems += verifier.verify().problems().size();
                reports++;
            }
            w.get(120, TimeUnit.SECONDS);
            return new int[] {problems, reports};
        } finally {
            pool.shutdownNow();
            pool.awaitTermination(60, TimeUnit.SECONDS);
        }
    }

    private static Callable<int[]> writer(ChangeRecordArchive archive, ChangeRecordArchive signer, String name, int n,
            CountDownLatch start) {
        return () -> {
            start.await();
            int stored = 0;
            int retryable = 0;
            List<Long> ids = new ArrayList<>();
            Instant t = Instant.parse("2025-02-01T00:00:00Z");
            for (int i = 0; i < n; i++) {
                try {
                    long id = archive.add(Fixtures.study("CR-" + name + i, "P-" + (i % 7), "tooling", "ok", t,
                            "Bore"), name, null).id();
                    stored++;
                    ids.add(id);
                    if (i % 2 == 0) {
                        signer.sign(id, "Signer " + name, "quality manager", "approved", t);
                    }
                    if (i % 3 == 0) {
                        archive.supersede(id, Fixtures.study("CR-" + name + i, "P-" + (i % 7), "tooling", "ok", t,
                                "Bore", "Wall"), name, "second characteristic added");
                        stored++;
                    }
                } catch (ArchiveException e) {
                    if (!e.isRetryable()) {
                        throw e;
                    }
                    retryable++;
                }
            }
            return new int[] {stored, retryable};
        };
    }
}
