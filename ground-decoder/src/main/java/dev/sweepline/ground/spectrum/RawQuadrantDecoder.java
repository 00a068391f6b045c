package dev.sweepline.ground.spectrum;

import dev.sweepline.ground.frame.BigEndian;

/**
 * Compression {@code 0x00} of ICD §4: c samples of w bits, each big-endian and unsigned in ⌈w/8⌉
 * octets (2 for 16 bits, 3 for 20). Stateless.
 */
public final class RawQuadrantDecoder implements QuadrantDecompressor {
    /** The shared instance. */
    public static final RawQuadrantDecoder INSTANCE = new RawQuadrantDecoder();

    private RawQuadrantDecoder() {
    }

    /** Octets of one raw sample of {@code sampleBits} bits: ⌈w/8⌉ (ICD §4). */
    public static int octetsPerSample(int sampleBits) {
        return (sampleBits + 7) / 8;
    }

    /**
     * {@inheritDoc} The stream must be exactly {@code ⌈w/8⌉ × sampleCount} octets: raw samples have no
     * fill, so a longer one leaves octets unused (ICD §10); a value above 2^w − 1 is corrupt.
     */
    @Override
    public int decode(byte[] in, int off, int len, int sampleCount, int sampleBits, int[] out) {
        int each = octetsPerSample(sampleBits);
        if (len < each * sampleCount) {
            return ERROR_SHORT_INPUT;
        }
        if (len > each * sampleCount) {
            return ERROR_UNUSED_OCTETS;
        }
        int top = (1 << sampleBits) - 1;
        for (int i = 0; i < sampleCount; i++) {
            int v = BigEndian.unsigned(in, off + each * i, each);
            if (v > top) {
                return ERROR_CORRUPT;
            }
            out[i] = v;
        }
        return sampleCount;
    }
}
