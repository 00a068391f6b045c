package dev.sweepline.fsw.link;

import dev.sweepline.fsw.octets.BigEndian;

/**
 * Sample reply codec (hardware ICD §3.2), big-endian:
 * <pre>
 *  0      1       3        4      5                           13           15
 * +------+-------+--------+------+---------------------------+------------+
 * | 0x81 | seq   | status | gain | Q1 | Q2 | Q3 | Q4 (2 each) | HV monitor |
 * +------+-------+--------+------+---------------------------+------------+
 * </pre>
 * Allocation-free.
 */
public final class SampleReplyCodec {
    /** Payload length, octets. */
    public static final int LENGTH = 15;
    /** Offset of the message type. */
    public static final int TYPE_OFFSET = 0;
    /** Offset of the sequence number (2). */
    public static final int SEQUENCE_OFFSET = 1;
    /** Offset of the status bits (1). */
    public static final int STATUS_OFFSET = 3;
    /** Offset of the gain range used (1). */
    public static final int GAIN_OFFSET = 4;
    /** Offset of quadrant Q1; Q2..Q4 follow, 2 octets each. */
    public static final int QUADRANT_OFFSET = 5;
    /** Offset of the HV monitor, high level, DAC code (2). */
    public static final int HV_MONITOR_OFFSET = 13;

    private SampleReplyCodec() {
    }

    /** Writes {@code reply} at {@code offset}; returns {@link #LENGTH}. */
    public static int encode(SampleReply reply, byte[] b, int offset) {
        b[offset + TYPE_OFFSET] = (byte) MessageType.SAMPLE_REPLY;
        BigEndian.put16(b, offset + SEQUENCE_OFFSET, reply.sequence);
        b[offset + STATUS_OFFSET] = (byte) reply.status;
        b[offset + GAIN_OFFSET] = (byte) reply.gainRange;
        for (int q = 0; q < InstrumentConstants.QUADRANTS; q++) {
            BigEndian.put16(b, offset + QUADRANT_OFFSET + 2 * q, reply.quadrant[q]);
        }
        BigEndian.put16(b, offset + HV_MONITOR_OFFSET, reply.hvMonitorCode);
        return LENGTH;
    }

    /**
     * Reads a sample reply payload into {@code into}.
     *
     * @return {@link LinkStatus#OK}, or {@link LinkStatus#WRONG_LENGTH} / {@link LinkStatus#UNKNOWN_TYPE}
     *         with {@code into} untouched
     */
    public static int decode(byte[] b, int offset, int length, SampleReply into) {
        if (length != LENGTH) {
            return LinkStatus.WRONG_LENGTH;
        }
        if ((b[offset + TYPE_OFFSET] & 0xFF) != MessageType.SAMPLE_REPLY) {
            return LinkStatus.UNKNOWN_TYPE;
        }
        into.sequence = BigEndian.get16(b, offset + SEQUENCE_OFFSET);
        into.status = b[offset + STATUS_OFFSET] & 0xFF;
        into.gainRange = b[offset + GAIN_OFFSET] & 0xFF;
        for (int q = 0; q < InstrumentConstants.QUADRANTS; q++) {
            into.quadrant[q] = BigEndian.get16(b, offset + QUADRANT_OFFSET + 2 * q);
        }
        into.hvMonitorCode = BigEndian.get16(b, offset + HV_MONITOR_OFFSET);
        return LinkStatus.OK;
    }
}
