package dev.sweepline.sim.interop;

import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;

/**
 * The official CCSDS 121.0-B test set (June 2012 release) at {@code ../shared/vectors/ccsds-121}
 * from the project root; its README gives the layout and parameters used here. A clone without
 * {@code ../shared} skips the tests that need it.
 */
final class Ccsds121TestSet {
    /** Where the README says the set lies, relative to the project root. */
    static final String RELATIVE_LOCATION = "../shared/vectors/ccsds-121";

    private static final Pattern ALL_OPTIONS = Pattern.compile("test_p(\\d+)n(\\d\\d)(-basic|-restricted)?\\.rz");
    private static final Pattern LOW_ENTROPY = Pattern.compile("(Lowset\\d_8bit)\\.n(\\d\\d)(-basic|-restricted)?\\.rz");

    /** One compressed file, its raw original and the parameters the README gives for it. */
    record Vector(String name, Path compressed, Path raw, int bitsPerSample, int blockSize,
                  int intervalBlocks, boolean restricted, int rawBytesPerSample) {
        /** The raw samples: headerless unsigned little-endian, 1, 2 or 4 bytes each (README). */
        int[] samples() {
            byte[] bytes = read(raw);
            int count = bytes.length / rawBytesPerSample;
            int[] samples = new int[count];
            for (int i = 0; i < count; i++) {
                int value = 0;
                for (int b = rawBytesPerSample - 1; b >= 0; b--) {
                    value = (value << 8) | (bytes[i * rawBytesPerSample + b] & 0xFF);
                }
                samples[i] = value;
            }
            return samples;
        }

        byte[] compressedBytes() {
            return read(compressed);
        }
    }

    private Ccsds121TestSet() {
    }

    /** The folder, found from the working directory up to the project root; skips the test if absent. */
    static Path folderOrSkip() {
        Path root = projectRoot();
        Path folder = root == null ? Path.of(RELATIVE_LOCATION) : root.resolve(RELATIVE_LOCATION).normalize();
        String absent = "CCSDS 121 test set not found at " + folder + " (project root + " + RELATIVE_LOCATION
                + "); skipped";
        if (!Files.isDirectory(folder.resolve("AllOptions"))) {
            System.err.println(absent); // surefire does not count an aborted test factory as skipped: say it
        }
        assumeTrue(Files.isDirectory(folder.resolve("AllOptions")), absent);
        return folder;
    }

    /** Every .rz of the set with its parameters. */
    static List<Vector> vectors() {
        Path folder = folderOrSkip();
        List<Vector> vectors = new ArrayList<>();
        for (Path rz : list(folder.resolve("AllOptions"))) {
            Matcher m = ALL_OPTIONS.matcher(rz.getFileName().toString());
            if (m.matches()) {
                int n = Integer.parseInt(m.group(2));
                // README: n = 1..16 with r = 16, n = 17..32 with r = 32; J = 16 throughout
                Path raw = rz.resolveSibling("test_p" + m.group(1) + "n" + m.group(2) + ".dat");
                vectors.add(new Vector(rz.getFileName().toString(), rz, raw, n, 16, n <= 16 ? 16 : 32,
                        "-restricted".equals(m.group(3)), bytesPerSample(n)));
            }
        }
        for (Path rz : list(folder.resolve("LowEntropyOptions"))) {
            Matcher m = LOW_ENTROPY.matcher(rz.getFileName().toString());
            if (m.matches()) {
                // README: 8-bit inputs (1 byte a sample) coded at n = XX, J = 16, r = 64
                Path raw = rz.resolveSibling(m.group(1) + ".dat");
                vectors.add(new Vector(rz.getFileName().toString(), rz, raw, Integer.parseInt(m.group(2)), 16, 64,
                        "-restricted".equals(m.group(3)), 1));
            }
        }
        return vectors;
    }

    static int bytesPerSample(int n) {
        return n <= 8 ? 1 : n <= 16 ? 2 : 4;
    }

    private static Path projectRoot() {
        for (Path dir = Path.of("").toAbsolutePath(); dir != null; dir = dir.getParent()) {
            Path pom = dir.resolve("pom.xml");
            if (Files.isRegularFile(pom) && read(pom).length > 0
                    && new String(read(pom), java.nio.charset.StandardCharsets.UTF_8).contains("<module>fsw-core</module>")) {
                return dir;
            }
        }
        return null;
    }

    private static List<Path> list(Path dir) {
        if (!Files.isDirectory(dir)) {
            return List.of();
        }
        try (Stream<Path> files = Files.list(dir)) {
            return files.sorted().toList();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static byte[] read(Path file) {
        try {
            return Files.readAllBytes(file);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
