package dev.sweepline.sim.bench;

import dev.sweepline.fsw.sweep.SweepMode;
import dev.sweepline.sim.scenario.Scenario.Jump;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.function.Predicate;

/**
 * The run's sweep figures kept as the sweeps complete, in memory bounded by the table (not by the run's
 * length): sweeps by mode, the lock and alpha-lock counts, the tracking error ({@link TrackingError}) and
 * the reacquisition after each jump ({@link Reacquisition}, loose and strict). They are the figures the
 * same functions give over the list of every record: the tracking errors are whole multiples of 1/256 of
 * a window (band centre and found peak are the flight software's Q8 windows, the true peak a whole
 * window), counted exactly per multiple ({@link ErrorCounts}), and the quantile is the same order
 * statistic {@code sorted[floor(q n)]}.
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

    /**
     * Exact counts of errors that are whole multiples of 1/256 window: one count per multiple, in an
     * array grown (doubling) to the largest error seen, so a run's tally costs what its errors need
     * (a tracking run's errors stay within a few windows: a few thousand counts) and at most the
     * table's windows x 256 counts while the errors stay within the table (band centre, found and true
     * peak all lie in it); a larger error grows the array to it, still exact.
     */
    static final class ErrorCounts {
        /** Counts allocated at the first error: errors below 4 windows. */
        private static final int FIRST_LENGTH = 4 * UNITS_PER_WINDOW;
        private final int tableUnits;
        private int[] counts = new int[0];
        private long total;
        private int max = -1;

        /** Counts for a table of {@code windows} windows. */
        ErrorCounts(int windows) {
            tableUnits = Math.max(1, windows) * UNITS_PER_WINDOW;
        }

        void add(double windows) {
            double units = windows * UNITS_PER_WINDOW;
            long k = (long) units;
            if (k != units || k < 0 || k >= Integer.MAX_VALUE / 2) {
                throw new IllegalArgumentException("tracking error " + windows + " windows is not a multiple of 1/"
                        + UNITS_PER_WINDOW + (k >= Integer.MAX_VALUE / 2 ? " within the counts' range" : ""));
            }
            int unit = (int) k;
            if (unit >= counts.length) {
                int length = Math.max(FIRST_LENGTH, counts.length);
                while (length <= unit) {
                    length *= 2;
                }
                if (unit < tableUnits) {
                    length = Math.min(length, tableUnits);
                }
                counts = Arrays.copyOf(counts, length);
            }
            counts[unit]++;
            total++;
            max = Math.max(max, unit);
        }

        int count() {
            return (int) total;
        }

        /** Counts held (the array's length). */
        int length() {
            return counts.length;
        }

        /** The order statistic sorted[floor(q n)] (0-based, at most n - 1), windows; NaN when empty. */
        double quantile(double q) {
            if (total == 0) {
                return Double.NaN;
            }
            long rank = (long) Math.min(total - 1, Math.floor(q * total));
            long seen = 0;
            for (int unit = 0; unit <= max; unit++) {
                seen += counts[unit];
                if (seen > rank) {
                    return unit / (double) UNITS_PER_WINDOW;
                }
            }
            throw new IllegalStateException("rank " + rank + " beyond " + total + " counts");
        }

        double max() {
            return total == 0 ? Double.NaN : max / (double) UNITS_PER_WINDOW;
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
