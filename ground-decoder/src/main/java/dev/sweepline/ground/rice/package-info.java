/**
 * CCSDS 121.0-B lossless decompression (adaptive Rice coder), the ground decoder.
 *
 * <h2>What it does</h2>
 * {@link dev.sweepline.ground.rice.RiceDecoder} reads a stream coded with a given
 * {@link dev.sweepline.ground.rice.RiceSettings} (n, J, r, preprocessing, restricted set, interval padding) and writes
 * the samples. It was written from standards.md and CCSDS 121.0-B, independently of the flight
 * encoder, and depends on no project module: golden vectors and cross-decoding keep the two honest.
 *
 * <h2>Decisions</h2>
 * <ul>
 *   <li>The caller gives the sample count; the decoder decodes whole blocks and writes only the samples asked for.</li>
 *   <li>ROS expands to the end of the 64-block segment or of the reference interval, whichever is first,
 *       clipped at the last data block; an explicit run longer than that is an error.</li>
 *   <li>Every option ID of the ID width is accepted except split-sample with k &gt;= n, which no
 *       encoder has a use for (it is longer than no compression).</li>
 *   <li>Each fundamental-sequence read has a limit - 64 for a zero run, x_max &gt;&gt; k for a split sample,
 *       the largest valid pair code for second extension - so a stream of zeros is refused quickly.</li>
 *   <li>Interval padding ({@code RiceSettings.padIntervalsToOctet}, libaec's "pad RSI"): when on, after
 *       the CDS that ends each interval of r blocks the reader skips to the next octet, and a one
 *       among the skipped bits is {@code INTERVAL_FILL_NOT_ZERO} (one way a stream that was not padded
 *       shows; it may instead fail another check or, rarely, decode to wrong samples). After the last CDS asked for,
 *       nothing is skipped or checked, as for the end-of-stream fill. libaec's own decoder skips the
 *       bits without looking at them; we check because fill is zero in CCSDS 121.0-B.</li>
 *   <li>Speed: a split-sample block (nearly every CDS of flight spectra) is read from one 64-bit word
 *       loaded eight octets at a time, each codeword's end found with {@code Long.numberOfLeadingZeros},
 *       the stream's end and the codeword limit checked once for the block. A block that fails that way
 *       (an error, a codeword of more than 56 zeros, the last octets of the buffer) is read again field by
 *       field, which reports the exact error and bit position, so the fast path changes no result.</li>
 * </ul>
 *
 * <h2>Requirements and how each is verified</h2>
 * <ol>
 *   <li>G1 Decodes the official CCSDS 121.0-B test set bit-exactly (72 streams, n = 1..32, basic and
 *       restricted): {@code OfficialVectorsDecodeTest}.</li>
 *   <li>G2 Decodes the small vectors of standards.md: {@code RiceDecoderSmallVectorsTest}.</li>
 *   <li>G3 Decodes the reference coder aec's streams: hw-sim {@code AecCrossCheckTest}, {@code ZeroRunRoundTripTest}.</li>
 *   <li>G4 Bad input is a {@link dev.sweepline.ground.rice.DecodeResult} with a
 *       {@link dev.sweepline.ground.rice.DecodeStatus} and a bit position, never an exception:
 *       truncation at every byte of every official stream, crafted faults, 2000 random garbage
 *       streams: {@code RiceDecoderBadInputTest}.</li>
 *   <li>G5 Reads padded intervals: hand-written streams (two intervals with the first ending mid-octet,
 *       zero runs to interval ends, a partial last interval), a one in the fill, truncation after
 *       it: {@code RiceDecoderIntervalPaddingTest}; aec's padded streams over n = 8, 12, 16, every J,
 *       r = 1, 5, 128: hw-sim {@code AecPaddedIntervalsCrossCheckTest}. The official set is not padded
 *       (its only streams of two intervals, the Lowset3 forms, read as padded fail where the first
 *       interval ends mid-octet): {@code OfficialVectorsDecodeTest}.</li>
 *   <li>G6 The block read gives the values and position of the field-by-field reads or declines without
 *       moving, and declines wherever they fail: 20,000 seeded streams of n = 8..32, k = 0..n − 1, dense and
 *       sparse ones, every offset and end ({@code BitReaderSplitBlockTest}).</li>
 * </ol>
 *
 * <p>Threading: one decode at a time per decoder instance.
 */
package dev.sweepline.ground.rice;
