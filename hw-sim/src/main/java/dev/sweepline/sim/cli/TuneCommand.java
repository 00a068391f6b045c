package dev.sweepline.sim.cli;

import dev.sweepline.sim.campaign.CampaignIdentity;
import dev.sweepline.sim.campaign.CampaignOutput;
import dev.sweepline.sim.campaign.CampaignReader;
import dev.sweepline.sim.campaign.CampaignRunner;
import dev.sweepline.sim.campaign.CampaignSpec;
import dev.sweepline.sim.campaign.CodeVersion;
import dev.sweepline.sim.campaign.RunJournal;
import dev.sweepline.sim.campaign.RunRow;
import dev.sweepline.sim.campaign.SetResult;
import dev.sweepline.sim.campaign.Shard;
import dev.sweepline.sim.campaign.ShardEnvironment;
import dev.sweepline.fsw.exec.FlightSoftware;
import dev.sweepline.fsw.host.CliException;
import dev.sweepline.fsw.host.CommandLines;
import dev.sweepline.fsw.host.ExitStatus;
import dev.sweepline.fsw.host.Ranges;
import dev.sweepline.fsw.host.instrument.InstrumentSpec;
import dev.sweepline.fsw.host.instrument.Instruments;
import dev.sweepline.fsw.host.yaml.FileFormatException;
import dev.sweepline.ground.decode.TelemetryDecoder;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.OptionalInt;
import java.util.concurrent.Callable;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code tune}: a tuning campaign, on every core, or one shard of it for a cluster job array. */
@Command(name = "tune", mixinStandardHelpOptions = true,
        description = {"Run a tuning campaign: a scenario ensemble crossed with a grid of sweep parameters.",
            "With --shard i/N only that slice runs (write each shard to its own folder, then 'merge');",
            "--shard auto takes i and N from a Slurm job array or a Kubernetes Indexed Job.",
            "Each run is journalled as it finishes: run the same command again to resume."})
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

    @Option(names = "--shard", paramLabel = "i/N|auto", description = "Run only shard i of N (1-based); auto: from "
            + "the job array's environment (Slurm SLURM_ARRAY_TASK_ID/_MIN/_MAX/_STEP/_COUNT; Kubernetes "
            + "JOB_COMPLETION_INDEX with --shards or " + ShardEnvironment.SHARD_COUNT + ").")
    String shard;

    @Option(names = "--shards", paramLabel = "N", converter = Ranges.PositiveInt.class,
            description = "With --shard auto: the number of shards (a Kubernetes Indexed Job's completions).")
    Integer shards;

    /** The environment --shard auto reads (tests put their own). */
    Map<String, String> environment = System.getenv();

    @Option(names = "--compare", paramLabel = "A,B", description = "Put sets A and B (set numbers of sets.csv) "
            + "side by side in the report (default: the recommended set and the set it is best compared with).")
    String compare;

    @Option(names = "--jit", paramLabel = "c1|tiered", converter = JitModeConverter.class,
            description = "The JVM's compilers: c1, the quick compiler alone (about two thirds of the CPU of a "
            + "100-run campaign, the same outputs), or tiered, the JVM's default (default: c1 when the threads take every "
            + "core and the campaign has at most " + JitPolicy.C1_MAX_RUNS + " runs, else tiered).")
    JitPolicy.Mode jit;

    /** {@code --jit c1|tiered}, in lower case as the help prints them. */
    static final class JitModeConverter implements CommandLine.ITypeConverter<JitPolicy.Mode> {
        @Override
        public JitPolicy.Mode convert(String value) {
            return switch (value) {
                case "c1" -> JitPolicy.Mode.C1;
                case "tiered" -> JitPolicy.Mode.TIERED;
                default -> throw new CommandLine.TypeConversionException("expected c1 or tiered, got '" + value + "'");
            };
        }
    }

    @Override
    public Integer call() throws Exception {
        instrument.resolve();
        if (shards != null && !"auto".equals(shard)) {
            throw new CliException(ExitStatus.USAGE, "--shards " + shards + ": only with --shard auto");
        }
        CampaignSpec spec;
        Shard slice = shard();
        try {
            spec = CampaignReader.load(campaign, instrument.given());
        } catch (FileFormatException e) {
            throw CliException.input("campaign error: " + e.getMessage());
        }
        int[] pair = comparePair(compare, spec);
        JitPolicy.Mode mode = JitPolicy.effective(jit, CampaignIdentity.runs(spec, slice), threads,
                Runtime.getRuntime().availableProcessors());
        // before the code is versioned (hashed), which the child does again
        OptionalInt relaunched = JitPolicy.relaunch(mode);
        if (relaunched.isPresent()) {
            return relaunched.getAsInt();
        }
        CampaignIdentity identity = CampaignIdentity.of(spec, campaignOctets(campaign, instrument.given()), codeVersion(), slice);
        if (!JitPolicy.apply(mode) && jit != null) {
            System.err.println("tune: --jit c1: this JVM takes no compiler directive; it compiles as it does by default");
        }
        OutputFolder.create(out);
        claim(out, identity);
        System.out.printf(Locale.ROOT, "campaign %s: %d sets x %d runs of %.0f s, shard %s, %d threads%n",
                spec.name(), spec.setCount(), spec.runsPerSet(), spec.durationSeconds(), slice, threads);
        long start = System.nanoTime();
        List<RunRow> rows;
        int resumed;
        try (RunJournal journal = openJournal(out, spec, slice); ConsoleProgress bar = ConsoleProgress.ofRuns("tune")) {
            resumed = journal.finished().size();
            if (resumed > 0 || journal.droppedOctets() > 0) {
                System.out.printf(Locale.ROOT, "resuming: %d of %d runs already in %s%s%n", resumed, identity.runs(),
                        journal.file(), dropped(journal));
            }
            rows = runs(spec, slice, journal, bar);
        }
        double wall = (System.nanoTime() - start) / 1e9;
        CampaignOutput.writeRuns(out, rows);
        int ran = rows.size() - resumed;
        System.out.printf(Locale.ROOT, "%d runs in %.1f s: %.2f scenario-runs per second, x%.0f real time%n",
                ran, wall, ran / wall, ran * spec.durationSeconds() / wall);
        if (!slice.whole()) {
            System.out.println("wrote " + out.resolve(CampaignOutput.RUNS) + "; merge the shards with 'merge'");
            return 0;
        }
        report(CampaignOutput.writeResults(out, spec, rows, pair), out, CampaignOutput.inertAxes(spec, rows));
        return 0;
    }

    /**
     * The shard's rows, its journal appended as each run finishes; a journal that cannot be appended (a full
     * disk, a quota) is an output that cannot be written (exit 5), naming the file.
     */
    private List<RunRow> runs(CampaignSpec spec, Shard slice, RunJournal journal, ConsoleProgress bar) {
        try {
            return CampaignRunner.run(spec, threads, slice, journal, bar::step);
        } catch (IllegalStateException e) {
            if (e.getCause() instanceof UncheckedIOException io) {
                throw CliException.io(io.getMessage() + "; the runs journalled before it are kept: make room and "
                        + "run the same command again, it resumes");
            }
            throw e;
        }
    }

    /** The resume note's words on the journal's dropped tail: how many lines and octets, or nothing. */
    private static String dropped(RunJournal journal) {
        if (journal.droppedOctets() == 0) {
            return "";
        }
        int lines = journal.droppedLines();
        return String.format(Locale.ROOT, " (dropped %s, %d octets: cut short or failing their check)",
                lines == 1 ? "its last line" : "its last " + lines + " lines", journal.droppedOctets());
    }

    /** The shard of {@code --shard}: the whole campaign without it, from the environment with {@code auto}. */
    private Shard shard() {
        try {
            if (shard == null) {
                return Shard.ALL;
            }
            return "auto".equals(shard) ? ShardEnvironment.of(environment, shards) : Shard.parse(shard);
        } catch (IllegalArgumentException e) {
            throw new CliException(ExitStatus.USAGE, "--shard " + shard + ": " + e.getMessage());
        }
    }

    /**
     * The octets a campaign's identity hashes: the campaign file, then each scenario or instrument file it
     * or {@code --instrument} names (a name line, then the file), so that editing any of them between shards
     * makes a different campaign; then, for a campaign without {@code instrument:}, a line naming the built-in
     * {@code --instrument} chooses when it is not the default. A campaign of built-ins alone, on the default
     * instrument, hashes its own file's octets.
     */
    static byte[] campaignOctets(Path campaign, InstrumentSpec option) {
        try {
            ByteArrayOutputStream octets = new ByteArrayOutputStream();
            octets.write(Files.readAllBytes(campaign));
            List<Path> named = new ArrayList<>(CampaignReader.namedFiles(campaign));
            if (option != null && Files.isRegularFile(Path.of(option.file()))) {
                named.add(Path.of(option.file()));
            }
            for (Path file : named) {
                octets.write(("\n# file " + file.getFileName() + "\n").getBytes(StandardCharsets.UTF_8));
                octets.write(Files.readAllBytes(file));
            }
            if (option != null && !Files.isRegularFile(Path.of(option.file()))
                    && !option.name().equals(Instruments.defaultName()) && !CampaignReader.namesInstrument(campaign)) {
                // a built-in the campaign does not name, chosen by --instrument: another instrument flown
                octets.write(("\n# instrument " + option.name() + "\n").getBytes(StandardCharsets.UTF_8));
            }
            return octets.toByteArray();
        } catch (IOException e) {
            throw CliException.input("campaign error: " + CommandLines.located(e));
        } catch (FileFormatException e) {
            throw CliException.input("campaign error: " + e.getMessage());
        }
    }

    /** The version of the bench's code (its flight software, simulator and ground), computed once. */
    static String codeVersion() {
        return CodeHolder.VERSION;
    }

    private static final class CodeHolder {
        static final String VERSION = CodeVersion.of(CommandLines.version(BenchMain.class), BenchMain.class,
                FlightSoftware.class, TelemetryDecoder.class);
    }

    /**
     * Writes the folder's identity, or checks the one there: a folder of another campaign file, code version or
     * shard is not resumed.
     */
    private static void claim(Path out, CampaignIdentity identity) {
        try {
            if (Files.exists(out.resolve(CampaignIdentity.FILE))) {
                CampaignIdentity there = readClaim(out, identity);
                if (!there.sameCampaign(identity) || !there.shard().equals(identity.shard())) {
                    throw CliException.io("--out " + out + ": holds shard " + there.shard() + " of campaign "
                            + there.campaign() + " (sha256 " + there.shortHash() + "…, code "
                            + there.code() + "), not shard " + identity.shard() + " of " + identity.campaign()
                            + " (sha256 " + identity.shortHash() + "…, code " + identity.code()
                            + "): it resumes only the same campaign file, code and shard; use another folder");
                }
            } else {
                identity.write(out);
            }
        } catch (IOException e) {
            throw CliException.io("--out " + out + ": " + CommandLines.located(e));
        }
    }

    /**
     * The identity in {@code out}; one that is not whole (a power loss while a bench that wrote it in place was
     * at it) says what the folder holds and what to do, since only its owner knows whether the journal's runs
     * are of this campaign.
     */
    private static CampaignIdentity readClaim(Path out, CampaignIdentity identity) throws IOException {
        try {
            return CampaignIdentity.read(out);
        } catch (CampaignIdentity.TornException e) {
            Path journal = out.resolve(RunJournal.FILE);
            long octets = Files.isRegularFile(journal) ? Files.size(journal) : 0;
            throw new IOException(e.getMessage() + "; " + (octets > 0 ? "the journal " + journal + " holds "
                    + octets + " octets of finished runs, which cannot be told to be of this campaign without it: "
                    + "if the folder holds shard " + identity.shard() + " of " + identity.campaign() + " (this "
                    + "campaign file and jar), delete " + CampaignIdentity.FILE + " and run the same command again, "
                    + "it resumes those runs; if not, use another folder" : "no run is journalled: delete "
                    + CampaignIdentity.FILE + " and run the same command again"), e);
        }
    }

    /**
     * Opens the shard's journal: a damaged or held journal is an input refused (exit 4); a file system
     * without locks, an output that cannot be written (exit 5).
     */
    private static RunJournal openJournal(Path out, CampaignSpec spec, Shard slice) {
        try {
            return RunJournal.open(out, spec, slice);
        } catch (IOException e) {
            throw journalError(out, e);
        }
    }

    /** The exit of {@link #openJournal}'s failure {@code e}. */
    static CliException journalError(Path out, IOException e) {
        String message = "--out " + out + ": " + CommandLines.located(e);
        return e instanceof RunJournal.LocksUnsupportedException ? CliException.io(message)
                : CliException.input(message);
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
