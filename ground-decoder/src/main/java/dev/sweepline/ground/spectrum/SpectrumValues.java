package dev.sweepline.ground.spectrum;

import dev.sweepline.ground.instrument.GroundInstrument;
import dev.sweepline.ground.packet.CucTime;

/**
 * What the fit and the spectrogram read of one spectrum, window by window, in place: an owned {@link
 * DecodedSpectrum} or the decoder's reused {@link SpectrumView} (valid during its listener call only), so that
 * a listener fitting every spectrum needs no owned copy. Values and indices mean what the components of
 * {@link DecodedSpectrum} of the same names mean: window 0..c−1 (windows f..f+c−1), quadrant 0..3.
 */
public interface SpectrumValues {
    /** CUC time of the sweep's first step. */
    CucTime time();

    /** 0x100 survey or 0x101 focus. */
    int apid();

    /** 1 survey, 2 focus. */
    int mode();

    /** "survey" or "focus" ({@link DecodedSpectrum#modeName(int)}). */
    String modeName();

    /** Flags bit 7: the sweep stepped downward (ICD §4). */
    boolean steppedDown();

    /** Flags bit 5: the sweep stepped in the interleaved focus order (ICD §4). */
    boolean interleaved();

    /**
     * The step at which window {@code i} (0..c−1) was read, 0..c−1, by ICD §4: in window order from the
     * starting end (f stepping upward, f + c − 1 downward), or, for an interleaved sweep, offset o from the
     * starting end at step o/2 for even o and at ⌈c/2⌉ + (o_last − o)/2 for odd o, o_last the largest odd
     * offset below c (the even offsets outward, then the odd ones back).
     */
    default int stepOrder(int i) {
        return stepOf(i, windowCount(), steppedDown(), interleaved());
    }

    /** {@link #stepOrder} of window {@code i} of {@code c} for the given flags. */
    static int stepOf(int i, int c, boolean steppedDown, boolean interleaved) {
        int o = steppedDown ? c - 1 - i : i;
        if (!interleaved) {
            return o;
        }
        int lastOdd = c % 2 == 0 ? c - 1 : c - 2;
        return o % 2 == 0 ? o / 2 : (c + 1) / 2 + (lastOdd - o) / 2;
    }

    /** Sweep number (16 bits, wraps). */
    int sweep();

    /** Window table id (0: built-in default table). */
    int tableId();

    /** First window index f. */
    int firstWindow();

    /** Window count c. */
    int windowCount();

    /** The instrument whose description gave the currents and edges. */
    GroundInstrument instrument();

    /** Gain range of window {@code i}. */
    int gainRange(int i);

    /** True when window {@code i} saturated. */
    boolean saturated(int i);

    /** Current of quadrant {@code q} (0..3) in window {@code i}, amperes. */
    double currentAmps(int q, int i);

    /** Sum of the four quadrant currents of window {@code i}, amperes. */
    double totalAmps(int i);

    /** Modulation periods integrated in window {@code i}. */
    int integrationPeriods(int i);

    /** Low edge of window {@code i}, volts; NaN when the table is not known. */
    double lowVolts(int i);

    /** High edge of window {@code i}, volts; NaN when the table is not known. */
    double highVolts(int i);
}
