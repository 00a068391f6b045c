package dev.sweepline.sim.bench;

import dev.sweepline.fsw.sweep.SweepMode;
import dev.sweepline.sim.report.DecisionChart;
import java.util.ArrayList;
import java.util.List;

/**
 * The sweeps the decision chart draws, bounded: every sweep while there are at most {@link #CAPACITY},
 * then every 2nd, 4th, ... sweep (when the series is full, every other point is dropped and the stride
 * doubles), so a run of any length is drawn from at most {@link #CAPACITY} evenly taken sweeps.
 */
public final class DecisionSeries {
    /** Points kept at most: more than a 60-minute run's sweeps (about 5800), and 1.1 MB at most. */
    static final int CAPACITY = 16_384;
    private final int capacity;
    private final List<DecisionChart.Sweep> points = new ArrayList<>();
    private long offered;
    private long stride = 1;

    /** A series of at most {@code capacity} points (at least 2). */
    DecisionSeries(int capacity) {
        if (capacity < 2) {
            throw new IllegalArgumentException("capacity " + capacity + " below 2");
        }
        this.capacity = capacity;
    }

    /** Offers one sweep: kept when its index is a multiple of the current stride. */
    void add(SweepRecord r) {
        long index = offered++;
        if (index % stride != 0) {
            return;
        }
        if (points.size() == capacity) {
            int kept = 0;
            for (int i = 0; i < points.size(); i += 2) {
                points.set(kept++, points.get(i));
            }
            points.subList(kept, points.size()).clear();
            stride *= 2;
            if (index % stride != 0) {
                return;
            }
        }
        points.add(new DecisionChart.Sweep(r.midMicros() / 1e6, r.mode() == SweepMode.FOCUS, r.firstWindow(),
                r.lastWindow(), r.peakWindow(), r.trueProtonWindow(), r.trueAlphaWindow()));
    }

    /** The points, in time order. */
    public List<DecisionChart.Sweep> points() {
        return points;
    }

    /** Every how many sweeps a point is kept now (1: every sweep). */
    public long stride() {
        return stride;
    }

    /** Sweeps offered. */
    public long sweeps() {
        return offered;
    }
}
