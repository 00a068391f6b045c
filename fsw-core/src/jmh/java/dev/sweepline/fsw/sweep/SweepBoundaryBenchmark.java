package dev.sweepline.fsw.sweep;

import dev.sweepline.fsw.DemoCup;
import dev.sweepline.fsw.link.SampleReply;
import dev.sweepline.fsw.link.StepCommand;
import dev.sweepline.fsw.table.WindowTable;
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.TearDown;

/**
 * The sweep-boundary step alone: the reply that completes a sweep (peak analysis, loss-of-lock checks,
 * the band choice, in the design style its table lookup) and the first step of the next sweep (the
 * dwell from the budget), on the canned 1 AU replies of {@link SchedulerStepBenchmark}. The steps in
 * between run in the per-invocation set-up, outside the measurement. Sample mode, for the tail.
 * Target (sweep design note R21): every boundary step within 50 us, 0 B/op.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.SampleTime)
@OutputTimeUnit(TimeUnit.NANOSECONDS)
public class SweepBoundaryBenchmark {
    private SweepScheduler scheduler;
    private CannedReplies canned;
    private final StepCommand step = new StepCommand();
    private final SampleReply reply = new SampleReply();
    private long nowMicros;
    private final SchedulerStepBenchmark.SweepCounter counter = new SchedulerStepBenchmark.SweepCounter();
    private long boundaries;

    /** Focus style (SweepParameters.FOCUS_STYLE_BAND, FOCUS_STYLE_DESIGN, 3: the design interleaved, 7 and 15: support dwell, 19 and 31: alpha-clear). */
    @Param({"0", "1", "3", "7", "15", "19", "31"})
    public int focusStyle;

    /** Builds the scheduler and the canned replies and issues the first step. */
    @Setup(Level.Trial)
    public void setUp() {
        WindowTable table = DemoCup.table();
        canned = new CannedReplies(table, new SyntheticInstrument(20261201L));
        scheduler = new SweepScheduler(DemoCup.INSTRUMENT, table, SchedulerStepBenchmark.parameters(focusStyle), counter);
        scheduler.nextStep(step, nowMicros);
    }

    /** Steps until the reply to the step in flight completes a sweep (not measured). */
    @Setup(Level.Invocation)
    public void toBoundary() {
        for (int guard = 0; guard < 2 * WindowTable.CAPACITY && !scheduler.lastStepOfSweepIssued(); guard++) {
            oneStep();
        }
    }

    /** Fails the run unless every invocation was a boundary and the loop went survey -&gt; focus. */
    @TearDown(Level.Trial)
    public void check() {
        long sweeps = counter.surveys + counter.focusSweeps;
        if (counter.focusSweeps == 0 || counter.surveys < 1 || sweeps != boundaries) {
            throw new IllegalStateException("boundaries " + boundaries + ", sweeps " + sweeps + " ("
                + counter.surveys + " surveys, " + counter.focusSweeps + " focus)");
        }
    }

    /** The boundary: ingest the sweep's last reply, choose the first step of the next sweep. */
    @Benchmark
    public int boundary() {
        boundaries++;
        return oneStep();
    }

    private int oneStep() {
        nowMicros += step.durationMicros(DemoCup.MODULATION_PERIOD_MICROS);
        canned.answer(step, reply);
        scheduler.ingest(reply, nowMicros);
        scheduler.nextStep(step, nowMicros);
        return step.window + step.gainRange;
    }
}
