package dev.sweepline.fsw.telemetry;

/** Application process identifiers and virtual channels of the telemetry ICD §3.3. */
public final class Apid {
    /** Survey spectrum. */
    public static final int SURVEY_SPECTRUM = 0x100;
    /** Focus spectrum. */
    public static final int FOCUS_SPECTRUM = 0x101;
    /** Housekeeping. */
    public static final int HOUSEKEEPING = 0x110;
    /** Event. */
    public static final int EVENT = 0x120;
    /** Command report. */
    public static final int COMMAND_REPORT = 0x130;
    /** Science virtual channel (spectra). */
    public static final int VC_SCIENCE = 0;
    /** Engineering virtual channel (housekeeping, events, command reports). */
    public static final int VC_ENGINEERING = 1;

    private Apid() {
    }
}
