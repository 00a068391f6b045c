package dev.sweepline.sim.design;

import dev.sweepline.sim.cup.FaradayCup;
import dev.sweepline.sim.hv.WindowVolts;
import dev.sweepline.sim.plasma.IonPopulation;
import dev.sweepline.sim.plasma.IonSpecies;
import dev.sweepline.sim.plasma.MaxwellianEdges;
import dev.sweepline.sim.plasma.PlasmaState;
import dev.sweepline.sim.preamp.Preamplifier;
import java.util.Arrays;
import java.util.List;

/**
 * The yardstick: how much could the same integration time, spent on the same windows over the same
 * plasmas, have told about the protons' (n, U, w)? A candidate window's information per second is
 * its information averaged over the run's plasmas (a design that gives window j the share s_j of the
 * time throughout the run collects T Σ_j s_j M̄_j); the D-optimal approximate design maximises
 * det Σ_j s_j M̄_j over the shares, found by {@link DesignSolver}.
 *
 * <p>Not thread-safe (the cup's caches, the window edges' values of the plasma being summed).
 */
public final class DOptimalDesign {
    /** Convergence of the yardstick: max_j d_j ≤ p (1 + 1e-6), so its det is within 3e-6 of the optimum's (DesignSolver). */
    public static final double TOLERANCE = 1e-6;

    private final ProtonInformation information;
    private final FaradayCup cup;
    private final WindowVolts windows;
    private final Preamplifier preamp;
    /** The cup's effective area, square metres (that of {@link ProtonInformation} and of the cup's currents). */
    private final double areaM2;
    /** Per population slot of the plasmas, the closed form over the windows' edges (grown as needed). */
    private MaxwellianEdges[] edges = new MaxwellianEdges[0];
    private double[] amps = new double[0];

    /** A design over {@code windows} for {@code cup} read through {@code preamp}. */
    public DOptimalDesign(FaradayCup cup, Preamplifier preamp, WindowVolts windows) {
        this.cup = cup;
        this.windows = windows;
        this.preamp = preamp;
        this.information = new ProtonInformation(cup.geometry(), preamp);
        this.areaM2 = cup.geometry().effectiveAreaM2();
    }

    /** As {@link #optimalInformation(List, double, double)} for the one plasma {@code plasma}. */
    public double[][] optimalInformation(PlasmaState plasma, double totalSeconds, double stepSeconds) {
        return optimalInformation(List.of(plasma), totalSeconds, stepSeconds);
    }

    /**
     * The information matrix of the D-optimal design over {@code plasmas} (a sampling of the run, each
     * the same weight): {@code totalSeconds} of integration shared among the windows in steps of
     * {@code stepSeconds}, each window read in the most sensitive gain range that does not saturate at
     * each plasma.
     *
     * @return the 3x3 information matrix, or null when the protons are absent or unmeasurable
     */
    public double[][] optimalInformation(List<PlasmaState> plasmas, double totalSeconds, double stepSeconds) {
        DesignSolver.Solution s = solve(plasmas, stepSeconds);
        if (s == null) {
            return null;
        }
        double[][] f = s.information();
        for (double[] row : f) {
            for (int b = 0; b < 3; b++) {
                row[b] *= totalSeconds;
            }
        }
        return f;
    }

    /** The D-optimal design per second over {@code plasmas}, with its equivalence-theorem figures; null as above. */
    public DesignSolver.Solution solve(List<PlasmaState> plasmas, double stepSeconds) {
        double[][][] m = windowInformation(plasmas, stepSeconds);
        return m == null ? null : DesignSolver.solve(m, TOLERANCE);
    }

    /**
     * Each window's information per second, averaged over the {@code plasmas} that hold protons; null
     * when none does or fewer windows than parameters carry information.
     */
    public double[][][] windowInformation(List<PlasmaState> plasmas, double stepSeconds) {
        int n = windows.count();
        double[][][] m = new double[n][3][3];
        double[] g = new double[3];
        double[] quadrants = new double[4];
        ProtonInformation.Noise noise = information.noiseAt(stepSeconds);
        int sampled = 0;
        for (PlasmaState plasma : plasmas) {
            IonPopulation p = ProtonInformation.protons(plasma);
            if (p == null) {
                continue;
            }
            sampled++;
            List<IonPopulation> populations = plasma.populations();
            double[] amps = populationAmps(populations.size());
            MaxwellianEdges protonEdges = setEdges(plasma, p);
            for (int j = 0; j < n; j++) {
                int low = windows.lowEdge(j);
                int high = windows.highEdge(j);
                // information.gradient of the window, from the edges it shares with its neighbours
                protonEdges.relativeSensitivities(p.densityPerM3(), areaM2, low, high, g);
                for (int i = 0; i < populations.size(); i++) {
                    IonPopulation pi = populations.get(i);
                    // g[0] = n dI/dn is the protons' window current itself: the cup need not compute it again
                    amps[i] = pi == p ? g[0] : seenByCup(pi) ? edges[i].windowCurrent(pi.densityPerM3(), areaM2, low, high) : 0;
                }
                cup.splitCurrents(plasma, amps, quadrants);
                double total = quadrants[0] + quadrants[1] + quadrants[2] + quadrants[3];
                int range = rangeFor(preamp, Math.max(Math.max(quadrants[0], quadrants[1]),
                        Math.max(quadrants[2], quadrants[3])));
                // information per second of window j, at the run's step length
                ProtonInformation.accumulate(m[j], g, noise.variance(total, range) * stepSeconds, 1.0);
            }
        }
        if (sampled == 0) {
            return null;
        }
        int usable = 0;
        for (double[][] mj : m) {
            for (double[] row : mj) {
                for (int b = 0; b < 3; b++) {
                    row[b] /= sampled;
                }
            }
            if (mj[0][0] > 0) {
                usable++;
            }
        }
        return usable < ProtonInformation.PARAMETERS ? null : m;
    }

    /**
     * Sets the edges of the {@code protons} of {@code plasma} (for their sensitivities) and of every other
     * population the cup sees (for its current) to their speeds at that plasma; returns the protons'.
     */
    private MaxwellianEdges setEdges(PlasmaState plasma, IonPopulation protons) {
        List<IonPopulation> populations = plasma.populations();
        MaxwellianEdges protonEdges = null;
        for (int i = 0; i < populations.size(); i++) {
            IonPopulation p = populations.get(i);
            if (p == protons || seenByCup(p)) {
                MaxwellianEdges e = edges(i, p.species());
                e.set(p.vzMetresPerSecond(), plasma.normalThermalSpeed(p));
                if (p == protons) {
                    protonEdges = e;
                }
            }
        }
        return protonEdges;
    }

    /** A population whose current the cup adds (one that flows into the cup, {@link FaradayCup#splitCurrents}). */
    private static boolean seenByCup(IonPopulation p) {
        return p.vzMetresPerSecond() > 0 && p.densityPerM3() != 0;
    }

    /** Scratch for the populations' window currents, at least {@code count} long. */
    private double[] populationAmps(int count) {
        if (amps.length < count) {
            amps = new double[count];
        }
        return amps;
    }

    /**
     * The window edges of the population in slot {@code slot} of a plasma, for its species (made once per
     * slot and species: the edges' speeds depend on the species alone).
     */
    private MaxwellianEdges edges(int slot, IonSpecies species) {
        if (slot >= edges.length) {
            edges = Arrays.copyOf(edges, slot + 1);
        }
        if (edges[slot] == null || !edges[slot].species().equals(species)) {
            edges[slot] = new MaxwellianEdges(windows.edgeVolts(), species);
        }
        return edges[slot];
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
