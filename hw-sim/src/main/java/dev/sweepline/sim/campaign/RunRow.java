package dev.sweepline.sim.campaign;

import dev.sweepline.fsw.sweep.SweepMode;
import dev.sweepline.sim.bench.GroundCheck;
import dev.sweepline.sim.bench.RunSummary;

/**
 * The metrics of one campaign run (one set on one ensemble member). Written to and read back from
 * {@code runs.csv} with {@link Double#toString}, which round-trips exactly: merged shards aggregate to
 * the same bits as the unsharded campaign.
 *
 * @param set                 grid point index
 * @param run                 ensemble member index
 * @param lockFraction        focus sweeps holding the true proton peak (NaN: no focus sweep)
 * @param alphaLocks          focus sweeps centred on the alpha peak
 * @param reacquireSweeps     worst reacquisition after the member's jumps, sweeps (0 without jumps, -1 never)
 * @param reacquireSeconds    worst reacquisition, seconds (NaN if never)
 * @param spectraPerSecond    completed sweeps per second, survey and focus
 * @param bitsPerSecond       telemetry frames, bits per second
 * @param integratingFraction integration time over all time
 * @param informationEfficiency D-efficiency against the D-optimal design (NaN if undefined)
 * @param momentError         median relative errors of the ground's n, U, T against the truth
 * @param crlbRatio           rms of (fit - truth) / Cramér-Rao bound of n, U, T
 * @param trackingCentre      band centre against the true proton peak, windows: median, p95, max
 * @param strictReacquireSweeps worst strict reacquisition (band centred within 2 windows), sweeps (0 without jumps, -1 never)
 * @param strictReacquireSeconds worst strict reacquisition, seconds (NaN if never)
 * @param crlbRobust          1.4826 x median |(fit - truth) / Cramér-Rao bound| of n, U, T
 * @param nonStationary       ground fits flagged non-stationary (reduced chi-square above its 0.999 quantile)
 * @param errorUnflagged      median relative errors of n, U, T without the flagged fits
 * @param crlbUnflagged       rms CRLB ratios of n, U, T without the flagged fits
 */
public record RunRow(int set, int run, double lockFraction, int alphaLocks, int reacquireSweeps,
        double reacquireSeconds, double spectraPerSecond, double bitsPerSecond, double integratingFraction,
        double informationEfficiency, double[] momentError, double[] crlbRatio,
        double[] trackingCentre, int strictReacquireSweeps, double strictReacquireSeconds,
        double[] crlbRobust, int nonStationary, double[] errorUnflagged, double[] crlbUnflagged) {

    /** CSV header, matching {@link #toCsv()}. */
    public static final String HEADER = "set,run,lockFraction,alphaLocks,reacquireSweeps,reacquireSeconds,"
            + "spectraPerSecond,bitsPerSecond,integratingFraction,informationEfficiency,errorN,errorU,errorT,"
            + "crlbRatioN,crlbRatioU,crlbRatioT,centreErrorMedian,centreErrorP95,centreErrorMax,"
            + "strictReacquireSweeps,strictReacquireSeconds,crlbRobustN,crlbRobustU,crlbRobustT,nonStationary,"
            + "errorUnflaggedN,errorUnflaggedU,errorUnflaggedT,crlbRatioUnflaggedN,crlbRatioUnflaggedU,crlbRatioUnflaggedT";
    private static final int FIELDS = 31;

    /** Mean of the three median relative moment errors: the accuracy objective (lower is better). */
    public double accuracy() {
        return (momentError[0] + momentError[1] + momentError[2]) / 3;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof RunRow r && toCsv().equals(r.toCsv());
    }

    @Override
    public int hashCode() {
        return toCsv().hashCode();
    }

    @Override
    public String toString() {
        return "RunRow[" + HEADER + " = " + toCsv() + "]";
    }

    /** The row of a finished run, with the ground's figures. */
    static RunRow of(int set, int run, RunSummary s, GroundCheck.GroundFigures g) {
        double cadence = s.spectraPerSecond().get(SweepMode.SURVEY) + s.spectraPerSecond().get(SweepMode.FOCUS);
        return new RunRow(set, run, s.lockFraction(), s.alphaLocks(), s.reacquireSweepsMax(),
                s.reacquireSecondsMax(), cadence, s.telemetry().frameBitsPerSecond(), s.integratingFraction(),
                s.informationEfficiency(), g.medianRelative().clone(), g.crlbRatio().clone(),
                new double[] {s.tracking().centreMedian(), s.tracking().centreP95(), s.tracking().centreMax()},
                s.strictReacquireSweepsMax(), s.strictReacquireSecondsMax(), g.robustCrlbRatio().clone(),
                g.nonStationary(), g.stationary().medianRelative().clone(), g.stationary().crlbRatio().clone());
    }

    /**
     * One CSV line (no newline): integers as {@link Integer#toString}, doubles as {@link Double#toString}
     * (what {@code String.format("%s")} gave before, without its parsing of a format per row: the rows are
     * compared through this text, {@link #equals}).
     */
    public String toCsv() {
        StringBuilder b = new StringBuilder(400);
        b.append(set).append(',').append(run).append(',').append(lockFraction).append(',').append(alphaLocks)
                .append(',').append(reacquireSweeps).append(',').append(reacquireSeconds).append(',')
                .append(spectraPerSecond).append(',').append(bitsPerSecond).append(',').append(integratingFraction)
                .append(',').append(informationEfficiency);
        appendAll(b, momentError);
        appendAll(b, crlbRatio);
        appendAll(b, trackingCentre);
        b.append(',').append(strictReacquireSweeps).append(',').append(strictReacquireSeconds);
        appendAll(b, crlbRobust);
        b.append(',').append(nonStationary);
        appendAll(b, errorUnflagged);
        appendAll(b, crlbUnflagged);
        return b.toString();
    }

    /** The three values of {@code v}, each after a comma. */
    private static void appendAll(StringBuilder b, double[] v) {
        b.append(',').append(v[0]).append(',').append(v[1]).append(',').append(v[2]);
    }

    /** Parses a line written by {@link #toCsv()}. */
    public static RunRow parse(String line) {
        String[] f = line.split(",", -1);
        if (f.length != FIELDS) {
            throw new IllegalArgumentException("expected " + FIELDS + " fields, got " + f.length + ": " + line);
        }
        return new RunRow(Integer.parseInt(f[0]), Integer.parseInt(f[1]), Double.parseDouble(f[2]),
                Integer.parseInt(f[3]), Integer.parseInt(f[4]), Double.parseDouble(f[5]), Double.parseDouble(f[6]),
                Double.parseDouble(f[7]), Double.parseDouble(f[8]), Double.parseDouble(f[9]),
                new double[] {Double.parseDouble(f[10]), Double.parseDouble(f[11]), Double.parseDouble(f[12])},
                new double[] {Double.parseDouble(f[13]), Double.parseDouble(f[14]), Double.parseDouble(f[15])},
                new double[] {Double.parseDouble(f[16]), Double.parseDouble(f[17]), Double.parseDouble(f[18])},
                Integer.parseInt(f[19]), Double.parseDouble(f[20]),
                new double[] {Double.parseDouble(f[21]), Double.parseDouble(f[22]), Double.parseDouble(f[23])},
                Integer.parseInt(f[24]),
                new double[] {Double.parseDouble(f[25]), Double.parseDouble(f[26]), Double.parseDouble(f[27])},
                new double[] {Double.parseDouble(f[28]), Double.parseDouble(f[29]), Double.parseDouble(f[30])});
    }
}
