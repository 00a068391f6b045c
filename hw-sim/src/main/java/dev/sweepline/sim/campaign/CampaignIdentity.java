package dev.sweepline.sim.campaign;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.HexFormat;
import java.util.List;
import java.util.Map;

/**
 * What a campaign output folder holds, written by {@code tune} before the first run as {@value #FILE}
 * (campaigns/FORMAT.md, "Shards, merge and resuming"): the campaign by name and by the SHA-256 of its
 * file's octets, the code version ({@link CodeVersion}), the shard and how many runs it owns. {@code merge}
 * takes only shards of one campaign file and code version; a restarted {@code tune} resumes only a folder
 * of the same campaign, code and shard.
 *
 * @param campaign       the campaign's name (for the reader; the hash decides)
 * @param campaignSha256 SHA-256 of the campaign file, 64 hex digits
 * @param code           the code version
 * @param shard          the shard the folder holds
 * @param runs           runs the shard owns
 */
public record CampaignIdentity(String campaign, String campaignSha256, String code, Shard shard, long runs) {
    /** The file in each output folder. */
    public static final String FILE = "shard.properties";
    private static final List<String> KEYS = List.of("campaign", "campaignSha256", "code", "shard", "runs");

    /** The identity of shard {@code shard} of {@code spec}, read from a file of octets {@code campaignFile}. */
    public static CampaignIdentity of(CampaignSpec spec, byte[] campaignFile, String code, Shard shard) {
        return new CampaignIdentity(spec.name(), sha256(campaignFile), code, shard, runs(spec, shard));
    }

    /** The runs {@code shard} owns of {@code spec}'s sets x members. */
    public static long runs(CampaignSpec spec, Shard shard) {
        long jobs = (long) spec.setCount() * spec.runsPerSet();
        return jobs / shard.count() + (jobs % shard.count() >= shard.index() ? 1 : 0);
    }

    /** The SHA-256 of {@code octets} as 64 lower-case hex digits. */
    public static String sha256(byte[] octets) {
        return HexFormat.of().formatHex(CodeVersion.sha256().digest(octets));
    }

    /** True when {@code other} is the same campaign file on the same code (the shard may differ). */
    public boolean sameCampaign(CampaignIdentity other) {
        return campaignSha256.equals(other.campaignSha256) && code.equals(other.code);
    }

    /** Writes {@value #FILE} in {@code dir}. */
    public void write(Path dir) throws IOException {
        String text = "# a campaign output folder of sweepline-bench tune (campaigns/FORMAT.md)\n"
                + "campaign=" + campaign + "\ncampaignSha256=" + campaignSha256 + "\ncode=" + code
                + "\nshard=" + shard + "\nruns=" + runs + "\n";
        Files.writeString(dir.resolve(FILE), text, StandardCharsets.UTF_8);
    }

    /**
     * Reads {@value #FILE} of {@code dir}.
     *
     * @throws IOException naming the file: missing, or a key missing or malformed
     */
    public static CampaignIdentity read(Path dir) throws IOException {
        Path file = dir.resolve(FILE);
        if (!Files.isRegularFile(file)) {
            throw new IOException(file + ": missing (not a campaign output folder, or written by a bench before "
                    + "shards carried their campaign and code version: run the shard again)");
        }
        Map<String, String> values = new HashMap<>();
        List<String> lines = Files.readAllLines(file, StandardCharsets.UTF_8);
        for (String line : lines) {
            int eq = line.indexOf('=');
            if (!line.startsWith("#") && eq > 0) {
                values.put(line.substring(0, eq), line.substring(eq + 1));
            }
        }
        for (String key : KEYS) {
            if (!values.containsKey(key)) {
                throw new IOException(file + ": no '" + key + "='");
            }
        }
        try {
            return new CampaignIdentity(values.get("campaign"), values.get("campaignSha256"), values.get("code"),
                    Shard.parse(values.get("shard")), Long.parseLong(values.get("runs")));
        } catch (IllegalArgumentException e) {
            throw new IOException(file + ": " + e.getMessage(), e);
        }
    }

    /** The campaign hash shortened for messages. */
    public String shortHash() {
        return campaignSha256.substring(0, Math.min(12, campaignSha256.length()));
    }
}
