package dev.sweepline.sim.campaign;

import static org.junit.jupiter.api.Assertions.assertDoesNotThrow;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.jar.JarEntry;
import java.util.jar.JarOutputStream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code merge}'s check of the shard folders (ShardSet, CampaignIdentity): one campaign file, one code
 * version, every shard of one split once and finished; the code version hashes content, not time stamps.
 */
class ShardSetTest {
    @TempDir
    Path dir;

    private final CampaignSpec spec = CampaignReader.parse(CampaignDeterminismTest.CAMPAIGN, "small.yaml", null);
    private final byte[] file = CampaignDeterminismTest.CAMPAIGN.getBytes(StandardCharsets.UTF_8);

    /** A finished shard folder (identity and an empty runs.csv: the check reads no row). */
    private Path shard(String name, Shard shard, byte[] campaign, String code) throws IOException {
        Path d = Files.createDirectories(dir.resolve(name));
        CampaignIdentity.of(spec, campaign, code, shard).write(d);
        Files.writeString(d.resolve(CampaignOutput.RUNS), RunRow.HEADER + "\n");
        return d;
    }

    private String refused(List<Path> dirs) {
        CampaignIdentity expected = CampaignIdentity.of(spec, file, "1.0+aa", Shard.ALL);
        return assertThrows(IOException.class, () -> ShardSet.check(dirs, expected)).getMessage();
    }

    @Test
    void shouldAcceptEveryShardOnceInAnyOrder() throws IOException {
        List<Path> dirs = List.of(shard("c", new Shard(3, 3), file, "1.0+aa"), shard("a", new Shard(1, 3), file, "1.0+aa"),
                shard("b", new Shard(2, 3), file, "1.0+aa"));
        assertDoesNotThrow(() -> ShardSet.check(dirs, CampaignIdentity.of(spec, file, "1.0+aa", Shard.ALL)));
        // 12 jobs over 3 shards: 4 each (Shard: job number modulo 3)
        assertEquals(4, CampaignIdentity.read(dirs.get(0)).runs());
        assertEquals(new Shard(3, 3), CampaignIdentity.read(dirs.get(0)).shard());
    }

    @Test
    void shouldNameTheMissingShards() throws IOException {
        List<Path> dirs = new ArrayList<>();
        for (int i : new int[] {1, 2, 6, 8}) {
            dirs.add(shard("s" + i, new Shard(i, 8), file, "1.0+aa"));
        }
        assertEquals("shards 3-5, 7 of 8 are missing", refused(dirs));
        assertEquals("shard 2 of 2 is missing", refused(List.of(shard("only", new Shard(1, 2), file, "1.0+aa"))));
    }

    @Test
    void shouldRefuseADuplicateAnotherSplitAnotherCampaignAndAnotherCode() throws IOException {
        Path a = shard("a", new Shard(1, 2), file, "1.0+aa");
        Path again = shard("again", new Shard(1, 2), file, "1.0+aa");
        assertEquals("shard 1/2 given twice: " + a + " and " + again, refused(List.of(a, again)));
        Path three = shard("three", new Shard(2, 3), file, "1.0+aa");
        assertTrue(refused(List.of(a, three)).contains(three + ": shard 2/3 is of another split than " + a));
        // one changed character of the campaign file (seed 77 -> 78) is another campaign
        byte[] edited = CampaignDeterminismTest.CAMPAIGN.replace("seed: 77", "seed: 78").getBytes(StandardCharsets.UTF_8);
        Path other = shard("other", new Shard(2, 2), edited, "1.0+aa");
        String m = refused(List.of(a, other));
        assertTrue(m.startsWith(other + ": a shard of another campaign file (small, sha256 "), m);
        Path newer = shard("newer", new Shard(2, 2), file, "1.0+bb");
        assertTrue(refused(List.of(a, newer)).contains("shard 2/2 ran on code 1.0+bb, this bench is 1.0+aa"));
    }

    @Test
    void shouldRefuseAnUnfinishedShardAndAFolderWithoutIdentity() throws IOException {
        Path a = shard("a", new Shard(1, 2), file, "1.0+aa");
        Path running = shard("running", new Shard(2, 2), file, "1.0+aa");
        Files.delete(running.resolve(CampaignOutput.RUNS));
        assertTrue(refused(List.of(a, running)).contains("shard 2/2 has not finished (no runs.csv): run it again"));
        Path bare = Files.createDirectories(dir.resolve("bare"));
        assertTrue(refused(List.of(bare)).startsWith(bare.resolve(CampaignIdentity.FILE) + ": missing"));
    }

    @Test
    void shouldHashTheCampaignFileAsSha256() {
        // FIPS 180-2 appendix B.1: SHA-256("abc")
        assertEquals("ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad",
                CampaignIdentity.sha256("abc".getBytes(StandardCharsets.US_ASCII)));
    }

    @Test
    void shouldCountEveryFolderOfBuiltInData() throws IOException {
        // the top folders of the modules' resources (the working folder of the tests is hw-sim)
        List<String> folders = new ArrayList<>();
        for (Path root : List.of(Path.of("src/main/resources"), Path.of("../fsw-core/src/main/resources"),
                Path.of("../ground-decoder/src/main/resources"))) {
            if (Files.isDirectory(root)) {
                try (var list = Files.list(root)) {
                    list.filter(Files::isDirectory).forEach(p -> folders.add(p.getFileName() + "/"));
                }
            }
        }
        assertTrue(folders.contains("scenarios/") && folders.contains("instruments/"), folders.toString());
        assertTrue(CodeVersion.DATA.containsAll(folders), "CodeVersion.DATA misses one of " + folders);
    }

    @Test
    void shouldVersionTheCodeByContentAlone() throws IOException {
        Path classes = Files.createDirectories(dir.resolve("classes/dev/sweepline/x"));
        Files.writeString(classes.resolve("A.class"), "a");
        Files.createDirectories(dir.resolve("classes/META-INF"));
        Files.writeString(dir.resolve("classes/META-INF/MANIFEST.MF"), "Built: monday");
        String before = CodeVersion.ofSources("1.0", List.of(dir.resolve("classes")));
        Files.writeString(dir.resolve("classes/META-INF/MANIFEST.MF"), "Built: tuesday");
        assertEquals(before, CodeVersion.ofSources("1.0", List.of(dir.resolve("classes")))); // META-INF does not count
        // the same entries in a jar: the same version
        Path jar = dir.resolve("code.jar");
        try (JarOutputStream out = new JarOutputStream(Files.newOutputStream(jar))) {
            out.putNextEntry(new JarEntry("dev/sweepline/x/A.class"));
            out.write("a".getBytes(StandardCharsets.UTF_8));
            out.closeEntry();
        }
        assertEquals(before, CodeVersion.ofSources("1.0", List.of(jar)));
        // a library's classes and files stand in by its version (its pom.properties), which counts
        Files.createDirectories(dir.resolve("classes/org/lib"));
        Files.writeString(dir.resolve("classes/org/lib/L.class"), "l");
        Files.writeString(dir.resolve("classes/org/lib/font.ttf"), "f");
        assertEquals(before, CodeVersion.ofSources("1.0", List.of(dir.resolve("classes"))));
        Files.createDirectories(dir.resolve("classes/META-INF/maven/org.lib/lib"));
        Files.writeString(dir.resolve("classes/META-INF/maven/org.lib/lib/pom.properties"), "version=2.0");
        assertNotEquals(before, CodeVersion.ofSources("1.0", List.of(dir.resolve("classes"))));
        Files.delete(dir.resolve("classes/META-INF/maven/org.lib/lib/pom.properties"));
        // built-in data counts (a scenario)
        Files.createDirectories(dir.resolve("classes/scenarios"));
        Files.writeString(dir.resolve("classes/scenarios/calm.yaml"), "x");
        assertNotEquals(before, CodeVersion.ofSources("1.0", List.of(dir.resolve("classes"))));
        Files.delete(dir.resolve("classes/scenarios/calm.yaml"));
        Files.writeString(classes.resolve("A.class"), "b");
        String after = CodeVersion.ofSources("1.0", List.of(dir.resolve("classes")));
        assertNotEquals(before, after);
        assertTrue(after.startsWith("1.0+") && after.length() == "1.0+".length() + 16, after);
    }
}
