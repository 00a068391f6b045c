package dev.sweepline.fsw.report;

import dev.sweepline.fsw.octets.BigEndian;
import dev.sweepline.fsw.telemetry.Apid;
import dev.sweepline.fsw.telemetry.TelemetryWriter;

/**
 * The command report packet's user data (telemetry ICD §9, APID 0x130), written into the telemetry
 * writer's buffer: the fixed report, and for a successful TABLE_DUMP the dumped image octets after it.
 *
 * <pre>
 *  0      1      2          4            8        9        10         12         14
 * +------+------+----------+------------+--------+--------+----------+----------+
 * | type | code | pkt seq  | auth seq   | status | detail | accepted | rejected |
 * +------+------+----------+------------+--------+--------+----------+----------+
 *  dump only: 14 copy(1) | 15 offset(2) | 17 length n(2) | 19 n image octets
 * </pre>
 * Threading: one thread, the executive's.
 */
public final class CommandReportWriter {
    /** Report type (1): {@link #ACCEPTANCE} or {@link #EXECUTION}. */
    public static final int TYPE_OFFSET = 0;
    /** Command code (1). */
    public static final int CODE_OFFSET = 1;
    /** The telecommand's packet sequence count (2). */
    public static final int PACKET_SEQUENCE_OFFSET = 2;
    /** The telecommand's authentication sequence number (4). */
    public static final int AUTH_SEQUENCE_OFFSET = 4;
    /** Status (1): 0 success, else the reason code. */
    public static final int STATUS_OFFSET = 8;
    /** Detail (1). */
    public static final int DETAIL_OFFSET = 9;
    /** Telecommands accepted so far (2, wraps). */
    public static final int ACCEPTED_OFFSET = 10;
    /** Telecommands rejected so far (2, wraps). */
    public static final int REJECTED_OFFSET = 12;
    /** User data octets of a report without dump data. */
    public static final int LENGTH = 14;
    /** Dump: copy (1), 0 active 1 pending. */
    public static final int DUMP_COPY_OFFSET = 14;
    /** Dump: image offset (2). */
    public static final int DUMP_OFFSET_OFFSET = 15;
    /** Dump: length n (2). */
    public static final int DUMP_LENGTH_OFFSET = 17;
    /** Dump: the first image octet. */
    public static final int DUMP_DATA_OFFSET = 19;
    /** Octets a dump report adds before its data: copy, offset, length. */
    public static final int DUMP_HEADER_OCTETS = DUMP_DATA_OFFSET - LENGTH;
    /** Report type: acceptance (success or rejection). */
    public static final int ACCEPTANCE = 1;
    /** Report type: execution (success or failure; a dump carries data). */
    public static final int EXECUTION = 2;

    private final TelemetryWriter telemetry;

    /** A writer into {@code telemetry}. */
    public CommandReportWriter(TelemetryWriter telemetry) {
        this.telemetry = telemetry;
    }

    /** The longest report: a dump of {@code maxDumpOctets}. */
    public static int maxLength(int maxDumpOctets) {
        return DUMP_DATA_OFFSET + maxDumpOctets;
    }

    /**
     * Copies {@code octets} image octets from {@code image} at {@code imageOffset} after the report's fixed
     * part, with their header (call before {@link #write} of the same report).
     *
     * @return the octets added
     */
    public int dump(int copy, byte[] image, int imageOffset, int octets) {
        byte[] r = telemetry.buffer();
        int p = telemetry.userDataOffset();
        r[p + DUMP_COPY_OFFSET] = (byte) copy;
        BigEndian.put16(r, p + DUMP_OFFSET_OFFSET, imageOffset);
        BigEndian.put16(r, p + DUMP_LENGTH_OFFSET, octets);
        System.arraycopy(image, imageOffset, r, p + DUMP_DATA_OFFSET, octets);
        return DUMP_HEADER_OCTETS + octets;
    }

    /** Writes and sends a report with {@code extraOctets} already written after it (a dump), stamped {@code nowMicros}. */
    public void write(int type, int code, int packetSequence, long authSequence, int status, int detail,
            long accepted, long rejected, int extraOctets, long nowMicros) {
        byte[] r = telemetry.buffer();
        int p = telemetry.userDataOffset();
        r[p + TYPE_OFFSET] = (byte) type;
        r[p + CODE_OFFSET] = (byte) code;
        BigEndian.put16(r, p + PACKET_SEQUENCE_OFFSET, packetSequence);
        BigEndian.put32(r, p + AUTH_SEQUENCE_OFFSET, authSequence);
        r[p + STATUS_OFFSET] = (byte) status;
        r[p + DETAIL_OFFSET] = (byte) detail;
        BigEndian.put16(r, p + ACCEPTED_OFFSET, (int) accepted);
        BigEndian.put16(r, p + REJECTED_OFFSET, (int) rejected);
        telemetry.sendEngineering(Apid.COMMAND_REPORT, LENGTH + extraOctets, nowMicros, nowMicros);
    }
}
