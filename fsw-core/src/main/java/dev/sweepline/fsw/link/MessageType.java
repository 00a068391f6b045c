package dev.sweepline.fsw.link;

/** Message types, the first payload octet (hardware ICD §3), with each type's payload length. */
public final class MessageType {
    /** Step command, flight software to electronics. */
    public static final int STEP_COMMAND = 0x01;
    /** Sample reply, electronics to flight software. */
    public static final int SAMPLE_REPLY = 0x81;
    /** Housekeeping request, flight software to electronics. */
    public static final int HOUSEKEEPING_REQUEST = 0x02;
    /** Housekeeping reply, electronics to flight software. */
    public static final int HOUSEKEEPING_REPLY = 0x82;

    private MessageType() {
    }

    /**
     * Payload length of {@code type}, octets, or -1 for a type the ICD does not define; a sample reply
     * is {@code sampleReplyLength} long (its samples have the instrument's width, hardware ICD §3.2).
     */
    public static int payloadLength(int type, int sampleReplyLength) {
        return switch (type) {
            case STEP_COMMAND -> StepCommandCodec.LENGTH;
            case SAMPLE_REPLY -> sampleReplyLength;
            case HOUSEKEEPING_REQUEST -> HousekeepingCodec.REQUEST_LENGTH;
            case HOUSEKEEPING_REPLY -> HousekeepingCodec.REPLY_LENGTH;
            default -> -1;
        };
    }

    /**
     * Checks a good frame's payload against the ICD: a known type and that type's length (a sample
     * reply of {@code sampleReplyLength}).
     *
     * @return {@link LinkStatus#OK}, {@link LinkStatus#UNKNOWN_TYPE} or {@link LinkStatus#WRONG_LENGTH}
     */
    public static int check(byte[] payload, int offset, int length, int sampleReplyLength) {
        if (length < 1) {
            return LinkStatus.WRONG_LENGTH;
        }
        int expected = payloadLength(payload[offset] & 0xFF, sampleReplyLength);
        if (expected < 0) {
            return LinkStatus.UNKNOWN_TYPE;
        }
        return expected == length ? LinkStatus.OK : LinkStatus.WRONG_LENGTH;
    }
}
