package dev.sweepline.sim.interop;

import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.File;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.concurrent.TimeUnit;

/**
 * Runs Debian's libaec-tools {@code aec} (the reference CCSDS 121.0-B coder of standards.md) on
 * sample files. Samples go MSB-first ({@code -m}) in 1 byte for n at most 8, 2 bytes up to 16,
 * 4 bytes above (aec 1.0.6 help and source: bytes per sample follow n the same way); {@code -r}
 * counts blocks; {@code -t} selects the restricted set, {@code -N} turns preprocessing off;
 * {@code -p} ("pad RSI to byte boundary", {@code aec -h}) sets libaec's AEC_PAD_RSI flag. The
 * decoder honours that flag; libaec's encoder writes the padding only when the library was built
 * with ENABLE_RSI_PADDING (encode.c), which the default build and Debian's package are not: there
 * {@code aec -p} encodes exactly as without it. {@link #encoderPadsIntervals} tells which.
 */
final class AecTool {
    private static final long TIMEOUT_SECONDS = 30;

    private final Path executable;
    private final Path workDir;

    private AecTool(Path executable, Path workDir) {
        this.executable = executable;
        this.workDir = workDir;
    }

    /** Finds {@code aec} on PATH or skips the calling test with a message saying so. */
    static AecTool onPathOrSkip(Path workDir) {
        String path = System.getenv("PATH");
        if (path != null) {
            for (String dir : path.split(File.pathSeparator)) {
                Path candidate = Path.of(dir, "aec");
                if (Files.isExecutable(candidate)) {
                    return new AecTool(candidate, workDir);
                }
            }
        }
        assumeTrue(false, "aec (Debian package libaec-tools) is not on PATH; cross-check skipped");
        return null;
    }

    /** Encodes {@code samples} with aec ({@code -p} if {@code padIntervals}); returns the compressed bytes. */
    byte[] encode(int[] samples, int n, int blockSize, int intervalBlocks, boolean restricted,
                  boolean preprocessed, boolean padIntervals) throws IOException, InterruptedException {
        Path raw = Files.createTempFile(workDir, "aec-in", ".raw");
        Path rz = Files.createTempFile(workDir, "aec-out", ".rz");
        Files.write(raw, toMsbFirst(samples, n));
        run(false, n, blockSize, intervalBlocks, restricted, preprocessed, padIntervals, raw, rz);
        return Files.readAllBytes(rz);
    }

    /**
     * Decodes {@code stream} with {@code aec -d} ({@code -d -p} if {@code padIntervals}); returns every
     * sample aec writes (it pads to whole intervals).
     */
    int[] decode(byte[] stream, int n, int blockSize, int intervalBlocks, boolean restricted,
                 boolean preprocessed, boolean padIntervals) throws IOException, InterruptedException {
        Path rz = Files.createTempFile(workDir, "aec-in", ".rz");
        Path raw = Files.createTempFile(workDir, "aec-out", ".raw");
        Files.write(rz, stream);
        run(true, n, blockSize, intervalBlocks, restricted, preprocessed, padIntervals, rz, raw);
        return fromMsbFirst(Files.readAllBytes(raw), n);
    }

    /**
     * True if this aec's encoder writes RSI padding for {@code -p}. The probe is two reference intervals
     * whose first ends mid-octet: n = 8, J = 8, r = 1, eight 5s then eight 9s, each interval one
     * zero-block CDS of 13 bits (ID 000 + '0', reference, FS(0); standards.md zero-block). It is coded
     * with and without {@code -p}; equal bytes mean the flag is ignored by the encoder.
     */
    boolean encoderPadsIntervals() throws IOException, InterruptedException {
        int[] probe = new int[16];
        Arrays.fill(probe, 0, 8, 5);
        Arrays.fill(probe, 8, 16, 9);
        return !Arrays.equals(encode(probe, 8, 8, 1, false, true, true), encode(probe, 8, 8, 1, false, true, false));
    }

    private void run(boolean decode, int n, int blockSize, int intervalBlocks, boolean restricted,
                     boolean preprocessed, boolean padIntervals, Path in, Path out)
            throws IOException, InterruptedException {
        List<String> command = new ArrayList<>(List.of(executable.toString()));
        if (decode) {
            command.add("-d");
        }
        if (restricted) {
            command.add("-t");
        }
        if (!preprocessed) {
            command.add("-N");
        }
        if (padIntervals) {
            command.add("-p");
        }
        command.addAll(List.of("-m", "-n", Integer.toString(n), "-j", Integer.toString(blockSize),
                "-r", Integer.toString(intervalBlocks), in.toString(), out.toString()));
        Process process = new ProcessBuilder(command).redirectErrorStream(true).start();
        byte[] log = process.getInputStream().readAllBytes();
        if (!process.waitFor(TIMEOUT_SECONDS, TimeUnit.SECONDS) || process.exitValue() != 0) {
            process.destroyForcibly();
            throw new IOException("aec failed: " + command + ": " + new String(log));
        }
    }

    static int bytesPerSample(int n) {
        return n <= 8 ? 1 : n <= 16 ? 2 : 4;
    }

    static byte[] toMsbFirst(int[] samples, int n) {
        int width = bytesPerSample(n);
        byte[] bytes = new byte[samples.length * width];
        for (int i = 0; i < samples.length; i++) {
            for (int b = 0; b < width; b++) {
                bytes[i * width + b] = (byte) (samples[i] >>> (8 * (width - 1 - b)));
            }
        }
        return bytes;
    }

    static int[] fromMsbFirst(byte[] bytes, int n) {
        int width = bytesPerSample(n);
        int[] samples = new int[bytes.length / width];
        for (int i = 0; i < samples.length; i++) {
            int value = 0;
            for (int b = 0; b < width; b++) {
                value = (value << 8) | (bytes[i * width + b] & 0xFF);
            }
            samples[i] = value;
        }
        return samples;
    }
}
