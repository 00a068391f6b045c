package dev.sweepline.fsw.link;

import dev.sweepline.fsw.octets.BigEndian;

/**
 * Step command codec (hardware ICD §3.1), big-endian:
 * <pre>
 *  0      1       3        5        7     8      9            13         15
 * +------+-------+--------+--------+-----+------+------------+----------+
 * | 0x01 | seq   | dacLow | dacHigh| gain| flags| settle µs  | periods  |
 * +------+-------+--------+--------+-----+------+------------+----------+
 * flags bit 0: HV enabled
 * </pre>
 * The window index is not on the wire (the electronics do not use it). Allocation-free.
 */
public final class StepCommandCodec {
    /** Payload length, octets. */
    public static final int LENGTH = 15;
    /** Offset of the message type. */
    public static final int TYPE_OFFSET = 0;
    /** Offset of the sequence number (2 octets). */
    public static final int SEQUENCE_OFFSET = 1;
    /** Offset of the modulator low level, DAC code (2). */
    public static final int DAC_LOW_OFFSET = 3;
    /** Offset of the modulator high level, DAC code (2). */
    public static final int DAC_HIGH_OFFSET = 5;
    /** Offset of the gain range (1). */
    public static final int GAIN_OFFSET = 7;
    /** Offset of the flags (1). */
    public static final int FLAGS_OFFSET = 8;
    /** Offset of the settle time, microseconds (4). */
    public static final int SETTLE_OFFSET = 9;
    /** Offset of the integration, modulation periods (2). */
    public static final int PERIODS_OFFSET = 13;
    /** Flag bit: HV enabled. */
    public static final int FLAG_HV_ENABLED = 1;

    private StepCommandCodec() {
    }

    /** Writes {@code step} at {@code offset}; returns {@link #LENGTH}. Fields are truncated to their widths. */
    public static int encode(StepCommand step, byte[] b, int offset) {
        b[offset + TYPE_OFFSET] = (byte) MessageType.STEP_COMMAND;
        BigEndian.put16(b, offset + SEQUENCE_OFFSET, step.sequence);
        BigEndian.put16(b, offset + DAC_LOW_OFFSET, step.dacLow);
        BigEndian.put16(b, offset + DAC_HIGH_OFFSET, step.dacHigh);
        b[offset + GAIN_OFFSET] = (byte) step.gainRange;
        b[offset + FLAGS_OFFSET] = (byte) (step.hvEnabled ? FLAG_HV_ENABLED : 0);
        BigEndian.put32(b, offset + SETTLE_OFFSET, step.settleMicros);
        BigEndian.put16(b, offset + PERIODS_OFFSET, step.integrationPeriods);
        return LENGTH;
    }

    /**
     * Reads a step command payload into {@code into} (window set to 0).
     *
     * @return {@link LinkStatus#OK}, or {@link LinkStatus#WRONG_LENGTH} / {@link LinkStatus#UNKNOWN_TYPE}
     *         with {@code into} untouched
     */
    public static int decode(byte[] b, int offset, int length, StepCommand into) {
        if (length != LENGTH) {
            return LinkStatus.WRONG_LENGTH;
        }
        if ((b[offset + TYPE_OFFSET] & 0xFF) != MessageType.STEP_COMMAND) {
            return LinkStatus.UNKNOWN_TYPE;
        }
        into.sequence = BigEndian.get16(b, offset + SEQUENCE_OFFSET);
        into.window = 0;
        into.dacLow = BigEndian.get16(b, offset + DAC_LOW_OFFSET);
        into.dacHigh = BigEndian.get16(b, offset + DAC_HIGH_OFFSET);
        into.gainRange = b[offset + GAIN_OFFSET] & 0xFF;
        into.hvEnabled = (b[offset + FLAGS_OFFSET] & FLAG_HV_ENABLED) != 0;
        // settle is a signed 32-bit field on our side; the ICD's values stay far below 2^31
        into.settleMicros = BigEndian.get32(b, offset + SETTLE_OFFSET);
        into.integrationPeriods = BigEndian.get16(b, offset + PERIODS_OFFSET);
        return LinkStatus.OK;
    }
}
