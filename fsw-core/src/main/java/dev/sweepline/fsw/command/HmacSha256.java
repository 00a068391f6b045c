package dev.sweepline.fsw.command;

import java.security.DigestException;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;

/**
 * HMAC-SHA256 (RFC 2104 with SHA-256 of FIPS 180-4), written over the JDK's
 * {@link MessageDigest} so that computing a MAC allocates nothing: {@code javax.crypto.Mac.doFinal}
 * returns a fresh array inside the JDK even when given an output buffer (measured: 48 B per call on
 * JDK 17), while {@code MessageDigest.digest(byte[], int, int)} writes in place (0 B). Checked
 * against {@code javax.crypto.Mac} and the RFC 4231 vectors in the tests. The digest and the padded
 * keys are made at start-up. One thread.
 */
public final class HmacSha256 {
    /** Octets of a full MAC. */
    public static final int MAC_OCTETS = 32;
    private static final int BLOCK_OCTETS = 64;
    private static final byte INNER_PAD = 0x36;
    private static final byte OUTER_PAD = 0x5C;

    private final MessageDigest sha256;
    private final byte[] innerKey = new byte[BLOCK_OCTETS];
    private final byte[] outerKey = new byte[BLOCK_OCTETS];
    private final byte[] innerHash = new byte[MAC_OCTETS];

    /**
     * A MAC with {@code key} (any length; keys longer than a block are hashed, RFC 2104 §2).
     *
     * @throws IllegalStateException if the JDK has no SHA-256 (every Java SE platform must have it)
     */
    public HmacSha256(byte[] key) {
        try {
            sha256 = MessageDigest.getInstance("SHA-256");
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 missing from the JDK", e);
        }
        byte[] k = key.length > BLOCK_OCTETS ? sha256.digest(key) : key;
        for (int i = 0; i < BLOCK_OCTETS; i++) {
            byte b = i < k.length ? k[i] : 0;
            innerKey[i] = (byte) (b ^ INNER_PAD);
            outerKey[i] = (byte) (b ^ OUTER_PAD);
        }
    }

    /** Writes the 32-octet MAC of {@code length} octets of {@code data} from {@code off} to {@code out} at {@code outOff}. */
    public void compute(byte[] data, int off, int length, byte[] out, int outOff) {
        try {
            sha256.reset();
            sha256.update(innerKey, 0, BLOCK_OCTETS);
            sha256.update(data, off, length);
            sha256.digest(innerHash, 0, MAC_OCTETS);
            sha256.update(outerKey, 0, BLOCK_OCTETS);
            sha256.update(innerHash, 0, MAC_OCTETS);
            sha256.digest(out, outOff, MAC_OCTETS);
        } catch (DigestException e) {
            throw new IllegalStateException("output buffer too small", e); // programming error
        }
    }
}
