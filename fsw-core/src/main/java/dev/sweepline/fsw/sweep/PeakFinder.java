package dev.sweepline.fsw.sweep;

import dev.sweepline.fsw.table.SweepParameters;

/**
 * Finds the proton peak of a spectrum in integer and fixed-point arithmetic (sweep design note,
 * R5-R8): integer argmax; alpha discrimination (a significant local maximum near
 * code(argmax) / alphaRatio is the proton peak); 3-point parabola refinement (Q8); FWHM from the
 * interpolated half-maximum crossings (Q8). Allocation-free; reads the scheduler's table arrays.
 */
final class PeakFinder {
    private final int[] centreCode;
    private final SweepParameters params;
    private final int rangeRatioShift;

    /**
     * @param centreCode      the active table's window centre codes, (low + high) / 2, owned and kept
     *                        current by the scheduler
     * @param params          the active parameters, owned and kept current by the scheduler
     * @param rangeRatioShift log2 of the gain ranges' ratio (InstrumentDescription#rangeRatioShift)
     */
    PeakFinder(int[] centreCode, SweepParameters params, int rangeRatioShift) {
        this.centreCode = centreCode;
        this.params = params;
        this.rangeRatioShift = rangeRatioShift;
    }

    /** Analyses {@code s} and stores the result in its peak fields. */
    void analyse(Spectrum s) {
        int n = s.count();
        if (n == 0) {
            s.clearPeak();
            return;
        }
        int argmax = 0;
        for (int i = 1; i < n; i++) {
            if (s.currentUnits(i) > s.currentUnits(argmax)) {
                argmax = i;
            }
        }
        int peak = argmax;
        int proton = protonBelow(s, argmax);
        if (proton >= 0) {
            peak = proton;
        }
        if (!significant(s, peak, s.currentUnits(peak))) {
            s.setArgmaxOnly(argmax);
            return;
        }
        int peakLocalQ8 = (peak << 8) + parabolaOffsetQ8(s, peak);
        long leftQ8 = leftCrossingQ8(s, peak);
        long rightQ8 = rightCrossingQ8(s, peak);
        int fwhmQ8 = fwhmQ8(s.count(), peakLocalQ8, leftQ8, rightQ8);
        int lowHalfQ8 = leftQ8 >= 0 ? (int) (peakLocalQ8 - leftQ8) : fwhmQ8 / 2;
        s.setPeak(argmax, peak, (s.firstWindow() << 8) + peakLocalQ8, fwhmQ8, lowHalfQ8);
    }

    /**
     * The entry of a significant local maximum whose window centre lies at code(argmax) / alphaRatio
     * within the tolerance, or -1. When several qualify, the highest wins.
     */
    int protonBelow(Spectrum s, int argmax) {
        int argmaxWindow = s.window(argmax);
        long target = ((long) centreCode[argmaxWindow] << 16) / params.alphaRatioQ16;
        long tolerance = (target * params.alphaToleranceQ16) >> 16;
        int best = -1;
        // i >= 1: entry 0 has no lower neighbour, so it cannot be shown to be a local maximum
        for (int i = argmax - 1; i >= 1; i--) {
            long centre = centreCode[s.window(i)];
            if (centre < target - tolerance) {
                break;
            }
            if (centre > target + tolerance) {
                continue;
            }
            long y = s.currentUnits(i);
            if (y <= s.currentUnits(i - 1) || y < s.currentUnits(i + 1)) {
                continue;
            }
            long dip = y;
            for (int k = i + 1; k <= argmax; k++) {
                dip = Math.min(dip, s.currentUnits(k));
            }
            long prominence = y - dip;
            long needed = Math.max(noiseThreshold(s, i), (y * params.prominenceFractionQ8) >> 8);
            if (prominence > needed && significant(s, i, y) && (best < 0 || y > s.currentUnits(best))) {
                best = i;
            }
        }
        return best;
    }

    /** True when {@code y} is above the noise threshold of entry {@code i}. */
    boolean significant(Spectrum s, int i, long y) {
        return y > noiseThreshold(s, i);
    }

    /**
     * Significance threshold of entry {@code i}, range-0 units: sigmas * (2 * quadrant noise), the
     * factor 2 being the rms sum of four independent quadrants, scaled to the entry's range.
     */
    long noiseThreshold(Spectrum s, int i) {
        long sigmaCounts = 2L * params.noiseCountsPerQuadrant;
        return (params.significanceSigmas * sigmaCounts) << (rangeRatioShift * s.gainRange(i));
    }

    /** Vertex offset of the parabola through entries p-1, p, p+1, Q8 windows, clamped to +/-0.5 window. */
    static int parabolaOffsetQ8(Spectrum s, int p) {
        if (p <= 0 || p >= s.count() - 1) {
            return 0;
        }
        long ym = s.currentUnits(p - 1);
        long y0 = s.currentUnits(p);
        long yp = s.currentUnits(p + 1);
        long curvature = ym - 2 * y0 + yp;
        if (curvature >= 0) {
            return 0; // flat or not a maximum: keep the integer peak
        }
        long offset = ((ym - yp) * 128) / curvature;
        return (int) Math.max(-128, Math.min(128, offset));
    }

    /**
     * FWHM in Q8 windows from the linearly interpolated half-maximum crossings either side of
     * entry {@code p}. A side with no crossing inside the spectrum mirrors the other side; with
     * neither, the spectrum width.
     */
    static int fwhmQ8(Spectrum s, int p, int peakLocalQ8) {
        return fwhmQ8(s.count(), peakLocalQ8, leftCrossingQ8(s, p), rightCrossingQ8(s, p));
    }

    /** As {@link #fwhmQ8(Spectrum, int, int)} from the crossings (-1: none) of a spectrum of {@code n} entries. */
    private static int fwhmQ8(int n, int peakLocalQ8, long leftQ8, long rightQ8) {
        if (leftQ8 >= 0 && rightQ8 >= 0) {
            return (int) (rightQ8 - leftQ8);
        }
        if (leftQ8 >= 0) {
            return (int) (2 * (peakLocalQ8 - leftQ8));
        }
        if (rightQ8 >= 0) {
            return (int) (2 * (rightQ8 - peakLocalQ8));
        }
        return n << 8;
    }

    /** The half-maximum crossing below entry {@code p}, Q8 entries, or -1 when the spectrum has none. */
    private static long leftCrossingQ8(Spectrum s, int p) {
        long half = s.currentUnits(p) / 2;
        int i = p;
        while (i > 0 && s.currentUnits(i - 1) >= half) {
            i--;
        }
        return i > 0 ? crossingQ8(i - 1, s.currentUnits(i - 1), s.currentUnits(i), half) : -1;
    }

    /** The half-maximum crossing above entry {@code p}, Q8 entries, or -1 when the spectrum has none. */
    private static long rightCrossingQ8(Spectrum s, int p) {
        long half = s.currentUnits(p) / 2;
        int j = p;
        while (j < s.count() - 1 && s.currentUnits(j + 1) >= half) {
            j++;
        }
        return j < s.count() - 1 ? crossingQ8(j, s.currentUnits(j), s.currentUnits(j + 1), half) : -1;
    }

    /**
     * Position, Q8 entries, where the line from (a, ya) to (a + 1, yb) crosses {@code half}; the
     * callers guarantee that {@code half} lies between ya and yb, one side strictly, so ya != yb.
     */
    private static long crossingQ8(int a, long ya, long yb, long half) {
        return ((long) a << 8) + ((ya - half) << 8) / (ya - yb);
    }
}
