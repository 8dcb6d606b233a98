package org.holdpoint.workflow;

import org.holdpoint.files.AtomicFiles;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.GeneralSecurityException;
import java.security.KeyFactory;
import java.security.KeyPair;
import java.security.KeyPairGenerator;
import java.security.PrivateKey;
import java.security.PublicKey;
import java.security.Signature;
import java.security.spec.PKCS8EncodedKeySpec;
import java.security.spec.X509EncodedKeySpec;
import java.util.Base64;
import org.holdpoint.report.RecordSeal;

/**
 * Digital signatures of the canonical study record with Ed25519 (RFC 8032, the JDK's "Ed25519"
 * provider). Keys are PEM files: the private key as PKCS#8 ("BEGIN PRIVATE KEY"), the public key as
 * X.509 SubjectPublicKeyInfo ("BEGIN PUBLIC KEY"), the formats {@code openssl genpkey -algorithm ed25519}
 * and {@code openssl pkey -pubout} write. A key's fingerprint is the SHA-256 of its X.509 encoding.
 */
public final class RecordSigning {
    /** Far larger than any key file (an Ed25519 PEM has about 120 bytes). */
    private static final long MAX_KEY_BYTES = 64 * 1024;

    /** The JCA algorithm name. */
    public static final String ALGORITHM = "Ed25519";

    private RecordSigning() {
    }

    /**
     * Creates a key pair and writes it as {@code NAME.key} (private, PKCS#8 PEM) and {@code NAME.pub}.
     *
     * @param privateFile the private key file to write (must not exist)
     * @param publicFile  the public key file to write (must not exist)
     * @return the public key's fingerprint
     * @throws IOException when a file exists or cannot be written
     */
    public static String generate(Path privateFile, Path publicFile) throws IOException {
        try {
            KeyPair pair = KeyPairGenerator.getInstance(ALGORITHM).generateKeyPair();
            AtomicFiles.write(publicFile, false, out -> out.write(pem("PUBLIC KEY", pair.getPublic().getEncoded())));
            AtomicFiles.writePrivate(privateFile, out -> out.write(pem("PRIVATE KEY",
                    pair.getPrivate().getEncoded())));
            return fingerprint(pair.getPublic());
        } catch (GeneralSecurityException e) {
            throw new IllegalStateException("Ed25519 is not available in this Java runtime", e);
        }
    }

    /**
     * Signs the record.
     *
     * @param record      the canonical record bytes
     * @param privateFile the private key (PKCS#8 PEM or DER)
     * @param publicFile  the matching public key (X.509 PEM or DER)
     * @return the seal to store in the workbook
     * @throws StudyFileException when a key cannot be read or the two keys do not belong together
     */
    public static RecordSeal sign(byte[] record, Path privateFile, Path publicFile) {
        PrivateKey priv = readPrivate(privateFile);
        PublicKey pub = readPublic(publicFile);
        try {
            Signature s = Signature.getInstance(ALGORITHM);
            s.initSign(priv);
            s.update(record);
            byte[] sig = s.sign();
            if (!check(record, pub, sig)) {
                throw new StudyFileException("%s and %s are not a key pair: the public key does not verify a "
                        + "signature made with the private key", privateFile, publicFile);
            }
            return new RecordSeal(ALGORITHM, Base64.getEncoder().encodeToString(pub.getEncoded()),
                    Base64.getEncoder().encodeToString(sig), fingerprint(pub));
        } catch (GeneralSecurityException e) {
            throw new StudyFileException("%s: cannot sign with this key (%s)", privateFile, e.getMessage());
        }
    }

    /**
     * Checks a stored seal against the record.
     *
     * @param record the canonical record bytes
     * @param seal   the stored seal
     * @return whether the signature is valid for the stored public key and the fingerprint matches that key
     */
    public static boolean verify(byte[] record, RecordSeal seal) {
        try {
            if (!ALGORITHM.equals(seal.algorithm())) {
                return false;
            }
            PublicKey pub = KeyFactory.getInstance(ALGORITHM).generatePublic(new X509EncodedKeySpec(
                    Base64.getDecoder().decode(seal.publicKey())));
            return fingerprint(pub).equals(seal.keyFingerprint()) && check(record, pub,
                    Base64.getDecoder().decode(seal.signature()));
        } catch (GeneralSecurityException | IllegalArgumentException e) {
            return false;
        }
    }

    private static boolean check(byte[] record, PublicKey pub, byte[] sig) throws GeneralSecurityException {
        Signature s = Signature.getInstance(ALGORITHM);
        s.initVerify(pub);
        s.update(record);
        return s.verify(sig);
    }

    /**
     * @param key a public key
     * @return lower-case hex SHA-256 of its X.509 encoding
     */
    public static String fingerprint(PublicKey key) {
        return StudyFiles.sha256(key.getEncoded());
    }

    /**
     * Reads a public key file.
     *
     * @param file X.509 SubjectPublicKeyInfo, PEM or DER
     * @return the key
     * @throws StudyFileException when it is not an Ed25519 public key
     */
    public static PublicKey readPublic(Path file) {
        try {
            return KeyFactory.getInstance(ALGORITHM).generatePublic(new X509EncodedKeySpec(der(file, "PUBLIC KEY")));
        } catch (GeneralSecurityException | IllegalArgumentException e) {
            throw new StudyFileException("%s is not an Ed25519 public key (X.509 'BEGIN PUBLIC KEY' PEM); create "
                    + "one with 'openssl pkey -in KEY.pem -pubout'", file);
        }
    }

    private static PrivateKey readPrivate(Path file) {
        try {
            return KeyFactory.getInstance(ALGORITHM).generatePrivate(new PKCS8EncodedKeySpec(der(file,
                    "PRIVATE KEY")));
        } catch (GeneralSecurityException | IllegalArgumentException e) {
            throw new StudyFileException("%s is not an Ed25519 private key (PKCS#8 'BEGIN PRIVATE KEY' PEM); create "
                    + "one with 'openssl genpkey -algorithm ed25519'", file);
        }
    }

    private static byte[] der(Path file, String type) {
        byte[] bytes;
        try {
            if (!Files.isRegularFile(file)) {
                throw new StudyFileException("%s is not a key file (%s); give the path of the .pem file", file,
                        Files.isDirectory(file) ? "it is a folder" : Files.exists(file) ? "it is a device or pipe"
                                : "it does not exist");
            }
            if (Files.size(file) > MAX_KEY_BYTES) {
                throw new StudyFileException("%s is not a key file (%d bytes; an Ed25519 key file has a few hundred); "
                        + "give the path of the .pem file", file, Files.size(file));
            }
            bytes = Files.readAllBytes(file);
        } catch (IOException e) {
            throw new StudyFileException("%s: cannot read the key file (%s); check the path", file, e.getMessage());
        }
        String text = new String(bytes, StandardCharsets.US_ASCII);
        String begin = "-----BEGIN " + type + "-----";
        int b = text.indexOf(begin);
        if (b < 0) {
            return bytes;
        }
        int e = text.indexOf("-----END " + type + "-----", b);
        if (e < 0) {
            throw new IllegalArgumentException("no PEM end line");
        }
        return Base64.getMimeDecoder().decode(text.substring(b + begin.length(), e));
    }

    private static byte[] pem(String type, byte[] der) {
        String body = Base64.getMimeEncoder(64, "\n".getBytes(StandardCharsets.US_ASCII)).encodeToString(der);
        return ("-----BEGIN " + type + "-----\n" + body + "\n-----END " + type + "-----\n")
                .getBytes(StandardCharsets.US_ASCII);
    }
}
