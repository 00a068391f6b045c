package dev.sweepline.sim.bench;

import dev.sweepline.sim.instrument.TestInstruments;
import dev.sweepline.sim.instrument.InstrumentModel;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sweepline.fsw.sweep.SweepMode;
import dev.sweepline.sim.cup.CupGeometry;
import dev.sweepline.sim.cup.FaradayCup;
import dev.sweepline.sim.design.ProtonInformation;
import dev.sweepline.sim.hv.HvCalibration;
import dev.sweepline.sim.hv.WindowVolts;
import dev.sweepline.sim.plasma.IonPopulation;
import dev.sweepline.sim.plasma.PlasmaState;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * physics.md, Cramér-Rao bound: "A singular F means the window set cannot pin down (n, U, w): the
 * scheduler should never choose such a set." Every focus band the flight software chose in 200 random
 * winds is checked at the plasma of its sweep: its Fisher matrix for the protons' relative (n, U, w),
 * at the run's dwell, must be well conditioned (the reciprocal condition estimate det / (trace/3)^3,
 * 1 for isotropic information and 0 when singular, above 1e-6; the bands chosen here reach 6e-4 at
 * worst, a band of two windows gives about 1e-17).
 */
class FocusBandInformationTest {
    @Test
    void shouldNeverChooseABandThatCannotPinDownTheProtons() {
        WindowVolts windows = new WindowVolts(TestInstruments.DEMO_CUP.flight().defaultTable(), TestInstruments.DEMO_CUP.calibration());
        FaradayCup cup = new FaradayCup(TestInstruments.DEMO_CUP.cup());
        ProtonInformation info = new ProtonInformation(TestInstruments.DEMO_CUP.cup(), TestInstruments.DEMO_CUP.preamp());
        List<String> bad = new ArrayList<>();
        int bands = 0;
        double worst = Double.POSITIVE_INFINITY;
        for (long seed = 40_000; seed < 40_200; seed++) {
            ClosedLoopBench.Result r = ClosedLoopBench.run(BenchConfig.defaults(RandomWind.steady(seed, 0.01, 0.15, 15),
                    seed, 15), ClosedLoopBench.Progress.NONE);
            for (SweepRecord s : r.recorder().sweeps()) {
                if (s.mode() != SweepMode.FOCUS) {
                    continue;
                }
                bands++;
                PlasmaState plasma = r.recorder().truthAt(s.midMicros());
                IonPopulation p = ProtonInformation.protons(plasma);
                double[][] f = new double[3][3];
                double[] g = new double[3];
                double[] q = new double[4];
                for (int w = s.firstWindow(); w <= s.lastWindow(); w++) {
                    cup.quadrantCurrents(plasma, windows.lowVolts(w), windows.highVolts(w), q);
                    double total = q[0] + q[1] + q[2] + q[3];
                    info.gradient(plasma, p, windows.lowVolts(w), windows.highVolts(w), g);
                    ProtonInformation.accumulate(f, g, info.variance(total, 1, 0.008), 1.0);
                }
                double trace = f[0][0] + f[1][1] + f[2][2];
                double conditioning = ProtonInformation.det(f) / Math.pow(trace / 3, 3);
                worst = Math.min(worst, conditioning);
                if (!(conditioning > 1e-6)) {
                    bad.add("seed " + seed + " sweep " + s.sweep() + " band " + s.firstWindow() + ".." + s.lastWindow()
                            + ": " + conditioning);
                }
            }
        }
        assertTrue(bands > 1000, "bands " + bands);
        assertTrue(bad.isEmpty(), "worst " + worst + "\n" + String.join("\n", bad));
    }
}
