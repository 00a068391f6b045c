package dev.sweepline.ground.decode;

import dev.sweepline.ground.packet.CucTime;

/**
 * A housekeeping packet (APID 0x110), ICD §5. The 32-bit and sweep counters wrap at their field
 * width; the 16-bit error, command and fault counters saturate at 0xFFFF.
 *
 * @param time             CUC time of the sample
 * @param sequenceCount    packet sequence count
 * @param mode             0 safe, 1 survey, 2 focus
 * @param hvEnabled        high voltage on
 * @param stepsSent        steps sent since start (32 bits)
 * @param repliesAccepted  replies accepted (32 bits)
 * @param sequenceErrors   sequence errors (16 bits)
 * @param replyTimeouts    reply time-outs (16 bits)
 * @param retries          retries (16 bits)
 * @param surveySweeps     survey sweeps since start (16 bits)
 * @param focusSweeps      focus sweeps since start (16 bits)
 * @param lockLosses       focus → survey transitions other than scheduled re-surveys (16 bits)
 * @param telemetryOctets  packet octets generated since start, all APIDs (32 bits)
 * @param commandsAccepted telecommands accepted (16 bits)
 * @param commandsRejected telecommands rejected at acceptance (16 bits)
 * @param commandFailures  accepted telecommands whose execution failed (16 bits)
 * @param lastRejection    reason code of the last rejection (commands.md §3)
 * @param hvState          HV interlock: 0 off, 1 armed, 2 enabled
 * @param tableId          id (CRC-16) of the parameter table in force, 0 for the built-in one
 * @param faultTrips       fault monitor trips (16 bits)
 */
public record HousekeepingReport(CucTime time, int sequenceCount, int mode, boolean hvEnabled, long stepsSent,
        long repliesAccepted, int sequenceErrors, int replyTimeouts, int retries, int surveySweeps,
        int focusSweeps, int lockLosses, long telemetryOctets, int commandsAccepted, int commandsRejected,
        int commandFailures, int lastRejection, int hvState, int tableId, int faultTrips, int linkFramesBad) {
    /** APID (ICD §3.3). */
    public static final int APID = 0x110;
    /** User data length, octets (ICD §5: offsets 0..39). */
    public static final int USER_DATA_OCTETS = 40;
    /** User data length before the link bad-frame count was appended (offsets 0..37), still accepted. */
    public static final int COMMAND_USER_DATA_OCTETS = 38;
    /** User data length of the issue-3 baseline packet (offsets 0..25), still accepted. */
    public static final int BASELINE_USER_DATA_OCTETS = 26;
}
