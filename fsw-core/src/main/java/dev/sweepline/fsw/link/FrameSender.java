package dev.sweepline.fsw.link;

/**
 * The sending half of either side of the link: frames one payload at a time and pushes it to the
 * transport, keeping what a non-blocking write did not take for the next {@link #flush()}.
 * Allocation-free.
 *
 * <p>Threading: one thread.
 */
public final class FrameSender {
    private final ByteTransport transport;
    private final LinkCounters counters;
    private final FrameEncoder encoder = new FrameEncoder();
    private final byte[] wire = new byte[FrameEncoder.MAX_WIRE_FRAME];
    private int wireLength;
    private int wireSent;
    private boolean ended;

    /** A sender on {@code transport}, counting into {@code counters}. */
    public FrameSender(ByteTransport transport, LinkCounters counters) {
        this.transport = transport;
        this.counters = counters;
    }

    /** True when the last frame has left completely and another may be sent. */
    public boolean idle() {
        return wireSent == wireLength;
    }

    /**
     * Frames {@code length} octets of {@code payload} and starts sending them.
     *
     * @return false (nothing sent) while the previous frame is still going out, or after the stream ended
     */
    public boolean send(byte[] payload, int offset, int length) {
        if (!flush() || ended) {
            return false;
        }
        wireLength = encoder.encode(payload, offset, length, wire, 0);
        wireSent = 0;
        counters.framesSent++;
        flush();
        return true;
    }

    /** Pushes what is left of the current frame; returns true when nothing is left. */
    public boolean flush() {
        if (wireSent < wireLength && !ended) {
            int n = transport.write(wire, wireSent, wireLength - wireSent);
            if (n < 0) {
                ended = true;
            } else {
                wireSent += n;
                counters.octetsWritten += n;
            }
        }
        return wireSent == wireLength;
    }

    /** True once the transport reported the end of the stream. */
    public boolean ended() {
        return ended;
    }
}
