package dev.sweepline.sim.campaign;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import dev.sweepline.fsw.command.ParameterTable;
import dev.sweepline.fsw.command.TableImage;
import dev.sweepline.fsw.table.SweepParameters;
import java.io.BufferedWriter;
import java.io.FileOutputStream;
import java.io.IOException;
import java.io.OutputStreamWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * Writes a campaign's results: {@code runs.csv} (every run; a shard writes only this), and for the
 * whole campaign {@code sets.csv}, {@code summary.json} (sets, Pareto front, recommendation) and
 * {@code recommended.yaml} (the recommended sweep parameters as a readable table) with
 * {@code recommended.table} (the same as an uplinkable table image). Nothing written
 * depends on the thread count, the shard split or the wall clock.
 */
public final class CampaignOutput {
    /** File of the run rows. */
    public static final String RUNS = "runs.csv";
    /** The recommended set as an uplinkable table image (commands.md, table image). */
    public static final String RECOMMENDED_IMAGE = "recommended.table";
    private static final String[] MOMENTS = {"n", "U", "T"};
    private static final ObjectMapper JSON = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    private CampaignOutput() {
    }

    /**
     * Writes the run rows: into a file beside it, forced to the disk and then renamed over {@value #RUNS}
     * (an atomic rename, rename(2)), so that a {@value #RUNS} is only ever whole: {@code merge} takes its
     * presence for a finished shard, and a kill or a power loss while it was written leaves the old one or none.
     */
    public static void writeRuns(Path dir, List<RunRow> rows) throws IOException {
        Files.createDirectories(dir);
        Path partial = dir.resolve(RUNS + ".partial");
        try (FileOutputStream file = new FileOutputStream(partial.toFile());
                Writer w = new BufferedWriter(new OutputStreamWriter(file, StandardCharsets.UTF_8))) {
            w.write(RunRow.HEADER + "\n");
            for (RunRow r : rows) {
                w.write(r.toCsv() + "\n");
            }
            w.flush();
            file.getFD().sync();
        }
        Files.move(partial, dir.resolve(RUNS), StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
    }

    /** Reads the run rows of one or more folders, in job order (every run of the campaign once). */
    public static List<RunRow> readRuns(CampaignSpec spec, List<Path> dirs) throws IOException {
        List<RunRow> rows = new ArrayList<>();
        for (Path dir : dirs) {
            rows.addAll(readRunFile(spec, dir, null));
        }
        return inJobOrder(spec, rows);
    }

    /**
     * As {@link #readRuns}, for shard folders: each {@value #RUNS} must hold exactly the runs its folder's
     * {@link CampaignIdentity} says its shard owns, each once.
     *
     * @throws IOException naming the file (and line): a run of another shard, fewer or more runs than the shard's
     */
    public static List<RunRow> readShards(CampaignSpec spec, List<Path> dirs) throws IOException {
        List<RunRow> rows = new ArrayList<>();
        for (Path dir : dirs) {
            rows.addAll(readRunFile(spec, dir, CampaignIdentity.read(dir)));
        }
        return inJobOrder(spec, rows);
    }

    /** The rows of {@code dir}'s {@value #RUNS}, checked against {@code shard}'s identity when it is not null. */
    private static List<RunRow> readRunFile(CampaignSpec spec, Path dir, CampaignIdentity shard) throws IOException {
        Path file = dir.resolve(RUNS);
        byte[] octets = Files.readAllBytes(file);
        List<String> lines = new String(octets, StandardCharsets.UTF_8).lines().toList();
        if (lines.isEmpty() || !lines.get(0).equals(RunRow.HEADER)) {
            throw new IOException(file + ": not a campaign run file of this bench (header differs: "
                    + (lines.isEmpty() ? "empty file" : lines.get(0).split(",", -1).length + " columns, expected "
                    + RunRow.HEADER.split(",").length) + "); a shard written by another version must be run again");
        }
        if (octets[octets.length - 1] != '\n') {
            throw new IOException(file + ":" + lines.size() + ": the last row is cut short (no newline: the file was "
                    + "not written to its end); run the shard again, it resumes");
        }
        List<RunRow> rows = new ArrayList<>();
        for (int i = 1; i < lines.size(); i++) {
            RunRow row;
            try {
                row = RunRow.parse(lines.get(i));
            } catch (IllegalArgumentException e) {
                throw new IOException(file + ":" + (i + 1) + ": " + e.getMessage(), e);
            }
            if (shard != null && (row.set() < 0 || row.set() >= spec.setCount() || row.run() < 0
                    || row.run() >= spec.runsPerSet() || !shard.shard().owns(CampaignRunner.job(spec, row)))) {
                throw new IOException(file + ":" + (i + 1) + ": run " + row.run() + " of set " + row.set()
                        + " is not a run of shard " + shard.shard() + " of this campaign");
            }
            rows.add(row);
        }
        if (shard != null && rows.size() != shard.runs()) {
            throw new IOException(file + ": " + rows.size() + " of the " + shard.runs() + " runs of shard "
                    + shard.shard() + "; run the shard again, it resumes");
        }
        return rows;
    }

    /** {@code rows} in job order, every run of the campaign exactly once. */
    private static List<RunRow> inJobOrder(CampaignSpec spec, List<RunRow> rows) throws IOException {
        rows.sort((a, b) -> Long.compare((long) a.set() * spec.runsPerSet() + a.run(),
                (long) b.set() * spec.runsPerSet() + b.run()));
        for (int i = 1; i < rows.size(); i++) {
            if (rows.get(i).set() == rows.get(i - 1).set() && rows.get(i).run() == rows.get(i - 1).run()) {
                throw new IOException("run " + rows.get(i).run() + " of set " + rows.get(i).set() + " appears twice");
            }
        }
        long expected = (long) spec.setCount() * spec.runsPerSet();
        if (rows.size() != expected) {
            throw new IOException("merged " + rows.size() + " runs, the campaign has " + expected + ": a shard is missing");
        }
        return rows;
    }

    /** Writes the campaign-wide results from all of its runs; returns the recommended set or null. */
    public static SetResult writeResults(Path dir, CampaignSpec spec, List<RunRow> rows) throws IOException {
        return writeResults(dir, spec, rows, null);
    }

    /**
     * As {@link #writeResults(Path, CampaignSpec, List)}, the report's side-by-side comparison showing
     * sets {@code compare[0]} and {@code compare[1]} (set numbers of {@code spec}, checked by the caller),
     * or, when {@code compare} is null, the recommended set beside {@link #comparedWith}'s choice.
     */
    public static SetResult writeResults(Path dir, CampaignSpec spec, List<RunRow> rows, int[] compare)
            throws IOException {
        Files.createDirectories(dir);
        List<SetResult> sets = SetResult.aggregate(spec, rows);
        List<SetResult> front = ParetoFront.of(sets);
        Recommendation rec = Recommendation.of(spec, sets, front, rows);
        SetResult best = rec.chosen();
        writeSets(dir.resolve("sets.csv"), spec, sets, front, rec);
        Map<String, Object> summary = new LinkedHashMap<>();
        summary.put("campaign", spec.name());
        summary.put("seed", spec.seed());
        summary.put("sets", spec.setCount());
        summary.put("runsPerSet", spec.runsPerSet());
        summary.put("durationSeconds", spec.durationSeconds());
        summary.put("scenario", spec.base().name());
        summary.put("allocationBitsPerSecond", finite(spec.allocationBitsPerSecond()));
        summary.put("axes", spec.axisKeys());
        List<Map<String, Object>> setMaps = new ArrayList<>();
        for (SetResult s : sets) {
            Map<String, Object> sm = setMap(spec, s, front.contains(s));
            Recommendation.Versus v = rec.versusLeader().get(s.set());
            if (v != null) {
                sm.put("versusLeader", versusMap(v));
            }
            setMaps.add(sm);
        }
        summary.put("results", setMaps);
        List<Integer> frontIds = new ArrayList<>();
        front.forEach(s -> frontIds.add(s.set()));
        summary.put("paretoFront", frontIds);
        summary.put("recommendedSet", best == null ? null : best.set());
        summary.put("leaderSet", rec.leader() == null ? null : rec.leader().set());
        List<Integer> tied = new ArrayList<>();
        rec.indistinguishable().forEach(s -> tied.add(s.set()));
        summary.put("indistinguishableFromLeader", tied);
        summary.put("recommendationNote", note(rec));
        List<String> inert = InertAxes.of(spec, rows);
        summary.put("inertAxes", inert);
        JSON.writeValue(dir.resolve("summary.json").toFile(), summary);
        if (best != null) {
            writeRecommended(dir.resolve("recommended.yaml"), spec, best);
            Files.write(dir.resolve(RECOMMENDED_IMAGE), recommendedImage(spec, best));
        }
        SetResult left = compare == null ? best : numbered(sets, compare[0]);
        SetResult right = compare == null ? comparedWith(rec, sets, front) : numbered(sets, compare[1]);
        CampaignReport.write(dir, spec, sets, front, best, note(rec), inert, left, right);
        return best;
    }

    /** The grid axes of {@code spec} that changed nothing in {@code rows} ({@link InertAxes}). */
    public static List<String> inertAxes(CampaignSpec spec, List<RunRow> rows) {
        return InertAxes.of(spec, rows);
    }

    private static SetResult numbered(List<SetResult> sets, int set) {
        return sets.stream().filter(s -> s.set() == set).findFirst()
                .orElseThrow(() -> new IllegalArgumentException("no results for set " + set));
    }

    /**
     * The set the report puts beside the recommended one: the leader when the recommendation moved off it
     * (to a set closer to the default within the noise), else the most accurate other set on the front,
     * else the most accurate other set; null without a recommendation.
     */
    static SetResult comparedWith(Recommendation rec, List<SetResult> sets, List<SetResult> front) {
        SetResult best = rec.chosen();
        if (best == null) {
            return null;
        }
        if (rec.leader() != best) {
            return rec.leader();
        }
        for (List<SetResult> pool : List.of(front, sets)) {
            SetResult other = pool.stream().filter(s -> s != best && Double.isFinite(s.accuracy()))
                    .min(java.util.Comparator.comparingDouble(SetResult::accuracy)).orElse(null);
            if (other != null) {
                return other;
            }
        }
        return null;
    }

    private static Map<String, Object> setMap(CampaignSpec spec, SetResult s, boolean onFront) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("set", s.set());
        Map<String, Object> values = new LinkedHashMap<>();
        for (int a = 0; a < spec.grid().size(); a++) {
            values.put(spec.grid().get(a).parameter().key(), s.values()[a]);
        }
        m.put("parameters", values);
        m.put("runs", s.runs());
        m.put("lockFractionMean", finite(s.lockFractionMean()));
        m.put("lockFractionMin", finite(s.lockFractionMin()));
        m.put("alphaLocks", s.alphaLocks());
        m.put("reacquireSweepsMax", s.reacquireSweepsMax());
        m.put("reacquireSecondsMax", finite(s.reacquireSecondsMax()));
        m.put("spectraPerSecond", s.spectraPerSecond());
        m.put("bitsPerSecondMean", s.bitsPerSecondMean());
        m.put("bitsPerSecondMax", s.bitsPerSecondMax());
        m.put("integratingFraction", s.integratingFraction());
        m.put("informationEfficiency", finite(s.informationEfficiency()));
        Map<String, Object> err = new LinkedHashMap<>();
        Map<String, Object> crlb = new LinkedHashMap<>();
        for (int k = 0; k < 3; k++) {
            err.put(MOMENTS[k], finite(s.momentError()[k]));
            crlb.put(MOMENTS[k], finite(s.crlbRatio()[k]));
        }
        m.put("momentErrorMedian", err);
        m.put("crlbRatio", crlb);
        Map<String, Object> robust = new LinkedHashMap<>();
        for (int k = 0; k < 3; k++) {
            robust.put(MOMENTS[k], finite(s.crlbRobust()[k]));
        }
        m.put("crlbRatioRobust", robust);
        Map<String, Object> unflagged = new LinkedHashMap<>();
        for (int k = 0; k < 3; k++) {
            unflagged.put(MOMENTS[k], finite(s.momentErrorUnflagged()[k]));
        }
        m.put("momentErrorMedianUnflagged", unflagged);
        m.put("nonStationaryFits", s.nonStationary());
        Map<String, Object> centre = new LinkedHashMap<>();
        centre.put("medianMean", finite(s.centreErrorMedian()));
        centre.put("p95Mean", finite(s.centreErrorP95()));
        centre.put("max", finite(s.centreErrorMax()));
        m.put("centreErrorWindows", centre);
        m.put("strictReacquireSweepsMax", s.strictReacquireSweepsMax());
        m.put("strictReacquireSecondsMax", finite(s.strictReacquireSecondsMax()));
        m.put("accuracy", finite(s.accuracy()));
        m.put("paretoFront", onFront);
        return m;
    }

    /** What the recommendation rests on, in one sentence (campaigns/FORMAT.md, "How a set is recommended"). */
    static String note(Recommendation rec) {
        if (rec.leader() == null) {
            return "no set met the recommendation rules";
        }
        if (!rec.withinNoise()) {
            return "set " + rec.leader().set() + " is distinguishably better than every other qualifying set "
                    + "on at least one objective (95 % paired intervals)";
        }
        return rec.indistinguishable().size() + " sets cannot be told apart from the leader (set " + rec.leader().set()
                + ") within the ensemble's noise (95 % paired intervals); recommended: set " + rec.chosen().set()
                + ", the one of them closest to the default table";
    }

    private static Map<String, Object> versusMap(Recommendation.Versus v) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("accuracy", intervalMap(v.accuracy()));
        m.put("bitsPerSecond", intervalMap(v.bits()));
        m.put("spectraPerSecond", intervalMap(v.cadence()));
        m.put("indistinguishable", v.tied());
        return m;
    }

    private static Map<String, Object> intervalMap(PairedInterval i) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("meanDifference", finite(i.mean()));
        m.put("low95", finite(i.low()));
        m.put("high95", finite(i.high()));
        m.put("members", i.members());
        return m;
    }

    private static void writeSets(Path file, CampaignSpec spec, List<SetResult> sets, List<SetResult> front,
            Recommendation rec) throws IOException {
        try (Writer w = Files.newBufferedWriter(file)) {
            w.write("set," + String.join(",", spec.axisKeys()) + ",runs,lockFractionMean,lockFractionMin,alphaLocks,"
                    + "reacquireSweepsMax,reacquireSecondsMax,spectraPerSecond,bitsPerSecondMean,bitsPerSecondMax,"
                    + "integratingFraction,informationEfficiency,errorN,errorU,errorT,crlbRatioN,crlbRatioU,crlbRatioT,"
                    + "centreErrorMedian,centreErrorP95,centreErrorMax,strictReacquireSweepsMax,strictReacquireSecondsMax,"
                    + "crlbRobustN,crlbRobustU,crlbRobustT,errorUnflaggedN,errorUnflaggedU,errorUnflaggedT,nonStationary,"
                    + "accuracyDiffLow95,accuracyDiffHigh95,bitsDiffLow95,"
                    + "bitsDiffHigh95,cadenceDiffLow95,cadenceDiffHigh95,indistinguishableFromLeader,paretoFront\n");
            for (SetResult s : sets) {
                StringBuilder b = new StringBuilder().append(s.set());
                for (double v : s.values()) {
                    b.append(',').append(v);
                }
                b.append(String.format(Locale.ROOT, ",%d,%s,%s,%d,%d,%s,%s,%s,%s,%s,%s,%s,%s,%s,%s,%s,%s,%s,%s,%s,%d,%s,%s,%s,%s,%s,%s,%s,%d,%b%n", s.runs(),
                        s.lockFractionMean(), s.lockFractionMin(), s.alphaLocks(), s.reacquireSweepsMax(),
                        s.reacquireSecondsMax(), s.spectraPerSecond(), s.bitsPerSecondMean(), s.bitsPerSecondMax(),
                        s.integratingFraction(), s.informationEfficiency(), s.momentError()[0], s.momentError()[1],
                        s.momentError()[2], s.crlbRatio()[0], s.crlbRatio()[1], s.crlbRatio()[2], s.centreErrorMedian(), s.centreErrorP95(),
                        s.centreErrorMax(), s.strictReacquireSweepsMax(), s.strictReacquireSecondsMax(), s.crlbRobust()[0], s.crlbRobust()[1],
                        s.crlbRobust()[2], s.momentErrorUnflagged()[0], s.momentErrorUnflagged()[1],
                        s.momentErrorUnflagged()[2], s.nonStationary(), front.contains(s)));
                Recommendation.Versus v = rec.versusLeader().get(s.set());
                String paired = v == null ? ",,,,,,false" : String.format(Locale.ROOT, ",%s,%s,%s,%s,%s,%s,%b",
                        v.accuracy().low(), v.accuracy().high(), v.bits().low(), v.bits().high(), v.cadence().low(),
                        v.cadence().high(), v.tied());
                b.insert(b.lastIndexOf(","), paired);
                w.write(b.toString());
            }
        }
    }

    /** The recommended parameters as a readable table: every field of the flight software's set. */
    private static void writeRecommended(Path file, CampaignSpec spec, SetResult best) throws IOException {
        SweepParameters p = spec.parameters(best.set());
        try (Writer w = Files.newBufferedWriter(file)) {
            w.write("# Recommended sweep parameters of campaign " + spec.name() + " (set " + best.set() + ")\n");
            w.write(String.format(Locale.ROOT, "# over %d runs: lock fraction mean %.4f (worst %.4f), %.3f spectra/s, "
                    + "%.0f bit/s mean (%.0f worst)%n", best.runs(), best.lockFractionMean(), best.lockFractionMin(),
                    best.spectraPerSecond(), best.bitsPerSecondMean(), best.bitsPerSecondMax()));
            w.write(String.format(Locale.ROOT, "# median relative errors n %.4f %%, U %.4f %%, T %.4f %%; D-efficiency %.3f%n",
                    100 * best.momentError()[0], 100 * best.momentError()[1], 100 * best.momentError()[2],
                    best.informationEfficiency()));
            for (java.lang.reflect.Field f : SweepParameters.class.getFields()) {
                if (!java.lang.reflect.Modifier.isStatic(f.getModifiers())) {
                    w.write(f.getName() + ": " + f.getInt(p) + "\n");
                }
            }
        } catch (IllegalAccessException e) {
            throw new IllegalStateException(e);
        }
    }

    /** The default windows with the set's sweep parameters, as the table image the table commands load. */
    public static byte[] recommendedImage(CampaignSpec spec, SetResult set) {
        ParameterTable t = ParameterTable.of(spec.instrument().flight().defaultTable(),
                spec.parameters(set.set()));
        byte[] image = new byte[TableImage.MAX_OCTETS];
        int n = TableImage.encode(t, image);
        return java.util.Arrays.copyOf(image, n);
    }

    private static Object finite(double v) {
        return Double.isFinite(v) ? v : null;
    }
}
