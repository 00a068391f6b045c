package dev.sweepline.ground.decode;

import dev.sweepline.ground.packet.CucTime;

/**
 * A command report packet (APID 0x130), telemetry ICD §9: the acceptance or execution report of one
 * telecommand; an execution report of a table dump also carries image octets.
 *
 * @param time            CUC time of the report
 * @param sequenceCount   packet sequence count
 * @param type            1 acceptance, 2 execution
 * @param commandCode     the command code (0 when the packet was too short to hold one)
 * @param tcSequence      the telecommand's packet sequence count (0xFFFF when unreadable)
 * @param authSequence    the telecommand's authentication sequence number
 * @param status          0 success, else the reason code (commands.md §3)
 * @param detail          reason detail (e.g. the table status of an invalid image)
 * @param accepted        commands accepted so far (16 bits)
 * @param rejected        commands rejected so far (16 bits)
 * @param dumpCopy        dump: 0 active, 1 pending image; -1 when no dump data
 * @param dumpOffset      dump: image offset of the data
 * @param dumpData        dump: the image octets (empty when none)
 */
public record CommandReport(CucTime time, int sequenceCount, int type, int commandCode, int tcSequence,
        long authSequence, int status, int detail, int accepted, int rejected, int dumpCopy, int dumpOffset,
        byte[] dumpData) {
    /** APID (ICD §3.3). */
    public static final int APID = 0x130;
    /** User data octets without dump data (ICD §9). */
    public static final int USER_DATA_OCTETS = 14;
    /** Report type: acceptance. */
    public static final int ACCEPTANCE = 1;
    /** Report type: execution. */
    public static final int EXECUTION = 2;
    /** Command code of a table dump (commands.md §2). */
    public static final int TABLE_DUMP = 0x33;

    private static final String[] REASONS = {
        "OK", "PACKET_LENGTH", "BAD_HEADER", "BAD_MAC", "REPLAY", "UNKNOWN_CODE", "ARGUMENT_LENGTH",
        "ARGUMENT_RANGE", "NOT_ARMED", "HV_NOT_ENABLED", "TABLE_NOT_VERIFIED", "TABLE_ID_MISMATCH",
        "TABLE_CORRUPT", "TABLE_INVALID", "NVM_WRITE_FAILED", "AUTH_LOCKED", "SEQUENCE_RANGE",
    };
    /** Reason code of an intact image with a value out of range (commands.md §3). */
    public static final int TABLE_INVALID = 13;
    /** Table value codes of commands.md §4.2, the detail of TABLE_INVALID below 100. */
    private static final String[] TABLE_VALUES = {
        "OK", "EMPTY", "TOO_MANY_WINDOWS", "OUT_OF_DAC_RANGE", "NOT_MONOTONIC", "MISSING_DATA",
        "BAD_INTEGRATION", "BAD_SETTLE", "BAD_BAND", "BAD_RESURVEY", "BAD_LOCK_LOSS",
        "BAD_GAIN_THRESHOLDS", "BAD_ALPHA", "BAD_NOISE", "ABOVE_VOLTAGE_LIMIT", "SETTLE_BELOW_SLEW",
        "SETTLE_TOO_SHORT", "BAD_EDGE_SEARCH", "BAD_STYLE", "BAD_FLUSH",
    };

    /** Name of a reason code of commands.md §3, or "UNKNOWN". */
    public static String reasonName(int code) {
        return code >= 0 && code < REASONS.length ? REASONS[code] : "UNKNOWN";
    }

    /**
     * Name of the detail of a TABLE_INVALID report (commands.md §4.2): a table value code, a fault
     * monitor entry outside its safe range (100 + monitor id), or the telemetry allocation (200);
     * empty for other reports.
     */
    public String detailName() {
        if (status != TABLE_INVALID) {
            return "";
        }
        if (detail >= 100 && detail < 200) {
            return "FAULT_ENTRY_" + EventReport.monitorName(detail - 100);
        }
        if (detail == 200) {
            return "TELEMETRY_ALLOCATION";
        }
        return detail < TABLE_VALUES.length ? TABLE_VALUES[detail] : "UNKNOWN";
    }

    /** True for a successful report. */
    public boolean ok() {
        return status == 0;
    }

    /** A one-line description for listings. */
    public String describe() {
        return (type == ACCEPTANCE ? "acceptance" : "execution") + String.format(" code 0x%02X", commandCode)
                + " auth " + authSequence + " " + reasonName(status) + (detail != 0 ? " detail " + detail : "")
                + (detailName().isEmpty() ? "" : " " + detailName());
    }
}
