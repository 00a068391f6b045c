package dev.sweepline.sim.bench;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

/** The closed-loop minute benchmark fails when the minute it flies is not the reference minute. */
class ClosedLoopMinuteBenchmarkCheckTest {
    @Test
    void shouldPassOnTheReferenceMinuteAndThrowWhenTheRunIsBroken() {
        ClosedLoopMinuteBenchmark bench = new ClosedLoopMinuteBenchmark();
        bench.setUp();
        // GoldenRunTest pins this minute's decision hash (quiet-perihelion, seed 1, 60 s, the demo cup)
        assertEquals(GoldenRunTest.DECISION_HASH, bench.minute().decisionHash());

        bench.config = new BenchConfig(bench.config.scenario(), 2, bench.config.durationSeconds(), bench.config.flight(),
                bench.config.instrument(), bench.config.allocationBitsPerSecond()); // another seed: other decisions
        assertThrows(IllegalStateException.class, bench::minute);
    }
}
