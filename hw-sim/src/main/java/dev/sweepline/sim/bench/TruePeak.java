package dev.sweepline.sim.bench;

import dev.sweepline.sim.cup.FaradayCup;
import dev.sweepline.sim.hv.WindowVolts;
import dev.sweepline.sim.plasma.ConvectedMaxwellian;
import dev.sweepline.sim.plasma.IonPopulation;
import dev.sweepline.sim.plasma.IonSpecies;
import dev.sweepline.sim.plasma.PlasmaState;
import java.util.List;

/**
 * The window where the noise-free current of one species peaks (the bench's truth convention, see the
 * package note): the same window as scanning every window of the table with the cup model and keeping
 * the first largest current, found by evaluating only the windows that could hold it.
 *
 * <p>Pruning: for ions of normal speed in [v1, v2] the window current is q n A ∫ v f(v) dv with f the
 * Maxwellian of {@link ConvectedMaxwellian}, so it is at most q n A v2 (v2 - v1) exp(-x²) / (√π w), x the
 * distance in thermal speeds from the bulk speed U to the nearer edge (0 when U lies in the window); the
 * collector's quadrant fractions sum to at most 1. The window of the previous answer is evaluated first;
 * a window whose bound (times 1 + 1e-6 for the rounding of the evaluated currents, plus an absolute
 * allowance of 1e-12 q n A (U + w) for the lower tail, where the cup's formula cancels) lies below that
 * current evaluates to less than it, so it cannot be the first largest, and is skipped. Every other window
 * is evaluated as the exhaustive search would, in order.
 *
 * <p>Not thread-safe (the cup's scratch, the cached edge speeds). One per recorder.
 */
final class TruePeak {
    /** Factor on the bound for the rounding of the evaluated currents and of the sum of the fractions (both near 1e-15). */
    private static final double BOUND_SLACK = 1 + 1e-6;
    /** Absolute allowance, in units of q n A (U + w), for the cancellation of the lower tail. */
    private static final double ABSOLUTE_ALLOWANCE = 1e-12;
    private static final double SQRT_PI = Math.sqrt(Math.PI);

    private final FaradayCup cup;
    private final double areaM2;
    private final IonSpecies species;
    private WindowVolts speedsOf;
    private double[] v1 = new double[0];
    private double[] v2 = new double[0];
    private double[] logProduct = new double[0];
    private int previous = -1;

    /** The peaks of {@code species} in {@code cup}. */
    TruePeak(FaradayCup cup, IonSpecies species) {
        this.cup = cup;
        this.areaM2 = cup.geometry().effectiveAreaM2();
        this.species = species;
    }

    /** The window of the species' peak in {@code plasma} over {@code windows}; -1 when the species is absent. */
    int of(PlasmaState plasma, WindowVolts windows) {
        for (IonPopulation p : plasma.populations()) {
            if (p.species().equals(species)) {
                PlasmaState alone = new PlasmaState(List.of(p), plasma.bx(), plasma.by(), plasma.bz());
                previous = peak(alone, p, windows);
                return previous;
            }
        }
        return -1;
    }

    /** The exhaustive search: every window evaluated (the definition {@link #of} agrees with). */
    static int scan(FaradayCup cup, PlasmaState alone, WindowVolts windows) {
        int best = -1;
        double bestAmps = 0;
        for (int w = 0; w < windows.count(); w++) {
            double amps = cup.totalCurrent(alone, windows.lowVolts(w), windows.highVolts(w));
            if (amps > bestAmps) {
                bestAmps = amps;
                best = w;
            }
        }
        return best;
    }

    private int peak(PlasmaState alone, IonPopulation p, WindowVolts windows) {
        double u = p.vzMetresPerSecond();
        double w = alone.normalThermalSpeed(p);
        int n = windows.count();
        int hint = previous >= 0 && previous < n ? previous : -1;
        if (hint < 0 || !(u > 0) || !(w > 0) || !Double.isFinite(u + w)) {
            return scan(cup, alone, windows);
        }
        edgeSpeeds(windows);
        double hintAmps = cup.totalCurrent(alone, windows.lowVolts(hint), windows.highVolts(hint));
        double qnA = species.chargeCoulomb() * p.densityPerM3() * areaM2;
        double target = hintAmps - ABSOLUTE_ALLOWANCE * qnA * (u + w);
        // window k is skipped when slack qnA v2 (v2 - v1) exp(-x^2) / (sqrt(pi) w) < target, that is when
        // x^2 > ln(v2 (v2 - v1)) + ln(slack qnA / (sqrt(pi) w target))
        double prefactor = BOUND_SLACK * qnA / (SQRT_PI * w);
        double logRatio = target > 0 && prefactor > 0 ? Math.log(prefactor / target) : Double.NaN;
        if (!Double.isFinite(logRatio)) {
            return scan(cup, alone, windows);
        }
        int best = -1;
        double bestAmps = 0;
        for (int k = 0; k < n; k++) {
            double amps;
            if (k == hint) {
                amps = hintAmps;
            } else {
                double x = v2[k] < u ? (u - v2[k]) / w : v1[k] > u ? (v1[k] - u) / w : 0;
                if (x * x > logProduct[k] + logRatio) {
                    continue;
                }
                amps = cup.totalCurrent(alone, windows.lowVolts(k), windows.highVolts(k));
            }
            if (amps > bestAmps) {
                bestAmps = amps;
                best = k;
            }
        }
        return best;
    }

    /**
     * The species' edge speeds of every window and ln(v2 (v2 - v1)), for {@code windows}; a window whose
     * edges are not ordered, non-negative and finite gets infinity (never skipped).
     */
    private void edgeSpeeds(WindowVolts windows) {
        if (windows == speedsOf) {
            return;
        }
        int n = windows.count();
        v1 = new double[n];
        v2 = new double[n];
        logProduct = new double[n];
        for (int k = 0; k < n; k++) {
            v1[k] = ConvectedMaxwellian.speedForVoltage(windows.lowVolts(k), species.massKg(), species.chargeCoulomb());
            v2[k] = ConvectedMaxwellian.speedForVoltage(windows.highVolts(k), species.massKg(), species.chargeCoulomb());
            logProduct[k] = v2[k] >= v1[k] && v1[k] >= 0 && Double.isFinite(v2[k])
                    ? Math.log(v2[k] * (v2[k] - v1[k])) : Double.POSITIVE_INFINITY;
        }
        speedsOf = windows;
    }
}
