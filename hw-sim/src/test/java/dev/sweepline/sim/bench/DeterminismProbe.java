package dev.sweepline.sim.bench;

import dev.sweepline.sim.scenario.ScenarioLoader;

/** Prints the decision hash of one run; the determinism test runs it in a second JVM. */
public final class DeterminismProbe {
    private DeterminismProbe() {
    }

    /** Arguments: scenario name, seed, seconds. */
    public static void main(String[] args) {
        System.out.println(hash(args[0], Long.parseLong(args[1]), Double.parseDouble(args[2])));
    }

    static String hash(String scenario, long seed, double seconds) {
        BenchConfig config = BenchConfig.defaults(ScenarioLoader.resolve(scenario), seed, seconds);
        return ClosedLoopBench.run(config, ClosedLoopBench.Progress.NONE).summary().decisionHash();
    }
}
