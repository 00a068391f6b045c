package dev.sweepline.fsw.link;

import dev.sweepline.fsw.instrument.InstrumentDescription;

/**
 * The flight software's {@link InstrumentLink} over a {@link ByteTransport} (hardware ICD): each step
 * goes out as one COBS/CRC frame, replies are deframed from whatever octets have arrived, and every
 * bad frame is discarded and counted ({@link #counters()}). Sequence checking, time-outs and retries
 * are the executive's (exec design note, E1-E5); this class only carries frames.
 *
 * <p>One decoded reply is held at a time: {@link #pump()} reads the transport until a reply is
 * complete or nothing more has arrived (at most {@link #READ_CHUNK} octets per read), and stops
 * there, so a burst cannot overrun anything. A housekeeping reply is kept in {@link #housekeeping()}.
 * Nothing is allocated after construction; no call blocks.
 *
 * <p>Threading: one thread, the executive's.
 */
public final class FramedInstrumentLink implements InstrumentLink, LinkHealth {
    /** Octets read from the transport per call at most. */
    public static final int READ_CHUNK = 256;
    /** Reads per {@link #pump()} at most (bounds the work of one cycle). */
    public static final int MAX_READS_PER_PUMP = 8;

    private final ByteTransport transport;
    private final LinkCounters counters = new LinkCounters();
    private final SampleReplyCodec replies;
    private final FrameReceiver receiver;
    private final int modulationPeriodMicros;
    private final FrameSender sender;
    private final byte[] payload = new byte[FrameEncoder.MAX_PAYLOAD];
    private final byte[] in = new byte[READ_CHUNK];
    private final SampleReply held = new SampleReply();
    private final HousekeepingReply housekeeping = new HousekeepingReply();
    private int inPos;
    private int inLength;
    private boolean replyHeld;
    private boolean ended;
    private long lastSendMicros;
    private long lastStepDurationMicros;
    private long repliesDelivered;
    private long housekeepingReplies;

    /** A link over {@code transport} to the electronics of {@code instrument} (its sample width and modulation). */
    public FramedInstrumentLink(ByteTransport transport, InstrumentDescription instrument) {
        this.transport = transport;
        this.replies = SampleReplyCodec.of(instrument);
        this.receiver = new FrameReceiver(counters, replies);
        this.modulationPeriodMicros = instrument.modulationPeriodMicros();
        this.sender = new FrameSender(transport, counters);
    }

    @Override
    public boolean send(StepCommand step, long nowMicros) {
        int n = StepCommandCodec.encode(step, payload, 0);
        if (!sender.send(payload, 0, n)) {
            return false;
        }
        lastSendMicros = nowMicros;
        lastStepDurationMicros = step.durationMicros(modulationPeriodMicros);
        return true;
    }

    @Override
    public boolean poll(SampleReply into, long nowMicros) {
        pump();
        if (!replyHeld) {
            return false;
        }
        into.copyFrom(held);
        replyHeld = false;
        repliesDelivered++;
        return true;
    }

    /**
     * Sends a housekeeping request with {@code sequence}; the reply lands in {@link #housekeeping()}.
     *
     * @return false when a frame is still going out
     */
    public boolean requestHousekeeping(int sequence) {
        int n = HousekeepingCodec.encodeRequest(sequence, payload, 0);
        return sender.send(payload, 0, n);
    }

    /**
     * Finishes any partly written frame and reads what has arrived until a sample reply is held.
     *
     * @return true when a sample reply is held
     */
    public boolean pump() {
        sender.flush();
        for (int reads = 0; !replyHeld && reads < MAX_READS_PER_PUMP; ) {
            if (inPos == inLength) {
                int n = ended ? -1 : transport.read(in, 0, in.length);
                if (n <= 0) {
                    ended |= n < 0;
                    break;
                }
                counters.octetsRead += n;
                inPos = 0;
                inLength = n;
                reads++;
            }
            while (inPos < inLength && !replyHeld) {
                int type = receiver.accept(in[inPos++]);
                if (type != FrameReceiver.NONE) {
                    handle(type);
                }
            }
        }
        return replyHeld;
    }

    private void handle(int type) {
        byte[] p = receiver.payload();
        int len = receiver.payloadLength();
        switch (type) {
            case MessageType.SAMPLE_REPLY:
                replies.decode(p, 0, len, held); // length and type already checked
                replyHeld = true;
                break;
            case MessageType.HOUSEKEEPING_REPLY:
                HousekeepingCodec.decodeReply(p, 0, len, housekeeping);
                housekeepingReplies++;
                break;
            default:
                counters.unexpected++; // a valid message for the other side: discard
                break;
        }
    }

    /** True when a decoded reply waits for {@link #poll}. */
    public boolean replyHeld() {
        return replyHeld;
    }

    /** When the reply to the last step sent is due: its send time plus its duration, microseconds. */
    public long expectedReplyMicros() {
        return lastSendMicros + lastStepDurationMicros;
    }

    /** True once the transport reported the end of the stream (peer gone). */
    public boolean ended() {
        return ended || sender.ended();
    }

    /** Frames received bad since start (housekeeping, telemetry ICD §5). */
    @Override
    public long framesBad() {
        return counters.framesBad();
    }

    /** Receive and send counters. */
    public LinkCounters counters() {
        return counters;
    }

    /** Sample replies handed to the executive. */
    public long repliesDelivered() {
        return repliesDelivered;
    }

    /** The last housekeeping reply received. */
    public HousekeepingReply housekeeping() {
        return housekeeping;
    }

    /** Housekeeping replies received. */
    public long housekeepingReplies() {
        return housekeepingReplies;
    }
}
