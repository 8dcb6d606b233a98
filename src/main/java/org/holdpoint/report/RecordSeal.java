package org.holdpoint.report;

/**
 * An optional digital signature of the canonical study record, made with a key pair outside the
 * workbook (Ed25519, RFC 8032). The workbook stores it beside the record so that a verifier can say
 * which key signed the record; it is produced and checked by the workflow, the report only stores it.
 *
 * @param algorithm      the JCA signature algorithm, "Ed25519"
 * @param publicKey      the signer's public key, Base64 of its X.509 SubjectPublicKeyInfo encoding
 * @param signature      Base64 of the signature over the canonical record's UTF-8 bytes
 * @param keyFingerprint lower-case hex SHA-256 of the public key's encoding
 */
public record RecordSeal(String algorithm, String publicKey, String signature, String keyFingerprint) {

    /** Validates that every part is present. */
    public RecordSeal {
        if (algorithm == null || publicKey == null || signature == null || keyFingerprint == null
                || algorithm.isBlank() || publicKey.isBlank() || signature.isBlank() || keyFingerprint.isBlank()) {
            throw new ReportException("a record signature needs an algorithm, a public key, a signature and a "
                    + "key fingerprint");
        }
    }
}
