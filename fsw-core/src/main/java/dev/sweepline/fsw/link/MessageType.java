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

    /** Payload length of {@code type}, octets, or -1 for a type the ICD does not define. */
    public static int payloadLength(int type) {
        switch (type) {
            case STEP_COMMAND:
                return StepCommandCodec.LENGTH;
            case SAMPLE_REPLY:
                return SampleReplyCodec.LENGTH;
            case HOUSEKEEPING_REQUEST:
                return HousekeepingCodec.REQUEST_LENGTH;
            case HOUSEKEEPING_REPLY:
                return HousekeepingCodec.REPLY_LENGTH;
            default:
                return -1;
        }
    }

    /**
     * Checks a good frame's payload against the ICD: a known type and that type's length.
     *
     * @return {@link LinkStatus#OK}, {@link LinkStatus#UNKNOWN_TYPE} or {@link LinkStatus#WRONG_LENGTH}
     */
    public static int check(byte[] payload, int offset, int length) {
        if (length < 1) {
            return LinkStatus.WRONG_LENGTH;
        }
        int expected = payloadLength(payload[offset] & 0xFF);
        if (expected < 0) {
            return LinkStatus.UNKNOWN_TYPE;
        }
        return expected == length ? LinkStatus.OK : LinkStatus.WRONG_LENGTH;
    }
}
