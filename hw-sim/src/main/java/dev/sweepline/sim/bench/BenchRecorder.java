package dev.sweepline.sim.bench;

import dev.sweepline.fsw.link.SampleReply;
import dev.sweepline.fsw.link.StepCommand;
import dev.sweepline.fsw.sweep.ModeChangeReason;
import dev.sweepline.fsw.sweep.Spectrum;
import dev.sweepline.fsw.sweep.SweepListener;
import dev.sweepline.fsw.sweep.SweepMode;
import dev.sweepline.sim.cup.FaradayCup;
import dev.sweepline.sim.design.ProtonInformation;
import dev.sweepline.sim.preamp.Preamplifier;
import dev.sweepline.sim.hv.WindowVolts;
import dev.sweepline.sim.instrument.StepTruth;
import dev.sweepline.sim.link.InProcessLink;
import dev.sweepline.sim.plasma.IonPopulation;
import dev.sweepline.sim.plasma.IonSpecies;
import dev.sweepline.sim.plasma.PlasmaState;
import dev.sweepline.sim.scenario.Scenario;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.function.LongFunction;

/**
 * Watches the closed loop from outside the flight software: every executed step (with its truth)
 * and every sweep decision, with the scenario's true peaks placed beside each sweep.
 *
 * <p>Each completed sweep is counted into the run's figures ({@link SweepTally}, bounded), handed to the
 * sweep log with its truth change ({@link SweepLog}, e.g. {@code decisions.csv} written as the run goes)
 * and added to a bounded series for the decision chart ({@link DecisionSeries}); the records themselves
 * are kept in memory only when asked ({@link #keepSweeps}: the ground check needs them), so that a long
 * run's memory does not grow with its length.
 */
public final class BenchRecorder implements SweepListener, InProcessLink.StepObserver {
    private WindowVolts windows;
    private dev.sweepline.fsw.sweep.SweepScheduler scheduler;
    private dev.sweepline.sim.hv.HvCalibration calibration;
    private final FaradayCup cup;
    private final LongFunction<PlasmaState> truthAt;
    private final SweepListener next;
    private final List<SweepRecord> sweeps = new ArrayList<>();
    private boolean keepSweeps = true;
    private SweepLog log = SweepLog.NONE;
    private SweepTally tally;
    private final DecisionSeries series = new DecisionSeries(DecisionSeries.CAPACITY);
    private final TruePeak trueProtons;
    private final TruePeak trueAlphas;
    private final Map<String, Integer> modeChanges = new TreeMap<>();
    private final List<ModeChange> chartModeChanges = new ArrayList<>();
    private int previousReason = ModeChangeReason.NONE;
    private long steps;
    private long integrationMicros;
    private long saturatedSamples;
    private long unsettledSamples;
    private double chosenCentre = Double.NaN;
    private final ProtonInformation information;
    private final double[][] measuredInformation = new double[3][3];
    private final double[] gradient = new double[3];
    private double informationSeconds;
    private long informationSteps;

    /**
     * @param windows the table's windows as the HV supply makes them
     * @param cup     the simulated cup, to place the true peaks where the instrument would see them
     * @param preamp  the simulated preamplifier, for the noise of each step's information
     * @param truthAt the scenario's plasma at a simulated time (microseconds)
     * @param next    sees every scheduler callback after this recorder
     */
    public BenchRecorder(WindowVolts windows, FaradayCup cup, Preamplifier preamp, LongFunction<PlasmaState> truthAt,
            SweepListener next) {
        this.next = next;
        this.windows = windows;
        this.cup = cup;
        this.information = new ProtonInformation(cup.geometry(), preamp);
        this.truthAt = truthAt;
        this.tally = new SweepTally(windows.count(), List.of());
        this.trueProtons = new TruePeak(cup, IonSpecies.PROTON);
        this.trueAlphas = new TruePeak(cup, IonSpecies.ALPHA);
    }

    /**
     * What to do with each completed sweep from now on: count it for tables of up to {@code maxWindows}
     * windows and the scenario's {@code jumps}, hand it to {@code log}, and keep it in {@link #sweeps()}
     * only when {@code keep}.
     */
    public void recordSweeps(int maxWindows, List<Scenario.Jump> jumps, SweepLog log, boolean keep) {
        this.tally = new SweepTally(maxWindows, jumps);
        this.log = log;
        this.keepSweeps = keep;
    }

    @Override
    public void onExecuted(StepCommand step, SampleReply reply, StepTruth truth, PlasmaState plasma, long startMicros) {
        steps++;
        integrationMicros += truth.endMicros - truth.integrationStartMicros;
        if ((reply.status & SampleReply.STATUS_SATURATED) != 0) {
            saturatedSamples++;
        }
        if ((reply.status & SampleReply.STATUS_HV_UNSETTLED) != 0) {
            unsettledSamples++;
        }
        addInformation(step, reply, truth, plasma);
    }

    /** What this step told about the protons' (n, U, w), at the plasma of its mid-integration. */
    private void addInformation(StepCommand step, SampleReply reply, StepTruth truth, PlasmaState plasma) {
        if (!step.hvEnabled || (reply.status & SampleReply.STATUS_SATURATED) != 0) {
            return;
        }
        IonPopulation p = ProtonInformation.protons(plasma);
        if (p == null) {
            return;
        }
        double seconds = (truth.endMicros - truth.integrationStartMicros) / 1e6;
        // the instrument evaluated the same window at the same plasma: its terms serve the sensitivities
        information.gradient(plasma, p, truth.lowVolts, truth.highVolts, truth.firstPopulation, gradient);
        ProtonInformation.accumulate(measuredInformation, gradient,
                information.variance(truth.totalAmps, reply.gainRange, seconds), 1.0);
        informationSeconds += seconds;
        informationSteps++;
    }

    /** Steps behind {@link #measuredInformation()}. */
    public long informationSteps() {
        return informationSteps;
    }

    /** Fisher information of the protons' relative (n, U, w) from every unsaturated step so far. */
    public double[][] measuredInformation() {
        return measuredInformation;
    }

    /** Integration time behind {@link #measuredInformation()}, seconds. */
    public double informationSeconds() {
        return informationSeconds;
    }

    @Override
    public void onSweepComplete(Spectrum spectrum, long nowMicros) {
        record(spectrum);
        next.onSweepComplete(spectrum, nowMicros);
    }

    /**
     * Places the truth on the windows of the scheduler's active table from now on (the table restored
     * from non-volatile memory at start-up, and each table commanded later when the scheduler says it
     * took effect), so that every sweep is judged on its own windows.
     */
    public void follow(dev.sweepline.fsw.sweep.SweepScheduler activeTable, dev.sweepline.sim.hv.HvCalibration hv) {
        this.scheduler = activeTable;
        this.calibration = hv;
        this.windows = new WindowVolts(activeTable, hv);
    }

    @Override
    public void onConfigurationApplied(int applied, int generation, long nowMicros) {
        if (scheduler != null && (applied & SweepListener.APPLIED_TABLE) != 0) {
            windows = new WindowVolts(scheduler, calibration);
        }
        next.onConfigurationApplied(applied, generation, nowMicros);
    }

    private void record(Spectrum spectrum) {
        if (spectrum.count() == 0) {
            return;
        }
        int saturated = 0;
        for (int i = 0; i < spectrum.count(); i++) {
            if ((spectrum.status(i) & SampleReply.STATUS_SATURATED) != 0) {
                saturated++;
            }
        }
        long mid = spectrum.startMicros() + (spectrum.endMicros() - spectrum.startMicros()) / 2;
        PlasmaState truth = truthAt.apply(mid);
        SweepRecord r = new SweepRecord((int) spectrum.sweepNumber(), spectrum.mode(), spectrum.startMicros(),
                spectrum.endMicros(), spectrum.window(0), spectrum.window(spectrum.count() - 1),
                spectrum.peakValid() ? spectrum.peakWindowQ8() / 256.0 : Double.NaN, spectrum.mode() == SweepMode.FOCUS ? chosenCentre : Double.NaN,
                trueProtons.of(truth, windows), trueAlphas.of(truth, windows), saturated);
        tally.add(r);
        series.add(r);
        if (log != SweepLog.NONE) {
            log.add(r, TruthChange.of(r, truthAt, truth));
        }
        if (keepSweeps) {
            sweeps.add(r);
        }
    }

    @Override
    public void onBandChosen(int firstWindow, int lastWindow, int peakWindowQ8, long nowMicros) {
        chosenCentre = peakWindowQ8 / 256.0;
        next.onBandChosen(firstWindow, lastWindow, peakWindowQ8, nowMicros);
    }

    @Override
    public void onStep(StepCommand step, long nowMicros) {
        next.onStep(step, nowMicros);
    }

    @Override
    public void onSample(StepCommand step, SampleReply reply, long nowMicros) {
        next.onSample(step, reply, nowMicros);
    }

    @Override
    public void onModeChange(SweepMode from, SweepMode to, int reason, long nowMicros) {
        modeChanges.merge(ModeChangeReason.name(reason), 1, Integer::sum);
        // the periodic resurvey and the lock regained right after it are routine: the chart leaves them out
        boolean routine = reason == ModeChangeReason.RESURVEY
                || reason == ModeChangeReason.LOCK_ACQUIRED && previousReason == ModeChangeReason.RESURVEY;
        previousReason = reason;
        if (!routine && chartModeChanges.size() < MAX_CHART_MODE_CHANGES) {
            chartModeChanges.add(new ModeChange(nowMicros, from, to, reason));
        }
        next.onModeChange(from, to, reason, nowMicros);
    }

    /** The scenario's plasma at {@code micros} of simulated time (the truth). */
    public PlasmaState truthAt(long micros) {
        return truthAt.apply(micros);
    }

    /**
     * Sweeps recorded so far, in order; empty when the records are not kept
     * ({@link #recordSweeps}: the default keeps them).
     */
    public List<SweepRecord> sweeps() {
        return sweeps;
    }

    /** True when {@link #sweeps()} holds every sweep. */
    public boolean keepsSweeps() {
        return keepSweeps;
    }

    /** The run's sweep figures so far. */
    SweepTally tally() {
        return tally;
    }

    /** The bounded series of the decision chart. */
    public DecisionSeries chartSeries() {
        return series;
    }

    /** A mode change as the scheduler reported it. */
    public record ModeChange(long atMicros, SweepMode from, SweepMode to, int reason) {
    }

    /** Mode changes the chart marks at most (a run that loses its lock that often is marked at its start). */
    static final int MAX_CHART_MODE_CHANGES = 1000;

    /**
     * The mode changes the decision chart marks, in order: every one but the routine ones (the periodic
     * resurvey and the lock regained right after it, which the survey-sweep marks already show), the first
     * {@link #MAX_CHART_MODE_CHANGES}.
     */
    public List<ModeChange> chartModeChanges() {
        return chartModeChanges;
    }


    /** Mode changes counted by reason name. */
    public Map<String, Integer> modeChanges() {
        return modeChanges;
    }

    /** Steps executed by the instrument. */
    public long steps() {
        return steps;
    }

    /** Time spent integrating, microseconds. */
    public long integrationMicros() {
        return integrationMicros;
    }

    /** Samples flagged saturated. */
    public long saturatedSamples() {
        return saturatedSamples;
    }

    /** Samples flagged as taken before the HV had settled. */
    public long unsettledSamples() {
        return unsettledSamples;
    }
}
