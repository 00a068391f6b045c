/**
 * Telemetry, CCSDS only: space packets, TM transfer frames, CUC time, the packet writer and the
 * bandwidth counters, the way the ground station receives them (telemetry ICD §1-§3, §7,
 * {@code fsw-core/docs/telemetry-icd.md}). What the packets say is the {@code science} (spectra) and
 * {@code report} (housekeeping, events, command reports) packages'; this package depends on the
 * {@code octets} helpers alone.
 *
 * <h2>Requirements</h2>
 * <ol>
 * <li>Frames follow CCSDS 132.0-B-3: fixed length per run, MC and VC counts, first header pointer,
 *     FECF by CRC-16/IBM-3740. Verified: {@code TransferFrameBuilderTest} (standards.md header
 *     example), octets {@code Crc16Test} (catalogue check 0x29B1, FECF example 0x0A32).</li>
 * <li>Packets follow CCSDS 133.0-B-2 with a CUC secondary header (CCSDS 301.0-B-4). Verified:
 *     {@code SpacePacketTest}, {@code CucTimeTest} (standards.md examples).</li>
 * <li>Packets span frames at any offset and come out intact. Verified: every-offset test in
 *     {@code TransferFrameBuilderTest}; golden frames ({@code GoldenFramesTest}) read by the ground decoder.</li>
 * <li>Nothing is allocated per packet or frame: buffers are sized at construction (the packet buffer for
 *     the longest user data its callers declare). Verified: {@code FlightSoftwareAllocationTest}.</li>
 * <li>The package knows no science: ArchitectureTest {@code telemetryIsCcsdsOnly}.</li>
 * </ol>
 */
package dev.sweepline.fsw.telemetry;
