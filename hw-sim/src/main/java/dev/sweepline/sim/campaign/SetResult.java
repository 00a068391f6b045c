package dev.sweepline.sim.campaign;

import java.util.ArrayList;
import java.util.List;

/**
 * The metrics of one parameter set over the ensemble.
 *
 * @param set                 grid point index
 * @param values              the set's values along the grid axes
 * @param runs                runs aggregated
 * @param lockFractionMean    mean lock fraction over runs with focus sweeps
 * @param lockFractionMin     worst run's lock fraction
 * @param alphaLocks          alpha locks over all runs
 * @param reacquireSweepsMax  worst reacquisition, sweeps (-1 if a jump was never reacquired)
 * @param reacquireSecondsMax worst reacquisition, seconds
 * @param spectraPerSecond    mean cadence, spectra per second
 * @param bitsPerSecondMean   mean telemetry rate
 * @param bitsPerSecondMax    highest telemetry rate of a run
 * @param integratingFraction mean integrating fraction
 * @param informationEfficiency mean D-efficiency against the D-optimal design, over runs where it is defined
 * @param momentError         mean over runs of the median relative errors of n, U, T
 * @param crlbRatio           mean over runs of the CRLB ratios of n, U, T
 * @param centreErrorMedian   mean over runs of the median band-centre error, windows
 * @param centreErrorP95      mean over runs of the 95th-percentile band-centre error, windows
 * @param centreErrorMax      worst run's largest band-centre error, windows
 * @param strictReacquireSweepsMax worst strict reacquisition, sweeps (-1 if a jump was never centred again)
 * @param strictReacquireSecondsMax worst strict reacquisition, seconds
 * @param crlbRobust          mean over runs of the robust CRLB ratios (1.4826 x median |z|) of n, U, T
 * @param momentErrorUnflagged mean over runs of the median relative errors of n, U, T without the flagged fits
 * @param nonStationary       ground fits flagged non-stationary, summed over runs
 */
public record SetResult(int set, double[] values, int runs, double lockFractionMean, double lockFractionMin,
        int alphaLocks, int reacquireSweepsMax, double reacquireSecondsMax, double spectraPerSecond,
        double bitsPerSecondMean, double bitsPerSecondMax, double integratingFraction, double informationEfficiency,
        double[] momentError, double[] crlbRatio, double centreErrorMedian, double centreErrorP95,
        double centreErrorMax, int strictReacquireSweepsMax, double strictReacquireSecondsMax,
        double[] crlbRobust, double[] momentErrorUnflagged, int nonStationary) {

    /** Fraction of focus sweeps that missed the proton peak. */
    public double missFraction() {
        return 1 - lockFractionMean;
    }

    /** The accuracy objective (lower is better): the mean of the median relative errors of n, U and T. */
    public double accuracy() {
        return (momentError[0] + momentError[1] + momentError[2]) / 3;
    }

    /** Aggregates {@code rows} (any order) into one result per set, in set order. */
    static List<SetResult> aggregate(CampaignSpec spec, List<RunRow> rows) {
        List<List<RunRow>> bySet = new ArrayList<>();
        for (int s = 0; s < spec.setCount(); s++) {
            bySet.add(new ArrayList<>());
        }
        for (RunRow r : rows) {
            bySet.get(r.set()).add(r);
        }
        List<SetResult> results = new ArrayList<>();
        for (int s = 0; s < spec.setCount(); s++) {
            List<RunRow> runs = bySet.get(s);
            runs.sort((a, b) -> Integer.compare(a.run(), b.run())); // sums in one order: bit-identical
            results.add(of(s, spec.setValues(s), runs));
        }
        return results;
    }

    private static SetResult of(int set, double[] values, List<RunRow> runs) {
        double lockSum = 0;
        int lockRuns = 0;
        double lockMin = Double.NaN;
        int alpha = 0;
        int reacqSweeps = 0;
        double reacqSeconds = 0;
        double cadence = 0;
        double bits = 0;
        double bitsMax = 0;
        double integrating = 0;
        double efficiency = 0;
        int efficiencyRuns = 0;
        double[] error = new double[3];
        double[] ratio = new double[3];
        int[] errorRuns = new int[3];
        int[] ratioRuns = new int[3];
        double[] robust = new double[3];
        int[] robustRuns = new int[3];
        double[] unflagged = new double[3];
        int[] unflaggedRuns = new int[3];
        int flagged = 0;
        double[] centre = new double[3]; // sums of median and p95, then the largest max
        int[] centreRuns = new int[3];
        int strictSweeps = 0;
        double strictSeconds = 0;
        for (RunRow r : runs) {
            for (int k = 0; k < 2; k++) {
                if (Double.isFinite(r.trackingCentre()[k])) {
                    centre[k] += r.trackingCentre()[k];
                    centreRuns[k]++;
                }
            }
            if (Double.isFinite(r.trackingCentre()[2])) {
                centre[2] = Math.max(centre[2], r.trackingCentre()[2]);
                centreRuns[2] = 1;
            }
            strictSweeps = strictSweeps < 0 || r.strictReacquireSweeps() < 0 ? -1
                    : Math.max(strictSweeps, r.strictReacquireSweeps());
            strictSeconds = Double.isNaN(r.strictReacquireSeconds()) ? Double.NaN
                    : Math.max(strictSeconds, r.strictReacquireSeconds());
            flagged += r.nonStationary();
            for (int k = 0; k < 3; k++) {
                if (Double.isFinite(r.errorUnflagged()[k])) {
                    unflagged[k] += r.errorUnflagged()[k];
                    unflaggedRuns[k]++;
                }
                if (Double.isFinite(r.momentError()[k])) {
                    error[k] += r.momentError()[k];
                    errorRuns[k]++;
                }
                if (Double.isFinite(r.crlbRobust()[k])) {
                    robust[k] += r.crlbRobust()[k];
                    robustRuns[k]++;
                }
                if (Double.isFinite(r.crlbRatio()[k])) {
                    ratio[k] += r.crlbRatio()[k];
                    ratioRuns[k]++;
                }
            }
            if (!Double.isNaN(r.informationEfficiency())) {
                efficiency += r.informationEfficiency();
                efficiencyRuns++;
            }
            if (!Double.isNaN(r.lockFraction())) {
                lockSum += r.lockFraction();
                lockRuns++;
                lockMin = Double.isNaN(lockMin) ? r.lockFraction() : Math.min(lockMin, r.lockFraction());
            }
            alpha += r.alphaLocks();
            reacqSweeps = reacqSweeps < 0 || r.reacquireSweeps() < 0 ? -1 : Math.max(reacqSweeps, r.reacquireSweeps());
            reacqSeconds = Double.isNaN(r.reacquireSeconds()) ? Double.NaN : Math.max(reacqSeconds, r.reacquireSeconds());
            cadence += r.spectraPerSecond();
            bits += r.bitsPerSecond();
            bitsMax = Math.max(bitsMax, r.bitsPerSecond());
            integrating += r.integratingFraction();
        }
        int n = Math.max(1, runs.size());
        return new SetResult(set, values, runs.size(), lockRuns == 0 ? Double.NaN : lockSum / lockRuns, lockMin,
                alpha, reacqSweeps, reacqSeconds, cadence / n, bits / n, bitsMax, integrating / n,
                efficiencyRuns == 0 ? Double.NaN : efficiency / efficiencyRuns, mean(error, errorRuns),
                mean(ratio, ratioRuns), centreRuns[0] == 0 ? Double.NaN : centre[0] / centreRuns[0],
                centreRuns[1] == 0 ? Double.NaN : centre[1] / centreRuns[1], centreRuns[2] == 0 ? Double.NaN : centre[2],
                strictSweeps, strictSeconds, mean(robust, robustRuns), mean(unflagged, unflaggedRuns), flagged);
    }

    private static double[] mean(double[] sum, int[] count) {
        double[] m = new double[sum.length];
        for (int k = 0; k < m.length; k++) {
            m[k] = count[k] == 0 ? Double.NaN : sum[k] / count[k];
        }
        return m;
    }
}
