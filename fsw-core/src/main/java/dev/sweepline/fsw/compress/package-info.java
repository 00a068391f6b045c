/**
 * CCSDS 121.0-B lossless compression (adaptive Rice coder), the flight encoder.
 *
 * <h2>What it does</h2>
 * {@link dev.sweepline.fsw.compress.RiceEncoder} turns n-bit unsigned samples into a CCSDS 121.0-B
 * bit stream: unit-delay predictor and mapper ({@code PredictionMapper}), then per block of J samples
 * the shortest of zero-block (runs, with "remainder of segment"), second extension, fundamental
 * sequence, split-sample k and no compression ({@code RiceBlockCoder}), packed MSB-first by
 * {@link dev.sweepline.fsw.compress.BitWriter}. {@link dev.sweepline.fsw.compress.RiceParameters}
 * holds the validated parameter set (n, J, r, preprocessing, restricted set).
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
 *       the small vectors of standards.md byte for byte.</li>
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
 * </ol>
 *
 * <p>Threading: an encoder and its bit writer belong to one thread.
 */
package dev.sweepline.fsw.compress;
