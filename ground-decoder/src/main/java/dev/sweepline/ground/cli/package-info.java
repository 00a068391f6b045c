/**
 * Command line of the ground decoder ({@code sweepline-ground.jar}): {@code decode FILE --out DIR
 * [--allocation BITS_PER_S]} writes {@code spectra.csv} (one row per window per spectrum),
 * {@code summary.json} (counts, gaps, bits per APID, time span, fits), {@code moments.csv},
 * {@code moments.json}, three PNG plots and {@code report.html} through
 * {@link dev.sweepline.ground.product.GroundProcessing}; {@code inspect FILE} lists frames and packets (spectra
 * with their layout, instrument id and sample width); both take {@code --instrument NAME|FILE} (repeatable;
 * default: every built-in). {@code instruments} lists the built-in descriptions. {@code decode --follow}
 * ({@link dev.sweepline.ground.cli.FollowLoop}) follows a growing file or {@code tcp://HOST:PORT} and rewrites
 * the products, with a self-reloading report, every two seconds while octets arrive.
 *
 * <h2>Design note</h2>
 * <p>Requirements and how each is verified ({@code DecodeCommandTest}, {@code InspectCommandTest}):
 * <ol>
 *   <li>C1 a good stream gives one CSV row per window with the currents of ICD §4.</li>
 *   <li>C2 bad frames are counted by reason in summary.json and do not change the exit status (0).</li>
 *   <li>C3 an unreadable input gives exit status 2 and no exception.</li>
 *   <li>C4 decode writes the moments, plots and report ({@code GroundProcessingTest}).</li>
 *   <li>C5 {@code --instrument} takes a built-in or a file; a broken file stops the command with exit status 2
 *       and its file, line and field; spectra of an instrument not given are refused and counted;
 *       {@code instruments} lists the built-ins ({@code InstrumentOptionTest}).</li>
 *   <li>C6 {@code --follow} rewrites the report while a file grows and while a TCP stream sends, a
 *       headless browser sees the spectrogram change between two screenshots, and the finished report no
 *       longer reloads ({@code FollowTest}; the screenshots skip without Chromium).</li>
 *   <li>C7 {@code inspect} names event reasons and the interlock state, and prints the table id and the
 *       command counters of housekeeping ({@code InspectCommandTest}).</li>
 * </ol>
 * <p>Compression 0x01 is decoded by {@link dev.sweepline.ground.spectrum.Ccsds121QuadrantDecoder}
 * (the module's own CCSDS 121.0-B decoder with the ICD's parameters).
 */
package dev.sweepline.ground.cli;
