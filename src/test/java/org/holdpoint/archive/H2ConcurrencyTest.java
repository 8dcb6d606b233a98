package org.holdpoint.archive;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;

/** Two archive objects writing to one H2 database at once (two threads, separate connection pools). */
class H2ConcurrencyTest {

    @Test
    void twoArchivesOnTheSameUrlAreSerialisedInTheJvmSoNeitherSeesAConflict() throws Exception {
        String url = Fixtures.memUrl("concurrent");
        try (JdbcArchive a = JdbcArchive.open(url); JdbcArchive b = JdbcArchive.open(url)) {
            ConcurrentWriters.Outcome o = ConcurrentWriters.race(a, b, 60);
            assertThat(o.report().problems()).isEmpty();
            assertThat(o.retryable()).isZero();
            // 60 per writer, every third (i = 0, 3, …, 57: 20) also corrected
            assertThat(o.stored()).isEqualTo(160);
            assertThat(o.listed()).isEqualTo(160);
            assertThat(a.conflictsRetried() + b.conflictsRetried()).isZero();
        }
    }

    @Test
    void writersWithoutASharedLockRaceInTheDatabaseAndLosersAreRetriedOrToldToRetry() throws Exception {
        // two spellings of one database: no shared JVM lock, as with two processes on a server
        String url = Fixtures.memUrl("racing");
        try (JdbcArchive a = JdbcArchive.open(url); JdbcArchive b = JdbcArchive.open(url + ";LOCK_TIMEOUT=10000")) {
            ConcurrentWriters.Outcome o = ConcurrentWriters.race(a, b, 60);
            assertThat(o.report().problems()).isEmpty();
            assertThat(o.listed()).isEqualTo(o.stored());
            assertThat(o.report().studiesChecked()).isEqualTo(o.stored());
            assertThat(o.report().eventsChecked()).isGreaterThanOrEqualTo(o.stored());
        }
    }

    @Test
    void verifyReadsAConsistentSnapshotWhileAnotherArchiveWrites() throws Exception {
        String url = Fixtures.memUrl("verify-while-writing");
        try (JdbcArchive writer = JdbcArchive.open(url); JdbcArchive auditor = JdbcArchive.open(url)) {
            int[] r = ConcurrentWriters.verifyWhileWriting(writer, auditor, 150);
            assertThat(r[0]).as("problems over %d reports", r[1]).isZero();
            assertThat(r[1]).isPositive();
        }
    }
}
