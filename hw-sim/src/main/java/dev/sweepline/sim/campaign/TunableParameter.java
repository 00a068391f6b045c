package dev.sweepline.sim.campaign;

import dev.sweepline.fsw.table.SweepParameters;
import java.util.function.ObjIntConsumer;

/**
 * The sweep parameters a campaign grid may vary, by their campaign-file key, in plain units: the
 * flight software's fixed-point scale of each is applied here (Q8: x256).
 */
public enum TunableParameter {
    /** Dwell: modulation periods integrated per window. */
    INTEGRATION_PERIODS("integrationPeriods", 1, (p, v) -> p.integrationPeriods = v, p -> p.integrationPeriods),
    /** Focus band half-width per measured FWHM (a factor; Q8 in the flight software). */
    HALF_WIDTH_PER_FWHM("halfWidthPerFwhm", 256, (p, v) -> p.halfWidthPerFwhmQ8 = v, p -> p.halfWidthPerFwhmQ8),
    /** Smallest focus band half-width, windows. */
    MIN_HALF_WIDTH_WINDOWS("minHalfWidthWindows", 1, (p, v) -> p.minHalfWidthWindows = v, p -> p.minHalfWidthWindows),
    /** Widest focus band, windows. */
    MAX_BAND_WINDOWS("maxBandWindows", 1, (p, v) -> p.maxBandWindows = v, p -> p.maxBandWindows),
    /** Focus sweeps between forced surveys (K). */
    RESURVEY_EVERY("resurveyEvery", 1, (p, v) -> p.resurveyEveryFocusSweeps = v, p -> p.resurveyEveryFocusSweeps),
    /** Lock lost below this fraction of the reference peak current (Q8 in the flight software). */
    COLLAPSE_FRACTION("collapseFraction", 256, (p, v) -> p.collapseFractionQ8 = v, p -> p.collapseFractionQ8),
    /** Lock lost when the peak moves by more than this many windows. */
    JUMP_WINDOWS("jumpWindows", 1, (p, v) -> p.jumpWindows = v, p -> p.jumpWindows),
    /** Edge search reach beyond a band edge, windows (0: survey at once). */
    EDGE_SEARCH_WINDOWS("edgeSearchWindows", 1, (p, v) -> p.edgeSearchWindows = v, p -> p.edgeSearchWindows),
    /** Settle after every level change, microseconds (at least the HV supply's settling). */
    FIXED_SETTLE_MICROS("fixedSettleMicros", 1, (p, v) -> p.fixedSettleMicros = v, p -> p.fixedSettleMicros),
    /** Extra settle per DAC code of rail change, microseconds (Q8 in the flight software; at least the slew limit's). */
    SETTLE_MICROS_PER_CODE("settleMicrosPerCode", 256, (p, v) -> p.settleMicrosPerCodeQ8 = v, p -> p.settleMicrosPerCodeQ8),
    /**
     * Focus style: 0 band (today's), 1 design (the D-optimal band and a dwell from the budget), plus 2
     * interleaved, plus 4 support dwell (commands.md §4.1).
     */
    FOCUS_STYLE("focusStyle", 1, (p, v) -> p.focusStyle = v, p -> p.focusStyle),
    /** Design style: sweep-time budget of a focus sweep, microseconds (0: the table's dwell). */
    FOCUS_BUDGET_MICROS("focusBudgetMicros", 1, (p, v) -> p.focusBudgetMicros = v, p -> p.focusBudgetMicros),
    /** Design style: windows added either side of the design half-width. */
    ROBUSTNESS_MARGIN_WINDOWS("robustnessMarginWindows", 1, (p, v) -> p.robustnessMarginWindows = v,
            p -> p.robustnessMarginWindows),
    /** Survey style: 0 the table's dwell, else a quick survey at this many periods per window. */
    SURVEY_INTEGRATION_PERIODS("surveyIntegrationPeriods", 1, (p, v) -> p.surveyIntegrationPeriods = v,
            p -> p.surveyIntegrationPeriods),
    /** Telemetry: engineering frame flush interval, seconds (0: the build's 10 s; 1..600; commands.md §4.1). */
    ENGINEERING_FLUSH_SECONDS("engineeringFlushSeconds", 1, (p, v) -> p.engineeringFlushSeconds = v,
            p -> p.engineeringFlushSeconds),
    /** Support dwell (focusStyle 4..7, 12..15, 21, 23, 29, 31): the floor dwell of every focus window but the support windows, periods. */
    FOCUS_FLOOR_PERIODS("focusFloorPeriods", 1, (p, v) -> p.focusFloorPeriods = v, p -> p.focusFloorPeriods);

    private final String key;
    private final int scale;
    private final ObjIntConsumer<SweepParameters> setter;
    private final java.util.function.ToIntFunction<SweepParameters> getter;

    TunableParameter(String key, int scale, ObjIntConsumer<SweepParameters> setter,
            java.util.function.ToIntFunction<SweepParameters> getter) {
        this.key = key;
        this.scale = scale;
        this.setter = setter;
        this.getter = getter;
    }

    /** This parameter of {@code p} in plain units (the flight software's value over its scale). */
    double read(SweepParameters p) {
        return getter.applyAsInt(p) / (double) scale;
    }

    /** Key in the campaign file. */
    public String key() {
        return key;
    }

    /** The flight software's fixed-point scale of this parameter (1, or 256 for Q8). */
    int scale() {
        return scale;
    }

    /** True when {@code value} (plain units) rounds to a value of the flight software's int field, as {@link #apply} sets it. */
    boolean fits(double value) {
        long scaled = Math.round(value * scale); // NaN gives 0, an infinity Long.MIN_VALUE or MAX_VALUE
        return !Double.isNaN(value) && scaled >= Integer.MIN_VALUE && scaled <= Integer.MAX_VALUE;
    }

    /** Sets this parameter of {@code p} to {@code value} (plain units, rounded to the flight software's scale). */
    void apply(SweepParameters p, double value) {
        setter.accept(p, (int) Math.round(value * scale));
    }

    /** The parameter of that key, or null. */
    static TunableParameter byKey(String key) {
        for (TunableParameter t : values()) {
            if (t.key.equals(key)) {
                return t;
            }
        }
        return null;
    }
}
