package dev.sweepline.ground.spectrum;

import dev.sweepline.ground.instrument.GroundInstrument;
import dev.sweepline.ground.packet.CucTime;
import java.util.Arrays;

/**
 * One decoded spectrum packet (ICD §4) held in buffers sized once for the largest spectrum ({@value
 * SpectrumPacketDecoder#MAX_WINDOWS} windows) and overwritten by the next decode: the flyweight the
 * decoder's hot path fills, so that decoding allocates nothing per spectrum. Its values mean what the
 * components of {@link DecodedSpectrum} of the same names mean; indices are window 0..c−1 (windows
 * f..f+c−1) and quadrant 0..3. Valid only until the decoder that filled it decodes again; {@link
 * #toDecoded()} makes the owned, immutable copy. Not thread-safe.
 */
public final class SpectrumView implements SpectrumValues {
    private static final int MAX = SpectrumPacketDecoder.MAX_WINDOWS;

    long coarseSeconds;
    int fine;
    int apid;
    int sequenceCount;
    int layoutVersion;
    int mode;
    int flags;
    int sweep;
    int tableId;
    int firstWindow;
    int windowCount;
    int peakQ8;
    int integrationPeriods;
    int compression;
    GroundInstrument instrument;
    final int[] gainRange = new int[MAX];
    final boolean[] saturated = new boolean[MAX];
    final int[][] adcCounts = new int[DecodedSpectrum.QUADRANTS][QuadrantDecompressor.paddedCount(MAX)];
    final double[][] currentAmps = new double[DecodedSpectrum.QUADRANTS][MAX];
    final double[] totalAmps = new double[MAX];
    final double[] lowVolts = new double[MAX];
    final double[] highVolts = new double[MAX];
    /** Integration periods of each window: the packet's, or a support window's (layout 3). */
    final int[] windowPeriods = new int[MAX];

    /** CUC coarse time of the sweep's first step, seconds. */
    public long coarseSeconds() {
        return coarseSeconds;
    }

    /** CUC fine time, 2^-16 s units (ICD §3.2). */
    public int fine() {
        return fine;
    }

    /** 0x100 survey or 0x101 focus. */
    public int apid() {
        return apid;
    }

    /** Packet sequence count. */
    public int sequenceCount() {
        return sequenceCount;
    }

    /** 1 survey, 2 focus. */
    public int mode() {
        return mode;
    }

    /** "survey" or "focus" ({@link DecodedSpectrum#modeName(int)}). */
    public String modeName() {
        return DecodedSpectrum.modeName(mode);
    }

    /** Flags bit 7: the sweep stepped downward (ICD §4). */
    @Override
    public boolean steppedDown() {
        return (flags & SpectrumHeader.STEPPED_DOWN) != 0;
    }

    /** Flags bit 5: the sweep stepped in the interleaved order (ICD §4). */
    @Override
    public boolean interleaved() {
        return (flags & SpectrumHeader.INTERLEAVED) != 0;
    }

    /** Sweep number (16 bits, wraps). */
    public int sweep() {
        return sweep;
    }

    /** CUC time of the sweep's first step (a new object each call). */
    public CucTime time() {
        return new CucTime(coarseSeconds, fine);
    }

    /** Window table id (0: built-in default table). */
    @Override
    public int tableId() {
        return tableId;
    }

    /** Window count c. */
    public int windowCount() {
        return windowCount;
    }

    /** First window index f. */
    public int firstWindow() {
        return firstWindow;
    }

    /** The instrument whose description gave the currents and edges. */
    public GroundInstrument instrument() {
        return instrument;
    }

    /** Gain range of window {@code i}. */
    public int gainRange(int i) {
        return gainRange[i];
    }

    /** Saturation flag of window {@code i}. */
    public boolean saturated(int i) {
        return saturated[i];
    }

    /** ADC sample of quadrant {@code q}, window {@code i}. */
    public int adcCount(int q, int i) {
        return adcCounts[q][i];
    }

    /** Current of quadrant {@code q}, window {@code i}, amperes. */
    public double currentAmps(int q, int i) {
        return currentAmps[q][i];
    }

    /** Sum of the four quadrant currents of window {@code i}, amperes. */
    public double totalAmps(int i) {
        return totalAmps[i];
    }

    /** Modulation periods integrated in window {@code i}: the packet's dwell, or its own in layout 3. */
    public int integrationPeriods(int i) {
        return windowPeriods[i];
    }

    /** Low edge of window {@code i}, volts; NaN when the table is not known. */
    public double lowVolts(int i) {
        return lowVolts[i];
    }

    /** High edge of window {@code i}, volts; NaN when the table is not known. */
    public double highVolts(int i) {
        return highVolts[i];
    }

    /** An owned copy: the {@link DecodedSpectrum} the same packet decodes to. */
    public DecodedSpectrum toDecoded() {
        int c = windowCount;
        int[][] adc = new int[DecodedSpectrum.QUADRANTS][];
        double[][] amps = new double[DecodedSpectrum.QUADRANTS][];
        for (int q = 0; q < DecodedSpectrum.QUADRANTS; q++) {
            adc[q] = Arrays.copyOf(adcCounts[q], c);
            amps[q] = Arrays.copyOf(currentAmps[q], c);
        }
        return new DecodedSpectrum(time(), apid, sequenceCount, mode,
                (flags & SpectrumHeader.STEPPED_DOWN) != 0, (flags & SpectrumHeader.TABLE_CHANGED) != 0, sweep, tableId,
                firstWindow, c, peakQ8, integrationPeriods, compression, Arrays.copyOf(gainRange, c),
                Arrays.copyOf(saturated, c), adc, amps, Arrays.copyOf(totalAmps, c), Arrays.copyOf(lowVolts, c),
                Arrays.copyOf(highVolts, c), layoutVersion, instrument, Arrays.copyOf(windowPeriods, c),
                (flags & SpectrumHeader.INTERLEAVED) != 0);
    }
}
