/**
 * The link to the electronics (hardware ICD): design note.
 *
 * <h2>What it does</h2>
 * Messages ({@link dev.sweepline.fsw.link.StepCommandCodec}, {@link dev.sweepline.fsw.link.SampleReplyCodec},
 * {@link dev.sweepline.fsw.link.HousekeepingCodec}: codecs with offset constants over byte arrays; the
 * sample reply's quadrants have the instrument's width, ⌈adc.bits/8⌉ octets, hardware ICD §3.2, so its
 * codec is made from the description; big-endian fields and the CRC come from the {@code octets} package)
 * are framed as {@code COBS(payload | CRC-16) | 0x00} by {@link dev.sweepline.fsw.link.FrameEncoder} and
 * {@link dev.sweepline.fsw.link.FrameSender}, and received by the streaming
 * {@link dev.sweepline.fsw.link.CobsDeframer} behind {@link dev.sweepline.fsw.link.FrameReceiver}, which
 * counts every outcome in {@link dev.sweepline.fsw.link.LinkCounters}. Both sides of the link (this
 * flight software and the simulator's server) use the same receiver and sender.
 * {@link dev.sweepline.fsw.link.FramedInstrumentLink} is the executive's
 * {@link dev.sweepline.fsw.link.InstrumentLink} over any {@link dev.sweepline.fsw.link.ByteTransport};
 * {@link dev.sweepline.fsw.link.PipeTransport} is the in-process one (TCP and serial live in the host
 * adapter, which may use java.net and jSerialComm). Sequence checks, time-outs and retries are the
 * executive's (exec design note E1-E8).
 *
 * <h2>Requirements and how each is verified</h2>
 * <ol>
 * <li><b>L1</b> Frames decode the same in any chunking; both forms of a trailing 254-octet block are
 *     accepted. <i>CobsDeframerTest.</i></li>
 * <li><b>L2</b> Every chunk gets one result (good, empty, COBS, length, CRC; then type and length of
 *     the type) and is counted; a bad chunk costs nothing but itself. <i>CobsDeframerTest,
 *     LinkFaultTest (hw-sim: counts equal the injector's ledger exactly).</i></li>
 * <li><b>L3</b> Golden frames of the ICD; a reply's length follows the description's sample width (15
 *     octets for the demo cup's 16-bit ADC, 19 for 3-octet samples), and every buffer holds the widest.
 *     <i>MessageCodecTest.</i></li>
 * <li><b>L4</b> No call blocks; one reply held at a time; a send is refused while the last frame is
 *     still going out. <i>FramedInstrumentLinkTest.</i></li>
 * <li><b>L5</b> No allocation per step. <i>FramedInstrumentLinkTest.shouldAllocateNothingPerStep.</i></li>
 * </ol>
 * Threading: each object on one thread; {@link dev.sweepline.fsw.link.BytePipe} is single-producer,
 * single-consumer across threads.
 */
package dev.sweepline.fsw.link;
