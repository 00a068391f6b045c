package dev.sweepline.sim.bench;

import dev.sweepline.fsw.sweep.SweepMode;
import dev.sweepline.sim.scenario.Scenario.Jump;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.function.Predicate;
import org.HdrHistogram.HistogramIterationValue;
import org.HdrHistogram.IntCountsHistogram;

/**
 * The run's sweep figures kept as the sweeps complete, in memory bounded by the table (not by the run's
 * length): sweeps by mode, the lock and alpha-lock counts, the tracking error ({@link TrackingError}) and
 * the reacquisition after each jump ({@link Reacquisition}, loose and strict). They are the figures the
 * same functions give over the list of every record: the tracking errors are whole multiples of 1/256 of
 * a window (band centre and found peak are the flight software's Q8 windows, the true peak a whole
 * window), counted exactly per multiple in an HdrHistogram at unit resolution, and the quantile is the
 * same order statistic {@code sorted[floor(q n)]}.
 */
final class SweepTally {
    /** Tracking errors are counted in units of 1/256 window (the Q8 of the flight software's windows). */
    static final int UNITS_PER_WINDOW = 256;

    private final Map<SweepMode, Integer> byMode = new EnumMap<>(SweepMode.class);
    private int focus;
    private int locked;
    private int alphaLocks;
    private final ErrorCounts centre;
    private final ErrorCounts peak;
    private final List<Watch> loose = new ArrayList<>();
    private final List<Watch> strict = new ArrayList<>();

    /** A tally for a table of {@code windows} windows and the scenario's {@code jumps}. */
    SweepTally(int windows, List<Jump> jumps) {
        for (SweepMode m : SweepMode.values()) {
            byMode.put(m, 0);
        }
        centre = new ErrorCounts(windows);
        peak = new ErrorCounts(windows);
        for (Jump j : jumps) {
            loose.add(new Watch(j, SweepRecord::locked));
            strict.add(new Watch(j, Reacquisition::centred));
        }
    }

    /** Counts one completed sweep. */
    void add(SweepRecord r) {
        byMode.merge(r.mode(), 1, Integer::sum);
        if (r.mode() == SweepMode.FOCUS) {
            focus++;
            locked += r.locked() ? 1 : 0;
            alphaLocks += r.alphaLock() ? 1 : 0;
        }
        if (r.trueProtonWindow() >= 0) {
            if (r.mode() == SweepMode.FOCUS && !Double.isNaN(r.bandCentre())) {
                centre.add(Math.abs(r.bandCentre() - r.trueProtonWindow()));
            }
            if (Double.isFinite(r.peakWindow())) {
                peak.add(Math.abs(r.peakWindow() - r.trueProtonWindow()));
            }
        }
        for (Watch w : loose) {
            w.add(r);
        }
        for (Watch w : strict) {
            w.add(r);
        }
    }

    /** Completed sweeps by mode (every mode present). */
    Map<SweepMode, Integer> sweepsByMode() {
        return new EnumMap<>(byMode);
    }

    /** Focus sweeps. */
    int focusSweeps() {
        return focus;
    }

    /** Focus sweeps whose band held the true proton peak. */
    int lockedSweeps() {
        return locked;
    }

    /** Focus sweeps centred nearer the true alpha peak. */
    int alphaLocks() {
        return alphaLocks;
    }

    /** The tracking error so far. */
    TrackingError tracking() {
        return new TrackingError(centre.count(), centre.quantile(0.5), centre.quantile(0.95), centre.max(),
                peak.count(), peak.quantile(0.5), peak.quantile(0.95), peak.max());
    }

    /** One reacquisition per jump, in the scenario's order: until the band holds the new peak. */
    List<Reacquisition> reacquisitions() {
        return loose.stream().map(Watch::result).toList();
    }

    /** One strict reacquisition per jump: until the band is centred on the new peak. */
    List<Reacquisition> strictReacquisitions() {
        return strict.stream().map(Watch::result).toList();
    }

    /** Exact counts of errors that are whole multiples of 1/256 window. */
    static final class ErrorCounts {
        private final IntCountsHistogram counts;

        /**
         * Counts for a table of {@code windows} windows: band centre, found peak and true peak all lie in
         * [0, windows), so the errors stay below windows x 256 units, all kept exactly; a larger one (a peak
         * outside the table) grows the histogram at a coarser resolution rather than failing the run.
         */
        ErrorCounts(int windows) {
            long highestUnits = Math.max(2, (long) windows * UNITS_PER_WINDOW - 1);
            counts = new IntCountsHistogram(highestUnits, exactDigits(highestUnits));
            counts.setAutoResize(true);
        }

        /**
         * The fewest significant digits at which an HdrHistogram keeps every value up to {@code highest} at
         * unit resolution: its first bucket holds 2^ceil(log2(2 x 10^digits)) values one apart (HdrHistogram
         * documentation, "subBucketCount").
         */
        static int exactDigits(long highest) {
            for (int digits = 0; digits <= 5; digits++) {
                long largestSingleUnit = 2 * (long) Math.pow(10, digits);
                long subBuckets = Long.highestOneBit(largestSingleUnit - 1) << 1;
                if (highest < subBuckets) {
                    return digits;
                }
            }
            throw new IllegalArgumentException("tracking errors of up to " + highest + " units are beyond exact counting");
        }

        void add(double windows) {
            double units = windows * UNITS_PER_WINDOW;
            long k = (long) units;
            if (k != units || k < 0) {
                throw new IllegalArgumentException("tracking error " + windows + " windows is not a multiple of 1/"
                        + UNITS_PER_WINDOW);
            }
            counts.recordValue(k);
        }

        int count() {
            return (int) counts.getTotalCount();
        }

        /** The order statistic sorted[floor(q n)] (0-based, at most n - 1), windows; NaN when empty. */
        double quantile(double q) {
            long n = counts.getTotalCount();
            if (n == 0) {
                return Double.NaN;
            }
            long rank = (long) Math.min(n - 1, Math.floor(q * n));
            long seen = 0;
            for (HistogramIterationValue v : counts.recordedValues()) {
                seen += v.getCountAtValueIteratedTo();
                if (seen > rank) {
                    return v.getValueIteratedTo() / (double) UNITS_PER_WINDOW;
                }
            }
            throw new IllegalStateException("rank " + rank + " beyond " + n + " counts");
        }

        double max() {
            return counts.getTotalCount() == 0 ? Double.NaN : counts.getMaxValue() / (double) UNITS_PER_WINDOW;
        }
    }

    /** The reacquisition after one jump, followed sweep by sweep as {@link Reacquisition} counts it over a list. */
    private static final class Watch {
        private final Jump jump;
        private final long front;
        private final Predicate<SweepRecord> held;
        private int counted;
        private Reacquisition done;

        Watch(Jump jump, Predicate<SweepRecord> held) {
            this.jump = jump;
            this.front = Reacquisition.frontMicros(jump);
            this.held = held;
        }

        void add(SweepRecord r) {
            if (done != null || r.startMicros() < front) {
                return;
            }
            counted++;
            if (held.test(r)) {
                done = new Reacquisition(jump.label(), front, counted, (r.startMicros() - front) / 1e6);
            }
        }

        Reacquisition result() {
            return done != null ? done : new Reacquisition(jump.label(), front, -1, Double.NaN);
        }
    }
}
