package dev.sweepline.sim.bench;

import dev.sweepline.fsw.sweep.ModeChangeReason;
import dev.sweepline.fsw.sweep.SweepMode;
import dev.sweepline.ground.product.ReportAdditions;
import dev.sweepline.sim.plasma.IonPopulation;
import dev.sweepline.sim.plasma.IonSpecies;
import dev.sweepline.sim.plasma.PlasmaState;
import dev.sweepline.sim.design.ProtonInformation;
import dev.sweepline.sim.report.DecisionChart;
import dev.sweepline.sim.scenario.ScenarioEvent;
import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.TreeMap;
import java.util.function.DoubleFunction;

/**
 * What a bench run adds to the ground's report.html: the truth under the moment plots and the
 * sweep-decision chart ({@link DecisionChart}) from the same records as {@code decisions.csv}.
 */
public final class RunFigures {
    /** File name of the sweep-decision chart in the run folder. */
    public static final String DECISIONS_PNG = "decisions.png";

    private RunFigures() {
    }

    /**
     * The sweep-decision chart: band, found and true peaks per sweep (every sweep of a run of up to
     * 16384, evenly taken ones of a longer run: {@link DecisionSeries}); the mode changes the scheduler
     * reported, except the routine ones (the periodic resurvey and the lock regained right after it,
     * which the survey-sweep marks already show; {@link BenchRecorder#chartModeChanges()}); the scenario's
     * timed events and {@code commands} (times and labels of the telecommands sent) as events.
     */
    public static byte[] decisionChart(BenchConfig config, ClosedLoopBench.Result result,
            List<DecisionChart.Marker> commands) throws IOException {
        List<DecisionChart.Marker> markers = new ArrayList<>();
        for (BenchRecorder.ModeChange m : result.recorder().chartModeChanges()) {
            markers.add(new DecisionChart.Marker(m.atMicros() / 1e6, m.to().name().toLowerCase(Locale.ROOT) + " ("
                    + ModeChangeReason.name(m.reason()) + ")", false));
        }
        for (ScenarioEvent e : config.scenario().events()) {
            if (e.atSeconds() <= config.durationSeconds()) {
                markers.add(new DecisionChart.Marker(e.atSeconds(), e.label(), true));
            }
        }
        markers.addAll(commands);
        return DecisionChart.render(result.recorder().chartSeries().points(), markers, config.flight().table.count());
    }

    /**
     * The truth for the ground's moment panels at a spectrum's TAI time: the scenario's plasma at the
     * mid-time of the sweep the spectrum came from (as {@link GroundCheck} scores it), n, U, T of the
     * protons and the alpha abundance; no flow-angle truth (NaN).
     */
    public static DoubleFunction<double[]> truthAtTai(ClosedLoopBench.Result result, long coarseAtTickZero) {
        TreeMap<Long, SweepRecord> byStart = GroundCheck.byStart(result.recorder().sweeps());
        return tai -> {
            SweepRecord sweep = GroundCheck.sweepAt(byStart, tai, coarseAtTickZero);
            if (sweep == null) {
                return new double[] {Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN};
            }
            PlasmaState plasma = result.recorder().truthAt(sweep.midMicros());
            IonPopulation p = ProtonInformation.protons(plasma);
            double[] npt = GroundCheck.truth(plasma, p);
            double alphas = 0;
            for (IonPopulation q : plasma.populations()) {
                alphas += q.species().equals(IonSpecies.ALPHA) ? q.densityPerM3() : 0;
            }
            return new double[] {npt[0], npt[1], npt[2], Double.NaN, 100 * alphas / p.densityPerM3()};
        };
    }

    /** The additions to the ground's report: the truth and the sweep-decision chart. */
    public static ReportAdditions additions(ClosedLoopBench.Result result, long coarseAtTickZero, byte[] decisions) {
        return new ReportAdditions(truthAtTai(result, coarseAtTickZero), List.of(new ReportAdditions.Figure(
                "Sweep decisions", "sweep decisions", decisions,
                "Each sweep at its mid-time, from decisions.csv: the focus band the flight software stepped (low and "
                + "high window), survey sweeps (whole table) as grey marks at the top, the proton peak it found "
                + "(red dots) and the true proton and alpha peaks (black, green lines); grey dotted lines mark "
                + "mode changes (the new mode and the reason; the periodic resurvey and the lock regained after it "
                + "left out), red dashed lines the scenario's timed events and the telecommands sent.")));
    }
}
