package dev.sweepline.ground.spectrum;

/**
 * Decoder of one quadrant's sample stream of a spectrum packet (ICD §4) of w-bit samples, w being the
 * packet's sample width (8..24; 16 in layout 1). The ICD's compression {@code 0x01} is CCSDS 121.0-B
 * adaptive Rice coding with these parameters, which an implementation must apply (they are not
 * transmitted):
 * <ul>
 *   <li>n = w bits per sample, block size J = {@value #BLOCK_SAMPLES};</li>
 *   <li>preprocessor on: unit-delay predictor, mapper with x_min = 0, x_max = 2^w − 1;</li>
 *   <li>basic option set (not the restricted set);</li>
 *   <li>one reference sample interval for the whole stream: the first sample is the reference, sent raw;</li>
 *   <li>the {@code sampleCount} samples are padded to a whole number of blocks by repeating the last
 *       sample; the padding is coded, and the decoder decodes and discards it;</li>
 *   <li>the stream is zero-filled to an octet; each quadrant's stream is independent.</li>
 * </ul>
 * The stream's length is Lq: the coded data sets and at most the 7 fill bits of its last octet, so a
 * stream whose samples end a whole octet or more before Lq is refused with {@link #ERROR_UNUSED_OCTETS}
 * (ICD §10).
 * Implementations are used from one thread at a time per instance.
 */
@FunctionalInterface
public interface QuadrantDecompressor {
    /** Sample width of layout-1 spectra, bits (ICD §4: the demo cup's 16-bit ADC). */
    int LAYOUT_1_SAMPLE_BITS = 16;
    /** Narrowest sample width (ICD §4: 8..24 bits). */
    int MIN_SAMPLE_BITS = 8;
    /** Widest sample width (ICD §4). */
    int MAX_SAMPLE_BITS = 24;
    /** Block size J, samples (ICD §4). */
    int BLOCK_SAMPLES = 8;
    /** Smallest sample value x_min of the mapper (ICD §4). */
    int X_MIN = 0;

    /** Error: no decoder for this compression is plugged in. */
    int ERROR_UNAVAILABLE = -1;
    /** Error: the stream ended before {@code sampleCount} samples were decoded. */
    int ERROR_SHORT_INPUT = -2;
    /** Error: the stream is malformed (bad option id, bad zero-block run, a value out of range, ...). */
    int ERROR_CORRUPT = -3;
    /** Error: the samples end a whole octet or more before the stream's stated length Lq (ICD §10). */
    int ERROR_UNUSED_OCTETS = -4;

    /**
     * Decodes {@code sampleCount} samples of {@code sampleBits} bits from {@code in[off .. off+len)}.
     *
     * @param in          packet buffer
     * @param off         first octet of this quadrant's stream
     * @param len         stream length Lq in octets
     * @param sampleCount samples to deliver (the window count c, 1..256)
     * @param sampleBits  sample width w, 8..24
     * @param out         receives the samples (0 .. 2^w − 1) from index 0; at least
     *                    {@link #paddedCount(int) paddedCount(sampleCount)} long, so whole blocks fit
     * @return {@code sampleCount} on success, or a negative error code ({@code ERROR_...})
     */
    int decode(byte[] in, int off, int len, int sampleCount, int sampleBits, int[] out);

    /** Decodes 16-bit samples, the width of layout-1 spectra (else as the method above). */
    default int decode(byte[] in, int off, int len, int sampleCount, int[] out) {
        return decode(in, off, len, sampleCount, LAYOUT_1_SAMPLE_BITS, out);
    }

    /** Samples rounded up to whole blocks of J. */
    static int paddedCount(int sampleCount) {
        return (sampleCount + BLOCK_SAMPLES - 1) / BLOCK_SAMPLES * BLOCK_SAMPLES;
    }

    /** Placeholder until a CCSDS 121 decoder is plugged in: always {@link #ERROR_UNAVAILABLE}. */
    QuadrantDecompressor UNAVAILABLE = (in, off, len, sampleCount, sampleBits, out) -> ERROR_UNAVAILABLE;
}
