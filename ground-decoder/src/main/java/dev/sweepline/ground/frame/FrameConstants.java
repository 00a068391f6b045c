package dev.sweepline.ground.frame;

/** Channel constants of the telemetry ICD §1–§2 (issue 3). */
public final class FrameConstants {
    /** Attached sync marker 1ACFFC1D as a big-endian int (ICD §1, CCSDS 131.0-B-4 §9). */
    public static final int ASM = 0x1ACFFC1D;
    /** ASM length, octets (ICD §1). */
    public static final int ASM_OCTETS = 4;
    /** Default frame length L, octets, header + data field + FECF (ICD §1 table). */
    public static final int DEFAULT_FRAME_OCTETS = 1024;
    /** Smallest allowed frame length, octets (ICD §1 table). */
    public static final int MIN_FRAME_OCTETS = 128;
    /** Largest allowed frame length, octets (ICD §1 table). */
    public static final int MAX_FRAME_OCTETS = 2048;
    /** Spacecraft id of the demo probe (ICD §1 table). */
    public static final int CINDER_SCID = 0x2C5;
    /** Transfer frame version number of a TM frame, version 1 = binary 00 (CCSDS 132.0-B-3 §4.1.2.2). */
    public static final int TFVN_TM = 0;
    /** Primary header length, octets (CCSDS 132.0-B-3 §4.1.2). */
    public static final int PRIMARY_HEADER_OCTETS = 6;
    /** Frame error control field length, octets (CCSDS 132.0-B-3 §4.1.6). */
    public static final int FECF_OCTETS = 2;
    /** Operational control field length when its flag is set, octets (CCSDS 132.0-B-3 §4.1.5). */
    public static final int OCF_OCTETS = 4;
    /** FHP value: no packet starts in this frame (CCSDS 132.0-B-3 §4.1.2.7.6, ICD §2). */
    public static final int FHP_NO_PACKET_START = 0x7FF;
    /** FHP value: the data field holds only idle data (CCSDS 132.0-B-3 §4.1.2.7.6, ICD §2). */
    public static final int FHP_IDLE_ONLY = 0x7FE;
    /** Segment length identifier required when the sync flag is 0 (CCSDS 132.0-B-3 §4.1.2.7.5). */
    public static final int SEGMENT_LENGTH_ID_PACKETS = 3;
    /** Virtual channel of science frames (ICD §2 table). */
    public static final int VC_SCIENCE = 0;
    /** Virtual channel of housekeeping, events and command reports (ICD §2 table). */
    public static final int VC_HOUSEKEEPING = 1;
    /** Virtual channel of idle frames (ICD §2 table). */
    public static final int VC_IDLE = 7;
    /** The VCIDs the ICD §2 table uses, one bit each (bit v for VCID v): 0, 1 and 7. */
    public static final int VCIDS_IN_USE = (1 << VC_SCIENCE) | (1 << VC_HOUSEKEEPING) | (1 << VC_IDLE);

    /** True for a VCID the ICD §2 table uses. */
    public static boolean vcidInUse(int vcid) {
        return ((VCIDS_IN_USE >>> vcid) & 1) != 0;
    }

    private FrameConstants() {
    }
}
