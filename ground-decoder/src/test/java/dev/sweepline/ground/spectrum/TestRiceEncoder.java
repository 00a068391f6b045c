package dev.sweepline.ground.spectrum;

import java.io.ByteArrayOutputStream;

/**
 * A CCSDS 121.0-B encoder with the ICD §4 parameters (n = w, J = 8, preprocessor on with x_min = 0 and
 * x_max = 2^w − 1, basic option set, one reference interval), written for tests from standards.md, so that
 * the ground module can make compressed spectra without the flight code. Per block it picks the option
 * with the fewest bits among second extension, fundamental sequence, split-sample k = 1..K and no
 * compression (K = 13 for 4-bit option IDs, n ≤ 16; for 5-bit IDs, n > 16, K = n − 2 here); it never codes
 * zero-block runs (the option choice is the encoder's, CCSDS 121.0-B §3 [memory]), so its streams are a
 * subset of what the flight encoder may send. The stream is zero-filled to an octet (ICD §4). Tests decode
 * its output with the ground decoder to the samples put in.
 */
final class TestRiceEncoder {
    private static final int J = QuadrantDecompressor.BLOCK_SAMPLES;
    /** Option code of the second extension in {@code block}. */
    private static final int SECOND_EXTENSION = 64;

    private final int n;
    /** Option ID width: 3 bits for n ≤ 8, 4 for n ≤ 16, 5 above (standards.md). */
    private final int idBits;
    /** Largest split position: the IDs below all ones and above the low-entropy 0 (standards.md), and below n − 1. */
    private final int maxK;
    private final long xMax;
    private final ByteArrayOutputStream out = new ByteArrayOutputStream();
    private long acc;
    private int accBits;

    private TestRiceEncoder(int n) {
        this.n = n;
        this.idBits = n <= 8 ? 3 : n <= 16 ? 4 : 5;
        this.maxK = Math.min((1 << idBits) - 3, n - 2);
        this.xMax = (1L << n) - 1;
    }

    /** The coded stream of 16-bit {@code samples} (layout 1), padded to whole blocks by the last sample (ICD §4). */
    static byte[] encode(int[] samples) {
        return encode(samples, QuadrantDecompressor.LAYOUT_1_SAMPLE_BITS);
    }

    /** The coded stream of {@code bits}-bit {@code samples}, padded to whole blocks by the last sample (ICD §4). */
    static byte[] encode(int[] samples, int bits) {
        TestRiceEncoder e = new TestRiceEncoder(bits);
        int padded = QuadrantDecompressor.paddedCount(samples.length);
        long[] mapped = new long[padded];
        int prev = samples[0];
        for (int i = 1; i < padded; i++) {
            int x = samples[Math.min(i, samples.length - 1)];
            mapped[i] = e.map(x, prev);
            prev = x;
        }
        for (int b = 0; b < padded / J; b++) {
            e.block(mapped, b * J, b == 0, samples[0]);
        }
        return e.finish();
    }

    /** The mapper of standards.md: Δ onto 0, 1, 2, ... by size, θ the room to the range's nearer end. */
    long map(int x, int prev) {
        long d = x - prev;
        long theta = Math.min(prev - QuadrantDecompressor.X_MIN, xMax - prev);
        if (d >= 0 && d <= theta) {
            return 2 * d;
        }
        if (d < 0 && -d <= theta) {
            return 2 * -d - 1;
        }
        return theta + Math.abs(d);
    }

    private void block(long[] m, int at, boolean reference, int ref) {
        int first = reference ? 1 : 0;
        int count = J - first;
        long best = idBits + (long) n * count;
        int option = -1; // -1 no compression, 0..maxK split k (0: fundamental sequence), SECOND_EXTENSION
        for (int k = 0; k <= maxK; k++) {
            long bits = idBits + (long) k * count;
            for (int i = at + first; i < at + J; i++) {
                bits += (m[i] >>> k) + 1;
            }
            if (bits < best) {
                best = bits;
                option = k;
            }
        }
        long se = idBits + 1;
        for (int i = at; i < at + J; i += 2) {
            se += gamma(reference && i == at ? 0 : m[i], m[i + 1]) + 1;
        }
        if (se < best) {
            option = SECOND_EXTENSION;
        }
        if (option == SECOND_EXTENSION) {
            put(0, idBits); // ID all zeros, then 1: second extension (standards.md)
            put(1, 1);
            putReference(reference, ref);
            for (int i = at; i < at + J; i += 2) {
                fs(gamma(reference && i == at ? 0 : m[i], m[i + 1]));
            }
        } else if (option < 0) {
            put((1 << idBits) - 1, idBits);
            putReference(reference, ref);
            for (int i = at + first; i < at + J; i++) {
                put(m[i], n);
            }
        } else {
            put(option + 1, idBits);
            putReference(reference, ref);
            for (int i = at + first; i < at + J; i++) {
                fs(m[i] >>> option);
            }
            for (int i = at + first; i < at + J && option > 0; i++) {
                put(m[i] & ((1L << option) - 1), option);
            }
        }
    }

    /** The pair code of the second extension (standards.md). */
    private static long gamma(long a, long b) {
        return (a + b) * (a + b + 1) / 2 + b;
    }

    private void putReference(boolean reference, int ref) {
        if (reference) {
            put(ref, n);
        }
    }

    /** FS(v): v zeros then a one (standards.md). */
    private void fs(long v) {
        for (long z = v; z > 0; z -= Math.min(z, 32)) {
            put(0, (int) Math.min(z, 32));
        }
        put(1, 1);
    }

    private void put(long value, int bits) {
        for (int b = bits - 1; b >= 0; b--) {
            acc = (acc << 1) | ((value >>> b) & 1);
            if (++accBits == 8) {
                out.write((int) acc);
                acc = 0;
                accBits = 0;
            }
        }
    }

    private byte[] finish() {
        if (accBits > 0) {
            out.write((int) (acc << (8 - accBits))); // zero fill to the octet (ICD §4)
        }
        return out.toByteArray();
    }
}
