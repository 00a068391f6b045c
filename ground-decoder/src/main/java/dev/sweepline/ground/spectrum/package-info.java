/**
 * Spectrum packets (APIDs 0x100 survey, 0x101 focus) of telemetry ICD §4, layouts 3, 2 and 1: fields, the
 * instrument they name, quadrant sample streams of w-bit samples, ADC counts to amperes and window edges
 * with that instrument's description, and the window catalogue of uplinked tables.
 *
 * <h2>Design note</h2>
 * <p>{@link dev.sweepline.ground.spectrum.SpectrumPacketDecoder} walks the packet once, checking every
 * length against the packet's end. The first user-data octet gives the layout ({@code SpectrumHeader}):
 * {@code 0x82} is layout 2, with the instrument id and the sample width w; {@code 0x83} layout 3, layout 2
 * with the support windows of a support-dwell focus sweep and their own integration periods after the
 * fixed fields (each window's dwell is exposed, and the fit weights each window by it); bit 7 clear is layout 1, which
 * recorded telemetry of the demo cup has (16-bit samples, no id). The instrument is looked up in the
 * ground's {@link dev.sweepline.ground.instrument.InstrumentSet} by id (layout 1: the demo cup by name); its
 * description gives the gain ranges the tags may name, the ADC width w must equal, the pedestal and LSB of
 * the currents and the default window table. Each quadrant's stream goes to a {@link
 * dev.sweepline.ground.spectrum.QuadrantDecompressor} with w: {@link
 * dev.sweepline.ground.spectrum.RawQuadrantDecoder} for compression 0x00 (⌈w/8⌉ octets a sample), and
 * {@link dev.sweepline.ground.spectrum.Ccsds121QuadrantDecoder} (the module's CCSDS 121.0-B decoder,
 * {@code dev.sweepline.ground.rice}, n = w) for 0x01.
 *
 * <p>Requirements and how each is verified:
 * <ol>
 *   <li>S1 every field of ICD §4 decodes, in both layouts: golden spectrum frames ({@code GoldenFrameDecodeTest},
 *       layout 1), golden layout-2 packets of both built-in instruments, 20-bit raw and CCSDS 121 with n = 20,
 *       made with python3 from the ICD and cross-checked with libaec ({@code SpectrumLayoutTwoTest}), and
 *       field-by-field checks ({@code SpectrumPacketDecoderTest}); layout 3 made from the golden layout-2
 *       packet by the ICD's rule ({@code SpectrumLayoutThreeTest}).</li>
 *   <li>S2 currents follow ICD §4 "Converting to current" with the instrument's pedestal, ADC width and
 *       full scales (values computed independently with python3: {@code InstrumentCurrentTest},
 *       {@code SpectrumLayoutTwoTest}).</li>
 *   <li>S3 window edges follow the description's table, DAC rounding and the HV calibration of ICD §8
 *       ({@code DefaultWindowTableTest}); an uplinked table's codes are calibrated with the instrument of the
 *       spectrum that names it ({@code WindowCatalogueTest}).</li>
 *   <li>S4 every malformed packet gives a {@link dev.sweepline.ground.spectrum.SpectrumError}, never an
 *       exception ({@code SpectrumPacketDecoderTest}, {@code SpectrumLayoutTwoTest}, {@code SpectrumLayoutThreeTest};
 *       {@code SpectrumMutationTest}: 25,000 damaged copies of the golden packets of the three layouts,
 *       recorded seed, 10,813 decode and the rest are refused under thirteen different reasons; the
 *       frame-level fuzz test; {@code InterleavedSpectrumFuzzTest}: 600 damaged interleaved focus spectra from
 *       decode to the products, each followed by a good one that decodes and fits to the same bits).</li>
 *   <li>S5 a quadrant stream must use its stated length Lq (ICD §10): the coded data sets of its c samples
 *       (padding blocks included) end in its last octet, since fill reaches only the next octet boundary
 *       (ICD §4); a stream that leaves one or more whole octets unused, or a raw one with Lq &gt; c⌈w/8⌉,
 *       rejects the spectrum as {@link dev.sweepline.ground.spectrum.SpectrumError#UNUSED_OCTETS}. A clean
 *       stream passes and the same with one octet more (CRC recomputed) is flagged; a mutation study
 *       shows what the check is worth: of single-bit flips in the quadrant fields that the decoder
 *       took silently before (80 % of them), it now catches 14.7 %, 11.7 % of all flips; 13.9–18.9 %
 *       for other kinds of damage ({@code QuadrantStreamLengthTest}, recorded seed, spectrum-like samples,
 *       a test-side encoder that codes no zero-block runs).</li>
 *   <li>S6 a spectrum of an instrument id the ground has no description for is refused as
 *       {@code UNKNOWN_INSTRUMENT}, one whose w is not its description's ADC width as
 *       {@code SAMPLE_WIDTH_MISMATCH}, a first octet with bit 7 set other than 0x82 as {@code UNKNOWN_LAYOUT},
 *       each with a detail naming the id or the instrument ({@code SpectrumLayoutTwoTest}).</li>
 *   <li>S6b a spectrum whose flags contradict it, the interleaved order (flags bit 5) on a survey (ICD §4 gives
 *       it to focus sweeps), is refused as {@code BAD_FLAGS}; one whose windows' integration periods (offset 16,
 *       a support window's) lie outside 1..1000 (commands.md §4.1: no dwell above the limit of 1000) as
 *       {@code BAD_DWELL} (a support window's as {@code BAD_SUPPORT_WINDOWS}), each with a detail naming the
 *       field and value, counted, the next packet decoding ({@code SpectrumFlagsAndDwellTest}).</li>
 *   <li>S7 the telemetry decoder's hot path fills one reused {@link dev.sweepline.ground.spectrum.SpectrumView}
 *       (buffers for 256 windows, the decompressor writing into them; the fixed fields read in place by a
 *       reused {@code SpectrumHeader}) and allocates nothing per sample, window or spectrum; a listener gets an
 *       owned {@code DecodedSpectrum} unless it reads the view ({@code SpectrumViewTest}; the golden tests go
 *       through the same path; {@code DecodeAllocationTest}: under 1 KiB for 300 spectra once warm; JMH
 *       {@code FlightTelemetryDecodeBenchmark -prof gc}: what a pass allocates is the new decoder's tables).</li>
 * </ol>
 *
 * <p>Choices: the window edges reported are the calibrated voltages of the DAC-rounded codes the table
 * holds (ICD §8: (1 + gainError) × scale × code + offset of the spectrum's instrument), what the fit needs
 * for its thresholds. Table id 0 is the instrument's default table; any other id is an uplinked table
 * image registered in the {@link dev.sweepline.ground.spectrum.WindowCatalogue} (the decode command's
 * {@code --table IMAGE}, or a catalogue handed to the decoder), whose DAC codes are calibrated with the
 * spectrum's instrument (an image names no instrument, commands.md §4.1). Edges are NaN only for a table id
 * the catalogue does not know, or a window beyond the table's count; the fit leaves such windows out.
 * A mode that disagrees with the APID, a gain tag beyond the instrument's ranges, a raw sample above 2^w − 1,
 * octets after the fourth quadrant, or octets of a quadrant stream its samples leave unused reject the
 * spectrum: under a good CRC they mean the two sides disagree on the layout or the instrument, or the data
 * were damaged before the frame's CRC was computed, which must be seen rather than guessed around. The
 * stream-length check is only a partial guard: most damage to a stream (a flipped split-sample LSB, say)
 * still decodes to c samples ending in the last octet, and no check of the layout can see it. The zero
 * fill bits of the last octet are not checked.
 */
package dev.sweepline.ground.spectrum;
