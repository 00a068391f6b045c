package dev.sweepline.fsw.report;

import dev.sweepline.fsw.octets.BigEndian;
import dev.sweepline.fsw.telemetry.Apid;
import dev.sweepline.fsw.telemetry.TelemetryWriter;

/**
 * The housekeeping packet's user data (telemetry ICD §5, APID 0x110): a flyweight over the telemetry
 * writer's buffer. {@link #begin()}, set every field, {@link #send(long)}. Counters are given as they are
 * and written as the ICD says: 32-bit fields wrap, 16-bit error and command counters saturate at 0xFFFF,
 * the sweep counters wrap.
 *
 * <pre>
 *  0    1    2           6           10     12     14     16      18     20     22          26
 * +----+----+-----------+-----------+------+------+------+-------+------+------+-----------+
 * |mode| HV | steps     | replies   | seq  | t/o  | retry| survey| focus| lock | TM octets |
 * +----+----+-----------+-----------+------+------+------+-------+------+------+-----------+
 *  26     28     30     32     33   34       36      38          40
 * +------+------+------+------+----+--------+-------+-----------+
 * | TC ok| TC no| exec | last | HV | table  | trips | link bad  |
 * +------+------+------+------+----+--------+-------+-----------+
 * </pre>
 * Threading: one thread, the executive's.
 */
public final class HousekeepingWriter {
    /** Mode code (1): 0 safe, 1 survey, 2 focus. */
    public static final int MODE_OFFSET = 0;
    /** HV enabled (1). */
    public static final int HV_ENABLED_OFFSET = 1;
    /** Steps sent (4, wraps). */
    public static final int STEPS_SENT_OFFSET = 2;
    /** Replies accepted (4, wraps). */
    public static final int REPLIES_ACCEPTED_OFFSET = 6;
    /** Sequence errors (2, saturates). */
    public static final int SEQUENCE_ERRORS_OFFSET = 10;
    /** Reply time-outs (2, saturates). */
    public static final int TIMEOUTS_OFFSET = 12;
    /** Retries (2, saturates). */
    public static final int RETRIES_OFFSET = 14;
    /** Survey sweeps (2, wraps). */
    public static final int SURVEY_SWEEPS_OFFSET = 16;
    /** Focus sweeps (2, wraps). */
    public static final int FOCUS_SWEEPS_OFFSET = 18;
    /** Lock losses (2, saturates). */
    public static final int LOCK_LOSSES_OFFSET = 20;
    /** Telemetry packet octets generated (4, wraps). */
    public static final int TELEMETRY_OCTETS_OFFSET = 22;
    /** Telecommands accepted (2, saturates). */
    public static final int COMMANDS_ACCEPTED_OFFSET = 26;
    /** Telecommands rejected at acceptance (2, saturates). */
    public static final int COMMANDS_REJECTED_OFFSET = 28;
    /** Accepted telecommands whose execution failed (2, saturates). */
    public static final int EXECUTION_FAILURES_OFFSET = 30;
    /** Reason code of the last rejection (1). */
    public static final int LAST_REJECTION_OFFSET = 32;
    /** HV interlock state (1): 0 off, 1 armed, 2 enabled. */
    public static final int HV_INTERLOCK_OFFSET = 33;
    /** Table id in force (2). */
    public static final int TABLE_ID_OFFSET = 34;
    /** Fault monitor trips (2, saturates). */
    public static final int FAULT_TRIPS_OFFSET = 36;
    /** Link frames received bad (2, saturates). */
    public static final int LINK_BAD_FRAMES_OFFSET = 38;
    /** User data octets (ICD §5, since issue 6). */
    public static final int LENGTH = 40;

    private final TelemetryWriter telemetry;
    private byte[] b;
    private int p;

    /** A writer into {@code telemetry}'s buffer. */
    public HousekeepingWriter(TelemetryWriter telemetry) {
        this.telemetry = telemetry;
    }

    /** Starts a packet in the telemetry buffer. */
    public HousekeepingWriter begin() {
        b = telemetry.buffer();
        p = telemetry.userDataOffset();
        return this;
    }

    /** Mode code and whether the HV is on (mode not safe, interlock enabled, host permission). */
    public HousekeepingWriter mode(int modeCode, boolean hvEnabled) {
        b[p + MODE_OFFSET] = (byte) modeCode;
        b[p + HV_ENABLED_OFFSET] = (byte) (hvEnabled ? 1 : 0);
        return this;
    }

    /** The executive's link counters. */
    public HousekeepingWriter link(long stepsSent, long repliesAccepted, long sequenceErrors, long timeouts,
            long retries) {
        BigEndian.put32(b, p + STEPS_SENT_OFFSET, stepsSent);
        BigEndian.put32(b, p + REPLIES_ACCEPTED_OFFSET, repliesAccepted);
        BigEndian.put16(b, p + SEQUENCE_ERRORS_OFFSET, saturate16(sequenceErrors));
        BigEndian.put16(b, p + TIMEOUTS_OFFSET, saturate16(timeouts));
        BigEndian.put16(b, p + RETRIES_OFFSET, saturate16(retries));
        return this;
    }

    /** Sweep counters and the telemetry generated. */
    public HousekeepingWriter sweeps(long surveySweeps, long focusSweeps, long lockLosses, long telemetryOctets) {
        BigEndian.put16(b, p + SURVEY_SWEEPS_OFFSET, (int) surveySweeps);
        BigEndian.put16(b, p + FOCUS_SWEEPS_OFFSET, (int) focusSweeps);
        BigEndian.put16(b, p + LOCK_LOSSES_OFFSET, saturate16(lockLosses));
        BigEndian.put32(b, p + TELEMETRY_OCTETS_OFFSET, telemetryOctets);
        return this;
    }

    /** Telecommand counters and the last rejection's reason. */
    public HousekeepingWriter commands(long accepted, long rejected, long executionFailures, int lastRejection) {
        BigEndian.put16(b, p + COMMANDS_ACCEPTED_OFFSET, saturate16(accepted));
        BigEndian.put16(b, p + COMMANDS_REJECTED_OFFSET, saturate16(rejected));
        BigEndian.put16(b, p + EXECUTION_FAILURES_OFFSET, saturate16(executionFailures));
        b[p + LAST_REJECTION_OFFSET] = (byte) lastRejection;
        return this;
    }

    /** HV interlock code, table id in force, fault trips, link frames received bad. */
    public HousekeepingWriter state(int hvInterlock, int tableId, long faultTrips, long linkFramesBad) {
        b[p + HV_INTERLOCK_OFFSET] = (byte) hvInterlock;
        BigEndian.put16(b, p + TABLE_ID_OFFSET, tableId);
        BigEndian.put16(b, p + FAULT_TRIPS_OFFSET, saturate16(faultTrips));
        BigEndian.put16(b, p + LINK_BAD_FRAMES_OFFSET, saturate16(linkFramesBad));
        return this;
    }

    /** Sends the packet, stamped {@code nowMicros}. */
    public void send(long nowMicros) {
        telemetry.sendEngineering(Apid.HOUSEKEEPING, LENGTH, nowMicros, nowMicros);
    }

    /** {@code v} limited to 0xFFFF (ICD §5: error counters saturate so that a flood never reads as few). */
    static int saturate16(long v) {
        return (int) Math.min(v, 0xFFFF);
    }
}
