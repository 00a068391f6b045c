/**
 * Frame layer of the ground decoder: attached sync marker search, TM transfer frame checks
 * (CCSDS 132.0-B-3, telemetry ICD §1–§2), written from the ICD alone.
 *
 * <h2>Design note</h2>
 * <p>Data flow: bytes (any chunking) → {@link dev.sweepline.ground.frame.FrameSynchroniser} →
 * {@link dev.sweepline.ground.frame.FrameListener} (good frames as a view on the synchroniser's buffer,
 * rejects with a {@link dev.sweepline.ground.frame.FrameReason}).
 *
 * <p>Requirements and how each is verified:
 * <ol>
 *   <li>F1 CRC-16/IBM-3740 is exact: catalogue check 0x29B1 and the standards.md FECF example 0x0A32
 *       ({@code Crc16Ibm3740Test}).</li>
 *   <li>F2 the header fields parse as CCSDS 132.0-B-3 lays them out: standards.md header example
 *       ({@code TmFrameHeaderTest}) and the golden frames ({@code GoldenFrameDecodeTest}).</li>
 *   <li>F3 any chunking gives the same result: one octet at a time vs all at once, and a read longer than
 *       the synchroniser's buffer (taken in pieces of it once the frame length is known) as frame by frame
 *       ({@code FrameSynchroniserTest}).</li>
 *   <li>F4 bad input is reported with a reason, never thrown, and the next good frame decodes: garbage,
 *       truncation, bit flip, wrong SCID/version ({@code FrameSynchroniserTest}, {@code DecoderFuzzTest}).</li>
 *   <li>F5 the frame length is found from the stream when not given ({@code FrameLengthDetectorTest}).</li>
 *   <li>F6 a CRC-valid frame of a VCID the ICD §2 does not use (2..6) is rejected as
 *       {@link dev.sweepline.ground.frame.FrameReason#UNKNOWN_VCID} and reaches no VC's state, nor the MC
 *       count check ({@code FrameSynchroniserTest}, {@code VcFrameCountTest}, the injection test of
 *       {@code DecoderFuzzTest}).</li>
 * </ol>
 *
 * <p>Choices: the FECF is checked before the header (a header is only trusted under a good CRC); a frame
 * whose CRC fails is searched for an ASM inside it, so that a truncated frame does not swallow the next
 * one; the ASM must match exactly (no bit-error tolerance), so a frame with a damaged ASM is skipped as
 * garbage; right after a good frame a missing ASM is also looked for up to 3 octets back, so a stream
 * that slipped by an octet or three keeps the next frame. The synchroniser reports every frame of the
 * right SCID and a VCID in use, including idle frames: a VCID outside the ICD's table is a header fault
 * like a wrong SCID, so it is refused here, before any VC could start a reassembly for it. Per-VC
 * continuity (gaps, repeats, stale frames, restarts) is the packet layer's business.
 */
package dev.sweepline.ground.frame;
