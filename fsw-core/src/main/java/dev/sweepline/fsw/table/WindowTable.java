package dev.sweepline.fsw.table;

import dev.sweepline.fsw.link.InstrumentConstants;

import java.util.Arrays;

/**
 * The energy-per-charge window table: window {@code w} makes the modulator alternate between DAC
 * codes {@code dacLow(w)} and {@code dacHigh(w)}. Immutable after it is built; primitive arrays.
 *
 * <p>A valid table has 1..{@link #CAPACITY} windows, every code in 0..DAC_MAX_CODE, lows strictly
 * increasing, highs strictly increasing and low &lt; high in every window (windows may overlap or
 * leave gaps; the default table is contiguous). Commands check a table with
 * {@link #validate(int[], int[], int)} and get a {@link TableStatus} reason code; the factories
 * throw only when a programmer hands them a table they did not validate.
 *
 * <p>The factories use floating point: they run at start-up or on a ground command, never on the
 * per-step path.
 */
public final class WindowTable {
    /** Most windows a table may hold; every scheduler buffer is sized from it. */
    public static final int CAPACITY = 256;
    /** Windows in the default table (physics.md, the demo instrument). */
    public static final int DEFAULT_WINDOWS = 128;
    /** Low edge of the default table, millivolts: 50 V (physics.md, the demo instrument). */
    public static final int DEFAULT_LOW_MILLIVOLTS = 50_000;
    /** High edge of the default table, millivolts: 6000 V (physics.md, the demo instrument). */
    public static final int DEFAULT_HIGH_MILLIVOLTS = 6_000_000;

    private final int[] dacLow;
    private final int[] dacHigh;

    private WindowTable(int[] dacLow, int[] dacHigh, int count) {
        this.dacLow = Arrays.copyOf(dacLow, count);
        this.dacHigh = Arrays.copyOf(dacHigh, count);
    }

    /**
     * The default table: 128 contiguous log-spaced windows from 50 V to 6000 V, edges
     * E_k = 50 V * 120^(k/128), window k = [E_k, E_k+1], at the nominal 0.1 V per DAC code.
     */
    public static WindowTable defaultTable() {
        return logSpaced(DEFAULT_WINDOWS, DEFAULT_LOW_MILLIVOLTS, DEFAULT_HIGH_MILLIVOLTS);
    }

    /**
     * {@code windows} contiguous log-spaced windows from {@code lowMillivolts} to
     * {@code highMillivolts}, each edge rounded to the nearest DAC code of the nominal scale.
     *
     * @throws IllegalArgumentException when the result is not a valid table (programmer misuse)
     */
    public static WindowTable logSpaced(int windows, int lowMillivolts, int highMillivolts) {
        if (windows < 1 || windows > CAPACITY || lowMillivolts <= 0 || highMillivolts <= lowMillivolts) {
            throw new IllegalArgumentException("bad log-spaced table: " + windows + " windows, "
                + lowMillivolts + ".." + highMillivolts + " mV");
        }
        int[] edges = new int[windows + 1];
        double ratio = (double) highMillivolts / lowMillivolts;
        for (int k = 0; k <= windows; k++) {
            double millivolts = lowMillivolts * Math.pow(ratio, (double) k / windows);
            edges[k] = (int) Math.round(millivolts / InstrumentConstants.DAC_MILLIVOLTS_PER_CODE);
        }
        return of(Arrays.copyOf(edges, windows), Arrays.copyOfRange(edges, 1, windows + 1), windows);
    }

    /**
     * Checks a candidate table without building it.
     *
     * @return a {@link TableStatus} code; {@link TableStatus#OK} when the table is valid
     */
    public static int validate(int[] dacLow, int[] dacHigh, int count) {
        if (count <= 0) {
            return TableStatus.EMPTY;
        }
        if (count > CAPACITY) {
            return TableStatus.TOO_MANY_WINDOWS;
        }
        if (dacLow == null || dacHigh == null || dacLow.length < count || dacHigh.length < count) {
            return TableStatus.MISSING_DATA;
        }
        for (int w = 0; w < count; w++) {
            if (dacLow[w] < 0 || dacHigh[w] < 0
                || dacLow[w] > InstrumentConstants.DAC_MAX_CODE || dacHigh[w] > InstrumentConstants.DAC_MAX_CODE) {
                return TableStatus.OUT_OF_DAC_RANGE;
            }
        }
        for (int w = 0; w < count; w++) {
            if (dacLow[w] >= dacHigh[w]) {
                return TableStatus.NOT_MONOTONIC;
            }
            if (w > 0 && (dacLow[w] <= dacLow[w - 1] || dacHigh[w] <= dacHigh[w - 1])) {
                return TableStatus.NOT_MONOTONIC;
            }
        }
        return TableStatus.OK;
    }

    /**
     * Builds a table from the first {@code count} entries of the arrays (copied).
     *
     * @throws IllegalArgumentException when {@link #validate} refuses it (commands validate first)
     */
    public static WindowTable of(int[] dacLow, int[] dacHigh, int count) {
        int status = validate(dacLow, dacHigh, count);
        if (status != TableStatus.OK) {
            throw new IllegalArgumentException("window table refused: " + TableStatus.name(status));
        }
        return new WindowTable(dacLow, dacHigh, count);
    }

    /** Number of windows. */
    public int count() {
        return dacLow.length;
    }

    /** Modulator low level of window {@code w}, DAC code. */
    public int dacLow(int w) {
        return dacLow[w];
    }

    /** Modulator high level of window {@code w}, DAC code. */
    public int dacHigh(int w) {
        return dacHigh[w];
    }
}
