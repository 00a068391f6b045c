package dev.sweepline.ground.frame;

/**
 * Receives what the {@link FrameSynchroniser} finds. Calls come on the thread that feeds the
 * synchroniser, in stream order. The frame buffer is only valid during the call: copy what you keep.
 */
public interface FrameListener {
    /**
     * A frame whose FECF checked and whose header is valid.
     *
     * @param buf           buffer holding the frame (header first, FECF last)
     * @param off           offset of the frame's first header octet
     * @param frameOctets   frame length L
     * @param streamOffset  offset in the input stream of the frame's first octet (after its ASM)
     */
    void onFrame(byte[] buf, int off, int frameOctets, long streamOffset);

    /**
     * A rejected frame or a run of skipped octets.
     *
     * @param reason        why
     * @param streamOffset  offset in the stream of the frame (after its ASM) or of the first skipped octet
     * @param octets        octets of the frame seen (TRUNCATED: how many arrived) or octets skipped
     */
    void onBadFrame(FrameReason reason, long streamOffset, int octets);
}
