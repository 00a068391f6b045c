package dev.sweepline.fsw.sweep;

import dev.sweepline.fsw.instrument.InstrumentDescription;
import dev.sweepline.fsw.link.SampleReply;
import dev.sweepline.fsw.table.WindowTable;

/**
 * One completed sweep, preallocated for {@link WindowTable#CAPACITY} windows and refilled for every
 * sweep. Entries are in ascending window order even when the sweep stepped downward: entry {@code i}
 * is window {@code firstWindow() + i}.
 *
 * <p>{@link #currentUnits(int)} is the sum of the four quadrants above the pedestal in range-0 LSB
 * units, {@code (counts - pedestal) << (rangeRatioShift * range)} (a long: a 24-bit ADC's top range
 * overflows an int), so windows read in different gain ranges compare. The pedestal, the range ratio
 * and the quadrants come from the instrument description; the buffers hold {@link WindowTable#CAPACITY}
 * windows of 4 quadrants.
 * The peak fields are filled by the scheduler's analysis when the sweep completes. Threading: owned
 * by the scheduler's thread; read it only during {@link SweepListener#onSweepComplete} or from the
 * same thread.
 */
public final class Spectrum {
    /** Status bit (above the {@link SampleReply} bits): no reply was ingested for this window. */
    public static final int STATUS_MISSING = 1 << 8;
    /** Status bit: the reply's gain range was not a valid range; the commanded one was used. */
    public static final int STATUS_BAD_RANGE = 1 << 9;

    private static final int Q = InstrumentDescription.QUADRANTS;

    private final int pedestalCounts;
    private final int rangeRatioShift;
    private final int adcTopCode;

    private final int[] gainRange = new int[WindowTable.CAPACITY];
    private final int[] quadrant = new int[WindowTable.CAPACITY * Q];
    private final int[] status = new int[WindowTable.CAPACITY];
    private final long[] currentUnits = new long[WindowTable.CAPACITY];
    private final long[] maxQuadrantUnits = new long[WindowTable.CAPACITY];

    private long sweepNumber;
    private SweepMode mode = SweepMode.SURVEY;
    private long startMicros;
    private long endMicros;
    private int count;
    private int firstWindow;
    private boolean ascending;
    private boolean interleaved;

    private boolean peakValid;
    private int peakIndex = -1;
    private int argmaxIndex = -1;
    private int peakWindowQ8;
    private int fwhmWindowsQ8;
    private int lowHalfWindowsQ8;
    private int integrationPeriods;
    private final int[] supportEntry = new int[FocusDesign.MAX_SUPPORT_WINDOWS];
    private final int[] supportPeriods = new int[FocusDesign.MAX_SUPPORT_WINDOWS];
    private int supportCount;

    /** An empty spectrum for sweeps of {@code instrument}. */
    public Spectrum(InstrumentDescription instrument) {
        this.pedestalCounts = instrument.pedestalCounts();
        this.rangeRatioShift = instrument.rangeRatioShift();
        this.adcTopCode = instrument.adcTopCode();
    }

    /** Sweep number, counting completed sweeps from 1. */
    public long sweepNumber() {
        return sweepNumber;
    }

    /** Mode the sweep was made in. */
    public SweepMode mode() {
        return mode;
    }

    /** Time of the sweep's first step, microseconds. */
    public long startMicros() {
        return startMicros;
    }

    /** Time the last reply was ingested, microseconds. */
    public long endMicros() {
        return endMicros;
    }

    /** Number of windows in the sweep. */
    public int count() {
        return count;
    }

    /** Window index of entry 0. */
    public int firstWindow() {
        return firstWindow;
    }

    /** True when the sweep stepped upward in window index. */
    public boolean ascending() {
        return ascending;
    }

    /**
     * True when the sweep stepped in the interleaved focus order (sweep design note R22, {@code
     * SweepScheduler.interleavedOffset}): the even offsets from its starting end outward, then the odd ones back.
     */
    public boolean interleaved() {
        return interleaved;
    }

    /** Window index of entry {@code i}. */
    public int window(int i) {
        return firstWindow + i;
    }

    /** Gain range entry {@code i} was read in. */
    public int gainRange(int i) {
        return gainRange[i];
    }

    /** Raw ADC counts of quadrant {@code q} (0..3) of entry {@code i}. */
    public int quadrant(int i, int q) {
        return quadrant[i * Q + q];
    }

    /** True when a quadrant of entry {@code i} reads the ADC's top code (saturated, FORMAT.md derived values). */
    public boolean anyAtTop(int i) {
        for (int q = 0; q < Q; q++) {
            if (quadrant[i * Q + q] >= adcTopCode) {
                return true;
            }
        }
        return false;
    }

    /** Status bits of entry {@code i}: {@link SampleReply} {@code STATUS_*} and this class's. */
    public int status(int i) {
        return status[i];
    }

    /** Total current of entry {@code i}, range-0 LSB units (may be slightly negative from noise). */
    public long currentUnits(int i) {
        return currentUnits[i];
    }

    /** Largest single-quadrant current of entry {@code i}, range-0 LSB units. */
    public long maxQuadrantUnits(int i) {
        return maxQuadrantUnits[i];
    }

    /** True when the analysis found a significant proton peak. */
    public boolean peakValid() {
        return peakValid;
    }

    /** Entry index of the proton peak (integer), or -1. */
    public int peakIndex() {
        return peakIndex;
    }

    /** Entry index of the largest current (may be a non-proton maximum), or -1. */
    public int argmaxIndex() {
        return argmaxIndex;
    }

    /** Refined proton peak in table window-index units, Q8 (valid when {@link #peakValid()}). */
    public int peakWindowQ8() {
        return peakWindowQ8;
    }

    /** Full width at half maximum of the proton peak, windows, Q8 (valid when {@link #peakValid()}). */
    public int fwhmWindowsQ8() {
        return fwhmWindowsQ8;
    }

    /**
     * The low-voltage side of the FWHM: from the low half-maximum crossing to the refined peak, windows,
     * Q8 (valid when {@link #peakValid()}; half the FWHM when that side has no crossing in the spectrum).
     * A hot, slow wind's peak is lopsided on a table of equal voltage ratios: more windows below the
     * peak than above it.
     */
    public int lowHalfWindowsQ8() {
        return lowHalfWindowsQ8;
    }

    /** Current of the proton peak entry, range-0 units (0 when no peak). */
    public long peakCurrentUnits() {
        return peakIndex >= 0 ? currentUnits[peakIndex] : 0;
    }

    /**
     * Modulation periods integrated per window in this sweep: every window's, or in a support-dwell focus
     * sweep every window's but the support windows' (the floor).
     */
    public int integrationPeriods() {
        return integrationPeriods;
    }

    /** Modulation periods integrated in entry {@code i}: a support window's dwell, else the sweep's. */
    public int integrationPeriodsOf(int i) {
        for (int k = 0; k < supportCount; k++) {
            if (supportEntry[k] == i) {
                return supportPeriods[k];
            }
        }
        return integrationPeriods;
    }

    /** Support windows of a support-dwell focus sweep (0..3; 0 in every other sweep). */
    public int supportCount() {
        return supportCount;
    }

    /** Entry index of support window {@code k} (ascending in k). */
    public int supportEntry(int k) {
        return supportEntry[k];
    }

    /** Modulation periods integrated in support window {@code k}. */
    public int supportPeriods(int k) {
        return supportPeriods[k];
    }

    /** Sets support window {@code k} (by the scheduler, after {@link #begin}, k = 0, 1, ... in order). */
    void support(int k, int entry, int periods) {
        supportEntry[k] = entry;
        supportPeriods[k] = periods;
        supportCount = k + 1;
    }

    /** Marks the sweep as stepped in the interleaved order (by the scheduler, after {@link #begin}). */
    void interleaved(boolean on) {
        interleaved = on;
    }

    /** Sets the sweep's dwell (by the scheduler, after {@link #begin}). */
    void integrationPeriods(int periods) {
        integrationPeriods = periods;
    }

    /** Starts a new sweep over windows first..first+count-1; every entry starts as missing. */
    void begin(long sweepNumber, SweepMode mode, int firstWindow, int count, boolean ascending, long startMicros) {
        this.sweepNumber = sweepNumber;
        this.mode = mode;
        this.firstWindow = firstWindow;
        this.count = count;
        this.ascending = ascending;
        this.interleaved = false;
        this.startMicros = startMicros;
        this.endMicros = startMicros;
        this.supportCount = 0;
        for (int i = 0; i < count; i++) {
            gainRange[i] = 0;
            status[i] = STATUS_MISSING;
            currentUnits[i] = 0;
            maxQuadrantUnits[i] = 0;
            for (int q = 0; q < Q; q++) {
                quadrant[i * Q + q] = pedestalCounts;
            }
        }
        clearPeak();
    }

    /**
     * Stores a reply as entry {@code i}, read in {@code range} (already checked by the caller);
     * {@code extraStatus} is or-ed into the reply's status.
     */
    void store(int i, SampleReply reply, int range, int extraStatus) {
        int shift = rangeRatioShift * range;
        long total = 0;
        long max = Long.MIN_VALUE;
        for (int q = 0; q < Q; q++) {
            int counts = reply.quadrant[q];
            quadrant[i * Q + q] = counts;
            // multiply, not shift: noise can leave counts slightly below the pedestal
            long units = (long) (counts - pedestalCounts) * (1L << shift);
            total += units;
            if (units > max) {
                max = units;
            }
        }
        gainRange[i] = range;
        status[i] = reply.status | extraStatus;
        currentUnits[i] = total;
        maxQuadrantUnits[i] = max;
    }

    /** Sets entry {@code i} directly (for analysis tests and replay): total current only. */
    void setEntry(int i, long totalUnits, int range, int entryStatus) {
        currentUnits[i] = totalUnits;
        maxQuadrantUnits[i] = totalUnits / Q;
        gainRange[i] = range;
        status[i] = entryStatus;
    }

    void end(long endMicros) {
        this.endMicros = endMicros;
    }

    void clearPeak() {
        peakValid = false;
        peakIndex = -1;
        argmaxIndex = -1;
        peakWindowQ8 = 0;
        fwhmWindowsQ8 = 0;
        lowHalfWindowsQ8 = 0;
    }

    void setPeak(int argmaxIndex, int peakIndex, int peakWindowQ8, int fwhmWindowsQ8, int lowHalfWindowsQ8) {
        this.argmaxIndex = argmaxIndex;
        this.peakIndex = peakIndex;
        this.peakWindowQ8 = peakWindowQ8;
        this.fwhmWindowsQ8 = fwhmWindowsQ8;
        this.lowHalfWindowsQ8 = lowHalfWindowsQ8;
        this.peakValid = true;
    }

    void setArgmaxOnly(int argmaxIndex) {
        clearPeak();
        this.argmaxIndex = argmaxIndex;
    }
}
