package dev.sweepline.sim.campaign;

import dev.sweepline.fsw.sweep.SweepMode;
import dev.sweepline.sim.bench.RunSummary;
import java.util.Locale;

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
 */
public record RunRow(int set, int run, double lockFraction, int alphaLocks, int reacquireSweeps,
        double reacquireSeconds, double spectraPerSecond, double bitsPerSecond, double integratingFraction,
        double informationEfficiency) {

    /** CSV header, matching {@link #toCsv()}. */
    public static final String HEADER = "set,run,lockFraction,alphaLocks,reacquireSweeps,reacquireSeconds,"
            + "spectraPerSecond,bitsPerSecond,integratingFraction,informationEfficiency";

    /** The row of a finished run. */
    static RunRow of(int set, int run, RunSummary s) {
        double cadence = s.spectraPerSecond().get(SweepMode.SURVEY) + s.spectraPerSecond().get(SweepMode.FOCUS);
        return new RunRow(set, run, s.lockFraction(), s.alphaLocks(), s.reacquireSweepsMax(),
                s.reacquireSecondsMax(), cadence, s.telemetry().frameBitsPerSecond(), s.integratingFraction(),
                s.informationEfficiency());
    }

    /** One CSV line (no newline). */
    public String toCsv() {
        return String.format(Locale.ROOT, "%d,%d,%s,%d,%d,%s,%s,%s,%s,%s", set, run, lockFraction, alphaLocks,
                reacquireSweeps, reacquireSeconds, spectraPerSecond, bitsPerSecond, integratingFraction,
                informationEfficiency);
    }

    /** Parses a line written by {@link #toCsv()}. */
    public static RunRow parse(String line) {
        String[] f = line.split(",", -1);
        if (f.length != 10) {
            throw new IllegalArgumentException("expected 10 fields, got " + f.length + ": " + line);
        }
        return new RunRow(Integer.parseInt(f[0]), Integer.parseInt(f[1]), Double.parseDouble(f[2]),
                Integer.parseInt(f[3]), Integer.parseInt(f[4]), Double.parseDouble(f[5]), Double.parseDouble(f[6]),
                Double.parseDouble(f[7]), Double.parseDouble(f[8]), Double.parseDouble(f[9]));
    }
}
