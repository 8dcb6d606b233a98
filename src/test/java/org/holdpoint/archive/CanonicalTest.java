package org.holdpoint.archive;

import static org.assertj.core.api.Assertions.assertThat;

import java.time.Instant;
import org.holdpoint.study.AuditEvent;
import org.junit.jupiter.api.Test;

/**
 * The canonical serialisation is the documented one (docs/archive.md) and its SHA-256 agrees with an outside
 * implementation, so an auditor can re-verify the chain with any SHA-256 tool.
 */
class CanonicalTest {

    @Test
    void sha256MatchesTheFipsExamples() {
        // FIPS 180-2 Appendix B.1 and B.2 (one-block and two-block messages)
        assertThat(Canonical.sha256Hex("abc"))
                .isEqualTo("ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad");
        assertThat(Canonical.sha256Hex("abcdbcdecdefdefgefghfghighijhijkijkljklmklmnlmnomnopnopq"))
                .isEqualTo("248d6a61d20638b8e5c026930c3e6039a33ce45964ff2167f6ecedd419db06c1");
    }

    @Test
    void anEventHashesItsDocumentedCanonicalText() {
        AuditEvent e = new AuditEvent(7, 3, AuditEvent.Kind.SIGNED, 2, "Zoë Qualität", "alice",
                Instant.parse("2025-04-01T09:00:00.123456Z"), "signed as quality manager", null, "a".repeat(64),
                "0".repeat(64), "");
        // the canonical text spelled out by hand from the format in docs/archive.md (lengths are UTF-8 bytes:
        // "Zoë Qualität" is 12 characters, 14 bytes)
        String text = "holdpoint-audit-event/1\nseq=1:7\nstudyId=1:3\nkind=6:SIGNED\nsubjectId=1:2\n"
                + "who=14:Zoë Qualität\ndbUser=5:alice\nwhen=27:2025-04-01T09:00:00.123456Z\n"
                + "what=25:signed as quality manager\nwhy=-\nsubjectDigest=64:" + "a".repeat(64) + "\n"
                + "prevHash=64:" + "0".repeat(64) + "\n";
        // expected digest of that text from Python 3.11.7 hashlib:
        // hashlib.sha256(text.encode('utf-8')).hexdigest()
        assertThat(Chain.hashOf(e)).isEqualTo("a5502e174014b504c2ab502c1dbc738ced9ba688cbd9f662e4eea5ce0f5cec2e");
        assertThat(Canonical.of(Canonical.EVENT).field("seq", 7).field("studyId", 3).field("kind", "SIGNED")
                .field("subjectId", 2).field("who", "Zoë Qualität").field("dbUser", "alice")
                .field("when", Instant.parse("2025-04-01T09:00:00.123456Z"))
                .field("what", "signed as quality manager").field("why", null).field("subjectDigest", "a".repeat(64))
                .field("prevHash", "0".repeat(64)).text()).isEqualTo(text);
    }

    @Test
    void lengthPrefixesKeepFieldBoundariesUnambiguous() {
        String a = Canonical.of("h").field("x", "a\ny=1:b").text();
        String b = Canonical.of("h").field("x", "a").field("y", "b").text();
        assertThat(Canonical.sha256Hex(a)).isNotEqualTo(Canonical.sha256Hex(b));
        assertThat(Canonical.of("h").field("x", null).text()).isNotEqualTo(Canonical.of("h").field("x", "-").text());
    }
}
