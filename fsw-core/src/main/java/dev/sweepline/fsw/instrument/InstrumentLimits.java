package dev.sweepline.fsw.instrument;

import dev.sweepline.fsw.table.SweepParameters;
import dev.sweepline.fsw.table.TableStatus;

/**
 * The instrument's own limits that every table is checked against before it can fly (commands.md
 * §4.4): the highest modulator voltage, the nominal DAC scale that turns it into a code, and the HV
 * supply's slew and settling. They describe the instrument, not the DAC: a 16-bit DAC at 0.1 V per
 * code could reach 6553.5 V, but the demo cup is rated to 6000 V. Immutable; checks are
 * allocation-free and return {@link TableStatus} codes.
 */
public final class InstrumentLimits {
    /** Highest modulator level the instrument may be commanded to, millivolts. */
    public final int maxModulatorMillivolts;
    /** Nominal DAC scale, millivolts per code (the calibration refines it by well under 1 %). */
    public final int dacMillivoltsPerCode;
    /** Highest DAC code any window may command: the voltage limit at the nominal scale, rounded down. */
    public final int maxLevelCode;
    /** Shortest settle after any level change, microseconds (first-order settling of the HV supply). */
    public final int minFixedSettleMicros;
    /** Shortest extra settle per code of rail change, microseconds Q8 (the inverse of the slew limit). */
    public final int minSettleMicrosPerCodeQ8;

    /**
     * @param maxModulatorMillivolts   highest modulator level, mV
     * @param dacMillivoltsPerCode     nominal DAC scale, mV per code
     * @param minFixedSettleMicros     shortest fixed settle, us
     * @param minSettleMicrosPerCodeQ8 shortest settle per code of rail change, us Q8
     * @throws IllegalArgumentException for a non-positive scale or voltage, or negative settle limits
     */
    public InstrumentLimits(int maxModulatorMillivolts, int dacMillivoltsPerCode, int minFixedSettleMicros,
                            int minSettleMicrosPerCodeQ8) {
        if (maxModulatorMillivolts <= 0 || dacMillivoltsPerCode <= 0 || minFixedSettleMicros < 0
            || minSettleMicrosPerCodeQ8 < 0) {
            throw new IllegalArgumentException("bad instrument limits");
        }
        this.maxModulatorMillivolts = maxModulatorMillivolts;
        this.dacMillivoltsPerCode = dacMillivoltsPerCode;
        this.maxLevelCode = maxModulatorMillivolts / dacMillivoltsPerCode;
        this.minFixedSettleMicros = minFixedSettleMicros;
        this.minSettleMicrosPerCodeQ8 = minSettleMicrosPerCodeQ8;
    }

    /**
     * The demo cup (docs: the demo instrument; invented values): modulator rated to 6000 V; 0.1 V
     * per DAC code; the HV supply slews 100 V/ms (1 code per us, so at least 256 in Q8) and settles
     * with a 150 us time constant, so the fixed settle is at least 5 tau = 750 us (residual
     * exp(-5) = 0.7 % of the step inside the slew band: common practice, settle to better than 1 %).
     */
    public static InstrumentLimits demo() {
        return new InstrumentLimits(6_000_000, 100, 750, 256);
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
