/**
 * Science telemetry: the spectrum packet (telemetry ICD §4, layout version 2) of every completed sweep.
 * {@link dev.sweepline.fsw.science.SpectrumLayout} is the layout as a flyweight with named offsets,
 * {@link dev.sweepline.fsw.science.SpectrumPacker} writes a sweep into it (samples of the instrument's
 * width w, CCSDS 121 with n = w or raw in ⌈w/8⌉ octets), {@link dev.sweepline.fsw.science.SpectrumTelemetry}
 * sends it on its mode's APID and counts it.
 *
 * <h2>Requirements</h2>
 * <ol>
 * <li>S1 The user data are those of the ICD §4 layout 2, octet for octet, instrument id and sample width
 *     from the description. Verified: {@code GoldenFramesTest} (golden packets and frames built by hand
 *     from the ICD by {@code src/test/resources/golden/make_golden_frames_v2.py}, for the demo cup's 16-bit
 *     and the fine cup's 20-bit samples).</li>
 * <li>S2 Samples of any width 8..24 go through unmasked and come back exactly, raw and CCSDS 121 coded.
 *     Verified: {@code WideSampleTest} (a 24-bit ADC at full scale on every window and quadrant) and
 *     hw-sim {@code WideSpectrumRoundTripTest} (decoded by the ground's CCSDS 121 decoder, n = 24).</li>
 * <li>S3 The table-changed flag (bit 6) is set on the first sweep flown with a newly applied table, and
 *     on no other. Verified: {@code TableChangedFlagTest}.</li>
 * <li>S4 Nothing is allocated per spectrum: buffers are sized at construction for 256 windows. Verified:
 *     {@code FlightSoftwareAllocationTest}, JMH {@code SpectrumPackingBenchmark -prof gc}.</li>
 * <li>S5 The interleaved flag (bit 5) is set on a spectrum stepped in the interleaved focus order (sweep
 *     design note R22) and on no other, from the spectrum alone; it changes no other octet. Verified:
 *     {@code InterleavedFlagTest}; the ICD's step rule against the scheduler's steps, {@code InterleavedOrderTest};
 *     read by the ground in closed loop, hw-sim {@code InterleavedDriftTest}.</li>
 * </ol>
 */
package dev.sweepline.fsw.science;
