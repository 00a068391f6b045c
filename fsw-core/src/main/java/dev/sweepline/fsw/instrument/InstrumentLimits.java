package dev.sweepline.fsw.instrument;

import dev.sweepline.fsw.table.SweepParameters;
import dev.sweepline.fsw.table.TableStatus;
import dev.sweepline.fsw.table.WindowTable;

/**
 * The instrument's own limits that every table is checked against before it can fly (commands.md
 * §4.4): the highest modulator voltage, the nominal DAC scale that turns it into a code, the DAC's
 * top code, the gain ranges' ratio (gain hysteresis) and the HV supply's slew and settling. They
 * describe the instrument, not only the DAC: a 16-bit DAC at 0.1 V per code could reach 6553.5 V,
 * but the demo cup is rated to 6000 V. Derived from the {@link InstrumentDescription}; immutable;
 * checks are allocation-free and return {@link TableStatus} codes.
 */
public final class InstrumentLimits {
    /** Highest modulator level the instrument may be commanded to, millivolts. */
    public final int maxModulatorMillivolts;
    /** Nominal DAC scale, millivolts per code (the calibration refines it by well under 1 %). */
    public final int dacMillivoltsPerCode;
    /** Highest DAC code any window may command: the voltage limit at the nominal scale, rounded down. */
    public final int maxLevelCode;
    /** Highest code of the DAC, 2^bits − 1: a table beyond it is {@link TableStatus#OUT_OF_DAC_RANGE}. */
    public final int dacTopCode;
    /** log2 of the gain ranges' full-scale ratio (the hysteresis check of the gain thresholds). */
    public final int rangeRatioShift;
    /** Shortest settle after any level change, microseconds (first-order settling of the HV supply: 5 tau). */
    public final int minFixedSettleMicros;
    /** Shortest extra settle per code of rail change, microseconds Q8 (the inverse of the slew limit). */
    public final int minSettleMicrosPerCodeQ8;

    /**
     * @param maxModulatorMillivolts   highest modulator level, mV
     * @param dacMillivoltsPerCode     nominal DAC scale, mV per code
     * @param dacTopCode               the DAC's highest code
     * @param rangeRatioShift          log2 of the gain ranges' ratio
     * @param minFixedSettleMicros     shortest fixed settle, us
     * @param minSettleMicrosPerCodeQ8 shortest settle per code of rail change, us Q8
     * @throws IllegalArgumentException for a non-positive scale, voltage or top code, or negative settle limits
     */
    public InstrumentLimits(int maxModulatorMillivolts, int dacMillivoltsPerCode, int dacTopCode, int rangeRatioShift,
                            int minFixedSettleMicros, int minSettleMicrosPerCodeQ8) {
        if (maxModulatorMillivolts <= 0 || dacMillivoltsPerCode <= 0 || dacTopCode <= 0 || rangeRatioShift < 0
            || minFixedSettleMicros < 0 || minSettleMicrosPerCodeQ8 < 0) {
            throw new IllegalArgumentException("bad instrument limits");
        }
        this.maxModulatorMillivolts = maxModulatorMillivolts;
        this.dacMillivoltsPerCode = dacMillivoltsPerCode;
        this.maxLevelCode = Math.min(dacTopCode, maxModulatorMillivolts / dacMillivoltsPerCode);
        this.dacTopCode = dacTopCode;
        this.rangeRatioShift = rangeRatioShift;
        this.minFixedSettleMicros = minFixedSettleMicros;
        this.minSettleMicrosPerCodeQ8 = minSettleMicrosPerCodeQ8;
    }

    /**
     * A window table as arrays: its shape within the DAC ({@link WindowTable#validate}), then its levels
     * against the voltage limit.
     *
     * @return {@link TableStatus#OK} or the first reason code
     */
    public int validateTable(int[] dacLow, int[] dacHigh, int count) {
        int status = WindowTable.validate(dacLow, dacHigh, count, dacTopCode);
        return status != TableStatus.OK ? status : checkLevels(dacLow, dacHigh, count);
    }

    /**
     * A parameter set: its own ranges ({@link SweepParameters#validate(int)} with this instrument's
     * range ratio), then its settle against the HV supply.
     *
     * @return {@link TableStatus#OK} or the first reason code
     */
    public int validateParameters(SweepParameters p) {
        int status = p.validate(rangeRatioShift);
        return status != TableStatus.OK ? status : checkSettle(p);
    }

    /**
     * Checks every level of a window table against the voltage limit.
     *
     * @return {@link TableStatus#OK} or {@link TableStatus#ABOVE_VOLTAGE_LIMIT}
     */
    public int checkLevels(int[] dacLow, int[] dacHigh, int count) {
        for (int w = 0; w < count; w++) {
            if (dacLow[w] > maxLevelCode || dacHigh[w] > maxLevelCode) {
                return TableStatus.ABOVE_VOLTAGE_LIMIT;
            }
        }
        return TableStatus.OK;
    }

    /**
     * Checks the settle parameters against what the HV supply needs.
     *
     * @return {@link TableStatus#OK}, {@link TableStatus#SETTLE_BELOW_SLEW} or
     *         {@link TableStatus#SETTLE_TOO_SHORT}
     */
    public int checkSettle(SweepParameters p) {
        if (p.settleMicrosPerCodeQ8 < minSettleMicrosPerCodeQ8) {
            return TableStatus.SETTLE_BELOW_SLEW;
        }
        if (p.fixedSettleMicros < minFixedSettleMicros) {
            return TableStatus.SETTLE_TOO_SHORT;
        }
        return TableStatus.OK;
    }
}
