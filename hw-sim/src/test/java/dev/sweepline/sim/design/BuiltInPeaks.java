package dev.sweepline.sim.design;

import dev.sweepline.sim.cup.FaradayCup;
import dev.sweepline.sim.hv.WindowVolts;
import dev.sweepline.sim.instrument.InstrumentModel;
import dev.sweepline.sim.instrument.TestInstruments;
import dev.sweepline.sim.plasma.PlasmaState;
import dev.sweepline.sim.scenario.PlasmaStates;
import dev.sweepline.sim.scenario.Scenario;
import dev.sweepline.sim.scenario.ScenarioLoader;
import dev.sweepline.sim.scenario.ScenarioTimeline;
import java.util.ArrayList;
import java.util.List;

/**
 * The plasmas the focus design's reach tests score against the D-optimal yardstick: the 8 built-in
 * scenarios at 2, 4 and 6 s of seed 1 on the demo cup's default table. For each: every window's
 * information (one step of {@code stepSeconds}), the unconstrained optimum, the noiseless window currents
 * with the gain range the yardstick reads each window in, the brightest window, the peak refined by the
 * parabola through it and its neighbours, and the half-maximum crossings interpolated linearly (as the
 * flight software's peak finder does, sweep design note R5).
 */
final class BuiltInPeaks {
    /** One plasma's windows. {@code left} and {@code right} are the half-maximum crossings, in windows. */
    record Peak(String scenario, double time, double[][][] m, DesignSolver.Solution optimum, double[] current,
                int[] ranges, int peak, double refined, double left, double right) {
    }

    private BuiltInPeaks() {
    }

    static List<Peak> of(double stepSeconds) {
        InstrumentModel demo = TestInstruments.DEMO_CUP;
        WindowVolts windows = new WindowVolts(demo.flight().defaultTable(), demo.calibration());
        FaradayCup cup = new FaradayCup(demo.cup());
        DOptimalDesign design = new DOptimalDesign(cup, demo.preamp(), windows);
        List<Peak> out = new ArrayList<>();
        double[] q = new double[4];
        for (String name : ScenarioLoader.builtInNames()) {
            Scenario scenario = ScenarioLoader.builtIn(name);
            ScenarioTimeline timeline = scenario.timeline(1);
            for (double t : new double[] {2, 4, 6}) {
                PlasmaState plasma = PlasmaStates.of(timeline.at(t), scenario.alphaDriftDirection());
                double[][][] m = design.windowInformation(List.of(plasma), stepSeconds);
                DesignSolver.Solution optimum = DesignSolver.solve(m, DOptimalDesign.TOLERANCE);
                double[] current = new double[m.length];
                int[] ranges = new int[m.length];
                int peak = 0;
                for (int j = 0; j < m.length; j++) {
                    cup.quadrantCurrents(plasma, windows.lowVolts(j), windows.highVolts(j), q);
                    current[j] = q[0] + q[1] + q[2] + q[3];
                    // the range the yardstick reads each window in (as the flight's last reading of it)
                    ranges[j] = DOptimalDesign.rangeFor(demo.preamp(), Math.max(Math.max(q[0], q[1]), Math.max(q[2], q[3])));
                    if (current[j] > current[peak]) {
                        peak = j;
                    }
                }
                double curvature = current[peak - 1] - 2 * current[peak] + current[peak + 1];
                double refined = peak + 0.5 * (current[peak - 1] - current[peak + 1]) / curvature;
                double half = current[peak] / 2;
                int lo = peak;
                while (current[lo - 1] >= half) {
                    lo--;
                }
                int hi = peak;
                while (current[hi + 1] >= half) {
                    hi++;
                }
                double left = lo - 1 + (current[lo - 1] - half) / (current[lo - 1] - current[lo]);
                double right = hi + (current[hi] - half) / (current[hi] - current[hi + 1]);
                out.add(new Peak(name, t, m, optimum, current, ranges, peak, refined, left, right));
            }
        }
        return out;
    }
}
