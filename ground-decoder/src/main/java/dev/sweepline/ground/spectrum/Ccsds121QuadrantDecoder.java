package dev.sweepline.ground.spectrum;

import dev.sweepline.ground.rice.DecodeStatus;
import dev.sweepline.ground.rice.RiceDecoder;
import dev.sweepline.ground.rice.RiceSettings;

/**
 * Compression 0x01 of the telemetry ICD §4: the CCSDS 121.0-B decoder with the ICD's parameters
 * (n = w, the packet's sample width, J = 8, preprocessor on, basic option set, one reference interval
 * of 32 blocks, so the first sample of each quadrant stream is its reference). A stream whose last
 * coded data set ends before its last octet is refused (ICD §10). One Rice decoder per sample width,
 * made when a width is first met. Not thread-safe: one per decoder.
 */
public final class Ccsds121QuadrantDecoder implements QuadrantDecompressor {
    /** Reference sample interval of the ICD, blocks: 32 blocks of 8 cover the 256-window maximum. */
    public static final int REFERENCE_INTERVAL_BLOCKS = 32;

    private final RiceDecoder[] byWidth = new RiceDecoder[MAX_SAMPLE_BITS + 1];

    @Override
    public int decode(byte[] in, int off, int len, int sampleCount, int sampleBits, int[] out) {
        if (sampleBits < MIN_SAMPLE_BITS || sampleBits > MAX_SAMPLE_BITS) {
            return ERROR_CORRUPT;
        }
        RiceDecoder decoder = byWidth[sampleBits];
        if (decoder == null) {
            decoder = new RiceDecoder(RiceSettings.basic(sampleBits, BLOCK_SAMPLES, REFERENCE_INTERVAL_BLOCKS));
            byWidth[sampleBits] = decoder;
        }
        DecodeStatus status = decoder.decodeInPlace(in, off, len, sampleCount, out);
        if (status == DecodeStatus.OK) {
            // fill reaches only the next octet boundary (ICD §4), so the last coded bit lies in octet Lq
            return (decoder.bitPosition() + 7) / 8 < len ? ERROR_UNUSED_OCTETS : decoder.samplesDecoded();
        }
        return status == DecodeStatus.TRUNCATED ? ERROR_SHORT_INPUT : ERROR_CORRUPT;
    }
}
