package dev.sweepline.sim.cli;

import dev.sweepline.sim.campaign.CampaignOutput;
import dev.sweepline.sim.campaign.CampaignReader;
import dev.sweepline.sim.campaign.CampaignRunner;
import dev.sweepline.sim.campaign.CampaignSpec;
import dev.sweepline.sim.campaign.RunRow;
import dev.sweepline.sim.campaign.SetResult;
import dev.sweepline.sim.campaign.Shard;
import dev.sweepline.fsw.host.CliException;
import dev.sweepline.fsw.host.ExitStatus;
import dev.sweepline.fsw.host.Ranges;
import dev.sweepline.fsw.host.yaml.FileFormatException;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code tune}: a tuning campaign, on every core, or one shard of it for a cluster job array. */
@Command(name = "tune", mixinStandardHelpOptions = true,
        description = {"Run a tuning campaign: a scenario ensemble crossed with a grid of sweep parameters.",
            "With --shard i/N only that slice runs (write each shard to its own folder, then 'merge')."})
final class TuneCommand implements Callable<Integer> {
    @Parameters(index = "0", paramLabel = "CAMPAIGN.yaml", description = "The campaign file.")
    Path campaign;

    @Option(names = "--out", paramLabel = "DIR", required = true, description = "Output folder.")
    Path out;

    @Option(names = "--threads", paramLabel = "N", converter = Ranges.PositiveInt.class,
            description = "Worker threads (default: every core, ${DEFAULT-VALUE}).")
    int threads = Runtime.getRuntime().availableProcessors();

    @CommandLine.Mixin
    InstrumentOption instrument = new InstrumentOption();

    @Option(names = "--shard", paramLabel = "i/N", description = "Run only shard i of N (1-based).")
    String shard;

    @Option(names = "--compare", paramLabel = "A,B", description = "Put sets A and B (set numbers of sets.csv) "
            + "side by side in the report (default: the recommended set and the set it is best compared with).")
    String compare;

    @Override
    public Integer call() throws Exception {
        instrument.resolve();
        CampaignSpec spec;
        Shard slice;
        try {
            spec = CampaignReader.load(campaign, instrument.given());
            slice = shard == null ? Shard.ALL : Shard.parse(shard);
        } catch (FileFormatException e) {
            throw CliException.input("campaign error: " + e.getMessage());
        } catch (IllegalArgumentException e) {
            throw new CliException(ExitStatus.USAGE, "--shard " + shard + ": " + e.getMessage());
        }
        int[] pair = comparePair(compare, spec);
        OutputFolder.create(out);
        long jobs = (long) spec.setCount() * spec.runsPerSet();
        System.out.printf(Locale.ROOT, "campaign %s: %d sets x %d runs of %.0f s, shard %s, %d threads%n",
                spec.name(), spec.setCount(), spec.runsPerSet(), spec.durationSeconds(), slice, threads);
        long start = System.nanoTime();
        List<RunRow> rows;
        try (ConsoleProgress bar = ConsoleProgress.ofRuns("tune")) {
            rows = CampaignRunner.run(spec, threads, slice, bar::step);
        }
        double wall = (System.nanoTime() - start) / 1e9;
        CampaignOutput.writeRuns(out, rows);
        System.out.printf(Locale.ROOT, "%d runs in %.1f s: %.2f scenario-runs per second, x%.0f real time%n",
                rows.size(), wall, rows.size() / wall, rows.size() * spec.durationSeconds() / wall);
        if (!slice.whole()) {
            System.out.println("wrote " + out.resolve(CampaignOutput.RUNS) + "; merge the shards with 'merge'");
            return 0;
        }
        report(CampaignOutput.writeResults(out, spec, rows, pair), out, CampaignOutput.inertAxes(spec, rows));
        return 0;
    }

    /**
     * The two set numbers of {@code --compare A,B}, or null without the option.
     *
     * @throws CliException (usage) unless they are two different set numbers of the campaign's 0..sets-1
     */
    static int[] comparePair(String option, CampaignSpec spec) {
        if (option == null) {
            return null;
        }
        String[] parts = option.split(",", -1);
        int last = spec.setCount() - 1;
        try {
            if (parts.length != 2) {
                throw new NumberFormatException("two set numbers");
            }
            int[] pair = {Integer.parseInt(parts[0].trim()), Integer.parseInt(parts[1].trim())};
            for (int set : pair) {
                if (set < 0 || set > last) {
                    throw new CliException(ExitStatus.USAGE, "--compare " + option + ": set " + set
                            + " is outside the campaign's sets 0.." + last);
                }
            }
            if (pair[0] == pair[1]) {
                throw new CliException(ExitStatus.USAGE, "--compare " + option + ": name two different sets");
            }
            return pair;
        } catch (NumberFormatException e) {
            throw new CliException(ExitStatus.USAGE, "--compare " + option + ": expected two set numbers A,B (0.."
                    + last + ")");
        }
    }

    static void report(SetResult best, Path out, List<String> inertAxes) {
        for (String axis : inertAxes) {
            System.out.println("warning: the grid axis " + axis + " changed nothing (every value gave the same runs; "
                    + "see report.html)");
        }
        if (best == null) {
            System.out.println("no set met the recommendation rules (see summary.json)");
        } else {
            System.out.printf(Locale.ROOT, "recommended: set %d, lock %.4f (worst %.4f), %.3f spectra/s, %.0f bit/s%n",
                    best.set(), best.lockFractionMean(), best.lockFractionMin(), best.spectraPerSecond(),
                    best.bitsPerSecondMean());
        }
        System.out.println("wrote " + out.resolve(CampaignOutput.RUNS) + ", sets.csv, summary.json, pareto.png, "
                + "pareto-cadence.png, report.html" + (best == null ? "" : ", recommended.yaml and "
                + CampaignOutput.RECOMMENDED_IMAGE) + " in " + out);
    }
}
