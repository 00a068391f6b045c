package dev.sweepline.sim.interop;

import dev.sweepline.fsw.compress.RiceEncoder;
import dev.sweepline.fsw.compress.RiceParameters;
import dev.sweepline.ground.rice.DecodeResult;
import dev.sweepline.ground.rice.RiceDecoder;
import dev.sweepline.ground.rice.RiceSettings;
import java.util.Arrays;

/** The flight encoder and the ground decoder set up with the same parameters, for the interop tests. */
final class RiceChain {
    private RiceChain() {
    }

    /**
     * Flight encoder output for {@code samples}, trimmed to its length; fails the test on a negative
     * status. {@code padIntervals}: each reference sample interval zero-filled to an octet.
     */
    static byte[] encode(int[] samples, int n, int blockSize, int intervalBlocks, boolean restricted,
                         boolean preprocessed, boolean padIntervals) {
        RiceEncoder encoder = new RiceEncoder(
                RiceParameters.of(n, blockSize, intervalBlocks, preprocessed, restricted, padIntervals),
                Math.max(1, samples.length));
        byte[] out = new byte[(int) encoder.maxEncodedBytes(samples.length)];
        int written = encoder.encode(samples, 0, samples.length, out, 0);
        if (written < 0) {
            throw new AssertionError("flight encoder status " + written);
        }
        return Arrays.copyOf(out, written);
    }

    /** Ground decoder result for {@code count} samples of {@code stream} into {@code out}. */
    static DecodeResult decode(byte[] stream, int count, int[] out, int n, int blockSize, int intervalBlocks,
                               boolean restricted, boolean preprocessed, boolean padIntervals) {
        return new RiceDecoder(new RiceSettings(n, blockSize, intervalBlocks, preprocessed, restricted, padIntervals))
                .decode(stream, 0, stream.length, count, out);
    }
}
