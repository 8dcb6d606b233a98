package org.holdpoint.archive;

import java.time.Instant;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.List;
import org.holdpoint.study.ArchiveQuery;

/**
 * The WHERE clause of a listing, assembled only from the fixed fragments in {@link Sql}, with its parameters.
 *
 * @param where  {@code ""} or {@code " WHERE a AND b …"}
 * @param params the parameters, in placeholder order
 */
record ListFilter(String where, Object[] params) {

    /**
     * @param q the query
     * @return its filter
     */
    static ListFilter of(ArchiveQuery q) {
        List<String> clauses = new ArrayList<>();
        List<Object> params = new ArrayList<>();
        add(clauses, params, Sql.WHERE_PART, q.partNumber());
        add(clauses, params, Sql.WHERE_CHARACTERISTIC, q.characteristic());
        add(clauses, params, Sql.WHERE_CHANGE_KIND, q.changeKind());
        add(clauses, params, Sql.WHERE_VERDICT, q.verdict());
        // stored times are truncated to microseconds, so the bounds are too
        add(clauses, params, Sql.WHERE_CREATED_FROM, micros(q.createdFrom()));
        add(clauses, params, Sql.WHERE_CREATED_TO, micros(q.createdTo()));
        add(clauses, params, Sql.WHERE_SIGNER, q.signer());
        add(clauses, params, Sql.WHERE_CHANGE_ID, q.changeId());
        if (q.versions() == ArchiveQuery.Versions.CURRENT) {
            clauses.add(Sql.WHERE_CURRENT);
        }
        String where = clauses.isEmpty() ? "" : " WHERE " + String.join(" AND ", clauses);
        return new ListFilter(where, params.toArray());
    }

    private static Instant micros(Instant t) {
        return t == null ? null : t.truncatedTo(ChronoUnit.MICROS);
    }

    private static void add(List<String> clauses, List<Object> params, String clause, Object value) {
        if (value != null) {
            clauses.add(clause);
            params.add(value);
        }
    }

    /** @return the statement listing the studies */
    Stmt studies() {
        return new Stmt("list studies", Sql.LIST_HEAD + where + Sql.LIST_TAIL);
    }

    /** @return the statement listing their characteristics */
    Stmt characteristics() {
        return new Stmt("list characteristics", Sql.LIST_CHARACTERISTICS_HEAD + where + Sql.LIST_CHARACTERISTICS_TAIL);
    }

    /** @return the statement listing their signatures */
    Stmt signatures() {
        return new Stmt("list signatures", Sql.LIST_SIGNATURES_HEAD + where + Sql.LIST_SIGNATURES_TAIL);
    }
}
