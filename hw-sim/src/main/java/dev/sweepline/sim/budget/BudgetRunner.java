package dev.sweepline.sim.budget;

import dev.sweepline.fsw.command.CommandReason;
import dev.sweepline.fsw.sweep.SweepMode;
import dev.sweepline.sim.bench.BenchConfig;
import dev.sweepline.sim.bench.ClosedLoopBench;
import dev.sweepline.sim.bench.RunPool;
import dev.sweepline.sim.bench.RunSummary;
import dev.sweepline.sim.command.ScriptRunner;
import dev.sweepline.sim.scenario.Scenario;
import dev.sweepline.sim.seed.SeedTree;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Checks an orbit plan's telemetry against its allocations: representative closed loops along each
 * phase (plasma scaled to the distance), interpolated hour by hour, summed per phase, and run
 * through the onboard store with the downlink passes. Deterministic for a seed, whatever the thread count.
 *
 * <p>Each closed loop flies the flight software as it is built for flight (FlightSoftware through the
 * closed-loop bench, HV interlock and command authentication on), put into the phase's mode by signed
 * telecommands at its start ({@link PhaseCommands}); a command the flight software refuses fails the check.
 */
public final class BudgetRunner {
    /** One representative closed loop of the plan: its index (for its seed), phase, time and distance. */
    record Point(int index, Phase phase, double hours, double distanceAu) {
    }

    /** What one point's closed loop gave, and what the flight software answered to its commands. */
    record Flown(RunSummary summary, List<dev.sweepline.fsw.host.script.ScriptPlayer.Sent> commands) {
    }

    private BudgetRunner() {
    }

    /** Runs the check on {@code threads} threads (at least 1) with budget seed {@code seed}. */
    public static BudgetResult run(OrbitPlan plan, long seed, int threads) {
        List<BudgetResult.Sample> samples = RunPool.map("budget point", threads, points(plan),
                p -> sampleOne(plan, p, SeedTree.of(seed).point(p.index()).seed()), RunPool.Progress.NONE);
        List<BudgetResult.Hour> hours = hours(plan, samples);
        List<String> violations = new ArrayList<>();
        List<BudgetResult.PhaseBudget> phases = phases(plan, hours, violations);
        return new BudgetResult(plan, samples, hours, phases, violations);
    }

    /** Both ends of each phase and points at most {@code sampleEveryHours} apart between them, in plan order. */
    static List<Point> points(OrbitPlan plan) {
        List<Point> points = new ArrayList<>();
        for (Phase phase : plan.phases()) {
            int steps = Math.max(1, (int) Math.ceil(phase.hours() / plan.sampleEveryHours()));
            for (int k = 0; k <= steps; k++) {
                double h = phase.startHours() + phase.hours() * k / steps;
                points.add(new Point(points.size(), phase, h, phase.distanceAt(h)));
            }
        }
        return points;
    }

    static BudgetResult.Sample sampleOne(OrbitPlan plan, Point point, long seed) {
        RunSummary s = fly(plan, point.phase(), point.distanceAu(), seed).summary();
        double cadence = s.spectraPerSecond().get(SweepMode.SURVEY) + s.spectraPerSecond().get(SweepMode.FOCUS);
        return new BudgetResult.Sample(point.phase().name(), point.hours(), point.distanceAu(),
                s.telemetry().frameBitsPerSecond(), cadence, s.telemetry().virtualChannels(),
                s.telemetry().flushIntervalSeconds());
    }

    /** The closed loop of one point: the default flight software, commanded into the phase's mode at its start. */
    static Flown fly(OrbitPlan plan, Phase phase, double distanceAu, long seed) {
        double seconds = plan.sampleMinutes() * 60;
        Scenario scaled = DistanceScaling.at(plan.scenario(), distanceAu, seconds);
        BenchConfig config = BenchConfig.defaults(scaled, seed, seconds, plan.instrument()).withAllocation(phase.allocationBitsPerSecond());
        if (plan.engineeringFlushSeconds() != 0) {
            config = config.withFlight(f -> {
                f.parameters = f.parameters.copy();
                f.parameters.engineeringFlushSeconds = plan.engineeringFlushSeconds();
            });
        }
        ScriptRunner commands = new ScriptRunner(PhaseCommands.of(phase.mode(), config.flight()), true, null);
        RunSummary s = ClosedLoopBench.run(config, ClosedLoopBench.Progress.NONE,
                ClosedLoopBench.Hooks.NONE.withCycle(commands)).summary();
        for (dev.sweepline.fsw.host.script.ScriptPlayer.Sent sent : commands.sent()) {
            if (sent.reason() != CommandReason.OK) {
                throw new IllegalStateException("phase '" + phase.name() + "': the flight software refused command 0x"
                        + Integer.toHexString(sent.code()) + " (" + CommandReason.name(sent.reason()) + ")");
            }
        }
        return new Flown(s, commands.sent());
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
            int overfull = 0;
            int firstOverfull = -1;
            double fullest = 0;
            int fullestHour = -1;
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
                    overfull++;
                    firstOverfull = firstOverfull < 0 ? h.hour() : firstOverfull;
                    if (h.storeMegabits() > fullest) {
                        fullest = h.storeMegabits();
                        fullestHour = h.hour();
                    }
                }
            }
            if (overfull > 0) {
                // one line per phase, however many hours overflow (a small store overflows for days)
                violations.add(String.format(Locale.ROOT, "phase '%s', hour %d: the store holds more than its %.1f Mbit "
                        + "(%d hours over; fullest hour %d at %.1f Mbit)", phase.name(), firstOverfull,
                        plan.storageMegabits(), overfull, fullestHour, fullest));
            }
            if (over > 0) {
                String[] rates = distinct(rateAt(hours, firstOver), phase.allocationBitsPerSecond());
                violations.add(String.format(Locale.ROOT, "phase '%s', hour %d: %s bit/s exceeds the allocation of "
                        + "%s bit/s (%d of %.0f hours over; worst hour %d at %.4f x)", phase.name(), firstOver,
                        rates[0], rates[1], over, Math.ceil(phase.hours()), worst, worstRatio));
            }
            result.add(new BudgetResult.PhaseBudget(phase.name(), generated,
                    phase.allocationBitsPerSecond() * phase.hours() * 3600 / 1e6, worst, worstRatio));
        }
        return result;
    }

    /**
     * Two rates with as few decimals (0 to 3) as keep them apart, so that a rate just over its allocation
     * never reads as equal to it ("7262.4 bit/s exceeds the allocation of 7262.0 bit/s"); closer than
     * that, every digit (Double.toString).
     */
    static String[] distinct(double a, double b) {
        for (int digits = 0; digits <= 3; digits++) {
            String x = String.format(Locale.ROOT, "%." + digits + "f", a);
            String y = String.format(Locale.ROOT, "%." + digits + "f", b);
            if (!x.equals(y)) {
                return new String[] {x, y};
            }
        }
        return new String[] {Double.toString(a), Double.toString(b)};
    }

    private static double rateAt(List<BudgetResult.Hour> hours, int hour) {
        return hours.get(hour).bitsPerSecond();
    }
}
