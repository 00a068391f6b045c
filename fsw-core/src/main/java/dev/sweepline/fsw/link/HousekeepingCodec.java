package dev.sweepline.fsw.link;

import dev.sweepline.fsw.octets.BigEndian;

/**
 * Housekeeping request and reply codecs (hardware ICD §3.3), big-endian.
 * <pre>
 * request:  0x02 | seq(2)
 * reply:    0x82 | seq(2) | frames good(4) | frames bad(4) | last step seq(2)
 *                | HV mon low(2) | HV mon high(2) | temperature 0.01 degC(2, signed)
 *                | status(1) | link watchdog trips(2)
 * status: bit 0 HV output on, bit 1 HV switched off by the link watchdog (ICD §4.1)
 * </pre>
 * Allocation-free.
 */
public final class HousekeepingCodec {
    /** Request payload length, octets. */
    public static final int REQUEST_LENGTH = 3;
    /** Reply payload length, octets (ICD §3.3: 22 since the watchdog fields were added). */
    public static final int REPLY_LENGTH = 22;
    /** Offset of the sequence number in both messages (2). */
    public static final int SEQUENCE_OFFSET = 1;
    /** Reply: offset of frames received good (4). */
    public static final int FRAMES_GOOD_OFFSET = 3;
    /** Reply: offset of frames received bad (4). */
    public static final int FRAMES_BAD_OFFSET = 7;
    /** Reply: offset of the sequence number of the last step executed (2). */
    public static final int LAST_STEP_OFFSET = 11;
    /** Reply: offset of the HV monitor, low level (2). */
    public static final int HV_LOW_OFFSET = 13;
    /** Reply: offset of the HV monitor, high level (2). */
    public static final int HV_HIGH_OFFSET = 15;
    /** Reply: offset of the temperature, 0.01 degC signed (2). */
    public static final int TEMPERATURE_OFFSET = 17;
    /** Reply: offset of the electronics' status flags (1). */
    public static final int STATUS_OFFSET = 19;
    /** Reply: offset of the link watchdog trips since power-up, saturating at 65535 (2). */
    public static final int WATCHDOG_TRIPS_OFFSET = 20;
    /** Status bit 0: the HV output is on (ICD §3.3). */
    public static final int STATUS_HV_ON = 0x01;
    /** Status bit 1: the link watchdog switched the HV off and no step has enabled it since (ICD §4.1). */
    public static final int STATUS_WATCHDOG_OFF = 0x02;
    /** Largest count the watchdog-trip field holds (2 octets). */
    public static final int MAX_WATCHDOG_TRIPS = 0xFFFF;

    private HousekeepingCodec() {
    }

    /** Writes a request with {@code sequence}; returns {@link #REQUEST_LENGTH}. */
    public static int encodeRequest(int sequence, byte[] b, int offset) {
        b[offset] = (byte) MessageType.HOUSEKEEPING_REQUEST;
        BigEndian.put16(b, offset + SEQUENCE_OFFSET, sequence);
        return REQUEST_LENGTH;
    }

    /** The sequence number of a request payload, or -1 when it is no request of the right length. */
    public static int decodeRequest(byte[] b, int offset, int length) {
        if (length != REQUEST_LENGTH || (b[offset] & 0xFF) != MessageType.HOUSEKEEPING_REQUEST) {
            return -1;
        }
        return BigEndian.get16(b, offset + SEQUENCE_OFFSET);
    }

    /** Writes {@code hk}; returns {@link #REPLY_LENGTH}. */
    public static int encodeReply(HousekeepingReply hk, byte[] b, int offset) {
        b[offset] = (byte) MessageType.HOUSEKEEPING_REPLY;
        BigEndian.put16(b, offset + SEQUENCE_OFFSET, hk.sequence);
        BigEndian.put32(b, offset + FRAMES_GOOD_OFFSET, hk.framesGood);
        BigEndian.put32(b, offset + FRAMES_BAD_OFFSET, hk.framesBad);
        BigEndian.put16(b, offset + LAST_STEP_OFFSET, hk.lastStepSequence);
        BigEndian.put16(b, offset + HV_LOW_OFFSET, hk.hvMonitorLowCode);
        BigEndian.put16(b, offset + HV_HIGH_OFFSET, hk.hvMonitorHighCode);
        BigEndian.put16(b, offset + TEMPERATURE_OFFSET, hk.temperatureCentiCelsius);
        b[offset + STATUS_OFFSET] = (byte) hk.status;
        BigEndian.put16(b, offset + WATCHDOG_TRIPS_OFFSET, Math.min(hk.watchdogTrips, MAX_WATCHDOG_TRIPS));
        return REPLY_LENGTH;
    }

    /**
     * Reads a reply payload into {@code into}.
     *
     * @return {@link LinkStatus#OK}, or {@link LinkStatus#WRONG_LENGTH} / {@link LinkStatus#UNKNOWN_TYPE}
     */
    public static int decodeReply(byte[] b, int offset, int length, HousekeepingReply into) {
        if (length != REPLY_LENGTH) {
            return LinkStatus.WRONG_LENGTH;
        }
        if ((b[offset] & 0xFF) != MessageType.HOUSEKEEPING_REPLY) {
            return LinkStatus.UNKNOWN_TYPE;
        }
        into.sequence = BigEndian.get16(b, offset + SEQUENCE_OFFSET);
        into.framesGood = BigEndian.getUnsigned32(b, offset + FRAMES_GOOD_OFFSET);
        into.framesBad = BigEndian.getUnsigned32(b, offset + FRAMES_BAD_OFFSET);
        into.lastStepSequence = BigEndian.get16(b, offset + LAST_STEP_OFFSET);
        into.hvMonitorLowCode = BigEndian.get16(b, offset + HV_LOW_OFFSET);
        into.hvMonitorHighCode = BigEndian.get16(b, offset + HV_HIGH_OFFSET);
        into.temperatureCentiCelsius = (short) BigEndian.get16(b, offset + TEMPERATURE_OFFSET);
        into.status = b[offset + STATUS_OFFSET] & 0xFF;
        into.watchdogTrips = BigEndian.get16(b, offset + WATCHDOG_TRIPS_OFFSET);
        return LinkStatus.OK;
    }
}
