package dev.sweepline.sim.hv;

import dev.sweepline.fsw.sweep.SweepScheduler;
import dev.sweepline.fsw.table.WindowTable;
import java.util.Arrays;
import java.util.function.IntUnaryOperator;

/**
 * The energy-per-charge windows of a table as the real HV supply makes them (the table's DAC codes
 * through the supply's calibration). The bench places the true peaks on them; the D-optimal design
 * spends its integration time over them.
 */
public final class WindowVolts {
    private final double[] lowVolts;
    private final double[] highVolts;
    /**
     * The distinct edges (see {@link #edgeVolts()}), found on first use (only the yardstick asks; two threads
     * that race find the same edges, and the record's final fields publish them whole).
     */
    private Edges edges;

    /** The distinct edges, volts, and each window's low and high edge in them. */
    private record Edges(double[] volts, int[] low, int[] high) {
    }

    /** The windows of {@code table} through {@code calibration}. */
    public WindowVolts(WindowTable table, HvCalibration calibration) {
        this(table.count(), table::dacLow, table::dacHigh, calibration);
    }

    /** The windows of the scheduler's active table (it changes when a table is commanded or restored). */
    public WindowVolts(SweepScheduler scheduler, HvCalibration calibration) {
        this(scheduler.windowCount(), scheduler::dacLow, scheduler::dacHigh, calibration);
    }

    private WindowVolts(int count, IntUnaryOperator dacLow, IntUnaryOperator dacHigh, HvCalibration calibration) {
        lowVolts = new double[count];
        highVolts = new double[count];
        for (int w = 0; w < count; w++) {
            lowVolts[w] = calibration.volts(dacLow.applyAsInt(w));
            highVolts[w] = calibration.volts(dacHigh.applyAsInt(w));
        }
    }

    private Edges edges() {
        if (edges == null) {
            int count = count();
            int[] low = new int[count];
            int[] high = new int[count];
            double[] volts = new double[2 * count];
            int n = 0;
            for (int w = 0; w < count; w++) {
                if (w > 0 && lowVolts[w] == highVolts[w - 1]) {
                    low[w] = high[w - 1];
                } else {
                    low[w] = n;
                    volts[n++] = lowVolts[w];
                }
                high[w] = n;
                volts[n++] = highVolts[w];
            }
            edges = new Edges(Arrays.copyOf(volts, n), low, high);
        }
        return edges;
    }

    /** Number of windows. */
    public int count() {
        return lowVolts.length;
    }

    /**
     * The window holding {@code volts}: its index, -1 below the first window, {@link #count()} above
     * the last; in a gap between windows, the nearer one.
     */
    public int windowOf(double volts) {
        if (volts < lowVolts[0]) {
            return -1;
        }
        int last = lowVolts.length - 1;
        if (volts >= highVolts[last]) {
            return lowVolts.length;
        }
        int lo = 0;
        int hi = last;
        while (lo < hi) { // first window whose high edge lies above volts
            int mid = (lo + hi) >>> 1;
            if (highVolts[mid] <= volts) {
                lo = mid + 1;
            } else {
                hi = mid;
            }
        }
        if (volts >= lowVolts[lo] || lo == 0) {
            return lo;
        }
        return (lowVolts[lo] - volts) < (volts - highVolts[lo - 1]) ? lo : lo - 1;
    }

    /** Low edge of window {@code w}, volts. */
    public double lowVolts(int w) {
        return lowVolts[w];
    }

    /** High edge of window {@code w}, volts. */
    public double highVolts(int w) {
        return highVolts[w];
    }

    /**
     * The windows' edges, volts, each window's low then high edge in window order, an edge that adjacent
     * windows share (the high edge of one equal to the low edge of the next) listed once; a new array.
     */
    public double[] edgeVolts() {
        return edges().volts().clone();
    }

    /** Index of window {@code w}'s low edge in {@link #edgeVolts()}. */
    public int lowEdge(int w) {
        return edges().low()[w];
    }

    /** Index of window {@code w}'s high edge in {@link #edgeVolts()}. */
    public int highEdge(int w) {
        return edges().high()[w];
    }

    /** Geometric centre of window {@code w}, volts. */
    public double centreVolts(int w) {
        return Math.sqrt(lowVolts[w] * highVolts[w]);
    }
}
