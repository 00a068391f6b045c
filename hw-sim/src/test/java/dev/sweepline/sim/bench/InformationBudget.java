package dev.sweepline.sim.bench;

import dev.sweepline.fsw.link.SampleReply;
import dev.sweepline.fsw.link.StepCommand;
import dev.sweepline.fsw.sweep.SweepListener;
import dev.sweepline.fsw.sweep.SweepMode;
import dev.sweepline.sim.cup.FaradayCup;
import dev.sweepline.sim.design.DOptimalDesign;
import dev.sweepline.sim.design.DesignSolver;
import dev.sweepline.sim.design.ProtonInformation;
import dev.sweepline.sim.hv.WindowVolts;
import dev.sweepline.sim.plasma.IonPopulation;
import dev.sweepline.sim.plasma.PlasmaState;
import java.util.ArrayList;
import java.util.List;

/**
 * Where a run's information goes: every step the scheduler commanded, split by mode, with its settle
 * and dwell, so that a run's D-efficiency (ClosedLoopBench, against the optimum over the same
 * integration time) splits into the focus sweeps' own efficiency and the survey's share, and the time
 * in focus into integration and dead time. A test helper of the bench's own figures.
 */
final class InformationBudget implements SweepListener {
    /** One commanded step and the gain range of its reply. */
    record Step(SweepMode mode, int window, int settleMicros, int periods, int range, long replyMicros) {
    }

    private final List<Step> steps = new ArrayList<>();
    private SweepMode mode = SweepMode.SURVEY;
    @Override
    public void onSample(StepCommand step, SampleReply reply, long nowMicros) {
        steps.add(new Step(mode, step.window, step.settleMicros, step.integrationPeriods, reply.gainRange, nowMicros));
    }

    @Override
    public void onModeChange(SweepMode from, SweepMode to, int reason, long nowMicros) {
        mode = to;
    }

    List<Step> steps() {
        return steps;
    }

    /** Focus steps' integration over their integration plus settle (the instrument's time while focusing). */
    double focusIntegratingFraction(int modulationPeriodMicros) {
        long integrating = 0;
        long settling = 0;
        for (Step s : steps) {
            if (s.mode() == SweepMode.FOCUS) {
                integrating += (long) s.periods() * modulationPeriodMicros;
                settling += s.settleMicros();
            }
        }
        return integrating / (double) (integrating + settling);
    }

    /**
     * The information of the steps of {@code which} (null: all) at the plasma of each step, and their
     * integration seconds in {@code seconds[0]}.
     */
    double[][] information(SweepMode which, WindowVolts windows, FaradayCup cup, ProtonInformation info,
            java.util.function.LongFunction<PlasmaState> truth, int modulationPeriodMicros, double[] seconds) {
        double[][] f = new double[3][3];
        double[] g = new double[3];
        double[] q = new double[4];
        double t = 0;
        for (Step s : steps) {
            if (which != null && s.mode() != which) {
                continue;
            }
            double dwell = (double) s.periods() * modulationPeriodMicros / 1e6;
            PlasmaState plasma = truth.apply(s.replyMicros() - Math.round(dwell * 5e5));
            IonPopulation p = ProtonInformation.protons(plasma);
            if (p == null) {
                continue;
            }
            cup.quadrantCurrents(plasma, windows.lowVolts(s.window()), windows.highVolts(s.window()), q);
            info.gradient(plasma, p, windows.lowVolts(s.window()), windows.highVolts(s.window()), g);
            ProtonInformation.accumulate(f, g, info.variance(q[0] + q[1] + q[2] + q[3], s.range(), dwell), 1.0);
            t += dwell;
        }
        seconds[0] = t;
        return f;
    }

    /** The information per second of equal dwell over windows {@code first..last} of {@code m} (clipped to it). */
    static double[][] equalDwell(double[][][] m, int first, int last) {
        int a = Math.max(0, first);
        int b = Math.min(m.length - 1, last);
        double[][] f = new double[3][3];
        for (int j = a; j <= b; j++) {
            for (int x = 0; x < 3; x++) {
                for (int y = 0; y < 3; y++) {
                    f[x][y] += m[j][x][y] / (b - a + 1);
                }
            }
        }
        return f;
    }

    /** D-efficiency of {@code measured} over {@code seconds} against the optimum of {@code design} scaled to them. */
    static double efficiency(double[][] measured, DesignSolver.Solution optimum, double seconds) {
        double[][] opt = new double[3][3];
        for (int a = 0; a < 3; a++) {
            for (int b = 0; b < 3; b++) {
                opt[a][b] = optimum.information()[a][b] * seconds;
            }
        }
        return DOptimalDesign.efficiency(measured, opt);
    }
}
