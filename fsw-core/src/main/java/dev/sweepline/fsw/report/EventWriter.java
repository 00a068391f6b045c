package dev.sweepline.fsw.report;

import dev.sweepline.fsw.octets.BigEndian;
import dev.sweepline.fsw.telemetry.Apid;
import dev.sweepline.fsw.telemetry.TelemetryWriter;

/**
 * The event packet's user data (telemetry ICD §6, APID 0x120), written into the telemetry writer's
 * buffer and sent at once.
 *
 * <pre>
 *  0          2     3     4            6
 * +----------+-----+-----+------------+
 * | event id | a   | b   | detail     |
 * +----------+-----+-----+------------+
 * </pre>
 * Threading: one thread, the executive's.
 */
public final class EventWriter {
    /** Event id (2). */
    public static final int EVENT_ID_OFFSET = 0;
    /** Argument a (1). */
    public static final int ARGUMENT_A_OFFSET = 2;
    /** Argument b (1). */
    public static final int ARGUMENT_B_OFFSET = 3;
    /** Reason / detail (2). */
    public static final int DETAIL_OFFSET = 4;
    /** User data octets. */
    public static final int LENGTH = 6;
    /** Event id: mode change (a from-mode, b to-mode, detail the mode-change reason). */
    public static final int MODE_CHANGE = 1;
    /** Event id: fault response (a monitor, b response, detail the monitor's detail). */
    public static final int FAULT_RESPONSE = 2;
    /** Event id: table committed (detail the table id). */
    public static final int TABLE_COMMITTED = 4;
    /** Event id: table restored at start-up (a the restore code, detail the table id in force). */
    public static final int TABLE_RESTORED = 5;
    /** Event id: command authentication restored at start-up (a the restore code). */
    public static final int AUTH_RESTORED = 6;
    /** Event id: authentication locked, its recovery challenge (a bits 31..24, b 23..16, detail 15..0). */
    public static final int AUTH_CHALLENGE = 7;

    private final TelemetryWriter telemetry;

    /** A writer into {@code telemetry}. */
    public EventWriter(TelemetryWriter telemetry) {
        this.telemetry = telemetry;
    }

    /** Writes and sends event {@code id}, stamped {@code nowMicros}. */
    public void write(int id, int a, int b, int detail, long nowMicros) {
        byte[] buf = telemetry.buffer();
        int p = telemetry.userDataOffset();
        BigEndian.put16(buf, p + EVENT_ID_OFFSET, id);
        buf[p + ARGUMENT_A_OFFSET] = (byte) a;
        buf[p + ARGUMENT_B_OFFSET] = (byte) b;
        BigEndian.put16(buf, p + DETAIL_OFFSET, detail);
        telemetry.sendEngineering(Apid.EVENT, LENGTH, nowMicros, nowMicros);
    }
}
