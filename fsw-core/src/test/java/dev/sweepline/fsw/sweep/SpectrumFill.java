package dev.sweepline.fsw.sweep;

import dev.sweepline.fsw.instrument.InstrumentDescription;
import dev.sweepline.fsw.link.SampleReply;

/**
 * Test-side access to the package-private fill methods of {@link Spectrum} ({@code begin}, {@code store},
 * {@code setPeak}, {@code end}), so that telemetry tests and benchmarks can hand the packer a spectrum
 * with chosen values without running the scheduler. Not for the per-step path: it allocates nothing
 * itself but is only used at set-up.
 */
public final class SpectrumFill {
    private static final int Q = InstrumentDescription.QUADRANTS;

    private SpectrumFill() {
    }

    /** Starts a sweep over windows {@code first..first+count-1}, every entry missing, no peak. */
    public static void begin(Spectrum s, long sweepNumber, SweepMode mode, int first, int count, boolean ascending,
            long startMicros) {
        s.begin(sweepNumber, mode, first, count, ascending, startMicros);
    }

    /** Stores entry {@code i}: the four quadrants' ADC counts, its gain range and reply status bits. */
    public static void store(Spectrum s, int i, int range, int status, int q1, int q2, int q3, int q4) {
        SampleReply r = new SampleReply();
        r.quadrant[0] = q1;
        r.quadrant[1] = q2;
        r.quadrant[2] = q3;
        r.quadrant[3] = q4;
        r.status = status;
        r.gainRange = range;
        s.store(i, r, range, 0);
    }

    /** Sets a valid proton peak at entry {@code peakIndex}, refined to {@code peakWindowQ8}. */
    public static void setPeak(Spectrum s, int peakIndex, int peakWindowQ8) {
        s.setPeak(peakIndex, peakIndex, peakWindowQ8, 0, 0);
    }

    /** Makes entry {@code entry} support window {@code k} dwelling {@code periods} (a support-dwell sweep). */
    public static void support(Spectrum s, int k, int entry, int periods) {
        s.support(k, entry, periods);
    }

    /** Marks the sweep as stepped in the interleaved focus order (sweep design note R22). */
    public static void interleaved(Spectrum s, boolean on) {
        s.interleaved(on);
    }

    /** Ends the sweep at {@code endMicros}. */
    public static void end(Spectrum s, long endMicros) {
        s.end(endMicros);
    }

    /** Copies every field the packer reads (header, entries, peak) of {@code from} into {@code to}. */
    public static void copy(Spectrum from, Spectrum to) {
        to.begin(from.sweepNumber(), from.mode(), from.firstWindow(), from.count(), from.ascending(),
                from.startMicros());
        to.integrationPeriods(from.integrationPeriods());
        to.interleaved(from.interleaved());
        for (int k = 0; k < from.supportCount(); k++) {
            to.support(k, from.supportEntry(k), from.supportPeriods(k));
        }
        SampleReply r = new SampleReply();
        for (int i = 0; i < from.count(); i++) {
            for (int q = 0; q < Q; q++) {
                r.quadrant[q] = from.quadrant(i, q);
            }
            r.status = from.status(i);
            r.gainRange = from.gainRange(i);
            to.store(i, r, from.gainRange(i), 0);
        }
        if (from.peakValid()) {
            to.setPeak(from.argmaxIndex(), from.peakIndex(), from.peakWindowQ8(), from.fwhmWindowsQ8(),
                    from.lowHalfWindowsQ8());
        }
        to.end(from.endMicros());
    }
}
