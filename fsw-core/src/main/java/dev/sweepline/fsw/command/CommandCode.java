package dev.sweepline.fsw.command;

/**
 * Command codes and their argument lengths (commands.md §2). A code with no defined length is
 * unknown.
 */
public final class CommandCode {
    /** No operation: reports only. No arguments. */
    public static final int NO_OP = 0x01;
    /** Set mode: 1 octet, 0 safe, 1 survey, 2 focus. */
    public static final int SET_MODE = 0x02;
    /** HV arm: no arguments; an HV enable must follow within the arm time-out. */
    public static final int HV_ARM = 0x10;
    /** HV enable: no arguments; refused unless armed. */
    public static final int HV_ENABLE = 0x11;
    /** Reset counters: 1 octet mask, bit 0 command, bit 1 fault, bit 2 sweep counters. */
    public static final int RESET_COUNTERS = 0x20;
    /** Table load: 2 octets offset, then 1..{@link #MAX_LOAD_OCTETS} octets of image. */
    public static final int TABLE_LOAD = 0x30;
    /** Table verify: 2 octets, the image length. */
    public static final int TABLE_VERIFY = 0x31;
    /** Table commit: 2 octets, the table id (image CRC) the ground expects. */
    public static final int TABLE_COMMIT = 0x32;
    /** Table dump: 1 octet copy (0 active, 1 pending), 2 offset, 2 length (1..MAX_DUMP_OCTETS). */
    public static final int TABLE_DUMP = 0x33;

    /**
     * Authentication recovery: 4 octets, this boot's challenge (commands.md §1.4). Accepted while the
     * anti-replay record is lost; its own sequence number becomes the new floor.
     */
    public static final int AUTH_RECOVER = 0x40;

    /** Most image octets in one table load. */
    public static final int MAX_LOAD_OCTETS = 192;
    /** Most image octets in one dump report. */
    public static final int MAX_DUMP_OCTETS = 192;
    /** Argument length of a variable-length command's fixed part. */
    static final int LOAD_HEADER_OCTETS = 2;

    private CommandCode() {
    }

    /**
     * Whether {@code argumentOctets} is a valid argument length for {@code code}.
     *
     * @return {@link CommandReason#OK}, {@link CommandReason#UNKNOWN_CODE} or
     *         {@link CommandReason#ARGUMENT_LENGTH}
     */
    public static int checkLength(int code, int argumentOctets) {
        int expected;
        switch (code) {
            case NO_OP:
            case HV_ARM:
            case HV_ENABLE:
                expected = 0;
                break;
            case SET_MODE:
            case RESET_COUNTERS:
                expected = 1;
                break;
            case TABLE_VERIFY:
            case TABLE_COMMIT:
                expected = 2;
                break;
            case TABLE_DUMP:
                expected = 5;
                break;
            case AUTH_RECOVER:
                expected = 4;
                break;
            case TABLE_LOAD:
                return argumentOctets > LOAD_HEADER_OCTETS && argumentOctets <= LOAD_HEADER_OCTETS + MAX_LOAD_OCTETS
                    ? CommandReason.OK : CommandReason.ARGUMENT_LENGTH;
            default:
                return CommandReason.UNKNOWN_CODE;
        }
        return argumentOctets == expected ? CommandReason.OK : CommandReason.ARGUMENT_LENGTH;
    }
}
