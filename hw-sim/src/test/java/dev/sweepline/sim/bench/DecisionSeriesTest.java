package dev.sweepline.sim.bench;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import dev.sweepline.fsw.sweep.SweepMode;
import dev.sweepline.sim.report.DecisionChart;
import java.util.List;
import org.junit.jupiter.api.Test;

/** The chart's series stays within its capacity and keeps evenly taken sweeps (worked out by hand below). */
class DecisionSeriesTest {
    private static SweepRecord sweep(int i) {
        return new SweepRecord(i, SweepMode.FOCUS, i * 1_000_000L, i * 1_000_000L, 0, 10, i, i, i, -1, 0);
    }

    @Test
    void shouldHalveItsPointsWhenFullAndKeepEveryStrideThSweep() {
        DecisionSeries series = new DecisionSeries(4);
        for (int i = 0; i < 4; i++) {
            series.add(sweep(i));
        }
        assertEquals(List.of(0, 1, 2, 3), sources(series.points())); // within capacity: every sweep
        assertEquals(1, series.stride());
        for (int i = 4; i < 100; i++) {
            series.add(sweep(i));
        }
        // full at 4 -> {0, 2} + 4, 6; at 8 -> {0, 4} + 8, 12; ... at 64 -> {0, 32} + 64, 96
        assertEquals(List.of(0, 32, 64, 96), sources(series.points()));
        assertEquals(32, series.stride());
        assertEquals(100, series.sweeps());
        assertThrows(IllegalArgumentException.class, () -> new DecisionSeries(1));
    }

    @Test
    void shouldGrowItsArraysUpToTheCapacityKeepingEverySweep() {
        DecisionSeries series = new DecisionSeries(3000);
        for (int i = 0; i < 2500; i++) { // beyond the first 128 points made room for, several doublings
            series.add(sweep(i));
        }
        assertEquals(2500, series.points().size());
        assertEquals(2499, series.points().get(2499).trueProton());
        assertEquals(1, series.stride());
    }

    /** The sweep index each point came from (its true proton window, set to the index above). */
    private static List<Integer> sources(List<DecisionChart.Sweep> points) {
        return points.stream().map(DecisionChart.Sweep::trueProton).toList();
    }
}
