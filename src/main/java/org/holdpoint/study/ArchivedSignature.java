package org.holdpoint.study;

import java.time.Instant;
import java.util.Objects;

/**
 * A sign-off of one study version: who signed, in which role, what the signature means and when.
 *
 * @param id       the signature's archive identifier
 * @param studyId  the signed study version
 * @param signer   the signer's name
 * @param role     the signer's role (e.g. quality manager)
 * @param meaning  what the signature means (e.g. approved for series production)
 * @param signedAt when it was signed
 */
public record ArchivedSignature(long id, long studyId, String signer, String role, String meaning, Instant signedAt) {

    /** Validates the signature: signer, role and meaning not blank. */
    public ArchivedSignature {
        Checks.notBlank(signer, "signer");
        Checks.notBlank(role, "role");
        Checks.notBlank(meaning, "meaning");
        Objects.requireNonNull(signedAt, "signedAt");
    }
}
