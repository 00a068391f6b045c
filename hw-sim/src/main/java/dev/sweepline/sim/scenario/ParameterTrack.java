package dev.sweepline.sim.scenario;

import java.util.Arrays;
import java.util.List;

/**
 * The event-driven (fluctuation-free) course of one parameter: a piecewise-linear function of time
 * given by knots. A step is two knots at the same time; at that instant the later value holds.
 * Before the first knot and after the last the value is constant.
 */
final class ParameterTrack {
    private final double[] timesS;
    private final double[] values;

    private ParameterTrack(double[] timesS, double[] values) {
        this.timesS = timesS;
        this.values = values;
    }

    /**
     * The track of {@code p} starting at {@code base} and changed by {@code events} (in time order,
     * ramps of one parameter not overlapping: the loader checks both).
     */
    static ParameterTrack of(PlasmaParameter p, double base, List<ScenarioEvent> events) {
        double[] t = new double[1 + 2 * events.size()];
        double[] v = new double[t.length];
        int n = 0;
        t[n] = 0;
        v[n++] = base;
        double level = base;
        for (ScenarioEvent e : events) {
            if (!e.changes(p)) {
                continue;
            }
            double target = e.target(p, level);
            t[n] = e.atSeconds();
            v[n++] = level;
            t[n] = e.endSeconds();
            v[n++] = target;
            level = target;
        }
        return new ParameterTrack(Arrays.copyOf(t, n), Arrays.copyOf(v, n));
    }

    /** The value at {@code seconds}; any time, in any order. */
    double at(double seconds) {
        // Last knot with time <= seconds; knots are few (two per event), so a plain binary search.
        int lo = 0;
        int hi = timesS.length - 1;
        if (seconds < timesS[0]) {
            return values[0];
        }
        while (lo < hi) {
            int mid = (lo + hi + 1) >>> 1;
            if (timesS[mid] <= seconds) {
                lo = mid;
            } else {
                hi = mid - 1;
            }
        }
        if (lo == timesS.length - 1) {
            return values[lo];
        }
        double f = (seconds - timesS[lo]) / (timesS[lo + 1] - timesS[lo]);
        return values[lo] + f * (values[lo + 1] - values[lo]);
    }

    /** The value once every event is over. */
    double finalValue() {
        return values[values.length - 1];
    }
}
