package dev.sweepline.fsw.table;

import java.util.Arrays;

/**
 * The energy-per-charge window table: window {@code w} makes the modulator alternate between DAC
 * codes {@code dacLow(w)} and {@code dacHigh(w)}. Immutable after it is built; primitive arrays.
 *
 * <p>A valid table has 1..{@link #CAPACITY} windows, every code in 0..the DAC's top code (at most
 * {@link #MAX_CODE}), lows strictly
 * increasing, highs strictly increasing and low &lt; high in every window (windows may overlap or
 * leave gaps; the default table is contiguous). Commands check a table with
 * {@link #validate(int[], int[], int)} and get a {@link TableStatus} reason code; the factories
 * throw only when a programmer hands them a table they did not validate.
 *
 * <p>The factories use floating point: they run at start-up or on a ground command, never on the
 * per-step path.
 */
public final class WindowTable {
    /** Most windows a table may hold (telemetry ICD §4, window count 1..256); every scheduler buffer is sized from it. */
    public static final int CAPACITY = 256;
    /** Highest code the hardware ICD's step command can carry (§3.1: 16-bit levels); a DAC may reach less. */
    public static final int MAX_CODE = 0xFFFF;

    private final int[] dacLow;
    private final int[] dacHigh;

    private WindowTable(int[] dacLow, int[] dacHigh, int count) {
        this.dacLow = Arrays.copyOf(dacLow, count);
        this.dacHigh = Arrays.copyOf(dacHigh, count);
    }

    /**
     * {@code windows} contiguous log-spaced windows from {@code lowMillivolts} to
     * {@code highMillivolts}, edges E_k = low × (high/low)^(k/windows), window k = [E_k, E_k+1], each
     * edge rounded to the nearest DAC code of the nominal scale {@code millivoltsPerCode}
     * (instrument description FORMAT.md, windows.spacing {@code log}).
     *
     * @throws IllegalArgumentException when the result is not a valid table (programmer misuse)
     */
    public static WindowTable logSpaced(int windows, int lowMillivolts, int highMillivolts, int millivoltsPerCode) {
        if (windows < 1 || windows > CAPACITY || lowMillivolts <= 0 || highMillivolts <= lowMillivolts
            || millivoltsPerCode <= 0) {
            throw new IllegalArgumentException("bad log-spaced table: " + windows + " windows, "
                + lowMillivolts + ".." + highMillivolts + " mV at " + millivoltsPerCode + " mV per code");
        }
        int[] edges = new int[windows + 1];
        double ratio = (double) highMillivolts / lowMillivolts;
        for (int k = 0; k <= windows; k++) {
            double millivolts = lowMillivolts * Math.pow(ratio, (double) k / windows);
            edges[k] = (int) Math.round(millivolts / millivoltsPerCode);
        }
        return of(Arrays.copyOf(edges, windows), Arrays.copyOfRange(edges, 1, windows + 1), windows);
    }

    /** {@link #validate(int[], int[], int, int)} against the widest codes the hardware ICD carries. */
    public static int validate(int[] dacLow, int[] dacHigh, int count) {
        return validate(dacLow, dacHigh, count, MAX_CODE);
    }

    /**
     * Checks a candidate table without building it: codes within 0..{@code dacTopCode}, the DAC's
     * highest code (InstrumentDescription#dacTopCode), strictly increasing.
     *
     * @return a {@link TableStatus} code; {@link TableStatus#OK} when the table is valid
     */
    public static int validate(int[] dacLow, int[] dacHigh, int count, int dacTopCode) {
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
                || dacLow[w] > dacTopCode || dacHigh[w] > dacTopCode) {
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

    /** A copy of the low codes (start-up and ground tools; not for the step path). */
    public int[] dacLows() {
        return dacLow.clone();
    }

    /** A copy of the high codes (start-up and ground tools; not for the step path). */
    public int[] dacHighs() {
        return dacHigh.clone();
    }
}
