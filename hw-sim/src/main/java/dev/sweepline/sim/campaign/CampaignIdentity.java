package dev.sweepline.sim.campaign;

import java.io.FileOutputStream;
import java.io.IOException;
import java.nio.channels.FileChannel;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
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

    /**
     * Writes {@value #FILE} in {@code dir}: into a file beside it, forced to the disk, renamed into place (an
     * atomic rename, rename(2)) and the folder forced too, so that it is whole or absent after a kill or a power
     * loss, and on the disk before the journal's first line.
     */
    public void write(Path dir) throws IOException {
        String text = "# a campaign output folder of sweepline-bench tune (campaigns/FORMAT.md)\n"
                + "campaign=" + campaign + "\ncampaignSha256=" + campaignSha256 + "\ncode=" + code
                + "\nshard=" + shard + "\nruns=" + runs + "\n";
        Path partial = dir.resolve(FILE + ".partial");
        try (FileOutputStream file = new FileOutputStream(partial.toFile())) {
            file.write(text.getBytes(StandardCharsets.UTF_8));
            file.getFD().sync();
        }
        Files.move(partial, dir.resolve(FILE), StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
        forceFolder(dir);
    }

    /** Forces the folder's entries (the rename) to the disk, where the platform opens a folder (Linux does). */
    private static void forceFolder(Path dir) throws IOException {
        FileChannel folder;
        try {
            folder = FileChannel.open(dir, StandardOpenOption.READ);
        } catch (IOException e) {
            return; // a platform that opens no folder as a file (Windows): the rename alone
        }
        try (folder) {
            folder.force(true);
        }
    }

    /**
     * A {@value #FILE} that is there but not whole: empty, without its last newline, or without a key (what a
     * power loss leaves of a file written in place, as benches before the atomic write did).
     */
    public static final class TornException extends IOException {
        private static final long serialVersionUID = 1L;

        TornException(String message) {
            super(message);
        }
    }

    /**
     * Reads {@value #FILE} of {@code dir}.
     *
     * @throws TornException naming the file: empty, cut short or a key missing
     * @throws IOException   naming the file: missing, or a key malformed
     */
    public static CampaignIdentity read(Path dir) throws IOException {
        Path file = dir.resolve(FILE);
        if (!Files.isRegularFile(file)) {
            throw new IOException(file + ": missing (not a campaign output folder, or written by a bench before "
                    + "shards carried their campaign and code version: run the shard again)");
        }
        byte[] octets = Files.readAllBytes(file);
        if (octets.length == 0) {
            throw new TornException(file + ": empty (0 octets: its write never reached the disk, a power loss?)");
        }
        if (octets[octets.length - 1] != '\n') {
            throw new TornException(file + ": cut short (" + octets.length + " octets, no newline at the end: a "
                    + "power loss while it was written?)");
        }
        Map<String, String> values = new HashMap<>();
        List<String> lines = new String(octets, StandardCharsets.UTF_8).lines().toList();
        for (String line : lines) {
            int eq = line.indexOf('=');
            if (!line.startsWith("#") && eq > 0) {
                values.put(line.substring(0, eq), line.substring(eq + 1));
            }
        }
        for (String key : KEYS) {
            if (!values.containsKey(key)) {
                throw new TornException(file + ": no '" + key + "=' (cut short or damaged)");
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
