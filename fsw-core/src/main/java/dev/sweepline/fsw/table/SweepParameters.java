package dev.sweepline.fsw.table;

/**
 * The sweep scheduler's tunables, one parameter table (commands.md). Plain int fields whose names
 * carry the unit or the fixed-point scale ({@code Q8} = value * 256, {@code Q16} = value * 65536).
 * Mutable for building and editing; the scheduler copies a validated set into its own storage, so
 * a caller may reuse one instance. Check with {@link #validate()} before loading.
 */
public final class SweepParameters {
    /** Upper limit of {@link #integrationPeriods} (design limit; FORMAT.md cadence.integrationPeriods 1..1000). */
    public static final int MAX_INTEGRATION_PERIODS = 1000;
    /** Upper limit of {@link #fixedSettleMicros}: 100 ms (design limit). */
    public static final int MAX_FIXED_SETTLE_MICROS = 100_000;
    /** Upper limit of {@link #settleMicrosPerCodeQ8}: 16 us per code (design limit). */
    public static final int MAX_SETTLE_MICROS_PER_CODE_Q8 = 16 * 256;
    /** {@link #focusStyle}: the band of {@link #halfWidthPerFwhmQ8} FWHM either side of the peak at the table's dwell. */
    public static final int FOCUS_STYLE_BAND = 0;
    /** {@link #focusStyle}: the band of the D-optimal design table (FocusDesign) and a dwell from {@link #focusBudgetMicros}. */
    public static final int FOCUS_STYLE_DESIGN = 1;
    /**
     * {@link #focusStyle} flag, added to either style: focus sweeps step the band's even offsets outward,
     * then the odd ones back (an interleaved, time-symmetric order, docs/focus-design.md), so that a wind
     * drifting during the sweep reads as the wind at mid-sweep to first order.
     */
    public static final int FOCUS_STYLE_INTERLEAVED = 2;
    /**
     * {@link #focusStyle} flag, added to any of the above (4..7): support dwell. Every window of a focus
     * band dwells {@link #focusFloorPeriods}; three support windows (low flank, peak, high flank,
     * FocusDesign) share the rest of the sweep's integration equally (docs/focus-design.md, "Support dwell").
     */
    public static final int FOCUS_STYLE_SUPPORT_DWELL = 4;
    /**
     * {@link #focusStyle} flag, added to a support-dwell style (12..15): paired support. Each of the three
     * support points is two neighbouring windows sharing its dwell (FocusDesign.pairedSupport), read in
     * opposite halves of an interleaved sweep (docs/focus-design.md, "Paired support").
     */
    public static final int FOCUS_STYLE_PAIRED_SUPPORT = 8;
    /**
     * {@link #focusStyle} flag, added to a design style only (17, 19, 21, 23, 29, 31): alpha-clear. When the
     * alphas' expected peak lies at least FocusDesign.ALPHA_CLEAR_PER_HWHM_Q8 (2.5) proton high half-widths
     * above the refined peak, the design band does not stretch to hold it (its reach above is the protons'
     * alone); closer alphas sit on the protons' flank and the band is the design band
     * (docs/focus-design.md, "Alpha-clear"). Only with the design bit: the band style has no alpha reach to leave out.
     */
    public static final int FOCUS_STYLE_ALPHA_CLEAR = 16;
    /** Upper limit of {@link #focusBudgetMicros}: 10 s (design limit: a focus sweep far longer than the wind's changes teaches little). */
    public static final int MAX_FOCUS_BUDGET_MICROS = 10_000_000;
    /** Upper limit of {@link #robustnessMarginWindows} (design limit: a quarter of the table capacity). */
    public static final int MAX_ROBUSTNESS_MARGIN_WINDOWS = 64;
    /**
     * Upper limit of {@link #engineeringFlushSeconds}: ten minutes, design limit (an event waits at most
     * this long on board before its frame leaves; common practice keeps housekeeping latency within minutes).
     */
    public static final int MAX_ENGINEERING_FLUSH_SECONDS = 600;
    /** V_alpha / V_p at equal speed = m_alpha / (2 m_p) = 1.986300 (physics.md, alpha particles), Q16. */
    public static final int ALPHA_RATIO_1_986300_Q16 = 130_174;

    /** Modulation periods integrated per window (dwell; the instrument description's cadence.integrationPeriods). */
    public int integrationPeriods;
    /** Settle time after every level change, microseconds (the description's cadence.fixedSettleMicros, at least 5 tau). */
    public int fixedSettleMicros;
    /**
     * Extra settle per DAC code of the larger rail change, microseconds, Q8 (the description's
     * cadence.settleMicrosPerCode, at least the nominal scale over the slew limit).
     */
    public int settleMicrosPerCodeQ8;
    /** Smallest focus half-width, windows either side of the peak window. */
    public int minHalfWidthWindows;
    /** Focus half-width per window of measured FWHM, Q8 (384 = 1.5 FWHM either side, about 3.5 sigma). */
    public int halfWidthPerFwhmQ8;
    /** Most windows in a focus band. */
    public int maxBandWindows;
    /** 1: a survey with a valid peak leads to focus; 0: survey only (every window, every sweep). */
    public int focusEnabled;
    /** Focus sweeps between forced surveys (K). */
    public int resurveyEveryFocusSweeps;
    /** Loss of lock: the peak current fell below this fraction of the reference peak, Q8. */
    public int collapseFractionQ8;
    /** Loss of lock: the refined peak moved by more than this many windows. */
    public int jumpWindows;
    /** Loss of lock: the peak window lies within this many windows of an unclipped band edge. */
    public int edgeWindows;
    /**
     * Edge search: when the peak runs onto a band edge, the next focus band reaches this many windows
     * beyond that edge (0: fall back to survey at once). 24 default windows is x2.45 in E/q, enough for
     * a speed jump of +55 %; a shock's +35 % is x1.82 (physics.md, Rankine-Hugoniot row).
     */
    public int edgeSearchWindows;
    /** Gain ranging: switch to a less sensitive range above this fraction of full scale, Q16 (80 %). */
    public int gainUpFractionQ16;
    /** Gain ranging: switch to a more sensitive range below this fraction of full scale, Q16 (2 %). */
    public int gainDownFractionQ16;
    /** Alpha-to-proton E/q ratio at equal speed, Q16 (physics.md: 1.986300). */
    public int alphaRatioQ16;
    /** Relative tolerance on the alpha ratio, Q16 (6 %, about 1.5 default windows of 3.8 %). */
    public int alphaToleranceQ16;
    /** Noise of one quadrant, ADC counts rms, in whichever range it is read (the description's preamp.noiseCountsPerQuadrant). */
    public int noiseCountsPerQuadrant;
    /** A peak or a prominence is significant above this many noise sigmas. */
    public int significanceSigmas;
    /** A local maximum is a separate peak when its prominence exceeds this fraction of its height, Q8. */
    public int prominenceFractionQ8;
    /**
     * How focus bands are chosen and stepped: {@link #FOCUS_STYLE_BAND} (the default) or
     * {@link #FOCUS_STYLE_DESIGN}, either plus {@link #FOCUS_STYLE_INTERLEAVED}, any of these plus
     * {@link #FOCUS_STYLE_SUPPORT_DWELL} (0..7), a support-dwell style plus {@link #FOCUS_STYLE_PAIRED_SUPPORT} (12..15),
     * and any design style of these plus {@link #FOCUS_STYLE_ALPHA_CLEAR} (17, 19, 21, 23, 29, 31).
     */
    public int focusStyle;
    /**
     * Design style: the sweep-time budget of a focus sweep, microseconds; the dwell of each window is
     * the most whole modulation periods that fit it, never fewer than {@link #integrationPeriods}
     * (0: always {@link #integrationPeriods}). Ignored in band style. In support dwell, the sweep's
     * time, whose integration after the settles the windows share (0: {@link #integrationPeriods} times
     * the band's windows of integration).
     */
    public int focusBudgetMicros;
    /** Design style: windows added on each side of the design's half-width, for the peak's motion between sweeps. */
    public int robustnessMarginWindows;
    /**
     * Survey style: 0 surveys at {@link #integrationPeriods}; else a quick survey at this dwell,
     * 1..{@link #integrationPeriods} modulation periods per window.
     */
    public int surveyIntegrationPeriods;
    /**
     * Telemetry: the longest time, seconds, a partly filled frame of the engineering virtual channel
     * (housekeeping and events) waits before it is completed with idle data, 1..{@value #MAX_ENGINEERING_FLUSH_SECONDS};
     * 0 keeps the build's flush interval (FlightConfig#flushIntervalMicros). Longer fills the frames
     * fuller (less bandwidth) and delays a packet more (commands.md §4.1).
     */
    public int engineeringFlushSeconds;
    /**
     * Support dwell ({@link #FOCUS_STYLE_SUPPORT_DWELL}): the dwell of every focus window that is not a
     * support window, 1..{@link #integrationPeriods} modulation periods; ignored (and may be 0) in any
     * other style.
     */
    public int focusFloorPeriods;

    /**
     * The flight defaults of the tunables that are no instrument fact (values and reasons in the field
     * docs and the sweep package design note). The cadence ({@link #integrationPeriods},
     * {@link #fixedSettleMicros}, {@link #settleMicrosPerCodeQ8}) and {@link #noiseCountsPerQuadrant}
     * are left 0: they come from the instrument description (InstrumentDescription#defaultParameters),
     * so this set alone does not validate.
     */
    public static SweepParameters tunableDefaults() {
        SweepParameters p = new SweepParameters();
        p.minHalfWidthWindows = 4;
        p.halfWidthPerFwhmQ8 = 384;
        p.maxBandWindows = 64;
        p.focusEnabled = 1;
        p.resurveyEveryFocusSweeps = 16;
        p.collapseFractionQ8 = 64;
        p.jumpWindows = 6;
        p.edgeWindows = 2;
        p.edgeSearchWindows = 24;
        p.gainUpFractionQ16 = 52_429;
        p.gainDownFractionQ16 = 1_311;
        p.alphaRatioQ16 = ALPHA_RATIO_1_986300_Q16;
        p.alphaToleranceQ16 = 3_932;
        p.significanceSigmas = 5;
        p.prominenceFractionQ8 = 26;
        return p;
    }

    /** A new instance with the same values. */
    public SweepParameters copy() {
        SweepParameters p = new SweepParameters();
        p.copyFrom(this);
        return p;
    }

    /** Copies every field of {@code other} into this set (allocation-free). */
    public void copyFrom(SweepParameters other) {
        integrationPeriods = other.integrationPeriods;
        fixedSettleMicros = other.fixedSettleMicros;
        settleMicrosPerCodeQ8 = other.settleMicrosPerCodeQ8;
        minHalfWidthWindows = other.minHalfWidthWindows;
        halfWidthPerFwhmQ8 = other.halfWidthPerFwhmQ8;
        maxBandWindows = other.maxBandWindows;
        focusEnabled = other.focusEnabled;
        resurveyEveryFocusSweeps = other.resurveyEveryFocusSweeps;
        collapseFractionQ8 = other.collapseFractionQ8;
        jumpWindows = other.jumpWindows;
        edgeWindows = other.edgeWindows;
        edgeSearchWindows = other.edgeSearchWindows;
        gainUpFractionQ16 = other.gainUpFractionQ16;
        gainDownFractionQ16 = other.gainDownFractionQ16;
        alphaRatioQ16 = other.alphaRatioQ16;
        alphaToleranceQ16 = other.alphaToleranceQ16;
        noiseCountsPerQuadrant = other.noiseCountsPerQuadrant;
        significanceSigmas = other.significanceSigmas;
        prominenceFractionQ8 = other.prominenceFractionQ8;
        focusStyle = other.focusStyle;
        focusBudgetMicros = other.focusBudgetMicros;
        robustnessMarginWindows = other.robustnessMarginWindows;
        surveyIntegrationPeriods = other.surveyIntegrationPeriods;
        engineeringFlushSeconds = other.engineeringFlushSeconds;
        focusFloorPeriods = other.focusFloorPeriods;
    }

    /** True when focus bands and dwell are the design style's ({@link #FOCUS_STYLE_DESIGN}, interleaved or not). */
    public boolean designBand() {
        return (focusStyle & FOCUS_STYLE_DESIGN) != 0;
    }

    /** True when focus sweeps step in the interleaved order ({@link #FOCUS_STYLE_INTERLEAVED}). */
    public boolean interleavedFocus() {
        return (focusStyle & FOCUS_STYLE_INTERLEAVED) != 0;
    }

    /** True when focus sweeps dwell longer on three support windows ({@link #FOCUS_STYLE_SUPPORT_DWELL}). */
    public boolean supportDwell() {
        return (focusStyle & FOCUS_STYLE_SUPPORT_DWELL) != 0;
    }

    /** True when support-dwell sweeps pair each support window with a neighbour ({@link #FOCUS_STYLE_PAIRED_SUPPORT}). */
    public boolean pairedSupport() {
        return (focusStyle & FOCUS_STYLE_PAIRED_SUPPORT) != 0;
    }

    /** True when the design band leaves out alphas well clear of the protons ({@link #FOCUS_STYLE_ALPHA_CLEAR}). */
    public boolean alphaClear() {
        return (focusStyle & FOCUS_STYLE_ALPHA_CLEAR) != 0;
    }

    /** True when the floor dwell is unset (0): no table image version 4 needed. */
    public boolean defaultFloor() {
        return focusFloorPeriods == 0;
    }

    /** True when the focus and survey styles are today's (table image version 1 holds this set). */
    public boolean defaultStyles() {
        return focusStyle == FOCUS_STYLE_BAND && focusBudgetMicros == 0 && robustnessMarginWindows == 0
            && surveyIntegrationPeriods == 0;
    }

    /** True when the engineering flush is the build's (0): no table image version 3 needed. */
    public boolean defaultFlush() {
        return engineeringFlushSeconds == 0;
    }

    /**
     * Checks the set for an instrument whose gain ranges are {@code 2^rangeRatioShift} apart
     * (InstrumentDescription#rangeRatioShift): the gain hysteresis needs a step down to land below
     * the next range's up threshold.
     *
     * @return {@link TableStatus#OK}, or the reason code of the first group that is out of range
     */
    public int validate(int rangeRatioShift) {
        if (integrationPeriods < 1 || integrationPeriods > MAX_INTEGRATION_PERIODS) {
            return TableStatus.BAD_INTEGRATION;
        }
        if (fixedSettleMicros < 0 || fixedSettleMicros > MAX_FIXED_SETTLE_MICROS
            || settleMicrosPerCodeQ8 < 0 || settleMicrosPerCodeQ8 > MAX_SETTLE_MICROS_PER_CODE_Q8) {
            return TableStatus.BAD_SETTLE;
        }
        // a centred peak must not already sit on the edge, and the band must hold at least 2*min+1 windows
        if (minHalfWidthWindows < 1 || minHalfWidthWindows <= edgeWindows
            || halfWidthPerFwhmQ8 < 0 || halfWidthPerFwhmQ8 > 16 * 256
            || maxBandWindows < 2 * minHalfWidthWindows + 1 || maxBandWindows > WindowTable.CAPACITY) {
            return TableStatus.BAD_BAND;
        }
        if (resurveyEveryFocusSweeps < 1 || (focusEnabled != 0 && focusEnabled != 1)) {
            return TableStatus.BAD_RESURVEY;
        }
        if (collapseFractionQ8 < 0 || collapseFractionQ8 > 256 || jumpWindows < 1
            || edgeWindows < 0 || jumpWindows > WindowTable.CAPACITY) {
            return TableStatus.BAD_LOCK_LOSS;
        }
        if (edgeSearchWindows < 0 || edgeSearchWindows > WindowTable.CAPACITY) {
            return TableStatus.BAD_EDGE_SEARCH;
        }
        // hysteresis: a step down must land below the next range's up threshold
        if (gainUpFractionQ16 <= 0 || gainUpFractionQ16 >= 65_536 || gainDownFractionQ16 <= 0
            || ((long) gainDownFractionQ16 << rangeRatioShift) >= gainUpFractionQ16) {
            return TableStatus.BAD_GAIN_THRESHOLDS;
        }
        if (alphaRatioQ16 <= 65_536 || alphaRatioQ16 > 4 * 65_536
            || alphaToleranceQ16 <= 0 || alphaToleranceQ16 >= 65_536 / 4) {
            return TableStatus.BAD_ALPHA;
        }
        if (noiseCountsPerQuadrant < 0 || noiseCountsPerQuadrant > 4096 || significanceSigmas < 1
            || significanceSigmas > 100 || prominenceFractionQ8 < 0 || prominenceFractionQ8 > 256) {
            return TableStatus.BAD_NOISE;
        }
        if (focusStyle < FOCUS_STYLE_BAND
            || focusStyle > (FOCUS_STYLE_DESIGN | FOCUS_STYLE_INTERLEAVED | FOCUS_STYLE_SUPPORT_DWELL | FOCUS_STYLE_PAIRED_SUPPORT
                | FOCUS_STYLE_ALPHA_CLEAR)
            || pairedSupport() && !supportDwell()
            || alphaClear() && !designBand()
            || focusFloorPeriods < (supportDwell() ? 1 : 0) || focusFloorPeriods > integrationPeriods
            || focusBudgetMicros < 0 || focusBudgetMicros > MAX_FOCUS_BUDGET_MICROS
            || robustnessMarginWindows < 0 || robustnessMarginWindows > MAX_ROBUSTNESS_MARGIN_WINDOWS
            || surveyIntegrationPeriods < 0 || surveyIntegrationPeriods > integrationPeriods) {
            return TableStatus.BAD_STYLE;
        }
        if (engineeringFlushSeconds < 0 || engineeringFlushSeconds > MAX_ENGINEERING_FLUSH_SECONDS) {
            return TableStatus.BAD_FLUSH;
        }
        return TableStatus.OK;
    }
}
