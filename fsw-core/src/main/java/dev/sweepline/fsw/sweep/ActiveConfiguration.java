package dev.sweepline.fsw.sweep;

import dev.sweepline.fsw.instrument.InstrumentDescription;
import dev.sweepline.fsw.table.SweepParameters;
import dev.sweepline.fsw.table.TableStatus;
import dev.sweepline.fsw.table.WindowTable;

/**
 * The window table and parameters in use, and the ones waiting for the next sweep boundary
 * (sweep design note R14). Loads are validated and copied into preallocated storage, so a command
 * allocates nothing and a refusal leaves everything as it was. The arrays and the parameter object
 * are shared, by reference, with the analysis classes and stay the same objects for life.
 */
final class ActiveConfiguration {
    /** {@link #applyPending()} result bit: new parameters took effect. */
    static final int PARAMETERS_CHANGED = 1;
    /** {@link #applyPending()} result bit: a new table took effect. */
    static final int TABLE_CHANGED = 2;

    /** Active low codes. */
    final int[] dacLow = new int[WindowTable.CAPACITY];
    /** Active high codes. */
    final int[] dacHigh = new int[WindowTable.CAPACITY];
    /** Active window centre codes, (low + high) / 2. */
    final int[] centreCode = new int[WindowTable.CAPACITY];
    /** Active parameters. */
    final SweepParameters params = new SweepParameters();
    private int windowCount;

    private final int[] pendingLow = new int[WindowTable.CAPACITY];
    private final int[] pendingHigh = new int[WindowTable.CAPACITY];
    private int pendingCount;
    private boolean tablePending;
    private final SweepParameters pendingParams = new SweepParameters();
    private boolean paramsPending;
    private final int dacTopCode;
    /** Highest code any window may command: the instrument's voltage limit (InstrumentLimits#maxLevelCode). */
    private final int maxLevelCode;
    private final int rangeRatioShift;

    /**
     * Starts with {@code table} and {@code initial} (already validated by the caller) in effect; loads
     * are checked against {@code instrument}'s DAC, voltage limit and range ratio; this is the one place every
     * table passes through before it can fly.
     *
     * @throws IllegalArgumentException when {@code table} is refused (programmer misuse: the description's
     *         own table passed these checks when it was built)
     */
    ActiveConfiguration(WindowTable table, SweepParameters initial, InstrumentDescription instrument) {
        dacTopCode = instrument.dacTopCode();
        maxLevelCode = instrument.limits().maxLevelCode;
        rangeRatioShift = instrument.rangeRatioShift();
        params.copyFrom(initial);
        int status = loadTable(table);
        if (status != TableStatus.OK) {
            throw new IllegalArgumentException("window table refused: " + TableStatus.name(status));
        }
        applyPending();
    }

    /** Windows in the active table. */
    int windowCount() {
        return windowCount;
    }

    /** True when a table waits for the next sweep boundary. */
    boolean tablePending() {
        return tablePending;
    }

    /** Queues a built (so well-formed) table whose codes lie within the DAC and the voltage limit. */
    int loadTable(WindowTable table) {
        if (table == null) {
            return TableStatus.MISSING_DATA;
        }
        for (int w = 0; w < table.count(); w++) {
            // highs increase and each low is below its high, so the highs bound every code
            if (table.dacHigh(w) > dacTopCode) {
                return TableStatus.OUT_OF_DAC_RANGE;
            }
            if (table.dacHigh(w) > maxLevelCode) {
                return TableStatus.ABOVE_VOLTAGE_LIMIT;
            }
        }
        for (int w = 0; w < table.count(); w++) {
            pendingLow[w] = table.dacLow(w);
            pendingHigh[w] = table.dacHigh(w);
        }
        pendingCount = table.count();
        tablePending = true;
        return TableStatus.OK;
    }

    /** Validates (shape within the DAC, then the voltage limit) and queues a table given as arrays. */
    int loadTable(int[] lows, int[] highs, int count) {
        int status = WindowTable.validate(lows, highs, count, dacTopCode);
        if (status != TableStatus.OK) {
            return status;
        }
        for (int w = 0; w < count; w++) {
            if (lows[w] > maxLevelCode || highs[w] > maxLevelCode) {
                return TableStatus.ABOVE_VOLTAGE_LIMIT;
            }
        }
        System.arraycopy(lows, 0, pendingLow, 0, count);
        System.arraycopy(highs, 0, pendingHigh, 0, count);
        pendingCount = count;
        tablePending = true;
        return TableStatus.OK;
    }

    /** Validates and queues parameters. */
    int loadParameters(SweepParameters p) {
        if (p == null) {
            return TableStatus.MISSING_DATA;
        }
        int status = p.validate(rangeRatioShift);
        if (status != TableStatus.OK) {
            return status;
        }
        pendingParams.copyFrom(p);
        paramsPending = true;
        return TableStatus.OK;
    }

    /** Copies into {@code into} the parameters in force from the next sweep boundary: those waiting, else the active ones. */
    void nextParameters(SweepParameters into) {
        into.copyFrom(paramsPending ? pendingParams : params);
    }

    /**
     * Puts whatever waits into effect (called at a sweep boundary).
     *
     * @return {@link #PARAMETERS_CHANGED} and / or {@link #TABLE_CHANGED} bits
     */
    int applyPending() {
        int changed = 0;
        if (paramsPending) {
            paramsPending = false;
            params.copyFrom(pendingParams);
            changed |= PARAMETERS_CHANGED;
        }
        if (tablePending) {
            tablePending = false;
            System.arraycopy(pendingLow, 0, dacLow, 0, pendingCount);
            System.arraycopy(pendingHigh, 0, dacHigh, 0, pendingCount);
            windowCount = pendingCount;
            for (int w = 0; w < windowCount; w++) {
                centreCode[w] = (dacLow[w] + dacHigh[w]) >>> 1;
            }
            changed |= TABLE_CHANGED;
        }
        return changed;
    }
}
