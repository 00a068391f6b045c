package dev.sweepline.sim.design;

import dev.sweepline.sim.cup.FaradayCup;
import dev.sweepline.sim.hv.WindowVolts;
import dev.sweepline.sim.plasma.IonPopulation;
import dev.sweepline.sim.plasma.PlasmaState;
import dev.sweepline.sim.preamp.Preamplifier;

/**
 * The yardstick: how much could the same integration time, spent on the same windows, have told
 * about the protons' (n, U, w)? The D-optimal approximate design maximises det F over the share of
 * time each window gets; it is found with the multiplicative algorithm (Silvey, Titterington and
 * Torsney 1978 [memory]) and checked by the Kiefer-Wolfowitz equivalence theorem: at the optimum no
 * window's standardised variance tr(F⁻¹ M_j) exceeds the parameter count.
 */
public final class DOptimalDesign {
    private static final int MAX_ITERATIONS = 5000;
    private static final double EQUIVALENCE_TOLERANCE = 1e-3;

    private final ProtonInformation information;
    private final FaradayCup cup;
    private final WindowVolts windows;
    private final Preamplifier preamp;

    /** A design over {@code windows} for {@code cup} read through {@code preamp}. */
    public DOptimalDesign(FaradayCup cup, Preamplifier preamp, WindowVolts windows) {
        this.cup = cup;
        this.windows = windows;
        this.preamp = preamp;
        this.information = new ProtonInformation(cup.geometry(), preamp);
    }

    /**
     * The information matrix of the D-optimal design for {@code plasma}: {@code totalSeconds} of
     * integration shared among the windows in steps of {@code stepSeconds}, each window read in the
     * most sensitive gain range that does not saturate.
     *
     * @return the 3x3 information matrix, or null when the protons are absent or unmeasurable
     */
    public double[][] optimalInformation(PlasmaState plasma, double totalSeconds, double stepSeconds) {
        IonPopulation p = ProtonInformation.protons(plasma);
        if (p == null) {
            return null;
        }
        int n = windows.count();
        double[][][] m = new double[n][][];
        double[] g = new double[3];
        double[] quadrants = new double[4];
        int usable = 0;
        for (int j = 0; j < n; j++) {
            cup.quadrantCurrents(plasma, windows.lowVolts(j), windows.highVolts(j), quadrants);
            double total = quadrants[0] + quadrants[1] + quadrants[2] + quadrants[3];
            int range = rangeFor(preamp, Math.max(Math.max(quadrants[0], quadrants[1]), Math.max(quadrants[2], quadrants[3])));
            information.gradient(plasma, p, windows.lowVolts(j), windows.highVolts(j), g);
            // information per second of window j, at the run's step length
            double perSecond = 1.0 / (information.variance(total, range, stepSeconds) * stepSeconds);
            m[j] = new double[3][3];
            ProtonInformation.accumulate(m[j], g, 1.0 / perSecond, 1.0);
            if (g[0] != 0) {
                usable++;
            }
        }
        if (usable < ProtonInformation.PARAMETERS) {
            return null;
        }
        double[] share = new double[n];
        java.util.Arrays.fill(share, 1.0 / n);
        double[][] f = new double[3][3];
        for (int it = 0; it < MAX_ITERATIONS; it++) {
            combine(m, share, f);
            double[][] inv = ProtonInformation.inverse(f);
            if (inv == null) {
                return null;
            }
            double worst = 0;
            for (int j = 0; j < n; j++) {
                double d = trace(inv, m[j]);
                share[j] *= d / ProtonInformation.PARAMETERS;
                worst = Math.max(worst, d);
            }
            if (worst <= ProtonInformation.PARAMETERS * (1 + EQUIVALENCE_TOLERANCE)) {
                break;
            }
        }
        combine(m, share, f);
        for (double[] row : f) {
            for (int b = 0; b < 3; b++) {
                row[b] *= totalSeconds;
            }
        }
        return f;
    }

    /** The most sensitive range whose full scale holds the quadrant current below 80 % (physics.md). */
    static int rangeFor(Preamplifier preamp, double quadrantAmps) {
        for (int r = 0; r < preamp.ranges() - 1; r++) {
            if (quadrantAmps < 0.8 * preamp.fullScaleAmps(r)) {
                return r;
            }
        }
        return preamp.ranges() - 1;
    }

    private static void combine(double[][][] m, double[] share, double[][] f) {
        for (double[] row : f) {
            java.util.Arrays.fill(row, 0);
        }
        for (int j = 0; j < m.length; j++) {
            for (int a = 0; a < 3; a++) {
                for (int b = 0; b < 3; b++) {
                    f[a][b] += share[j] * m[j][a][b];
                }
            }
        }
    }

    private static double trace(double[][] inv, double[][] mj) {
        double t = 0;
        for (int a = 0; a < 3; a++) {
            for (int b = 0; b < 3; b++) {
                t += inv[a][b] * mj[b][a];
            }
        }
        return t;
    }

    /** D-efficiency (det measured / det optimal)^(1/3); NaN when either is singular. */
    public static double efficiency(double[][] measured, double[][] optimal) {
        if (measured == null || optimal == null) {
            return Double.NaN;
        }
        double dm = ProtonInformation.det(measured);
        double dopt = ProtonInformation.det(optimal);
        if (!(dm > 0) || !(dopt > 0)) {
            return Double.NaN;
        }
        return Math.cbrt(dm / dopt);
    }
}
