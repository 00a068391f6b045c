package dev.sweepline.ground.packet;

/**
 * Per-APID packet sequence count continuity (14 bits, wrapping 16383 → 0; CCSDS 133.0-B-2
 * §4.1.3.4.3, ICD §3.1). Not thread-safe.
 */
public final class SequenceCountTracker {
    private static final int APIDS = 2048;
    private final int[] last = new int[APIDS];
    /** Per APID: its source may have started again, so a next count of 0 is a new sequence. */
    private final boolean[] restartPending = new boolean[APIDS];

    /** A tracker that has seen no packet yet. */
    public SequenceCountTracker() {
        java.util.Arrays.fill(last, -1);
    }

    /**
     * Records a packet's count.
     *
     * @return packets missing before this one (0 when in sequence or the first of its APID)
     */
    public int observe(int apid, int sequenceCount) {
        int prev = last[apid];
        last[apid] = sequenceCount;
        boolean restarted = restartPending[apid];
        restartPending[apid] = false;
        if (prev < 0 || restarted && sequenceCount == 0) {
            return 0;
        }
        return (sequenceCount - prev - 1) & (SpacePacketHeader.SEQUENCE_COUNT_MODULUS - 1);
    }

    /**
     * The source of {@code apid} may have started again (the count sequence of its VC did, ICD §10): if
     * its next packet has count 0 it starts a new sequence and no gap is counted. Any other count is
     * judged against the last one as usual, since after an outage the counts simply go on.
     */
    public void expectRestart(int apid) {
        restartPending[apid] = last[apid] >= 0;
    }

    /** The count expected next for {@code apid}, or -1 before its first packet. */
    public int expected(int apid) {
        int prev = last[apid];
        return prev < 0 ? -1 : (prev + 1) & (SpacePacketHeader.SEQUENCE_COUNT_MODULUS - 1);
    }
}
