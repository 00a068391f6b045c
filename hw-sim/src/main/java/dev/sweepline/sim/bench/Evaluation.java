package dev.sweepline.sim.bench;

import dev.sweepline.fsw.sweep.SweepMode;
import dev.sweepline.sim.instrument.InstrumentModel;
import dev.sweepline.sim.scenario.Scenario;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;

/**
 * The evaluation table: each case (a scenario) flown closed loop on a few seeds with the ground on,
 * its fits pooled over the seeds and scored against the truth at mid-sweep.
 *
 * <p>Per case: median and p95 relative errors of n, U, T; their bias in bound units (the median of
 * z = (fit - truth) / bound, a bias estimate one discontinuity cannot move: for z from a normal of mean
 * b, the median is b); the rms and robust CRLB ratios ({@link MomentErrors}); the non-stationary count;
 * the spurious-alpha rate (fits reporting alphas on sweeps whose plasma has none, over those sweeps);
 * the tracking error ({@link TrackingError}, over every seed's sweeps) and the strict reacquisition (the
 * worst over seeds and jumps, {@link Reacquisition#strictAfter}).
 *
 * <p>The fidelity goal ({@link #fidelity}) is checked on calm variants ({@link Scenario#calm()}): p95
 * relative errors of n, U, T within {@link #GOAL_P95}, and |bias| below {@link #GOAL_BIAS} of the bound.
 */
public final class Evaluation {
    /** Fidelity goal in steady wind, p95 relative error of n, U, T: 1 %, 0.5 %, 3 % (the project's goal). */
    public static final double[] GOAL_P95 = {0.01, 0.005, 0.03};
    /** Fidelity goal in steady wind: |bias| below 0.3 of the Cramér-Rao bound (the project's goal). */
    public static final double GOAL_BIAS = 0.3;

    /**
     * One case's figures.
     *
     * @param name            the scenario's name
     * @param runs            seeds flown
     * @param errors          errors over every compared fit
     * @param bias            median z of n, U, T over every compared fit (bound units)
     * @param flagged         fits flagged non-stationary
     * @param stationary      errors without the flagged fits
     * @param alphaFreeFits   compared fits of sweeps whose plasma has no alphas
     * @param spuriousAlphas  of those, fits that reported alphas
     * @param tracking        tracking error over every seed's sweeps
     * @param jumps           jumps per run in the scenario
     * @param strictSweepsMax worst strict reacquisition, sweeps (0 without jumps, -1 if one never was)
     * @param chiSquare       the fits' reduced chi-square against its expectation, per mode
     */
    public record Row(String name, int runs, MomentErrors errors, double[] bias, int flagged, MomentErrors stationary,
            int alphaFreeFits, int spuriousAlphas, TrackingError tracking, int jumps, int strictSweepsMax,
            Map<SweepMode, ChiSquareMean> chiSquare) {
        /** Spurious alphas over alpha-free fits; NaN when every sweep had alphas. */
        public double spuriousAlphaRate() {
            return alphaFreeFits == 0 ? Double.NaN : (double) spuriousAlphas / alphaFreeFits;
        }
    }

    /**
     * The mean reduced chi-square of a set of fits and the standard error it would have if every fit
     * were right and its noise model too: chi-square(nu) / nu has mean 1 and variance 2 / nu (closed
     * form), so the mean of N fits has standard error sqrt(sum 2 / nu_i) / N.
     *
     * @param fits          fits behind the mean
     * @param mean          mean reduced chi-square (NaN without fits)
     * @param standardError its standard error under the right model
     */
    public record ChiSquareMean(int fits, double mean, double standardError) {
        /** The mean of {@code fits}' finite reduced chi-squares. */
        static ChiSquareMean of(List<GroundCheck.ComparedFit> fits) {
            double sum = 0;
            double variance = 0;
            int n = 0;
            for (GroundCheck.ComparedFit f : fits) {
                if (Double.isFinite(f.reducedChiSquare()) && f.dof() > 0) {
                    sum += f.reducedChiSquare();
                    variance += 2.0 / f.dof();
                    n++;
                }
            }
            return n == 0 ? new ChiSquareMean(0, Double.NaN, Double.NaN)
                    : new ChiSquareMean(n, sum / n, Math.sqrt(variance) / n);
        }
    }

    private record Job(Scenario scenario, long seed) {
    }

    private record RunOutcome(List<GroundCheck.ComparedFit> fits, List<SweepRecord> sweeps, int strictSweepsMax) {
    }

    private Evaluation() {
    }

    /**
     * The rows of {@code cases}, each flown on {@code seeds} for {@code seconds} on {@code instrument},
     * on {@code threads} threads; rows in case order, the same whatever the thread count.
     */
    public static List<Row> evaluate(List<Scenario> cases, long[] seeds, double seconds, InstrumentModel instrument,
            int threads, RunPool.Progress progress) {
        List<Job> jobs = new ArrayList<>();
        for (Scenario s : cases) {
            for (long seed : seeds) {
                jobs.add(new Job(s, seed));
            }
        }
        List<RunOutcome> outcomes = RunPool.map("evaluation run", threads, jobs,
                job -> fly(job, seconds, instrument), progress);
        List<Row> rows = new ArrayList<>();
        for (int c = 0; c < cases.size(); c++) {
            rows.add(row(cases.get(c), outcomes.subList(c * seeds.length, (c + 1) * seeds.length)));
        }
        return rows;
    }

    private static RunOutcome fly(Job job, double seconds, InstrumentModel instrument) {
        BenchConfig config = BenchConfig.defaults(job.scenario(), job.seed(), seconds, instrument);
        GroundCheck ground = new GroundCheck(config.flight(), GroundInstruments.of(instrument.spec()));
        ClosedLoopBench.Result r = ClosedLoopBench.run(config, ClosedLoopBench.Progress.NONE,
                ClosedLoopBench.Hooks.NONE.withFrames(ground.frames()));
        return new RunOutcome(ground.compared(r.recorder().sweeps(), r.recorder()::truthAt), r.recorder().sweeps(),
                r.summary().strictReacquireSweepsMax());
    }

    private static Row row(Scenario scenario, List<RunOutcome> runs) {
        List<double[]> rel = new ArrayList<>();
        List<double[]> z = new ArrayList<>();
        List<double[]> relStationary = new ArrayList<>();
        List<double[]> zStationary = new ArrayList<>();
        List<SweepRecord> sweeps = new ArrayList<>();
        int alphaFree = 0;
        int spurious = 0;
        int strict = 0;
        Map<SweepMode, List<GroundCheck.ComparedFit>> byMode = new EnumMap<>(SweepMode.class);
        for (RunOutcome run : runs) {
            sweeps.addAll(run.sweeps());
            strict = strict < 0 || run.strictSweepsMax() < 0 ? -1 : Math.max(strict, run.strictSweepsMax());
            for (GroundCheck.ComparedFit f : run.fits()) {
                if (f == null) {
                    continue;
                }
                rel.add(f.relative());
                z.add(f.z());
                byMode.computeIfAbsent(f.mode(), m -> new ArrayList<>()).add(f);
                if (!f.flagged()) {
                    relStationary.add(f.relative());
                    zStationary.add(f.z());
                }
                if (!f.truthHasAlphas()) {
                    alphaFree++;
                    spurious += f.alphasReported() ? 1 : 0;
                }
            }
        }
        return new Row(scenario.name(), runs.size(), MomentErrors.of(rel, z), medianZ(z),
                rel.size() - relStationary.size(), MomentErrors.of(relStationary, zStationary), alphaFree, spurious,
                TrackingError.of(sweeps), scenario.jumps().size(), strict, chiSquare(byMode));
    }

    private static Map<SweepMode, ChiSquareMean> chiSquare(Map<SweepMode, List<GroundCheck.ComparedFit>> byMode) {
        Map<SweepMode, ChiSquareMean> m = new EnumMap<>(SweepMode.class);
        byMode.forEach((mode, fits) -> m.put(mode, ChiSquareMean.of(fits)));
        return m;
    }

    /** Median of each moment's finite z-scores (NaN when none). */
    static double[] medianZ(List<double[]> z) {
        double[] median = new double[3];
        for (int k = 0; k < 3; k++) {
            double[] v = new double[z.size()];
            int n = 0;
            for (double[] row : z) {
                if (Double.isFinite(row[k])) {
                    v[n++] = row[k];
                }
            }
            double[] sorted = Arrays.copyOf(v, n);
            Arrays.sort(sorted);
            median[k] = TrackingError.quantile(sorted, 0.5);
        }
        return median;
    }

    /**
     * The fidelity goal on {@code row} (a calm variant): for each of n, U, T whether its p95 relative
     * error and its |bias| meet {@link #GOAL_P95} and {@link #GOAL_BIAS}.
     */
    public static boolean[] fidelity(Row row) {
        boolean[] pass = new boolean[3];
        for (int k = 0; k < 3; k++) {
            pass[k] = row.errors().p95Relative()[k] <= GOAL_P95[k] && Math.abs(row.bias()[k]) < GOAL_BIAS;
        }
        return pass;
    }
}
