/**
 * Packet layer of the ground decoder: per-VC reassembly of CCSDS 133.0-B-2 space packets from TM frames
 * with the first header pointer, frame-count and sequence-count continuity, CUC time (telemetry ICD §2–§3).
 *
 * <h2>Design note</h2>
 * <p>Data flow: good frame → {@link dev.sweepline.ground.packet.VirtualChannelDemux} (MC and VC count
 * checks) → one {@link dev.sweepline.ground.packet.VcReassembler} per VC → {@link
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
 * </ol>
 *
 * <p>Choices (where the ICD leaves room): continuity is judged per VC by its VC count; a master-count
 * jump alone is reported but drops nothing, since the lost frames belonged to other VCs. When a packet's
 * length and the next FHP disagree the packet is dropped rather than trusted, since either could be the
 * wrong one. After a packet ends exactly with its frame the next frame of the VC must have FHP 0 (or be
 * idle-only); anything else is FHP_INCONSISTENT.
 */
package dev.sweepline.ground.packet;
