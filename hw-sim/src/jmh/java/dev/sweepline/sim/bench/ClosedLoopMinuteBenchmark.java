package dev.sweepline.sim.bench;

import dev.sweepline.sim.scenario.ScenarioLoader;
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/**
 * One simulated minute of the closed loop without the ground, as {@code bench run --no-ground} flies it
 * (the default scenario quiet-perihelion, seed 1, the demo cup; no record kept, the sweeps tallied): the
 * time per op is the wall time of 60 simulated seconds, so 60 s / (ms per op) is the real-time factor.
 * Run: {@code java -cp <hw-sim test classpath> org.openjdk.jmh.Main -foe true ClosedLoopMinuteBenchmark
 * -f 1 -wi 3 -i 5}.
 *
 * <p>Checked: every minute flown must end with the decision hash, the step count and the sweep count of
 * the same minute flown in {@link #setUp} by the plain path (the recorder keeping every record, as the
 * ground check and the tests run it); a minute that differs throws.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(1)
public class ClosedLoopMinuteBenchmark {
    /** Simulated seconds per op. */
    static final double SECONDS = 60;
    /** The run flown: package-visible so that the check test can break it. */
    BenchConfig config;
    private String expectedHash;
    private long expectedSteps;
    private int expectedSweeps;

    @Setup
    public void setUp() {
        config = BenchConfig.defaults(ScenarioLoader.builtIn(ScenarioLoader.defaultName()), 1, SECONDS);
        ClosedLoopBench.Result reference = ClosedLoopBench.run(config, ClosedLoopBench.Progress.NONE);
        expectedHash = reference.summary().decisionHash();
        expectedSteps = reference.summary().steps();
        expectedSweeps = reference.recorder().sweeps().size();
        if (expectedSweeps == 0) {
            throw new IllegalStateException("the reference minute completed no sweep");
        }
    }

    /** One simulated minute, its records not kept, checked against the reference. */
    @Benchmark
    public RunSummary minute() {
        ClosedLoopBench.Result r = ClosedLoopBench.run(config, ClosedLoopBench.Progress.NONE,
                ClosedLoopBench.Hooks.NONE.withSweepLog(SweepLog.NONE, false));
        RunSummary s = r.summary();
        int sweeps = s.sweepsByMode().values().stream().mapToInt(Integer::intValue).sum();
        if (!s.decisionHash().equals(expectedHash) || s.steps() != expectedSteps || sweeps != expectedSweeps) {
            throw new IllegalStateException("minute flown: hash " + s.decisionHash() + ", " + s.steps() + " steps, "
                    + sweeps + " sweeps; the reference: " + expectedHash + ", " + expectedSteps + ", " + expectedSweeps);
        }
        return s;
    }
}
