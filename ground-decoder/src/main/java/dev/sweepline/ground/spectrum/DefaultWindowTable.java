package dev.sweepline.ground.spectrum;

/**
 * Edges of the built-in window table (table id 0), ICD §4: low(w) = 50 V × 120^(w/128),
 * high(w) = low(w+1), 128 contiguous log-spaced windows from 50 V to 6000 V, held as DAC codes
 * round(V / 0.1 V) (ICD §8: low code = round(10 × 50 × 120^(w/128))). The edges reported are the
 * calibrated voltages the modulator really reaches at those codes, ICD §8 HV calibration:
 * volts = 0.100150 V × code − 0.8 V; {@link #tableVolts} gives the nominal code × 0.1 V.
 */
public final class DefaultWindowTable {
    /** Table id of the built-in table (ICD §4). */
    public static final int TABLE_ID = 0;
    /** Windows in the table (ICD §4). */
    public static final int WINDOWS = 128;
    /** Low edge of window 0, volts (ICD §4). */
    public static final double BOTTOM_VOLTS = 50.0;
    /** Ratio of the top edge to the bottom edge: 6000 V / 50 V (ICD §4). */
    public static final double SPAN_RATIO = 120.0;
    /** DAC codes per volt: one code is 0.1 V (ICD §4). Divided by, so that code / 10 rounds exactly. */
    public static final double DAC_CODES_PER_VOLT = 10.0;
    /** Calibrated modulator volts per DAC code, both levels (ICD §8: gain +0.15 % on 0.1 V/code). */
    public static final double CALIBRATED_VOLTS_PER_CODE = 0.100150;
    /** Calibrated modulator offset, volts (ICD §8). */
    public static final double CALIBRATED_OFFSET_VOLTS = -0.8;

    private static final double[] EDGE_VOLTS = buildEdges();

    private DefaultWindowTable() {
    }

    /** The formula edge before DAC rounding, volts, for edge index 0..128. */
    public static double nominalEdgeVolts(int edge) {
        return BOTTOM_VOLTS * Math.pow(SPAN_RATIO, edge / (double) WINDOWS);
    }

    /** DAC code of edge 0..128: round(V / 0.1 V). */
    public static int dacCode(int edge) {
        return (int) Math.round(nominalEdgeVolts(edge) * DAC_CODES_PER_VOLT);
    }

    /** Nominal voltage of edge 0..128 as the table holds it: code × 0.1 V (ICD §4). */
    public static double tableVolts(int edge) {
        return dacCode(edge) / DAC_CODES_PER_VOLT;
    }

    /** Calibrated modulator voltage of a DAC code: 0.100150 V × code − 0.8 V (ICD §8). */
    public static double calibratedVolts(int code) {
        return CALIBRATED_VOLTS_PER_CODE * code + CALIBRATED_OFFSET_VOLTS;
    }

    /** The window whose calibrated edges hold {@code volts}, or -1 outside the table (and for NaN). */
    public static int windowOf(double volts) {
        if (!(volts >= EDGE_VOLTS[0]) || volts >= EDGE_VOLTS[WINDOWS]) {
            return -1;
        }
        int lo = 0;
        int hi = WINDOWS - 1;
        while (lo < hi) { // the first window whose high edge lies above volts
            int mid = (lo + hi) >>> 1;
            if (EDGE_VOLTS[mid + 1] <= volts) {
                lo = mid + 1;
            } else {
                hi = mid;
            }
        }
        return lo;
    }

    /** Calibrated low edge of window {@code w}, volts; NaN outside 0..127. */
    public static double lowVolts(int w) {
        return w >= 0 && w < WINDOWS ? EDGE_VOLTS[w] : Double.NaN;
    }

    /** Calibrated high edge of window {@code w} (= low edge of w+1), volts; NaN outside 0..127. */
    public static double highVolts(int w) {
        return w >= 0 && w < WINDOWS ? EDGE_VOLTS[w + 1] : Double.NaN;
    }

    private static double[] buildEdges() {
        double[] e = new double[WINDOWS + 1];
        for (int i = 0; i <= WINDOWS; i++) {
            e[i] = calibratedVolts(dacCode(i));
        }
        return e;
    }
}
