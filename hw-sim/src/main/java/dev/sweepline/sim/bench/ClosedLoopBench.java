package dev.sweepline.sim.bench;

import dev.sweepline.fsw.exec.FlightConfig;
import dev.sweepline.fsw.exec.FlightSoftware;
import dev.sweepline.fsw.telemetry.FrameSink;
import dev.sweepline.sim.cup.FaradayCup;
import dev.sweepline.sim.instrument.SimulatedInstrument;
import dev.sweepline.sim.link.InProcessLink;
import dev.sweepline.sim.plasma.PlasmaState;
import dev.sweepline.sim.scenario.AlphaDriftDirection;
import dev.sweepline.sim.scenario.ScenarioTimeline;
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

    /** Seed of the instrument's noise, derived from the run seed so the two streams are independent. */
    static long instrumentSeed(long runSeed) {
        return runSeed * 0x9E3779B97F4A7C15L + 0x632BE59BD9B4E019L;
    }

    /** Runs {@code config} to its end, discarding the telemetry frames (they are still built and counted). */
    public static Result run(BenchConfig config, Progress progress) {
        return run(config, progress, (f, off, len) -> { });
    }

    /** Runs {@code config} to its end, handing every telemetry frame (ASM first) to {@code frames}. */
    public static Result run(BenchConfig config, Progress progress, FrameSink frames) {
        return run(config, progress, frames, CycleHook.NONE);
    }

    /** As {@link #run(BenchConfig, Progress, FrameSink)}, with {@code hook} called before every cycle. */
    public static Result run(BenchConfig config, Progress progress, FrameSink frames, CycleHook hook) {
        ScenarioTimeline timeline = config.scenario().timeline(config.seed());
        WindowVolts windows = new WindowVolts(config.table(), config.instrument().calibration());
        AlphaDriftDirection drift = config.scenario().alphaDriftDirection();
        LongFunction<PlasmaState> plasma = micros -> PlasmaStates.of(timeline.at(micros / 1e6), drift);
        BenchRecorder recorder = new BenchRecorder(windows, new FaradayCup(config.instrument().cup()), plasma);
        SimulatedInstrument instrument = new SimulatedInstrument(config.instrument(), instrumentSeed(config.seed()));
        InProcessLink link = new InProcessLink(instrument, plasma::apply, recorder);
        FlightConfig flight = new FlightConfig();
        flight.table = config.table();
        flight.parameters = config.parameters();
        flight.frameLength = config.frameLength();
        hook.configure(flight, instrument);
        FlightSoftware fsw = new FlightSoftware(flight, link, frames, recorder);

        long wallStart = System.nanoTime();
        long end = config.durationMicros();
        long now = 0;
        long nextProgress = 1_000_000;
        int stalls = 0;
        while (now < end) {
            hook.beforeCycle(fsw, now);
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
        return new Result(RunSummary.of(config, recorder, TelemetryFigures.of(fsw, config), wallSeconds, hash),
                recorder);
    }
}
