package dev.sweepline.sim.bench;

import dev.sweepline.fsw.exec.FlightConfig;
import dev.sweepline.fsw.exec.FlightSoftware;
import dev.sweepline.fsw.telemetry.FrameSink;
import dev.sweepline.sim.cup.FaradayCup;
import dev.sweepline.sim.design.DOptimalDesign;
import dev.sweepline.sim.hv.WindowVolts;
import dev.sweepline.sim.instrument.SimulatedInstrument;
import dev.sweepline.sim.link.InProcessLink;
import dev.sweepline.sim.plasma.PlasmaState;
import dev.sweepline.sim.scenario.AlphaDriftDirection;
import dev.sweepline.sim.scenario.PlasmaStates;
import dev.sweepline.sim.scenario.ScenarioTimeline;
import dev.sweepline.fsw.sweep.SweepListener;
import dev.sweepline.sim.seed.SeedTree;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Consumer;
import java.util.function.LongFunction;

/**
 * The closed loop in one process: the flight software (executive, scheduler, telemetry) drives the simulated
 * instrument through the same {@link dev.sweepline.fsw.link.InstrumentLink} the serial link
 * implements, on simulated time, while a recorder keeps the truth beside every decision.
 *
 * <p>Time jumps from one reply to the next (there is nothing to simulate in between), so the run
 * goes as fast as the physics and the flight software compute.
 */
public final class ClosedLoopBench {
    /** Time step while the flight software has nothing in flight (e.g. in safe). */
    static final long IDLE_MICROS = 10_000;

    /** Told how far the run has got, about once per simulated second. */
    public interface Progress {
        /** {@code doneMicros} of {@code totalMicros} simulated. */
        void update(long doneMicros, long totalMicros);

        /** A progress sink that shows nothing. */
        Progress NONE = (done, total) -> { };
    }

    /**
     * A hook into a run (command scripts, fault injection): sees the flight configuration and the
     * instrument before the flight software is built, then is called before every executive cycle.
     */
    public interface CycleHook {
        /** Called once, before the flight software is built from {@code flight}. */
        default void configure(FlightConfig flight, SimulatedInstrument instrument) {
        }

        /** Called once, after the flight software is built and before its first cycle. */
        default void afterBuild(FlightSoftware fsw) {
        }

        /** Called before each {@code doWork} of the flight software at {@code nowMicros}. */
        default void beforeCycle(FlightSoftware fsw, long nowMicros) {
        }

        /** A hook that does nothing. */
        CycleHook NONE = new CycleHook() { };
    }

    /** What one run leaves behind: its figures and the recorder with the sweep-by-sweep truth. */
    public record Result(RunSummary summary, BenchRecorder recorder) {
    }

    private ClosedLoopBench() {
    }

    /**
     * Sampling period of the run's plasma for the yardstick, seconds: one second is far shorter than
     * the fluctuations' correlation times of the built-in scenarios (20-60 s), and on a run with a
     * shock it gives the same efficiency as a period eight times finer to 0.002 (ClosedLoopYardstickTest).
     * Each sample costs about 3 ms (the information of every window).
     */
    static final double YARDSTICK_PERIOD_SECONDS = 1.0;
    /** At most this many plasmas are sampled (long runs get a longer period). */
    static final int YARDSTICK_MAX_SAMPLES = 2048;

    /**
     * The run's D-efficiency: what its steps told about the protons against the D-optimal use of the
     * same integration time on the same windows over the same plasmas (the run sampled at the
     * midpoints of equal intervals of about {@code periodSeconds}).
     */
    static double informationEfficiency(BenchConfig config, BenchRecorder recorder, WindowVolts windows,
            LongFunction<PlasmaState> plasma, long endMicros, double periodSeconds) {
        if (recorder.informationSeconds() <= 0) {
            return Double.NaN;
        }
        // the mean integration per step as flown (a commanded or restored table may differ from the config)
        double stepSeconds = recorder.informationSeconds() / recorder.informationSteps();
        DOptimalDesign design = new DOptimalDesign(new FaradayCup(config.instrument().cup()), config.instrument().preamp(),
                windows);
        return DOptimalDesign.efficiency(recorder.measuredInformation(),
                design.optimalInformation(runPlasmas(plasma, endMicros, periodSeconds), recorder.informationSeconds(),
                        stepSeconds));
    }

    /** The plasma at the midpoints of equal intervals of about {@code periodSeconds} over [0, endMicros]. */
    static List<PlasmaState> runPlasmas(LongFunction<PlasmaState> plasma, long endMicros, double periodSeconds) {
        int samples = (int) Math.max(1, Math.min(YARDSTICK_MAX_SAMPLES, Math.round(endMicros / 1e6 / periodSeconds)));
        List<PlasmaState> out = new ArrayList<>(samples);
        for (int k = 0; k < samples; k++) {
            out.add(plasma.apply(Math.round((k + 0.5) * endMicros / samples)));
        }
        return out;
    }

    /**
     * What a caller may attach to a run: where the frames go, a hook into the cycles (command
     * scripts, fault injection, a commanded mode), one more observer of the scheduler's callbacks
     * (after the bench's own recorder), where each completed sweep goes as it completes, and whether the
     * recorder keeps every sweep's record in memory (the ground check needs them; a long run without the
     * ground need not).
     */
    public record Hooks(FrameSink frames, CycleHook cycle, SweepListener observer, SweepLog sweeps,
            boolean keepSweeps) {
        /** Frames discarded (still built and counted), the sweeps kept, nothing else. */
        public static final Hooks NONE = new Hooks((f, off, len) -> { }, CycleHook.NONE, SweepListener.NONE,
                SweepLog.NONE, true);

        /** These hooks with another frame sink. */
        public Hooks withFrames(FrameSink sink) {
            return new Hooks(sink, cycle, observer, sweeps, keepSweeps);
        }

        /** These hooks with another cycle hook. */
        public Hooks withCycle(CycleHook hook) {
            return new Hooks(frames, hook, observer, sweeps, keepSweeps);
        }

        /** These hooks handing each sweep to {@code log} as it completes; {@code keep}: also keep the records. */
        public Hooks withSweepLog(SweepLog log, boolean keep) {
            return new Hooks(frames, cycle, observer, log, keep);
        }

        /** These hooks with a set-up step run once on the built flight software (e.g. a commanded mode). */
        public Hooks withSetup(Consumer<FlightSoftware> step) {
            return withCycle(new CycleHook() {
                @Override
                public void afterBuild(FlightSoftware fsw) {
                    step.accept(fsw);
                }
            });
        }

        /** These hooks with another extra observer. */
        public Hooks withObserver(SweepListener listener) {
            return new Hooks(frames, cycle, listener, sweeps, keepSweeps);
        }
    }

    /** Runs {@code config} to its end, discarding the telemetry frames (they are still built and counted). */
    public static Result run(BenchConfig config, Progress progress) {
        return run(config, progress, Hooks.NONE);
    }

    /** Runs {@code config} to its end, handing every telemetry frame (ASM first) to {@code frames}. */
    public static Result run(BenchConfig config, Progress progress, FrameSink frames) {
        return run(config, progress, Hooks.NONE.withFrames(frames));
    }

    /** As {@link #run(BenchConfig, Progress, FrameSink)}, with {@code hook} called before every cycle. */
    public static Result run(BenchConfig config, Progress progress, FrameSink frames, CycleHook hook) {
        return run(config, progress, Hooks.NONE.withFrames(frames).withCycle(hook));
    }

    /**
     * The flight configuration of a bench run: {@code config}'s, with the bench's two settings. The
     * simulator makes no high voltage, so the core HV interlock starts enabled, by explicit
     * configuration (the flight default is OFF, commands.md §2.3); the recovery challenge is drawn from
     * the run's seed tree so that runs stay reproducible (the PC host draws it from SecureRandom,
     * commands.md §1.4). A new copy each call.
     */
    public static FlightConfig flightConfig(BenchConfig config) {
        FlightConfig flight = config.flight();
        flight.hvEnabledAtStart = true;
        flight.bootChallenge = SeedTree.of(config.seed()).bootChallenge();
        return flight;
    }

    /** Runs {@code config} to its end with {@code hooks} attached. */
    public static Result run(BenchConfig config, Progress progress, Hooks hooks) {
        ScenarioTimeline timeline = config.scenario().timeline(config.seed());
        FlightConfig flight = flightConfig(config);
        WindowVolts windows = new WindowVolts(flight.table, config.instrument().calibration());
        AlphaDriftDirection drift = config.scenario().alphaDriftDirection();
        PlasmaStates.Series states = new PlasmaStates.Series(timeline, drift);
        LongFunction<PlasmaState> plasma = micros -> states.at(micros / 1e6);
        BenchRecorder recorder = new BenchRecorder(windows, new FaradayCup(config.instrument().cup()),
                config.instrument().preamp(), plasma, hooks.observer());
        SimulatedInstrument instrument = new SimulatedInstrument(config.instrument(),
                SeedTree.of(config.seed()).instrument());
        // the steps' plasma refilled in place (the instrument and the recorder read it within the step)
        InProcessLink link = new InProcessLink(instrument, micros -> states.reused(micros / 1e6), recorder);
        hooks.cycle().configure(flight, instrument);
        FlightSoftware fsw = new FlightSoftware(flight, link, hooks.frames(), recorder);
        recorder.follow(fsw.scheduler(), config.instrument().calibration());
        recorder.recordSweeps(Math.max(windows.count(), config.instrument().flight().windowCount()),
                config.scenario().jumps(), hooks.sweeps(), hooks.keepSweeps());
        hooks.cycle().afterBuild(fsw);

        long wallStart = System.nanoTime();
        long end = config.durationMicros();
        long now = 0;
        long nextProgress = 1_000_000;
        int stalls = 0;
        while (now < end) {
            hooks.cycle().beforeCycle(fsw, now);
            int work = fsw.doWork(now);
            long next = link.nextReplyMicros();
            long before = now;
            if (next != Long.MAX_VALUE) {
                now = Math.max(now, next);
            } else if (work == 0) {
                now += IDLE_MICROS;
            }
            // the executive must make progress; guard against a loop that neither works nor moves time
            stalls = (now == before && work == 0) ? stalls + 1 : 0;
            if (stalls > 3) {
                now++;
            }
            if (now >= nextProgress) {
                progress.update(Math.min(now, end), end);
                nextProgress += 1_000_000;
            }
        }
        fsw.close(end);
        progress.update(end, end);
        double wallSeconds = (System.nanoTime() - wallStart) / 1e9;
        String hash = String.format("%016x", fsw.scheduler().decisionHash());
        double efficiency = informationEfficiency(config, recorder, windows, plasma, end, YARDSTICK_PERIOD_SECONDS);
        return new Result(RunSummary.of(config, recorder, TelemetryFigures.of(fsw, config), efficiency, wallSeconds,
                hash), recorder);
    }
}
