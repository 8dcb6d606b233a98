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
        add(clauses, params, Sql.WHERE_PART, pattern(q.partNumber()));
        add(clauses, params, Sql.WHERE_CHARACTERISTIC, pattern(q.characteristic()));
        add(clauses, params, Sql.WHERE_CHANGE_KIND, q.changeKind());
        add(clauses, params, Sql.WHERE_VERDICT, q.verdict());
        // stored times are truncated to microseconds, so the bounds are too
        add(clauses, params, Sql.WHERE_CREATED_FROM, micros(q.createdFrom()));
        add(clauses, params, Sql.WHERE_CREATED_TO, micros(q.createdTo()));
        String signer = pattern(q.signer());
        add(clauses, params, Sql.WHERE_SIGNER, signer);
        if (signer != null) {
            params.add(signer); // WHERE_SIGNER asks twice: archive signatures and the document's own signers
        }
        add(clauses, params, Sql.WHERE_CHANGE_ID, q.changeId());
        if (q.versions() == ArchiveQuery.Versions.CURRENT) {
            clauses.add(Sql.WHERE_CURRENT);
        }
        String where = clauses.isEmpty() ? "" : " WHERE " + String.join(" AND ", clauses);
        return new ListFilter(where, params.toArray());
    }

    /**
     * Searching as people search: case does not matter, and the text matches anywhere in the name
     * ("hx" finds "HX-220-B"); with a {@code *} the text is a pattern ("HX-*-B"), {@code *} standing
     * for any run of characters. The LIKE wildcards {@code %} and {@code _} typed by the user are taken
     * literally (escaped with {@code !}).
     *
     * @param text the user's text, or null
     * @return the LIKE pattern in lower case, or null
     */
    static String pattern(String text) {
        if (text == null || text.isBlank()) {
            return null;
        }
        String t = text.strip().toLowerCase(java.util.Locale.ROOT);
        StringBuilder sb = new StringBuilder();
        for (char ch : t.toCharArray()) {
            switch (ch) {
                case '!', '%', '_' -> sb.append('!').append(ch);
                case '*' -> sb.append('%');
                default -> sb.append(ch);
            }
        }
        return t.indexOf('*') >= 0 ? sb.toString() : "%" + sb + "%";
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

    /** @return the statement listing the signers of their own documents */
    Stmt documentSigners() {
        return new Stmt("list study signers", Sql.LIST_DOCUMENT_SIGNERS_HEAD + where + Sql.LIST_DOCUMENT_SIGNERS_TAIL);
    }

    /** @return the statement listing their signatures */
    Stmt signatures() {
        return new Stmt("list signatures", Sql.LIST_SIGNATURES_HEAD + where + Sql.LIST_SIGNATURES_TAIL);
    }
}
