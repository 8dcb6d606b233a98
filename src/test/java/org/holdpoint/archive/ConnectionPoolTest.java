package org.holdpoint.archive;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.sql.Connection;
import java.util.ArrayList;
import java.util.List;
import java.util.Properties;
import org.holdpoint.study.ArchiveException;
import org.junit.jupiter.api.Test;

/** The pool the archive lends connections from (HikariCP underneath), on an in-memory H2 database. */
class ConnectionPoolTest {

    @Test
    void aLeaseReturnsItsConnectionOnceAndThePoolIsBounded() throws Exception {
        try (ConnectionPool pool = new ConnectionPool(Fixtures.memUrl("pool") + ";DB_CLOSE_DELAY=-1",
                new Properties())) {
            ConnectionPool.Lease a = pool.lease();
            a.close();
            a.close(); // a second close must not return the connection twice
            List<ConnectionPool.Lease> held = new ArrayList<>();
            for (int i = 0; i < ConnectionPool.MAX_CONNECTIONS; i++) {
                held.add(pool.lease());
            }
            List<Connection> distinct = held.stream().map(ConnectionPool.Lease::connection).distinct().toList();
            assertThat(distinct).as("every lease has a connection of its own").hasSize(ConnectionPool.MAX_CONNECTIONS);
            assertThat(pool.openConnections()).isEqualTo(ConnectionPool.MAX_CONNECTIONS);
            held.forEach(ConnectionPool.Lease::close);
        }
    }

    @Test
    void aDiscardedConnectionIsNotLentAgainAndAClosedPoolRefuses() throws Exception {
        ConnectionPool pool = new ConnectionPool(Fixtures.memUrl("pool2") + ";DB_CLOSE_DELAY=-1", new Properties());
        ConnectionPool.Lease a = pool.lease();
        Connection first = a.connection().unwrap(Connection.class);
        a.discard();
        a.close();
        try (ConnectionPool.Lease b = pool.lease()) {
            assertThat(b.connection().unwrap(Connection.class)).isNotSameAs(first);
        }
        pool.close();
        assertThat(pool.openConnections()).isZero();
        assertThatThrownBy(pool::lease).isInstanceOf(ArchiveException.class).hasMessageContaining("closed");
    }

    @Test
    void anUnreachableDatabaseIsSaidWithItsAddressAndNoPassword() {
        try (ConnectionPool pool = new ConnectionPool("jdbc:postgresql://127.0.0.1:9/none?password=secret",
                new Properties())) {
            assertThatThrownBy(pool::lease).isInstanceOf(ArchiveException.class)
                    .hasMessageContaining("cannot open the archive at").hasMessageNotContaining("secret");
        }
    }
}
