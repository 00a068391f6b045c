/**
 * Telemetry: CCSDS space packets and TM transfer frames, the way the ground station receives them
 * (telemetry ICD, {@code fsw-core/docs/telemetry-icd.md}).
 *
 * <h2>Requirements</h2>
 * <ol>
 * <li>Frames follow CCSDS 132.0-B-3: fixed length per run, MC and VC counts, first header pointer,
 *     FECF by CRC-16/IBM-3740. Verified: {@code TransferFrameBuilderTest} (standards.md header
 *     example), {@code Crc16Test} (catalogue check 0x29B1, FECF example 0x0A32).</li>
 * <li>Packets follow CCSDS 133.0-B-2 with a CUC secondary header (CCSDS 301.0-B-4). Verified:
 *     {@code SpacePacketTest}, {@code CucTimeTest} (standards.md examples).</li>
 * <li>Packets span frames at any offset and come out intact. Verified: every-offset test in
 *     {@code TransferFrameBuilderTest}; golden frames read by the ground decoder.</li>
 * <li>Nothing is allocated per packet or frame: buffers are sized at construction.</li>
 * </ol>
 */
package dev.sweepline.fsw.telemetry;
