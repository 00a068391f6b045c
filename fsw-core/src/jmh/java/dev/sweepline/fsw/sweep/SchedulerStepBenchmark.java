package dev.sweepline.fsw.sweep;

import dev.sweepline.fsw.DemoCup;
import dev.sweepline.fsw.link.SampleReply;
import dev.sweepline.fsw.link.StepCommand;
import dev.sweepline.fsw.table.SweepParameters;
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
 * One scheduler step: ingest the reply to the last step and choose the next one, against canned
 * replies of a 1 AU slow-wind spectrum (physics.md worked case P1 plasma, He/H 4 %, 2 counts of
 * noise baked in at set-up). The loop runs survey -&gt; focus -&gt; re-survey every K, so the cost of
 * the sweep analysis at every sweep end is amortised in the mean as it is in flight.
 * Measured as a mean and, in sample mode, as a distribution, whose high percentiles are the step's tail
 * (the sweep-end analysis). Target: mean &lt;= 1 us, 0 B/op under {@code -prof gc}; in both focus styles
 * ({@code focusStyle} 1: the design style of sweep design note R21, with a budget and a quick survey; 7 and 15:
 * support dwell and paired support, R23, at a floor of 4 periods; 19 and 31: the alpha-clear band, R24).
 */
@State(Scope.Thread)
@BenchmarkMode({Mode.AverageTime, Mode.SampleTime})
@OutputTimeUnit(TimeUnit.NANOSECONDS)
public class SchedulerStepBenchmark {
    private SweepScheduler scheduler;
    private CannedReplies canned;
    private final StepCommand step = new StepCommand();
    private final SampleReply reply = new SampleReply();
    private long nowMicros;
    private final SweepCounter counter = new SweepCounter();

    /** Focus style (SweepParameters.FOCUS_STYLE_BAND, FOCUS_STYLE_DESIGN, 3: the design interleaved, 7 and 15: support dwell, 19 and 31: alpha-clear). */
    @Param({"0", "1", "3", "7", "15", "19", "31"})
    public int focusStyle;

    /** Counts sweeps per mode without allocating (the benchmark checks that it measured both modes). */
    static final class SweepCounter implements SweepListener {
        long surveys;
        long focusSweeps;

        @Override
        public void onSweepComplete(Spectrum spectrum, long nowMicros) {
            if (spectrum.mode() == SweepMode.FOCUS) {
                focusSweeps++;
            } else {
                surveys++;
            }
        }
    }

    /** Builds the scheduler and the canned replies and issues the first step. */
    @Setup(Level.Trial)
    public void setUp() {
        WindowTable table = DemoCup.table();
        SyntheticInstrument plasma = new SyntheticInstrument(20261201L);
        canned = new CannedReplies(table, plasma);
        scheduler = new SweepScheduler(DemoCup.INSTRUMENT, table, parameters(focusStyle), counter);
        scheduler.nextStep(step, nowMicros);
    }

    /** The demo cup's parameters in {@code style}; the design style of the tests' Fixtures (400 ms budget, margin 1, quick survey). */
    static SweepParameters parameters(int style) {
        SweepParameters p = (style & SweepParameters.FOCUS_STYLE_DESIGN) != 0 ? Fixtures.designStyle() : DemoCup.parameters();
        p.focusStyle = style;
        if ((style & SweepParameters.FOCUS_STYLE_SUPPORT_DWELL) != 0) {
            p.focusFloorPeriods = 4; // the paired-support test table's floor (hw-sim FocusTables)
        }
        return p;
    }

    /** Fails the run if the loop did not go survey -&gt; focus (a benchmark that checks its result). */
    @TearDown(Level.Trial)
    public void check() {
        if (counter.focusSweeps == 0 || counter.surveys < 2 || counter.focusSweeps < 10 * counter.surveys) {
            throw new IllegalStateException("loop did not reach focus: " + counter.surveys + " surveys, "
                + counter.focusSweeps + " focus sweeps");
        }
    }

    /** Ingest one sample, choose the next step. */
    @Benchmark
    public int step() {
        nowMicros += step.durationMicros(DemoCup.MODULATION_PERIOD_MICROS);
        canned.answer(step, reply);
        scheduler.ingest(reply, nowMicros);
        scheduler.nextStep(step, nowMicros);
        return step.window + step.gainRange;
    }
}
