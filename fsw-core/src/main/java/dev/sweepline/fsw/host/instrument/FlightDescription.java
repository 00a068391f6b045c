package dev.sweepline.fsw.host.instrument;

import dev.sweepline.fsw.instrument.InstrumentDescription;
import dev.sweepline.fsw.table.SweepParameters;
import java.util.Map;
import java.util.function.ObjIntConsumer;

/**
 * Turns an {@link InstrumentSpec}'s plain units into the flight software's integers (FORMAT.md,
 * derived values): volts to millivolts, picoamperes to femtoamperes, the range ratio to its shift, the
 * settle limits rounded up (a limit is never below what the supply needs), the cadence and the sweep
 * overrides to the parameter table's fixed-point scales (rounded to nearest, as campaign grids are).
 */
final class FlightDescription {
    /** A sweep override: the parameter-table field it sets and the fixed-point scale of its value. */
    record Override(int scale, ObjIntConsumer<SweepParameters> set) {
    }

    /** The keys of the optional {@code sweep} section (FORMAT.md; hw-sim campaigns FORMAT.md grid keys). */
    static final Map<String, Override> OVERRIDES = Map.ofEntries(
            Map.entry("halfWidthPerFwhm", new Override(256, (p, v) -> p.halfWidthPerFwhmQ8 = v)),
            Map.entry("minHalfWidthWindows", new Override(1, (p, v) -> p.minHalfWidthWindows = v)),
            Map.entry("maxBandWindows", new Override(1, (p, v) -> p.maxBandWindows = v)),
            Map.entry("resurveyEvery", new Override(1, (p, v) -> p.resurveyEveryFocusSweeps = v)),
            Map.entry("collapseFraction", new Override(256, (p, v) -> p.collapseFractionQ8 = v)),
            Map.entry("jumpWindows", new Override(1, (p, v) -> p.jumpWindows = v)),
            Map.entry("edgeWindows", new Override(1, (p, v) -> p.edgeWindows = v)),
            Map.entry("edgeSearchWindows", new Override(1, (p, v) -> p.edgeSearchWindows = v)),
            Map.entry("gainUpFraction", new Override(65_536, (p, v) -> p.gainUpFractionQ16 = v)),
            Map.entry("gainDownFraction", new Override(65_536, (p, v) -> p.gainDownFractionQ16 = v)));

    private FlightDescription() {
    }

    static InstrumentDescription of(InstrumentSpec s) {
        InstrumentSpec.Modulator m = s.modulator();
        return InstrumentDescription.builder()
                .identity(s.name(), s.id())
                .preamp(s.preamp().ranges(), Integer.numberOfTrailingZeros(s.preamp().rangeRatio()),
                        Math.round(s.preamp().fullScaleRange0PicoAmps() * 1000))
                .adc(s.adc().bits(), s.adc().pedestalCounts())
                .modulator(m.dacBits(), m.nominalMillivoltsPerCode(), millivolts(m.minVolts()),
                        millivolts(m.maxVolts()), m.modulationPeriodMicros())
                .settleLimits(ceil(m.minFixedSettleMicros()), ceil(256 * m.minSettleMicrosPerCode()))
                .windows(s.windows().count(), millivolts(s.windows().lowVolts()), millivolts(s.windows().highVolts()))
                .defaultParameters(parameters(s))
                .build();
    }

    static SweepParameters parameters(InstrumentSpec s) {
        SweepParameters p = SweepParameters.tunableDefaults();
        p.integrationPeriods = s.cadence().integrationPeriods();
        p.fixedSettleMicros = (int) Math.round(s.cadence().fixedSettleMicros());
        p.settleMicrosPerCodeQ8 = (int) Math.round(s.cadence().settleMicrosPerCode() * 256);
        p.noiseCountsPerQuadrant = s.preamp().noiseCountsPerQuadrant();
        for (Map.Entry<String, Double> e : s.sweep().entrySet()) {
            Override o = OVERRIDES.get(e.getKey());
            o.set().accept(p, (int) Math.round(e.getValue() * o.scale()));
        }
        return p;
    }

    /** Volts to whole millivolts, to nearest. */
    static int millivolts(double volts) {
        return (int) Math.round(volts * 1000);
    }

    /** Rounded up, past a rounding error of the division that gave it. */
    private static int ceil(double v) {
        return (int) Math.ceil(v - 1e-9);
    }
}
