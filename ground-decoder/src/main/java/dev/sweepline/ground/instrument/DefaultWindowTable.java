package dev.sweepline.ground.instrument;

import java.util.Arrays;

/**
 * The instrument's default window table (table id 0, the built-in start-up table): {@code count}
 * contiguous log-spaced windows, edge k at E_k = low × (high/low)^(k/count), k = 0..count, held as the
 * nearest DAC code of the nominal scale (FORMAT.md, {@code windows}); window w spans edges w and w+1.
 * The edges reported are the calibrated voltages the modulator really gives at those codes (telemetry
 * ICD §8), what the fit needs for its thresholds; {@link #tableVolts} gives the nominal ones. Immutable.
 */
public final class DefaultWindowTable {
    /** Table id of the built-in table (telemetry ICD §4). */
    public static final int TABLE_ID = 0;

    private final double lowVolts;
    private final double highVolts;
    private final HvCalibration calibration;
    private final int[] edgeCodes;
    private final double[] edgeVolts;

    /** The table of {@code count} windows from {@code lowVolts} to {@code highVolts} on {@code calibration}'s DAC. */
    public DefaultWindowTable(int count, double lowVolts, double highVolts, HvCalibration calibration) {
        this.lowVolts = lowVolts;
        this.highVolts = highVolts;
        this.calibration = calibration;
        this.edgeCodes = new int[count + 1];
        this.edgeVolts = new double[count + 1];
        for (int k = 0; k <= count; k++) {
            edgeCodes[k] = calibration.nearestCode(lowVolts * Math.pow(highVolts / lowVolts, k / (double) count));
            edgeVolts[k] = calibration.volts(edgeCodes[k]);
        }
    }

    /** Windows in the table. */
    public int windows() {
        return edgeCodes.length - 1;
    }

    /** The formula edge k (0..count) before DAC rounding, volts: low × (high/low)^(k/count). */
    public double nominalEdgeVolts(int k) {
        return lowVolts * Math.pow(highVolts / lowVolts, k / (double) windows());
    }

    /** DAC code of edge k (0..count). */
    public int edgeCode(int k) {
        return edgeCodes[k];
    }

    /** Nominal voltage of edge k as the table holds it: code × scale / 1000. */
    public double tableVolts(int k) {
        return calibration.nominalVolts(edgeCodes[k]);
    }

    /** Low DAC code of window {@code w}. */
    public int lowCode(int w) {
        return edgeCodes[w];
    }

    /** High DAC code of window {@code w} (= low code of w+1). */
    public int highCode(int w) {
        return edgeCodes[w + 1];
    }

    /** Calibrated low edge of window {@code w}, volts; NaN outside the table. */
    public double lowVolts(int w) {
        return w >= 0 && w < windows() ? edgeVolts[w] : Double.NaN;
    }

    /** Calibrated high edge of window {@code w} (= low edge of w+1), volts; NaN outside the table. */
    public double highVolts(int w) {
        return w >= 0 && w < windows() ? edgeVolts[w + 1] : Double.NaN;
    }

    /**
     * The window whose calibrated edges hold {@code volts} (an edge belongs to the window above it), or −1
     * outside the table and for NaN.
     */
    public int windowOf(double volts) {
        if (!(volts >= edgeVolts[0]) || volts >= edgeVolts[windows()]) {
            return -1;
        }
        int at = Arrays.binarySearch(edgeVolts, volts);
        return at >= 0 ? at : -at - 2;
    }
}
