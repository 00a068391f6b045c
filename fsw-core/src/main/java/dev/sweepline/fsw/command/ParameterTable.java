package dev.sweepline.fsw.command;

import dev.sweepline.fsw.fault.FaultSettings;
import dev.sweepline.fsw.table.SweepParameters;
import dev.sweepline.fsw.table.WindowTable;

/**
 * The content of one parameter table (commands.md §4): the sweep windows, the sweep parameters
 * (focus, dwell, re-survey, gain thresholds), the telemetry allocation and the fault-protection
 * settings. A mutable holder sized at start-up; {@link TableImage} fills it from an image and writes
 * an image from it.
 */
public final class ParameterTable {
    /** Shortest housekeeping period the table may set, seconds. */
    public static final int MIN_HOUSEKEEPING_SECONDS = 1;
    /** Longest housekeeping period the table may set, seconds (one hour). */
    public static final int MAX_HOUSEKEEPING_SECONDS = 3600;
    /** Largest spectrum decimation (one packet per this many sweeps of a mode). */
    public static final int MAX_SPECTRUM_DECIMATION = 256;

    /** Low DAC codes of the windows. */
    public final int[] dacLow = new int[WindowTable.CAPACITY];
    /** High DAC codes of the windows. */
    public final int[] dacHigh = new int[WindowTable.CAPACITY];
    /** Windows in use. */
    public int windowCount;
    /** Sweep parameters. */
    public final SweepParameters sweep = new SweepParameters();
    /** Telemetry allocation: housekeeping period, seconds. */
    public int housekeepingSeconds;
    /** Telemetry allocation: one spectrum packet per this many completed sweeps of each mode (1: all). */
    public int spectrumDecimation;
    /** Fault-protection settings. */
    public final FaultSettings faults = new FaultSettings();

    /** The start-up table: {@code table}, {@code params}, housekeeping every 16 s, every spectrum, default faults. */
    public static ParameterTable of(WindowTable table, SweepParameters params) {
        ParameterTable t = new ParameterTable();
        t.windowCount = table.count();
        for (int w = 0; w < table.count(); w++) {
            t.dacLow[w] = table.dacLow(w);
            t.dacHigh[w] = table.dacHigh(w);
        }
        t.sweep.copyFrom(params);
        t.housekeepingSeconds = 16;
        t.spectrumDecimation = 1;
        t.faults.copyFrom(FaultSettings.defaults());
        return t;
    }

    /** Copies every value of {@code other}. */
    public void copyFrom(ParameterTable other) {
        System.arraycopy(other.dacLow, 0, dacLow, 0, WindowTable.CAPACITY);
        System.arraycopy(other.dacHigh, 0, dacHigh, 0, WindowTable.CAPACITY);
        windowCount = other.windowCount;
        sweep.copyFrom(other.sweep);
        housekeepingSeconds = other.housekeepingSeconds;
        spectrumDecimation = other.spectrumDecimation;
        faults.copyFrom(other.faults);
    }

    /** The windows as a built table (start-up only: allocates). */
    public WindowTable windowTable() {
        return WindowTable.of(dacLow, dacHigh, windowCount);
    }
}
