package dev.sweepline.ground.spectrum;

import dev.sweepline.ground.instrument.GroundInstrument;
import dev.sweepline.ground.packet.CucTime;

/**
 * One decoded spectrum packet (ICD §4). Per-window arrays are indexed 0..c−1 for windows f..f+c−1;
 * per-quadrant arrays are {@code [quadrant 0..3][window index]} for quadrants 1..4. The arrays are not
 * copied: treat them as read-only.
 *
 * @param time               CUC time of the sweep's first step
 * @param apid               0x100 survey or 0x101 focus
 * @param sequenceCount      packet sequence count
 * @param mode               1 survey, 2 focus
 * @param steppedDown        flags bit 7: the sweep stepped downward
 * @param tableChanged       flags bit 6: the window table changed at this sweep
 * @param sweep              sweep number (16 bits, wraps)
 * @param tableId            window table id (0: built-in default table)
 * @param firstWindow        first window index f
 * @param windowCount        window count c
 * @param peakQ8             refined proton peak, window units Q8; 0xFFFF when none
 * @param integrationPeriods modulation periods (the instrument's {@code modulationPeriodMicros}) integrated per
 *                           window; in layout 3 per window but the support windows (see {@code windowPeriods})
 * @param compression        0x00 raw or 0x01 CCSDS 121
 * @param gainRange          gain range 0 .. ranges − 1 of the instrument, per window
 * @param saturated          saturation flag per window
 * @param adcCounts          ADC samples [q][i], 0 .. 2^w − 1
 * @param currentAmps        quadrant current [q][i], amperes
 * @param totalAmps          sum of the four quadrant currents per window, amperes
 * @param lowVolts           low window edge per window, volts; NaN when the table is not known
 * @param highVolts          high window edge per window, volts; NaN when the table is not known
 * @param layoutVersion      spectrum packet layout, 1, 2 or 3 (ICD §4)
 * @param instrument         the instrument the packet names (layout 2), or the demo cup (layout 1),
 *                           whose description gave the currents and edges
 * @param windowPeriods      modulation periods integrated per window: {@code integrationPeriods}, or a
 *                           support window's own (layout 3)
 * @param interleaved        flags bit 5: the sweep stepped in the interleaved focus order (ICD §4; its step of
 *                           each window: {@link SpectrumValues#stepOrder})
 */
public record DecodedSpectrum(CucTime time, int apid, int sequenceCount, int mode, boolean steppedDown,
        boolean tableChanged, int sweep, int tableId, int firstWindow, int windowCount, int peakQ8,
        int integrationPeriods, int compression, int[] gainRange, boolean[] saturated, int[][] adcCounts,
        double[][] currentAmps, double[] totalAmps, double[] lowVolts, double[] highVolts, int layoutVersion,
        GroundInstrument instrument, int[] windowPeriods, boolean interleaved) implements SpectrumValues {
    /** Peak value meaning "no peak" (ICD §4). */
    public static final int NO_PEAK = 0xFFFF;
    /** Mode code of survey (ICD §4). */
    public static final int MODE_SURVEY = 1;
    /** Mode code of focus (ICD §4). */
    public static final int MODE_FOCUS = 2;
    /** Quadrants per spectrum (ICD §4). */
    public static final int QUADRANTS = 4;

    /** The instrument id (layout 2 carries it; layout 1 is the demo cup's). */
    public int instrumentId() {
        return instrument.id();
    }

    /** Sample width w, bits: the packet's, which equals its instrument's ADC width (ICD §4). */
    public int sampleBits() {
        return instrument.sampleBits();
    }

    /** Modulation periods integrated in window {@code i} (0..c−1). */
    @Override
    public int integrationPeriods(int i) {
        return windowPeriods[i];
    }

    @Override
    public int gainRange(int i) {
        return gainRange[i];
    }

    @Override
    public boolean saturated(int i) {
        return saturated[i];
    }

    @Override
    public double currentAmps(int q, int i) {
        return currentAmps[q][i];
    }

    @Override
    public double totalAmps(int i) {
        return totalAmps[i];
    }

    @Override
    public double lowVolts(int i) {
        return lowVolts[i];
    }

    @Override
    public double highVolts(int i) {
        return highVolts[i];
    }

    /** True when a proton peak was found. */
    public boolean hasPeak() {
        return peakQ8 != NO_PEAK;
    }

    /** The peak in window units (Q8 / 256), or NaN when none. */
    public double peakWindow() {
        return hasPeak() ? peakQ8 / 256.0 : Double.NaN;
    }

    /** "survey" or "focus". */
    public String modeName() {
        return modeName(mode);
    }

    /** "survey" or "focus" for the mode code {@code mode} (ICD §4), "mode" and the code for another. */
    public static String modeName(int mode) {
        return mode == MODE_SURVEY ? "survey" : mode == MODE_FOCUS ? "focus" : "mode" + mode;
    }
}
