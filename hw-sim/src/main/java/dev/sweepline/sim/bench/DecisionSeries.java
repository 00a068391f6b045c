package dev.sweepline.sim.bench;

import dev.sweepline.fsw.sweep.SweepMode;
import dev.sweepline.sim.report.DecisionChart;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * The sweeps the decision chart draws, bounded: every sweep while there are at most {@link #CAPACITY},
 * then every 2nd, 4th, ... sweep (when the series is full, every other point is dropped and the stride
 * doubles), so a run of any length is drawn from at most {@link #CAPACITY} evenly taken sweeps. The points
 * live in primitive arrays that grow with the series up to the capacity (a short run pays for its own
 * points only), and stay at it from then on.
 */
public final class DecisionSeries {
    /** Points kept at most: more than a 60-minute run's sweeps (about 5800); 33 B each. */
    static final int CAPACITY = 16_384;
    /** Points room is made for at first: a minute's sweeps (about 95 on the default scenario). */
    private static final int INITIAL = 128;
    private final int capacity;
    private double[] seconds;
    private boolean[] focus;
    private int[] first;
    private int[] last;
    private double[] peak;
    private int[] trueProton;
    private int[] trueAlpha;
    private int size;
    private long offered;
    private long stride = 1;

    /** A series of at most {@code capacity} points (at least 2). */
    DecisionSeries(int capacity) {
        if (capacity < 2) {
            throw new IllegalArgumentException("capacity " + capacity + " below 2");
        }
        this.capacity = capacity;
        room(Math.min(INITIAL, capacity));
    }

    /** Makes the arrays {@code length} long, keeping the points. */
    private void room(int length) {
        seconds = seconds == null ? new double[length] : Arrays.copyOf(seconds, length);
        focus = focus == null ? new boolean[length] : Arrays.copyOf(focus, length);
        first = first == null ? new int[length] : Arrays.copyOf(first, length);
        last = last == null ? new int[length] : Arrays.copyOf(last, length);
        peak = peak == null ? new double[length] : Arrays.copyOf(peak, length);
        trueProton = trueProton == null ? new int[length] : Arrays.copyOf(trueProton, length);
        trueAlpha = trueAlpha == null ? new int[length] : Arrays.copyOf(trueAlpha, length);
    }

    /** Offers one sweep: kept when its index is a multiple of the current stride. */
    void add(SweepRecord r) {
        long index = offered++;
        if (index % stride != 0) {
            return;
        }
        if (size == seconds.length && size < capacity) {
            room(Math.min(capacity, 2 * size));
        } else if (size == capacity) {
            int kept = 0;
            for (int i = 0; i < size; i += 2) {
                move(i, kept++);
            }
            size = kept;
            stride *= 2;
            if (index % stride != 0) {
                return;
            }
        }
        seconds[size] = r.midMicros() / 1e6;
        focus[size] = r.mode() == SweepMode.FOCUS;
        first[size] = r.firstWindow();
        last[size] = r.lastWindow();
        peak[size] = r.peakWindow();
        trueProton[size] = r.trueProtonWindow();
        trueAlpha[size] = r.trueAlphaWindow();
        size++;
    }

    private void move(int from, int to) {
        seconds[to] = seconds[from];
        focus[to] = focus[from];
        first[to] = first[from];
        last[to] = last[from];
        peak[to] = peak[from];
        trueProton[to] = trueProton[from];
        trueAlpha[to] = trueAlpha[from];
    }

    /** The points, in time order (a new list). */
    public List<DecisionChart.Sweep> points() {
        List<DecisionChart.Sweep> out = new ArrayList<>(size);
        for (int i = 0; i < size; i++) {
            out.add(new DecisionChart.Sweep(seconds[i], focus[i], first[i], last[i], peak[i], trueProton[i], trueAlpha[i]));
        }
        return out;
    }

    /** Every how many sweeps a point is kept now (1: every sweep). */
    public long stride() {
        return stride;
    }

    /** Sweeps offered. */
    public long sweeps() {
        return offered;
    }
}
