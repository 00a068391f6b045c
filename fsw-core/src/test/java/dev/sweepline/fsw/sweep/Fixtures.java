package dev.sweepline.fsw.sweep;

import dev.sweepline.fsw.DemoCup;
import dev.sweepline.fsw.table.SweepParameters;
import dev.sweepline.fsw.table.WindowTable;

/** Shared set-ups of the scheduler tests. */
final class Fixtures {
    /** Default table (physics.md demo instrument). */
    static final WindowTable TABLE = DemoCup.table();
    /** Low edge of the default table, volts. */
    static final double LOW_VOLTS = 50;
    /** High edge of the default table, volts. */
    static final double HIGH_VOLTS = 6000;

    private Fixtures() {
    }

    /** Slow wind at 1 AU as in physics.md worked case P1: n 5 cm^-3, U 400 km/s, T 1e5 K, He/H 4 %. */
    static SyntheticInstrument oneAu(long seed) {
        SyntheticInstrument s = new SyntheticInstrument(seed);
        s.protonDensityPerCm3 = 5;
        s.speedKmPerS = 400;
        s.protonThermalKmPerS = SyntheticInstrument.thermalKmPerS(1e5, SyntheticInstrument.PROTON_MASS);
        s.alphaPerProton = 0.04;
        return s;
    }

    /**
     * Near 0.05 AU (physics.md, solar wind: n ~3000 cm^-3, U 250-350 km/s, U/w near 3, current ~10 nA/cm^2):
     * n 3000, U 300 km/s, w 100 km/s.
     */
    static SyntheticInstrument nearSun(long seed) {
        SyntheticInstrument s = new SyntheticInstrument(seed);
        s.protonDensityPerCm3 = 3000;
        s.speedKmPerS = 300;
        s.protonThermalKmPerS = 100;
        s.alphaPerProton = 0.04;
        return s;
    }

    /** A loop with a recording listener. */
    /** The demo cup's parameters in the design style (R21): 400 ms focus budget, margin 1, quick survey at 2 periods. */
    static SweepParameters designStyle() {
        SweepParameters p = DemoCup.parameters();
        p.focusStyle = SweepParameters.FOCUS_STYLE_DESIGN;
        p.focusBudgetMicros = 400_000;
        p.robustnessMarginWindows = 1;
        p.surveyIntegrationPeriods = 2;
        return p;
    }

    static ClosedLoop loop(SyntheticInstrument instrument, SweepParameters p, RecordingListener listener) {
        SweepScheduler scheduler = new SweepScheduler(DemoCup.INSTRUMENT, TABLE, p, listener);
        listener.scheduler = scheduler;
        return new ClosedLoop(scheduler, instrument);
    }

    /** Fractional default-table window index (centre convention: window w is centred at w) of {@code volts}. */
    static double windowOf(double volts) {
        return SyntheticInstrument.logWindow(volts, DemoCup.INSTRUMENT.windowCount(), LOW_VOLTS, HIGH_VOLTS) - 0.5;
    }

    /** Noise-free total current of every window of the default table, amperes. */
    static double[] trueCurrents(SyntheticInstrument s) {
        double[] a = new double[TABLE.count()];
        for (int w = 0; w < a.length; w++) {
            a[w] = s.currentAmps(TABLE.dacLow(w), TABLE.dacHigh(w));
        }
        return a;
    }

    /** Index of the largest element. */
    static int argmax(double[] a) {
        int m = 0;
        for (int i = 1; i < a.length; i++) {
            if (a[i] > a[m]) {
                m = i;
            }
        }
        return m;
    }

    /** Floating-point 3-point parabola vertex around the argmax (the reference for the Q8 refinement). */
    static double parabolaPeak(double[] a) {
        int m = argmax(a);
        double ym = a[m - 1];
        double y0 = a[m];
        double yp = a[m + 1];
        return m + 0.5 * (ym - yp) / (ym - 2 * y0 + yp);
    }
}
