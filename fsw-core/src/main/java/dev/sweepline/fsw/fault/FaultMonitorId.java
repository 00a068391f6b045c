package dev.sweepline.fsw.fault;

/**
 * Identifiers of the fault-protection monitors (commands.md §6, telemetry ICD §6 event 2 argument a).
 * Plain ints: they index the settings arrays and travel in events without allocation.
 */
public final class FaultMonitorId {
    /** HV monitor readback differs from the commanded high code beyond a tolerance for N steps. */
    public static final int HV_READBACK = 1;
    /** A quadrant at the top of the ADC for N consecutive steps. */
    public static final int ADC_SATURATION = 2;
    /** One quadrant reads the same code for N steps while another varies by more than a limit. */
    public static final int STUCK_CHANNEL = 3;
    /** The executive went to SAFE for a link time-out. */
    public static final int LINK_TIMEOUT = 4;
    /** M completed sweeps in a row without a valid proton peak. */
    public static final int PEAK_LOST = 5;
    /** N executive cycles in a row whose work exceeded a budget in ticks (the host measures it). */
    public static final int CYCLE_OVERRUN = 6;
    /** Number of monitors; ids run 1..COUNT. */
    public static final int COUNT = 6;

    private static final String[] NAMES = {
        "NONE", "HV_READBACK", "ADC_SATURATION", "STUCK_CHANNEL", "LINK_TIMEOUT", "PEAK_LOST", "CYCLE_OVERRUN",
    };

    private FaultMonitorId() {
    }

    /** Name of a monitor id, or {@code "UNKNOWN"}. */
    public static String name(int id) {
        return id >= 0 && id < NAMES.length ? NAMES[id] : "UNKNOWN";
    }
}
