package dev.sweepline.ground.spectrum;

/** Compression {@code 0x00} of ICD §4: c samples as c × 2 octets, big-endian, unsigned. Stateless. */
public final class RawQuadrantDecoder implements QuadrantDecompressor {
    /** The shared instance. */
    public static final RawQuadrantDecoder INSTANCE = new RawQuadrantDecoder();

    private RawQuadrantDecoder() {
    }

    /**
     * {@inheritDoc} The stream must be exactly {@code 2 × sampleCount} octets: raw samples have no fill,
     * so a longer one leaves octets unused (ICD §10).
     */
    @Override
    public int decode(byte[] in, int off, int len, int sampleCount, int[] out) {
        if (len < 2 * sampleCount) {
            return ERROR_SHORT_INPUT;
        }
        if (len > 2 * sampleCount) {
            return ERROR_UNUSED_OCTETS;
        }
        for (int i = 0; i < sampleCount; i++) {
            out[i] = ((in[off + 2 * i] & 0xFF) << 8) | (in[off + 2 * i + 1] & 0xFF);
        }
        return sampleCount;
    }
}
