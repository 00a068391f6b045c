package dev.sweepline.fsw.instrument;

import dev.sweepline.fsw.table.SweepParameters;
import dev.sweepline.fsw.table.TableStatus;
import dev.sweepline.fsw.table.WindowTable;

/**
 * The integer facts of one instrument that the flight software needs (instrument description format
 * {@code sweepline-instrument/1}, {@code instruments/FORMAT.md}): its name and telemetry id, the
 * collector quadrants, the preamplifier's gain ranges, the ADC, the HV DAC and its nominal scale,
 * the modulator's voltage limits, the modulation period, the default window table and the default
 * sweep parameters. Given at start-up as configuration; every buffer of the flight software is sized
 * from it at construction. Immutable; build with {@link #builder()}, which checks every value and
 * the values against each other.
 *
 * <p>The host's description file reader ({@code dev.sweepline.fsw.host.instrument}) turns a file's
 * plain units into these integers; the core never sees a floating-point value of it.
 */
public final class InstrumentDescription {
    /** Collector quadrants of the only layout of format version 1 (FORMAT.md, geometry.collector). */
    public static final int QUADRANTS = 4;
    /** Most gain ranges (FORMAT.md, preamp.ranges; the telemetry's gain tags have 2 bits). */
    public static final int MAX_GAIN_RANGES = 4;
    /** Narrowest and widest ADC (FORMAT.md, adc.bits; telemetry ICD §4, sample width w). */
    public static final int MIN_ADC_BITS = 8;
    /** Widest ADC, bits (FORMAT.md, adc.bits). */
    public static final int MAX_ADC_BITS = 24;
    /** Widest HV DAC, bits: the hardware ICD's step command carries 16-bit codes (FORMAT.md, modulator.dacBits). */
    public static final int MAX_DAC_BITS = 16;
    /** Narrowest HV DAC, bits (FORMAT.md, modulator.dacBits). */
    public static final int MIN_DAC_BITS = 8;
    /**
     * Most bits of a window's current in range-0 units, log2(4 quadrants × 2^adcBits × ratio^(ranges−1)):
     * the scheduler's 64-bit sums and their fixed-point products (× 256 at most, Q8) keep 8 bits of
     * headroom below 2^63 (FORMAT.md, contradictions; design value).
     */
    public static final int MAX_CURRENT_UNIT_BITS = 47;

    private final String name;
    private final int id;
    private final int gainRanges;
    private final int rangeRatioShift;
    private final long fullScaleRange0Femtoamps;
    private final int adcBits;
    private final int pedestalCounts;
    private final int dacBits;
    private final int millivoltsPerCode;
    private final int minModulatorMillivolts;
    private final int maxModulatorMillivolts;
    private final int modulationPeriodMicros;
    private final int windowCount;
    private final int windowLowMillivolts;
    private final int windowHighMillivolts;
    private final SweepParameters defaultParameters;
    private final InstrumentLimits limits;

    private InstrumentDescription(Builder b) {
        name = b.name;
        id = b.id;
        gainRanges = b.gainRanges;
        rangeRatioShift = b.rangeRatioShift;
        fullScaleRange0Femtoamps = b.fullScaleRange0Femtoamps;
        adcBits = b.adcBits;
        pedestalCounts = b.pedestalCounts;
        dacBits = b.dacBits;
        millivoltsPerCode = b.millivoltsPerCode;
        minModulatorMillivolts = b.minModulatorMillivolts;
        maxModulatorMillivolts = b.maxModulatorMillivolts;
        modulationPeriodMicros = b.modulationPeriodMicros;
        windowCount = b.windowCount;
        windowLowMillivolts = b.windowLowMillivolts;
        windowHighMillivolts = b.windowHighMillivolts;
        defaultParameters = b.defaultParameters.copy();
        limits = new InstrumentLimits(maxModulatorMillivolts, millivoltsPerCode, dacTopCode(), rangeRatioShift,
                b.minFixedSettleMicros, b.minSettleMicrosPerCodeQ8);
    }

    /** A builder with nothing set. */
    public static Builder builder() {
        return new Builder();
    }

    /** The instrument's name (FORMAT.md {@code name}). */
    public String name() {
        return name;
    }

    /** The instrument id telemetry carries, 1..65535 (telemetry ICD §4). */
    public int id() {
        return id;
    }

    /** Collector quadrants: {@value #QUADRANTS}. */
    public int quadrants() {
        return QUADRANTS;
    }

    /** Preamplifier gain ranges, 1..{@value #MAX_GAIN_RANGES}. */
    public int gainRanges() {
        return gainRanges;
    }

    /** log2 of the full-scale ratio of neighbouring ranges (the ratio is a power of two, 2..1024). */
    public int rangeRatioShift() {
        return rangeRatioShift;
    }

    /** Full-scale ratio of neighbouring gain ranges. */
    public int rangeRatio() {
        return 1 << rangeRatioShift;
    }

    /** Full scale of gain range 0, femtoamperes; range r has this times {@code rangeRatio()^r}. */
    public long fullScaleRange0Femtoamps() {
        return fullScaleRange0Femtoamps;
    }

    /** ADC width, bits ({@value #MIN_ADC_BITS}..{@value #MAX_ADC_BITS}); the sample width w of telemetry. */
    public int adcBits() {
        return adcBits;
    }

    /** Highest ADC code, 2^bits − 1: a sample at it is saturated. */
    public int adcTopCode() {
        return (1 << adcBits) - 1;
    }

    /** ADC code of zero current. */
    public int pedestalCounts() {
        return pedestalCounts;
    }

    /** Octets of one quadrant sample on the link and in raw telemetry: ⌈bits / 8⌉ (hardware ICD §3.2). */
    public int sampleOctets() {
        return (adcBits + 7) / 8;
    }

    /** HV DAC width, bits. */
    public int dacBits() {
        return dacBits;
    }

    /** Highest HV DAC code, 2^dacBits − 1. */
    public int dacTopCode() {
        return (1 << dacBits) - 1;
    }

    /** Nominal HV DAC scale, millivolts per code. */
    public int millivoltsPerCode() {
        return millivoltsPerCode;
    }

    /** Lowest modulator level of the default table, millivolts. */
    public int minModulatorMillivolts() {
        return minModulatorMillivolts;
    }

    /** The modulator's rating, millivolts: no window of any table may command more. */
    public int maxModulatorMillivolts() {
        return maxModulatorMillivolts;
    }

    /** Period of the square-wave modulation, microseconds. */
    public int modulationPeriodMicros() {
        return modulationPeriodMicros;
    }

    /** Windows of the default table. */
    public int windowCount() {
        return windowCount;
    }

    /** Low edge of the default table, millivolts. */
    public int windowLowMillivolts() {
        return windowLowMillivolts;
    }

    /** High edge of the default table, millivolts. */
    public int windowHighMillivolts() {
        return windowHighMillivolts;
    }

    /** The default (start-up) window table: log-spaced, at the nominal DAC scale (FORMAT.md, windows). */
    public WindowTable defaultTable() {
        return WindowTable.logSpaced(windowCount, windowLowMillivolts, windowHighMillivolts, millivoltsPerCode);
    }

    /** A copy of the default sweep parameters (cadence, noise estimate, the file's sweep overrides). */
    public SweepParameters defaultParameters() {
        return defaultParameters.copy();
    }

    /** The limits every table is checked against (commands.md §4.4). */
    public InstrumentLimits limits() {
        return limits;
    }

    @Override
    public String toString() {
        return name + " (id " + id + ", " + adcBits + "-bit ADC, " + windowCount + " windows)";
    }

    /** Sets the values one by one; {@link #build()} checks them. Not thread-safe. */
    public static final class Builder {
        private String name;
        private int id;
        private int gainRanges;
        private int rangeRatioShift;
        private long fullScaleRange0Femtoamps;
        private int adcBits;
        private int pedestalCounts;
        private int dacBits;
        private int millivoltsPerCode;
        private int minModulatorMillivolts;
        private int maxModulatorMillivolts;
        private int modulationPeriodMicros;
        private int windowCount;
        private int windowLowMillivolts;
        private int windowHighMillivolts;
        private int minFixedSettleMicros;
        private int minSettleMicrosPerCodeQ8;
        private SweepParameters defaultParameters;

        private Builder() {
        }

        /** Name and telemetry id. */
        public Builder identity(String name, int id) {
            this.name = name;
            this.id = id;
            return this;
        }

        /** Gain ranges, log2 of their ratio, full scale of range 0 in femtoamperes. */
        public Builder preamp(int gainRanges, int rangeRatioShift, long fullScaleRange0Femtoamps) {
            this.gainRanges = gainRanges;
            this.rangeRatioShift = rangeRatioShift;
            this.fullScaleRange0Femtoamps = fullScaleRange0Femtoamps;
            return this;
        }

        /** ADC width and pedestal. */
        public Builder adc(int bits, int pedestalCounts) {
            this.adcBits = bits;
            this.pedestalCounts = pedestalCounts;
            return this;
        }

        /** HV DAC width, nominal scale, modulator levels (mV) and modulation period (µs). */
        public Builder modulator(int dacBits, int millivoltsPerCode, int minMillivolts, int maxMillivolts,
                int modulationPeriodMicros) {
            this.dacBits = dacBits;
            this.millivoltsPerCode = millivoltsPerCode;
            this.minModulatorMillivolts = minMillivolts;
            this.maxModulatorMillivolts = maxMillivolts;
            this.modulationPeriodMicros = modulationPeriodMicros;
            return this;
        }

        /** The HV supply's shortest settles: fixed (µs) and per code of rail change (µs, Q8). */
        public Builder settleLimits(int minFixedSettleMicros, int minSettleMicrosPerCodeQ8) {
            this.minFixedSettleMicros = minFixedSettleMicros;
            this.minSettleMicrosPerCodeQ8 = minSettleMicrosPerCodeQ8;
            return this;
        }

        /** The default table: {@code count} log-spaced windows from {@code lowMillivolts} to {@code highMillivolts}. */
        public Builder windows(int count, int lowMillivolts, int highMillivolts) {
            this.windowCount = count;
            this.windowLowMillivolts = lowMillivolts;
            this.windowHighMillivolts = highMillivolts;
            return this;
        }

        /** The default sweep parameters (copied at build). */
        public Builder defaultParameters(SweepParameters p) {
            this.defaultParameters = p;
            return this;
        }

        /**
         * Checks every value and builds the description.
         *
         * @throws IllegalArgumentException naming the first value out of its range (FORMAT.md ranges)
         */
        public InstrumentDescription build() {
            require(name != null && !name.isEmpty() && name.length() <= 32, "name", "1..32 characters");
            require(id >= 1 && id <= 0xFFFF, "id", "1..65535");
            require(gainRanges >= 1 && gainRanges <= MAX_GAIN_RANGES, "preamp.ranges", "1..4");
            require(rangeRatioShift >= 1 && rangeRatioShift <= 10, "preamp.rangeRatio", "2^1..2^10");
            require(fullScaleRange0Femtoamps > 0, "preamp.fullScaleRange0PicoAmps", "positive");
            require(adcBits >= MIN_ADC_BITS && adcBits <= MAX_ADC_BITS, "adc.bits", "8..24");
            require(2 + adcBits + rangeRatioShift * (gainRanges - 1) <= MAX_CURRENT_UNIT_BITS, "preamp.ranges",
                    "4 x 2^adc.bits x rangeRatio^(ranges-1) below 2^47");
            require(pedestalCounts >= 0 && pedestalCounts <= (1 << adcBits) / 4, "adc.pedestalCounts", "0..2^bits/4");
            require(dacBits >= MIN_DAC_BITS && dacBits <= MAX_DAC_BITS, "modulator.dacBits", "8..16");
            require(millivoltsPerCode >= 1 && millivoltsPerCode <= 10_000, "modulator.nominalMillivoltsPerCode",
                    "1..10000");
            require(minModulatorMillivolts > 0 && maxModulatorMillivolts > minModulatorMillivolts,
                    "modulator.maxVolts", "above minVolts");
            require((long) maxModulatorMillivolts <= (long) ((1 << dacBits) - 1) * millivoltsPerCode,
                    "modulator.maxVolts", "within the DAC's reach");
            require(modulationPeriodMicros >= 10 && modulationPeriodMicros <= 100_000, "modulator.modulationPeriodMicros",
                    "10..100000");
            require(minFixedSettleMicros >= 0 && minSettleMicrosPerCodeQ8 >= 0, "modulator", "settle limits >= 0");
            require(windowCount >= 1 && windowCount <= WindowTable.CAPACITY, "windows.count", "1..256");
            require(windowLowMillivolts >= minModulatorMillivolts && windowLowMillivolts < windowHighMillivolts
                    && windowHighMillivolts <= maxModulatorMillivolts, "windows", "minVolts <= low < high <= maxVolts");
            require(defaultParameters != null, "cadence", "present");
            InstrumentDescription d = new InstrumentDescription(this);
            int status = d.limits.validateParameters(d.defaultParameters);
            require(status == TableStatus.OK, "sweep", "valid default parameters, got " + TableStatus.name(status));
            WindowTable t = d.defaultTable();
            status = d.limits.validateTable(t.dacLows(), t.dacHighs(), t.count());
            require(status == TableStatus.OK, "windows", "a valid default table, got " + TableStatus.name(status));
            return d;
        }

        private static void require(boolean ok, String field, String expected) {
            if (!ok) {
                throw new IllegalArgumentException("instrument description: " + field + ": expected " + expected);
            }
        }
    }
}
