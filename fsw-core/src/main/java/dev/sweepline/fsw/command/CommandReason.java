package dev.sweepline.fsw.command;

/**
 * Reason codes of command reports (commands.md §3): 0 is success; 1..11, 15 and 16 reject a command
 * at acceptance (nothing changes but the consumed sequence number of an authentic command), 12..13
 * are failures found while executing an accepted one, 14 either. Plain
 * ints so that they are reported and counted without allocation.
 */
public final class CommandReason {
    /** Accepted / executed. */
    public static final int OK = 0;
    /** Shorter than the smallest or longer than the largest telecommand, or the length field disagrees. */
    public static final int PACKET_LENGTH = 1;
    /** Primary header: version not 0, not a TC, no secondary header, wrong APID or segmented. */
    public static final int BAD_HEADER = 2;
    /** The truncated HMAC-SHA256 does not match. */
    public static final int BAD_MAC = 3;
    /** The authentication sequence number is not above the last accepted one. */
    public static final int REPLAY = 4;
    /** No command has this code. */
    public static final int UNKNOWN_CODE = 5;
    /** The argument field's length is not the one the command code defines. */
    public static final int ARGUMENT_LENGTH = 6;
    /** An argument lies outside its range. */
    public static final int ARGUMENT_RANGE = 7;
    /** HV enable without an HV arm in the arm time-out before it. */
    public static final int NOT_ARMED = 8;
    /** SURVEY or FOCUS commanded while the HV is not enabled. */
    public static final int HV_NOT_ENABLED = 9;
    /** Table commit without a successful verify of the pending image since its last change. */
    public static final int TABLE_NOT_VERIFIED = 10;
    /** Table commit naming a table id (CRC) other than that of the verified pending image. */
    public static final int TABLE_ID_MISMATCH = 11;
    /** Execution: the pending image's CRC, marker, version or length field is wrong. */
    public static final int TABLE_CORRUPT = 12;
    /** Execution: the image is intact but a value is out of range (detail: the table or fault code). */
    public static final int TABLE_INVALID = 13;
    /**
     * Execution: the table was committed but the non-volatile store refused to write it. Acceptance:
     * the consumed sequence number could not be made durable, so the command is not executed.
     */
    public static final int NVM_WRITE_FAILED = 14;
    /** The anti-replay record was lost at start-up: only AUTH_RECOVER with this boot's challenge is accepted. */
    public static final int AUTH_LOCKED = 15;
    /** Sequence number 0 or 0xFFFFFFFF, or more than 2^24 above the last accepted one. */
    public static final int SEQUENCE_RANGE = 16;
    /** Number of codes (array size for per-reason counters). */
    public static final int COUNT = 17;

    private static final String[] NAMES = {
        "OK", "PACKET_LENGTH", "BAD_HEADER", "BAD_MAC", "REPLAY", "UNKNOWN_CODE", "ARGUMENT_LENGTH",
        "ARGUMENT_RANGE", "NOT_ARMED", "HV_NOT_ENABLED", "TABLE_NOT_VERIFIED", "TABLE_ID_MISMATCH",
        "TABLE_CORRUPT", "TABLE_INVALID", "NVM_WRITE_FAILED", "AUTH_LOCKED", "SEQUENCE_RANGE",
    };

    private CommandReason() {
    }

    /** Name of a reason code, or {@code "UNKNOWN"}. */
    public static String name(int code) {
        return code >= 0 && code < NAMES.length ? NAMES[code] : "UNKNOWN";
    }
}
