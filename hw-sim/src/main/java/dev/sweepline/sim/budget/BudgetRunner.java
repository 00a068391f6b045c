package dev.sweepline.sim.budget;

import dev.sweepline.fsw.sweep.SweepMode;
import dev.sweepline.fsw.table.SweepParameters;
import dev.sweepline.fsw.telemetry.TelemetryWriter;
import dev.sweepline.sim.bench.BenchConfig;
import dev.sweepline.sim.bench.ClosedLoopBench;
import dev.sweepline.sim.bench.RunSummary;
import dev.sweepline.sim.instrument.InstrumentModel;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;

/**
 * Checks an orbit plan's telemetry against its allocations: representative closed loops along each
 * phase (plasma scaled to the distance), interpolated hour by hour, summed per phase, and run
 * through the onboard store with the downlink passes. Deterministic for a seed, whatever the thread count.
 */
public final class BudgetRunner {
    private BudgetRunner() {
    }

    /** Runs the check on {@code threads} threads with run seed {@code seed}. */
    public static BudgetResult run(OrbitPlan plan, long seed, int threads) {
        List<double[]> points = new ArrayList<>(); // phase index, hours, distance
        for (int p = 0; p < plan.phases().size(); p++) {
            Phase phase = plan.phases().get(p);
            int steps = Math.max(1, (int) Math.ceil(phase.hours() / plan.sampleEveryHours()));
            for (int k = 0; k <= steps; k++) {
                double h = phase.startHours() + phase.hours() * k / steps;
                points.add(new double[] {p, h, phase.distanceAt(h)});
            }
        }
        List<BudgetResult.Sample> samples = sample(plan, seed, threads, points);
        List<BudgetResult.Hour> hours = hours(plan, samples);
        List<String> violations = new ArrayList<>();
        List<BudgetResult.PhaseBudget> phases = phases(plan, hours, violations);
        return new BudgetResult(plan, samples, hours, phases, violations);
    }

    private static List<BudgetResult.Sample> sample(OrbitPlan plan, long seed, int threads, List<double[]> points) {
        ExecutorService pool = Executors.newFixedThreadPool(Math.max(1, threads), r -> {
            Thread t = new Thread(r, "budget-run");
            t.setDaemon(true);
            return t;
        });
        try {
            List<Future<BudgetResult.Sample>> futures = new ArrayList<>();
            for (int i = 0; i < points.size(); i++) {
                double[] pt = points.get(i);
                long pointSeed = seed * 1_000_003L + i; // each point its own, repeatable noise
                futures.add(pool.submit(() -> sampleOne(plan, plan.phases().get((int) pt[0]), pt[1], pt[2], pointSeed)));
            }
            List<BudgetResult.Sample> samples = new ArrayList<>();
            for (Future<BudgetResult.Sample> f : futures) {
                samples.add(f.get());
            }
            return samples;
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("budget check interrupted", e);
        } catch (ExecutionException e) {
            throw new IllegalStateException("a budget run failed: " + e.getCause(), e.getCause());
        } finally {
            pool.shutdownNow();
        }
    }

    static BudgetResult.Sample sampleOne(OrbitPlan plan, Phase phase, double hours, double distanceAu, long seed) {
        double seconds = plan.sampleMinutes() * 60;
        InstrumentModel instrument = InstrumentModel.demo();
        SweepParameters parameters = instrument.flight().defaultParameters();
        if (phase.mode() == Phase.Mode.SURVEY) {
            parameters.focusEnabled = 0;
        }
        BenchConfig config = new BenchConfig(DistanceScaling.at(plan.scenario(), distanceAu, seconds), seed, seconds,
                instrument.flight().defaultTable(), parameters, instrument, TelemetryWriter.DEFAULT_FRAME_LENGTH,
                phase.allocationBitsPerSecond(), true);
        RunSummary s = ClosedLoopBench.run(config, ClosedLoopBench.Progress.NONE, ClosedLoopBench.Hooks.NONE.withSetup(fsw -> {
            if (phase.mode() == Phase.Mode.SAFE) {
                fsw.scheduler().requestMode(SweepMode.SAFE, 0);
            }
        })).summary();
        double cadence = s.spectraPerSecond().get(SweepMode.SURVEY) + s.spectraPerSecond().get(SweepMode.FOCUS);
        return new BudgetResult.Sample(phase.name(), hours, distanceAu, s.telemetry().frameBitsPerSecond(), cadence);
    }

    /** Hour by hour: the rate interpolated between the phase's samples, and the store. */
    private static List<BudgetResult.Hour> hours(OrbitPlan plan, List<BudgetResult.Sample> samples) {
        List<BudgetResult.Hour> hours = new ArrayList<>();
        int count = (int) Math.ceil(plan.endHours());
        double store = 0;
        for (int h = 0; h < count; h++) {
            double mid = Math.min(h + 0.5, plan.endHours());
            Phase phase = plan.phaseAt(mid);
            double rate = interpolate(samples, phase.name(), mid);
            double hourSeconds = Math.min(1.0, plan.endHours() - h) * 3600;
            store += rate * hourSeconds / 1e6;
            store = Math.max(0, store - downlinkedMegabits(plan, h, h + hourSeconds / 3600));
            hours.add(new BudgetResult.Hour(h, phase.name(), phase.distanceAt(mid), rate,
                    phase.allocationBitsPerSecond(), Double.isNaN(plan.storageMegabits()) ? Double.NaN : store));
        }
        return hours;
    }

    private static double downlinkedMegabits(OrbitPlan plan, double fromHours, double toHours) {
        double mb = 0;
        for (OrbitPlan.Pass p : plan.passes()) {
            double overlap = Math.min(toHours, p.startHours() + p.hours()) - Math.max(fromHours, p.startHours());
            if (overlap > 0) {
                mb += overlap * 3600 * p.bitsPerSecond() / 1e6;
            }
        }
        return mb;
    }

    private static double interpolate(List<BudgetResult.Sample> samples, String phase, double hours) {
        BudgetResult.Sample before = null;
        BudgetResult.Sample after = null;
        for (BudgetResult.Sample s : samples) {
            if (!s.phase().equals(phase)) {
                continue;
            }
            if (s.hours() <= hours) {
                before = s;
            }
            if (s.hours() >= hours && after == null) {
                after = s;
            }
        }
        if (before == null) {
            return after.bitsPerSecond();
        }
        if (after == null || after.hours() == before.hours()) {
            return before.bitsPerSecond();
        }
        double f = (hours - before.hours()) / (after.hours() - before.hours());
        return before.bitsPerSecond() + f * (after.bitsPerSecond() - before.bitsPerSecond());
    }

    private static List<BudgetResult.PhaseBudget> phases(OrbitPlan plan, List<BudgetResult.Hour> hours,
            List<String> violations) {
        List<BudgetResult.PhaseBudget> result = new ArrayList<>();
        for (Phase phase : plan.phases()) {
            double generated = 0;
            int worst = -1;
            double worstRatio = 0;
            int over = 0;
            int firstOver = -1;
            for (BudgetResult.Hour h : hours) {
                if (!h.phase().equals(phase.name())) {
                    continue;
                }
                double seconds = Math.min(1.0, plan.endHours() - h.hour()) * 3600;
                generated += h.bitsPerSecond() * seconds / 1e6;
                double ratio = h.bitsPerSecond() / h.allocationBitsPerSecond();
                if (ratio > worstRatio) {
                    worstRatio = ratio;
                    worst = h.hour();
                }
                if (ratio > 1) {
                    over++;
                    firstOver = firstOver < 0 ? h.hour() : firstOver;
                }
                if (!Double.isNaN(plan.storageMegabits()) && h.storeMegabits() > plan.storageMegabits()) {
                    violations.add(String.format(Locale.ROOT, "phase '%s', hour %d: the store holds %.1f Mbit, more than "
                            + "its %.1f Mbit", phase.name(), h.hour(), h.storeMegabits(), plan.storageMegabits()));
                }
            }
            if (over > 0) {
                violations.add(String.format(Locale.ROOT, "phase '%s', hour %d: %.0f bit/s exceeds the allocation of "
                        + "%.0f bit/s (%d of %.0f hours over; worst hour %d at %.2f x)", phase.name(), firstOver,
                        rateAt(hours, firstOver), phase.allocationBitsPerSecond(), over, Math.ceil(phase.hours()), worst,
                        worstRatio));
            }
            result.add(new BudgetResult.PhaseBudget(phase.name(), generated,
                    phase.allocationBitsPerSecond() * phase.hours() * 3600 / 1e6, worst, worstRatio));
        }
        return result;
    }

    private static double rateAt(List<BudgetResult.Hour> hours, int hour) {
        return hours.get(hour).bitsPerSecond();
    }
}
