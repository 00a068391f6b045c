package dev.sweepline.sim.campaign;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

/**
 * The check {@code merge} makes before reading any row: the folders hold every shard of one split of
 * one campaign file, run on one code version, each exactly once, and each finished
 * ({@link CampaignIdentity}; campaigns/FORMAT.md, "Shards, merge and resuming").
 */
public final class ShardSet {
    private ShardSet() {
    }

    /**
     * Checks {@code dirs} against {@code expected} (its campaign hash and code; the shard is ignored).
     *
     * @throws IOException one line: a folder of another campaign file or code version, shards of two splits,
     *                     a shard given twice, a shard not finished, or which shard indexes are missing
     */
    public static void check(List<Path> dirs, CampaignIdentity expected) throws IOException {
        Map<Integer, Path> byIndex = new TreeMap<>();
        Shard first = null;
        Path firstDir = null;
        for (Path dir : dirs) {
            CampaignIdentity id = CampaignIdentity.read(dir);
            if (!id.campaignSha256().equals(expected.campaignSha256())) {
                throw new IOException(dir + ": a shard of another campaign file (" + id.campaign() + ", sha256 "
                        + id.shortHash() + "…; the campaign file given: " + expected.campaign() + ", sha256 "
                        + expected.shortHash() + "…)");
            }
            if (!id.code().equals(expected.code())) {
                throw new IOException(dir + ": shard " + id.shard() + " ran on code " + id.code() + ", this bench is "
                        + expected.code() + ": run every shard and the merge on one version");
            }
            if (first == null) {
                first = id.shard();
                firstDir = dir;
            } else if (id.shard().count() != first.count()) {
                throw new IOException(dir + ": shard " + id.shard() + " is of another split than " + firstDir
                        + " (shard " + first + ")");
            }
            Path twice = byIndex.put(id.shard().index(), dir);
            if (twice != null) {
                throw new IOException("shard " + id.shard() + " given twice: " + twice + " and " + dir);
            }
            if (!Files.isRegularFile(dir.resolve(CampaignOutput.RUNS))) {
                throw new IOException(dir + ": shard " + id.shard() + " has not finished (no "
                        + CampaignOutput.RUNS + "): run it again, it resumes");
            }
        }
        if (first == null) {
            throw new IOException("no shard folder given");
        }
        List<Integer> missing = new ArrayList<>();
        for (int i = 1; i <= first.count(); i++) {
            if (!byIndex.containsKey(i)) {
                missing.add(i);
            }
        }
        if (!missing.isEmpty()) {
            throw new IOException((missing.size() == 1 ? "shard " : "shards ") + join(missing) + " of " + first.count()
                    + (missing.size() == 1 ? " is" : " are") + " missing");
        }
    }

    /** The indexes, runs of consecutive ones shortened to a-b ("3, 5-7"), at most 20 items. */
    static String join(List<Integer> indexes) {
        StringBuilder b = new StringBuilder();
        int items = 0;
        for (int i = 0; i < indexes.size(); i++) {
            int from = indexes.get(i);
            int to = from;
            while (i + 1 < indexes.size() && indexes.get(i + 1) == to + 1) {
                to = indexes.get(++i);
            }
            if (items == 20) {
                return b.append(", …").toString();
            }
            b.append(items++ == 0 ? "" : ", ").append(from == to ? Integer.toString(from) : from + "-" + to);
        }
        return b.toString();
    }
}
