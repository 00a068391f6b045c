/**
 * CCSDS 121.0-B lossless compression (adaptive Rice coder), the flight encoder.
 *
 * <h2>What it does</h2>
 * {@link dev.sweepline.fsw.compress.RiceEncoder} turns n-bit unsigned samples into a CCSDS 121.0-B
 * bit stream: unit-delay predictor and mapper ({@code PredictionMapper}), then per block of J samples
 * the shortest of zero-block (runs, with "remainder of segment"), second extension, fundamental
 * sequence, split-sample k and no compression ({@code RiceBlockCoder}), packed MSB-first by
 * {@link dev.sweepline.fsw.compress.BitWriter}. {@link dev.sweepline.fsw.compress.RiceParameters}
 * holds the validated parameter set (n, J, r, preprocessing, restricted set, interval padding).
 *
 * <h2>Decisions</h2>
 * <ul>
 *   <li>Each encode call is one self-contained stream: it starts a reference interval and ends zero-filled.</li>
 *   <li>A last partial block is padded with the last sample (mapped value 0); the decoder is told the
 *       sample count. A zero run is closed at a 64-block segment end (segments counted from the start
 *       of each reference interval), at an interval end and at the last block; more than 4 blocks
 *       closed that way are sent as ROS, which is what the reference coder aec does.</li>
 *   <li>Split positions run 0..min(2^idBits - 3, n - 2): beyond n - 2 a split block is never shorter
 *       than no compression.</li>
 *   <li>Ties: no compression, then second extension, then split-sample with the smallest k. This is
 *       the reference coders' order; with it the encoder reproduces all 72 official test streams and
 *       the small vectors of standards.md byte for byte. aec (libaec 1.0.6) is not always the same
 *       on a split-k tie: its search starts from the previous block's k and may keep the larger, so
 *       its streams can differ from ours in such blocks, at the same length.</li>
 *   <li>Interval padding ({@code RiceParameters.padIntervalsToOctet}, libaec's "pad RSI", {@code aec -p}):
 *       when on, the writer is zero-filled to an octet after the block that ends each reference
 *       interval (any zero run is closed there first), so each interval starts on an octet; after
 *       the last interval that fill is the end-of-stream fill, so a one-interval stream is the same
 *       either way. There is no default: every construction names the value; the ICD's configuration
 *       ({@code SpectrumPacker}) has it off. It is one {@code padToOctet} call per interval: no
 *       allocation, integers only. CCSDS 121.0-B-3 has, as far as we remember, no such option, and
 *       libaec says it "violates the standard"; it exists here to match streams written that way.</li>
 * </ul>
 *
 * <h2>Requirements and how each is verified</h2>
 * <ol>
 *   <li>R1 Conformant output: the ground decoder and aec decode every stream exactly. Verified by
 *       hw-sim {@code interop} tests: official test set, aec cross-check at n = 8, 12, 16 and every J,
 *       jqwik round trips over n = 1..32, every zero-run length at every boundary.</li>
 *   <li>R2 Golden bytes: the small vectors of standards.md and the 72 official .rz streams.
 *       Verified by {@code RiceEncoderSmallVectorsTest} and {@code OfficialVectorsEncodeTest}.</li>
 *   <li>R3 Shortest option per block, ID included; never longer than no compression. Verified by the
 *       byte-exact official streams and a jqwik bound property in hw-sim.</li>
 *   <li>R4 Allocation-free, integer-only per call; buffers sized at construction. Verified by
 *       {@code RiceEncoderBenchmark} under {@code -prof gc} (0 B/op) and {@code CompressArchitectureTest}
 *       (java.lang only).</li>
 *   <li>R5 Bad input is a status: output too small, too many samples, bad range, sample above
 *       x_max. Verified by {@code RiceEncoderSmallVectorsTest}; parameter sets by {@code RiceParametersTest}.</li>
 *   <li>R6 Interval padding: with it on, every interval but the last ends with 0..7 zero bits to an
 *       octet; {@code maxEncodedBytes} counts them; padded streams are allocation-free too. Verified
 *       by {@code RiceIntervalPaddingTest} (hand-written bits, the bound, allocation), the one-interval
 *       official streams in {@code OfficialVectorsEncodeTest}, and hw-sim
 *       {@code AecPaddedIntervalsCrossCheckTest} ({@code aec -d -p} decodes ours; n = 8, 12, 16, every J,
 *       r = 1, 5, 128, data ending mid-block and mid-interval) and {@code ZeroRunRoundTripTest}.</li>
 * </ol>
 *
 * <p>Threading: an encoder and its bit writer belong to one thread.
 */
package dev.sweepline.fsw.compress;
