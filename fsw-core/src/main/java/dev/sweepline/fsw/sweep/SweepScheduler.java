package dev.sweepline.fsw.sweep;

import dev.sweepline.fsw.instrument.InstrumentDescription;
import dev.sweepline.fsw.link.SampleReply;
import dev.sweepline.fsw.link.StepCommand;
import dev.sweepline.fsw.table.SettleTime;
import dev.sweepline.fsw.table.SweepParameters;
import dev.sweepline.fsw.table.TableStatus;
import dev.sweepline.fsw.table.WindowTable;

/**
 * The adaptive sweep scheduler: chooses every step (window, levels, gain range, settle time),
 * ingests every reply, analyses each completed sweep and switches between survey, focus and safe
 * (see the package design note for the requirements and how each is verified).
 *
 * <p>Driven from outside: {@link #nextStep} and {@link #ingest} are given the time; nothing reads
 * a clock. Everything is allocated in the constructor; the step path (nextStep, ingest and the sweep
 * analysis) allocates nothing and uses integer arithmetic only. Threading: one thread, the executive's.
 */
public final class SweepScheduler {
    private static final int NO_WINDOW = -1;
    private static final int NONE = ModeChangeReason.NONE;

    private SweepListener listener;

    private final ActiveConfiguration config;
    private final int[] dacLow;
    private final int[] dacHigh;
    private final SweepParameters params;

    private final InstrumentDescription instrument;
    private final GainPredictor gain;
    private final PeakFinder peakFinder;
    private final FocusBand band;
    private final FocusDesign design;
    private final DecisionHash hash = new DecisionHash();
    private final StepCommand lastStep = new StepCommand();

    private Spectrum building;
    private Spectrum completed;

    private SweepMode mode = SweepMode.SURVEY;
    private boolean startPending = true;
    private boolean sweepActive;
    private int sweepFirst;
    private int sweepSteps;
    private int sweepPeriods;
    /** Support-dwell focus sweep: its support windows (ascending), how many (0: none) and their common dwell. */
    private final int[] supportWindow = new int[FocusDesign.MAX_SUPPORT_WINDOWS];
    private int supportCount;
    private int supportPeriods;
    private boolean sweepAscending;
    private boolean sweepInterleaved;
    private int stepsIssued;
    private int awaitingWindow = NO_WINDOW;
    private int awaitingRange;
    private long sweepNumber;
    private int focusSweepsSinceSurvey;
    /** The levels the next sweep's direction is chosen from (R12): the last step's, 0 after SAFE. */
    private int hvLowCode;
    private int hvHighCode;
    /**
     * Where the rails may stand when the next step starts (R13), per rail the lowest and highest DAC code: a
     * rail moves continuously towards its last target and is switched to 0 V with the HV, so it lies between
     * the levels it may have been sent to since it was last known and 0 once the HV may have gone off.
     */
    private int railLowMin;
    private int railLowMax;
    private int railHighMin;
    private int railHighMax;
    /** The same before the last step: where the rails stay if that step never reached the electronics. */
    private int priorLowMin;
    private int priorLowMax;
    private int priorHighMin;
    private int priorHighMax;
    private int priorHvLowCode;
    private int priorHvHighCode;
    /** True when a mode change abandoned the last step before its reply (it may or may not have flown). */
    private boolean abandonedInFlight;
    private long ignoredReplies;
    private boolean hvPermitted = true;
    /** Configurations applied since start (the start-up one is 0). */
    private int generation;

    /**
     * Builds a scheduler for {@code instrument} that starts in SURVEY (reported as a START mode change
     * at the first step); every buffer is sized from the description and the table capacity here.
     *
     * @throws IllegalArgumentException if {@code params} does not validate, or {@code table} lies outside the
     *         instrument's DAC or voltage limit (programmer misuse)
     */
    public SweepScheduler(InstrumentDescription instrument, WindowTable table, SweepParameters params,
                          SweepListener listener) {
        int status = params.validate(instrument.rangeRatioShift());
        if (status != TableStatus.OK) {
            throw new IllegalArgumentException("sweep parameters refused: " + TableStatus.name(status));
        }
        this.instrument = instrument;
        this.listener = listener == null ? SweepListener.NONE : listener;
        this.config = new ActiveConfiguration(table, params, instrument);
        this.dacLow = config.dacLow;
        this.dacHigh = config.dacHigh;
        this.params = config.params;
        this.gain = new GainPredictor(instrument);
        this.building = new Spectrum(instrument);
        this.completed = new Spectrum(instrument);
        this.peakFinder = new PeakFinder(config.centreCode, this.params, instrument.rangeRatioShift());
        this.design = new FocusDesign(instrument);
        this.band = new FocusBand(config.centreCode, this.params);
        gain.reset(config.windowCount());
        gain.configure(this.params);
    }

    /**
     * Sets the listener of every callback (at start-up, before the first step, by whoever assembles the
     * flight software around this scheduler); null for none.
     */
    public void listen(SweepListener l) {
        listener = l == null ? SweepListener.NONE : l;
    }

    // ---------------------------------------------------------------- step path

    /**
     * Chooses the next step and writes it into {@code out} (every field but {@code sequence}, which
     * the executive assigns). A step whose reply never came is recorded as missing.
     *
     * @return false in SAFE: there is nothing to step
     */
    public boolean nextStep(StepCommand out, long nowMicros) {
        if (startPending) {
            startPending = false;
            recordModeChange(SweepMode.SAFE, SweepMode.SURVEY, ModeChangeReason.START, nowMicros);
        }
        if (mode == SweepMode.SAFE) {
            return false;
        }
        if (sweepActive && stepsIssued == sweepSteps) {
            awaitingWindow = NO_WINDOW; // the last reply never came; its entry stays missing
            completeSweep(nowMicros);
        }
        if (!sweepActive) {
            beginSweep(nowMicros);
        }
        int offset = sweepInterleaved ? interleavedOffset(stepsIssued, sweepSteps) : stepsIssued;
        int window = sweepAscending ? sweepFirst + offset : sweepFirst + sweepSteps - 1 - offset;
        int range = gain.choose(window);
        int low = dacLow[window];
        int high = dacHigh[window];
        long settle = settleMicros(low, high);
        out.window = window;
        out.dacLow = low;
        out.dacHigh = high;
        out.gainRange = range;
        out.settleMicros = (int) Math.min(Integer.MAX_VALUE, settle);
        out.integrationPeriods = periodsOf(window);
        out.hvEnabled = hvPermitted; // the host's HV permission (arm-then-fire on a real bench)
        lastStep.copyFrom(out);
        priorLowMin = railLowMin;
        priorLowMax = railLowMax;
        priorHighMin = railHighMin;
        priorHighMax = railHighMax;
        priorHvLowCode = hvLowCode;
        priorHvHighCode = hvHighCode;
        abandonedInFlight = false;
        // a step with the HV off leaves both rails at 0 V (hardware ICD §3.1 flags bit 0)
        railLowMin = railLowMax = hvPermitted ? low : 0;
        railHighMin = railHighMax = hvPermitted ? high : 0;
        hvLowCode = low;
        hvHighCode = high;
        stepsIssued++;
        awaitingWindow = window;
        awaitingRange = range;
        hash.addStep(out);
        listener.onStep(out, nowMicros);
        return true;
    }

    /**
     * Ingests the reply to the last step. A reply when no step awaits one (after a mode change, or
     * a duplicate) is ignored and counted.
     */
    public void ingest(SampleReply reply, long nowMicros) {
        if (awaitingWindow == NO_WINDOW) {
            ignoredReplies++;
            return;
        }
        int window = awaitingWindow;
        awaitingWindow = NO_WINDOW;
        int range = reply.gainRange;
        int extra = 0;
        if (range < 0 || range >= instrument.gainRanges()) {
            range = awaitingRange;
            extra = Spectrum.STATUS_BAD_RANGE;
        }
        int i = window - sweepFirst;
        building.store(i, reply, range, extra);
        boolean saturated = (reply.status & SampleReply.STATUS_SATURATED) != 0 || building.anyAtTop(i);
        gain.record(window, building.maxQuadrantUnits(i), saturated, range);
        listener.onSample(lastStep, reply, nowMicros);
        if (stepsIssued == sweepSteps) {
            completeSweep(nowMicros);
        }
    }

    private void beginSweep(long nowMicros) {
        applyPending(nowMicros);
        boolean survey = switch (mode) {
            case SURVEY -> true;
            case FOCUS -> false;
            case SAFE -> throw new IllegalStateException("no sweep in mode " + mode);
        };
        int first = survey ? 0 : band.first();
        int last = survey ? config.windowCount() - 1 : band.last();
        // start from the end nearer the present HV level: consecutive surveys alternate direction
        int toFirst = Math.max(Math.abs(dacLow[first] - hvLowCode), Math.abs(dacHigh[first] - hvHighCode));
        int toLast = Math.max(Math.abs(dacLow[last] - hvLowCode), Math.abs(dacHigh[last] - hvHighCode));
        sweepAscending = toFirst <= toLast;
        int start = sweepAscending ? first : last;
        sweepFirst = first;
        sweepSteps = last - first + 1;
        sweepPeriods = survey ? FocusDesign.surveyPeriods(params)
                : params.designBand() ? design.focusPeriods(params, dacLow, dacHigh,
                        first, last, settleMicros(dacLow[start], dacHigh[start]))
                : params.integrationPeriods;
        sweepInterleaved = !survey && params.interleavedFocus();
        supportCount = 0;
        if (!survey && params.supportDwell() && !band.searching()) {
            chooseSupport(first, last, settleMicros(dacLow[start], dacHigh[start]));
        }
        stepsIssued = 0;
        awaitingWindow = NO_WINDOW;
        building.begin(sweepNumber + 1, mode, first, sweepSteps, sweepAscending, nowMicros);
        building.integrationPeriods(sweepPeriods);
        building.interleaved(sweepInterleaved);
        for (int k = 0; k < supportCount; k++) {
            building.support(k, supportWindow[k] - first, supportPeriods);
        }
        sweepActive = true;
    }

    /**
     * Settle before integrating at {@code (low, high)} (R13): {@link SettleTime} for the largest rail change
     * from anywhere the rails may stand. The distance to a point of an interval is largest at one of its
     * ends, so the two corners (both rails at their lowest, both at their highest) cover every case.
     */
    private long settleMicros(int low, int high) {
        return Math.max(SettleTime.micros(params, railLowMin, railHighMin, low, high),
                SettleTime.micros(params, railLowMax, railHighMax, low, high));
    }

    /**
     * Support dwell (R23): the floor for every window of the band {@code first..last}, and the support
     * windows of the band's reference peak sharing the rest of the sweep's integration; none when the
     * share would not exceed the floor.
     */
    private void chooseSupport(int first, int last, long firstSettleMicros) {
        sweepPeriods = params.focusFloorPeriods;
        int n = design.supportWindows(band.referencePeakQ8(), band.referenceLowHalfQ8(), band.referenceHighHalfQ8(),
                first, last, gain.lastRanges(), supportWindow);
        if (params.pairedSupport()) {
            n = design.pairedSupport(supportWindow, n, band.referencePeakQ8(), first, last);
        }
        supportPeriods = design.supportPeriods(params, dacLow, dacHigh, first, last, firstSettleMicros, n);
        supportCount = supportPeriods > sweepPeriods ? n : 0;
    }

    /** The dwell of {@code window} in the present sweep: a support window's, else the sweep's. */
    private int periodsOf(int window) {
        for (int k = 0; k < supportCount; k++) {
            if (supportWindow[k] == window) {
                return supportPeriods;
            }
        }
        return sweepPeriods;
    }

    /**
     * The offset from the sweep's starting end of step {@code k} of {@code n} in an interleaved sweep: the
     * even offsets outward (0, 2, 4, ...), then the odd ones back (..., 3, 1), so that every stretch of
     * the profile holds steps from both halves of the sweep's time.
     */
    static int interleavedOffset(int k, int n) {
        int evens = (n + 1) / 2;
        if (k < evens) {
            return 2 * k;
        }
        int lastOdd = (n - 1) % 2 == 1 ? n - 1 : n - 2;
        return lastOdd - 2 * (k - evens);
    }

    private void completeSweep(long nowMicros) {
        sweepActive = false;
        building.end(nowMicros);
        peakFinder.analyse(building);
        Spectrum done = building;
        building = completed;
        completed = done;
        sweepNumber++;
        listener.onSweepComplete(done, nowMicros);
        boolean surveyed = switch (mode) {
            case SURVEY -> true;
            case FOCUS -> false;
            case SAFE -> throw new IllegalStateException("sweep completed in mode " + mode);
        };
        if (surveyed) {
            afterSurvey(done, nowMicros);
        } else {
            afterFocus(done, nowMicros);
        }
    }

    private void afterSurvey(Spectrum done, long nowMicros) {
        if (done.peakValid() && params.focusEnabled != 0) {
            chooseBand(done, nowMicros);
            focusSweepsSinceSurvey = 0;
            changeMode(SweepMode.FOCUS, ModeChangeReason.LOCK_ACQUIRED, nowMicros);
        }
    }

    private void afterFocus(Spectrum done, long nowMicros) {
        focusSweepsSinceSurvey++;
        int lost = band.lossOfLock(done, config.windowCount());
        if (lost == ModeChangeReason.PEAK_ON_EDGE && !band.searching() && params.edgeSearchWindows > 0) {
            band.searchBeyondEdge(done, config.windowCount());
            hash.addBand(band.first(), band.last());
            listener.onBandChosen(band.first(), band.last(), done.peakWindowQ8(), nowMicros);
        } else if (lost == ModeChangeReason.PEAK_JUMP && params.designBand() && !band.jumpedToAlphaRatio(done, config.windowCount())) {
            // design style: a peak that jumped within the band, not by the alpha ratio, is followed at once
            chooseBand(done, nowMicros);
        } else if (lost != NONE) {
            changeMode(SweepMode.SURVEY, lost, nowMicros);
        } else if (focusSweepsSinceSurvey >= params.resurveyEveryFocusSweeps) {
            changeMode(SweepMode.SURVEY, ModeChangeReason.RESURVEY, nowMicros);
        } else {
            chooseBand(done, nowMicros);
        }
    }

    private void chooseBand(Spectrum s, long nowMicros) {
        band.choose(s, config.windowCount());
        hash.addBand(band.first(), band.last());
        listener.onBandChosen(band.first(), band.last(), s.peakWindowQ8(), nowMicros);
    }

    // ---------------------------------------------------------------- commands

    /**
     * Whether steps may ask for high voltage at all: the host's arm-then-fire permission on real
     * electronics (true in the simulator). Without it every step asks for the HV off, so the HV
     * monitors expect none.
     */
    public void permitHv(boolean permitted) {
        hvPermitted = permitted;
    }

    /** True when steps may ask for high voltage. */
    public boolean hvPermitted() {
        return hvPermitted;
    }

    /** Commands a mode (ground command): same as {@link #requestMode(SweepMode, int, long)} with COMMANDED. */
    public void requestMode(SweepMode requested, long nowMicros) {
        requestMode(requested, ModeChangeReason.COMMANDED, nowMicros);
    }

    /**
     * Changes mode now, abandoning the sweep in progress. FOCUS without a valid band (or with a new
     * table waiting) gives SURVEY with {@link ModeChangeReason#NO_BAND}; while surveying that is no
     * change, and the survey in progress goes on. SAFE turns the HV off.
     */
    public void requestMode(SweepMode requested, int reason, long nowMicros) {
        if (requested == mode) {
            return;
        }
        SweepMode to = switch (requested) {
            case SAFE -> SweepMode.SAFE;
            case SURVEY -> SweepMode.SURVEY;
            case FOCUS -> band.valid() && !config.tablePending() ? SweepMode.FOCUS : SweepMode.SURVEY;
        };
        int why = to == requested ? reason : ModeChangeReason.NO_BAND;
        if (to == mode) {
            return; // FOCUS without a band while surveying: nothing changes, the survey in progress goes on
        }
        sweepActive = false;
        if (awaitingWindow != NO_WINDOW) {
            // the step in flight may have reached the electronics or not: the rails stand at its levels or
            // where they were before it
            awaitingWindow = NO_WINDOW;
            abandonedInFlight = true;
            railLowMin = Math.min(railLowMin, priorLowMin);
            railLowMax = Math.max(railLowMax, priorLowMax);
            railHighMin = Math.min(railHighMin, priorHighMin);
            railHighMax = Math.max(railHighMax, priorHighMax);
        }
        if (to == SweepMode.SAFE) {
            // SAFE sends nothing: the rails hold their levels until the electronics' link watchdog (hardware
            // ICD §4.1, 2 s) switches the HV off, or longer on a bench without one; so anywhere down to 0
            hvLowCode = 0;
            hvHighCode = 0;
            railLowMin = 0;
            railHighMin = 0;
            priorLowMin = 0;
            priorHighMin = 0;
            priorHvLowCode = 0;
            priorHvHighCode = 0;
        } else if (to == SweepMode.FOCUS) {
            focusSweepsSinceSurvey = 0;
        }
        changeMode(to, why, nowMicros);
    }

    /**
     * The executive's word that the last step was never handed to the link (every send refused) before a
     * mode change abandoned it: the rails stand where they stood before it, not at its levels. Nothing
     * happens unless a mode change abandoned that step in flight.
     */
    public void stepNotSent() {
        if (!abandonedInFlight) {
            return;
        }
        abandonedInFlight = false;
        railLowMin = priorLowMin;
        railLowMax = priorLowMax;
        railHighMin = priorHighMin;
        railHighMax = priorHighMax;
        hvLowCode = priorHvLowCode;
        hvHighCode = priorHvHighCode;
    }

    /**
     * Loads a window table, applied at the next sweep boundary (a focus band then becomes invalid and
     * the scheduler surveys); its codes are checked against the DAC and the instrument's voltage limit.
     *
     * @return a {@link TableStatus} code ({@link TableStatus#ABOVE_VOLTAGE_LIMIT} for a level above the
     *         limit); on refusal the old table stays
     */
    public int loadTable(WindowTable table) {
        return config.loadTable(table);
    }

    /**
     * Loads a window table from raw arrays (a telecommand), allocation-free: validated (shape, DAC, voltage
     * limit), then copied
     * and applied at the next sweep boundary.
     *
     * @return a {@link TableStatus} code; on refusal the old table (and any table already waiting) stays
     */
    public int loadTable(int[] lows, int[] highs, int count) {
        return config.loadTable(lows, highs, count);
    }

    /**
     * Loads parameters (copied), applied at the next sweep boundary.
     *
     * @return a {@link TableStatus} code; on refusal the old parameters stay
     */
    public int loadParameters(SweepParameters p) {
        return config.loadParameters(p);
    }

    private void applyPending(long nowMicros) {
        int changed = config.applyPending();
        if (changed != 0) {
            generation++;
            listener.onConfigurationApplied(changed, generation, nowMicros);
        }
        if ((changed & ActiveConfiguration.PARAMETERS_CHANGED) != 0) {
            gain.configure(params);
        }
        if ((changed & ActiveConfiguration.TABLE_CHANGED) != 0) {
            gain.reset(config.windowCount());
            band.invalidate();
            if (mode == SweepMode.FOCUS) {
                changeMode(SweepMode.SURVEY, ModeChangeReason.TABLE_LOADED, nowMicros);
            }
        }
    }

    private void changeMode(SweepMode to, int reason, long nowMicros) {
        SweepMode from = mode;
        mode = to;
        recordModeChange(from, to, reason, nowMicros);
    }

    private void recordModeChange(SweepMode from, SweepMode to, int reason, long nowMicros) {
        hash.add(-1 - from.ordinal()); // negative tags keep mode changes apart from step fields
        hash.add(to.ordinal());
        hash.add(reason);
        listener.onModeChange(from, to, reason, nowMicros);
    }

    // ---------------------------------------------------------------- state

    /** Present mode. */
    public SweepMode mode() {
        return mode;
    }

    /** Running FNV-1a hash over every step's fields, every band and every mode change. */
    public long decisionHash() {
        return hash.value();
    }

    /** The last completed sweep (a preallocated buffer, refilled at every sweep end). */
    public Spectrum lastSpectrum() {
        return completed;
    }

    /** First window of the focus band (meaningful once a band was chosen). */
    public int bandFirst() {
        return band.first();
    }

    /** Last window of the focus band. */
    public int bandLast() {
        return band.last();
    }

    /** True when a focus band has been chosen since the last table change. */
    public boolean bandValid() {
        return band.valid();
    }

    /** Windows in the active table. */
    public int windowCount() {
        return config.windowCount();
    }

    /** Active low code of window {@code w} (the table in use, not one waiting). */
    public int dacLow(int w) {
        return dacLow[w];
    }

    /** Active high code of window {@code w}. */
    public int dacHigh(int w) {
        return dacHigh[w];
    }

    /** Completed sweeps. */
    public long sweepCount() {
        return sweepNumber;
    }

    /** Focus sweeps since the last survey. */
    public int focusSweepsSinceSurvey() {
        return focusSweepsSinceSurvey;
    }

    /** Replies ingested when no step awaited one. */
    public long ignoredReplies() {
        return ignoredReplies;
    }

    /** The instrument this scheduler sweeps. */
    public InstrumentDescription instrument() {
        return instrument;
    }

    /** The active value of a parameter set (a copy into {@code into}, allocation-free). */
    public void activeParameters(SweepParameters into) {
        into.copyFrom(params);
    }

    /**
     * The parameters in force from the next sweep boundary (a copy into {@code into}, allocation-free): a
     * loaded set waiting for it (a committed table's), else the active one. A change to the parameters
     * starts from these, so that it does not undo a load that has not taken effect yet.
     */
    public void nextParameters(SweepParameters into) {
        config.nextParameters(into);
    }

    /** True when the last step of a sweep was issued: its reply completes the sweep (benchmarks, tests). */
    boolean lastStepOfSweepIssued() {
        return sweepActive && stepsIssued == sweepSteps;
    }

    /** True when a step has been issued and its reply not yet ingested. */
    public boolean awaitingReply() {
        return awaitingWindow != NO_WINDOW;
    }
}
