package org.holdpoint.archive;

import java.nio.charset.StandardCharsets;
import java.time.Instant;
import java.time.format.DateTimeFormatter;
import java.util.List;

/**
 * The canonical serialisation that the archive hashes, and SHA-256 in lower-case hex.
 *
 * <p>A record is serialised as a header line followed by one line per field, in a fixed order:
 * {@code name=<length>:<value>\n}, where length is the number of UTF-8 bytes of the value, or
 * {@code name=-\n} for a null value. Instants are ISO-8601 in UTC ({@link DateTimeFormatter#ISO_INSTANT}),
 * truncated to microseconds before storage; lists are a count field followed by one field per entry. The
 * length prefix makes the encoding unambiguous whatever the values contain.
 * The digest is SHA-256 (FIPS 180-4) of the UTF-8 bytes of that text.
 */
final class Canonical {

    /** The {@code prevHash} of the first audit event. */
    static final String GENESIS = "0".repeat(64);

    /** Header of a study row's canonical form. */
    static final String STUDY = "holdpoint-study/1";
    /** Header of a signature row's canonical form. */
    static final String SIGNATURE = "holdpoint-signature/1";
    /** Header of an audit event's canonical form. */
    static final String EVENT = "holdpoint-audit-event/1";

    private final StringBuilder text = new StringBuilder();

    private Canonical(String header) {
        text.append(header).append('\n');
    }

    /**
     * Starts a record.
     *
     * @param header the record type, e.g. {@link #STUDY}
     * @return the builder
     */
    static Canonical of(String header) {
        return new Canonical(header);
    }

    /**
     * Appends a field.
     *
     * @param name  the field name
     * @param value the value (String, Number, Instant, enum), or null
     * @return this builder
     */
    Canonical field(String name, Object value) {
        text.append(name).append('=');
        if (value == null) {
            text.append('-');
        } else {
            String v = value instanceof Instant t ? DateTimeFormatter.ISO_INSTANT.format(t) : value.toString();
            text.append(v.getBytes(StandardCharsets.UTF_8).length).append(':').append(v);
        }
        text.append('\n');
        return this;
    }

    /**
     * Appends a list as {@code name.count} then {@code name.0}, {@code name.1}, ….
     *
     * @param name   the field name
     * @param values the entries
     * @return this builder
     */
    Canonical list(String name, List<String> values) {
        field(name + ".count", values.size());
        for (int i = 0; i < values.size(); i++) {
            field(name + "." + i, values.get(i));
        }
        return this;
    }

    /**
     * Appends a list as {@link #list} does, but nothing at all when it is empty: a field added in a later
     * schema leaves the digests of the rows written before it unchanged.
     *
     * @param name   the field name
     * @param values the entries
     * @return this builder
     */
    Canonical listIfAny(String name, List<String> values) {
        return values.isEmpty() ? this : list(name, values);
    }

    /** @return the canonical text */
    String text() {
        return text.toString();
    }

    /** @return SHA-256 of the canonical text, lower-case hex */
    String sha256() {
        return sha256Hex(text.toString());
    }

    /**
     * SHA-256 (FIPS 180-4) of the UTF-8 bytes of a text.
     *
     * @param s the text
     * @return 64 lower-case hex digits
     */
    static String sha256Hex(String s) {
        return org.holdpoint.files.Sha256.ofText(s);
    }
}
