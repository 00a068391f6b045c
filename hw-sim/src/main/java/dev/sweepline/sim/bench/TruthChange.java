package dev.sweepline.sim.bench;

import dev.sweepline.sim.design.ProtonInformation;
import dev.sweepline.sim.plasma.IonPopulation;
import dev.sweepline.sim.plasma.PlasmaState;
import java.util.function.LongFunction;

/**
 * How much the true protons moved within one sweep: |x(last step) - x(first step)| / x(mid-sweep) for
 * the density n, bulk speed U and normal temperature T the cup measures ({@link GroundCheck#truth}).
 * The ground's fit is scored against the plasma at mid-sweep, so a sweep over which the plasma changed
 * by more than the bound allows scores badly for a reason that is not the instrument's.
 */
public final class TruthChange {
    private TruthChange() {
    }

    /** Relative change of n, U, T over {@code sweep}; NaN for each when the protons are absent at an end. */
    public static double[] of(SweepRecord sweep, LongFunction<PlasmaState> truthAt) {
        return of(sweep, truthAt, truthAt.apply(sweep.midMicros()));
    }

    /** As {@link #of(SweepRecord, LongFunction)}, with the plasma at the sweep's mid-time already at hand. */
    public static double[] of(SweepRecord sweep, LongFunction<PlasmaState> truthAt, PlasmaState atMid) {
        double[] first = moments(truthAt.apply(sweep.startMicros()));
        double[] last = moments(truthAt.apply(sweep.endMicros()));
        double[] mid = moments(atMid);
        double[] change = new double[3];
        for (int k = 0; k < 3; k++) {
            change[k] = first == null || last == null || mid == null ? Double.NaN
                    : Math.abs(last[k] - first[k]) / mid[k];
        }
        return change;
    }

    private static double[] moments(PlasmaState plasma) {
        IonPopulation p = ProtonInformation.protons(plasma);
        return p == null ? null : GroundCheck.truth(plasma, p);
    }
}
