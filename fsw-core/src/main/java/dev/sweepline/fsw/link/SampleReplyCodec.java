package dev.sweepline.fsw.link;

import dev.sweepline.fsw.instrument.InstrumentDescription;
import dev.sweepline.fsw.octets.BigEndian;

/**
 * Sample reply codec (hardware ICD §3.2), big-endian, for samples of b = ⌈adc.bits / 8⌉ octets each
 * (the instrument description's ADC width):
 * <pre>
 *  0      1       3        4      5                           5+4b         7+4b
 * +------+-------+--------+------+---------------------------+------------+
 * | 0x81 | seq   | status | gain | Q1 | Q2 | Q3 | Q4 (b each) | HV monitor |
 * +------+-------+--------+------+---------------------------+------------+
 * </pre>
 * The demo cup's 16-bit ADC gives b = 2 and the 15-octet reply of the ICD before descriptions; a
 * 20-bit ADC gives b = 3 and 19 octets. Immutable, allocation-free.
 */
public final class SampleReplyCodec {
    /** Offset of the message type. */
    public static final int TYPE_OFFSET = 0;
    /** Offset of the sequence number (2). */
    public static final int SEQUENCE_OFFSET = 1;
    /** Offset of the status bits (1). */
    public static final int STATUS_OFFSET = 3;
    /** Offset of the gain range used (1). */
    public static final int GAIN_OFFSET = 4;
    /** Offset of quadrant Q1; Q2..Q4 follow, b octets each. */
    public static final int QUADRANT_OFFSET = 5;
    /** Octets of the HV monitor field that ends the reply. */
    public static final int HV_MONITOR_OCTETS = 2;
    /** Widest sample the ICD carries, octets (a 24-bit ADC). */
    public static final int MAX_SAMPLE_OCTETS = 3;
    /** Longest reply, octets: 3-octet samples. */
    public static final int MAX_LENGTH = length(MAX_SAMPLE_OCTETS);

    private final int sampleOctets;
    private final int hvMonitorOffset;
    private final int length;

    /**
     * A codec for samples of {@code sampleOctets} octets (1..{@value #MAX_SAMPLE_OCTETS}).
     *
     * @throws IllegalArgumentException for another width (programmer misuse: the description is checked)
     */
    public SampleReplyCodec(int sampleOctets) {
        if (sampleOctets < 1 || sampleOctets > MAX_SAMPLE_OCTETS) {
            throw new IllegalArgumentException("sample width " + sampleOctets + " octets");
        }
        this.sampleOctets = sampleOctets;
        this.hvMonitorOffset = QUADRANT_OFFSET + InstrumentDescription.QUADRANTS * sampleOctets;
        this.length = hvMonitorOffset + HV_MONITOR_OCTETS;
    }

    /** The codec of {@code instrument}'s sample width. */
    public static SampleReplyCodec of(InstrumentDescription instrument) {
        return new SampleReplyCodec(instrument.sampleOctets());
    }

    /** Payload length of a reply with samples of {@code sampleOctets} octets: 7 + 4 b. */
    public static int length(int sampleOctets) {
        return QUADRANT_OFFSET + InstrumentDescription.QUADRANTS * sampleOctets + HV_MONITOR_OCTETS;
    }

    /** Payload length, octets. */
    public int length() {
        return length;
    }

    /** Octets per quadrant sample. */
    public int sampleOctets() {
        return sampleOctets;
    }

    /** Offset of the HV monitor, high level, DAC code (2): 5 + 4 b. */
    public int hvMonitorOffset() {
        return hvMonitorOffset;
    }

    /** Writes {@code reply} at {@code offset}; returns {@link #length()}. */
    public int encode(SampleReply reply, byte[] b, int offset) {
        b[offset + TYPE_OFFSET] = (byte) MessageType.SAMPLE_REPLY;
        BigEndian.put16(b, offset + SEQUENCE_OFFSET, reply.sequence);
        b[offset + STATUS_OFFSET] = (byte) reply.status;
        b[offset + GAIN_OFFSET] = (byte) reply.gainRange;
        for (int q = 0; q < InstrumentDescription.QUADRANTS; q++) {
            BigEndian.putN(b, offset + QUADRANT_OFFSET + sampleOctets * q, reply.quadrant[q], sampleOctets);
        }
        BigEndian.put16(b, offset + hvMonitorOffset, reply.hvMonitorCode);
        return length;
    }

    /**
     * Reads a sample reply payload into {@code into}.
     *
     * @return {@link LinkStatus#OK}, or {@link LinkStatus#WRONG_LENGTH} / {@link LinkStatus#UNKNOWN_TYPE}
     *         with {@code into} untouched
     */
    public int decode(byte[] b, int offset, int length, SampleReply into) {
        if (length != this.length) {
            return LinkStatus.WRONG_LENGTH;
        }
        if ((b[offset + TYPE_OFFSET] & 0xFF) != MessageType.SAMPLE_REPLY) {
            return LinkStatus.UNKNOWN_TYPE;
        }
        into.sequence = BigEndian.get16(b, offset + SEQUENCE_OFFSET);
        into.status = b[offset + STATUS_OFFSET] & 0xFF;
        into.gainRange = b[offset + GAIN_OFFSET] & 0xFF;
        for (int q = 0; q < InstrumentDescription.QUADRANTS; q++) {
            into.quadrant[q] = BigEndian.getN(b, offset + QUADRANT_OFFSET + sampleOctets * q, sampleOctets);
        }
        into.hvMonitorCode = BigEndian.get16(b, offset + hvMonitorOffset);
        return LinkStatus.OK;
    }
}
