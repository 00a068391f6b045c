/**
 * Packet layer of the ground decoder: per-VC reassembly of CCSDS 133.0-B-2 space packets from TM frames
 * with the first header pointer, frame-count and sequence-count continuity, CUC time (telemetry ICD §2–§3).
 *
 * <h2>Design note</h2>
 * <p>Data flow: good frame → {@link dev.sweepline.ground.packet.VirtualChannelDemux} → one
 * {@code VcFrameGate} per VC (repeated, stale frames dropped; restarts found; ICD §10) → MC and VC count
 * checks of the frames accepted → one {@link dev.sweepline.ground.packet.VcReassembler} per VC → {@link
 * dev.sweepline.ground.packet.PacketListener}. Sequence counts per APID are checked by {@link
 * dev.sweepline.ground.packet.SequenceCountTracker} in the decoder above.
 *
 * <p>Requirements and how each is verified:
 * <ol>
 *   <li>P1 headers parse as CCSDS 133.0-B-2 / 301.0-B-4 lay them out: the standards.md space-packet and
 *       CUC examples ({@code SpacePacketHeaderTest}, {@code CucTimeTest}).</li>
 *   <li>P2 a packet spanning frames is rebuilt; several packets in one frame are split; a packet header
 *       split across frames is joined ({@code VcReassemblerTest}, golden frames).</li>
 *   <li>P3 a lost frame of the VC (VC count jump) drops the partial packet, counts the gap with the
 *       frames missing, and reassembly resumes at the next FHP ({@code VcReassemblerTest},
 *       {@code BadInputTest}).</li>
 *   <li>P4 a length running past the data or an FHP that disagrees is flagged and the doubtful packet
 *       dropped ({@code VcReassemblerTest}).</li>
 *   <li>P5 sequence-count gaps per APID are found across the 14-bit wrap ({@code SequenceCountTrackerTest}).</li>
 *   <li>P6 a frame whose VC count equals the last accepted one ({@link dev.sweepline.ground.packet.FrameDrop#DUPLICATE})
 *       or lies 1..127 behind it ({@link dev.sweepline.ground.packet.FrameDrop#STALE}) is dropped and counted:
 *       it feeds no packet, starts no gap, leaves the packet in progress whole; 1..128 ahead is forward.
 *       The window's edges ({@code VcFrameGateTest}); repeats, stale frames and replayed runs in a stream
 *       ({@code VcFrameCountTest}); about 3,000 of them put into 15,000 clean frames, with zero duplicate
 *       and zero lost packets and the counters equal to what was put in (the injection test of
 *       {@code DecoderFuzzTest}).</li>
 *   <li>P7 a restart of the count sequence (two new frames in sequence, behind or equal to the last count)
 *       is taken up without loss of the new frames, counted, and reported as no gap; the packet it cut
 *       short is dropped; the APIDs of the VC may start again at sequence count 0 ({@code VcFrameGateTest},
 *       {@code VcFrameCountTest}).</li>
 * </ol>
 *
 * <p>Choices (where the ICD leaves room): continuity is judged per VC by its VC count; a master-count
 * jump alone is reported but drops nothing, since the lost frames belonged to other VCs. When a packet's
 * length and the next FHP disagree the packet is dropped rather than trusted, since either could be the
 * wrong one. After a packet ends exactly with its frame the next frame of the VC must have FHP 0 (or be
 * idle-only); anything else is FHP_INCONSISTENT.
 *
 * <p>Repeats, stale frames and restarts (ICD §10). With L the last count accepted on a VC and
 * d = (count − L) mod 256, d = 1..128 is forward and d = 0 or 129..255 is not: an 8-bit count cannot tell
 * 128 ahead from 128 behind, so each way takes half the circle (RFC 1982 §3.2), the tie going forward
 * since losses are common and 128-frame-old replays are not. Counts alone cannot tell a replayed frame
 * from the first frames after a restart (counts start again at 0, ICD §2), or after an outage of more than
 * 127 frames; content can: the gate keeps the FECF of the frame accepted at each count, a frame equal to
 * one accepted at its count is a copy, and only new frames can start a new sequence. One new frame behind
 * is held rather than trusted, because a CRC escape or a replay of a frame lost the first time looks the
 * same; the next frame of its VC following it, and new too, confirms the restart, and then the held frame
 * is decoded as well. The cost: a VC with one frame only after a restart loses it, and a replayed pair of
 * frames both lost the first time is taken as a restart (their packets are new to the ground, so none is
 * duplicated; the live stream then shows a gap). A restart resets the MC count check, since the MC count
 * starts again too; frames dropped are not MC-checked, so a repeat is no MC gap.
 */
package dev.sweepline.ground.packet;
