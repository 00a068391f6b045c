package dev.sweepline.fsw.link;

/**
 * The receiving half of either side of the link: a {@link CobsDeframer} followed by the ICD's
 * type and length check, with every outcome counted in {@link LinkCounters} (hardware ICD §5:
 * a bad frame is discarded, counted, and state is kept). Allocation-free.
 *
 * <p>Threading: one thread.
 */
public final class FrameReceiver {
    /** {@link #accept} result: nothing complete (more octets needed, or the chunk was discarded). */
    public static final int NONE = -1;

    private final CobsDeframer deframer = new CobsDeframer();
    private final LinkCounters counters;
    private final int sampleReplyLength;

    /** A receiver counting into {@code counters}, taking sample replies of {@code replies}' length. */
    public FrameReceiver(LinkCounters counters, SampleReplyCodec replies) {
        this.counters = counters;
        this.sampleReplyLength = replies.length();
    }

    /**
     * Feeds one octet.
     *
     * @return the message type of a good frame that ended here (payload in {@link #payload()}), else {@link #NONE}
     */
    public int accept(byte octet) {
        int r = deframer.accept(octet);
        switch (r) {
            case CobsDeframer.MORE:
                return NONE;
            case CobsDeframer.FRAME:
                return checkFrame();
            case CobsDeframer.EMPTY:
                counters.emptyChunks++;
                return NONE;
            case CobsDeframer.BAD_COBS:
                counters.badCobs++;
                return NONE;
            case CobsDeframer.BAD_LENGTH:
                counters.badLength++;
                return NONE;
            case CobsDeframer.BAD_CRC:
                counters.badCrc++;
                return NONE;
            default:
                throw new IllegalStateException("unknown deframer result " + r);
        }
    }

    private int checkFrame() {
        int status = MessageType.check(deframer.payload(), 0, deframer.payloadLength(), sampleReplyLength);
        switch (status) {
            case LinkStatus.OK:
                counters.framesGood++;
                return deframer.payload()[0] & 0xFF;
            case LinkStatus.UNKNOWN_TYPE:
                counters.unknownType++;
                return NONE;
            case LinkStatus.WRONG_LENGTH:
                counters.wrongLength++;
                return NONE;
            default:
                throw new IllegalStateException("unknown check status " + status);
        }
    }

    /** Payload of the good frame just reported (valid until the next octet). */
    public byte[] payload() {
        return deframer.payload();
    }

    /** Its length, octets. */
    public int payloadLength() {
        return deframer.payloadLength();
    }

    /** The counters. */
    public LinkCounters counters() {
        return counters;
    }
}
