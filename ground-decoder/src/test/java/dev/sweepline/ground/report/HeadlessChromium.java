package dev.sweepline.ground.report;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.TimeUnit;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.Assumptions;

/** Test helper: a page rendered by a real browser, a headless Chromium (Debian package chromium). */
public final class HeadlessChromium {
    /** Where a headless Chromium is installed on Debian (package chromium). */
    public static final Path CHROMIUM = Path.of("/usr/bin/chromium");
    /** How long one screenshot may take: a few seconds when idle, over a minute on a loaded 2-core machine. */
    private static final long WAIT_SECONDS = 180;

    private HeadlessChromium() {
    }

    /** Skips the calling test, saying why, when there is no Chromium. */
    public static void assumeInstalled() {
        Assumptions.assumeTrue(Files.isExecutable(CHROMIUM),
                "skipped: no headless Chromium at /usr/bin/chromium (apt-get install -y chromium to run it)");
    }

    /** A screenshot of {@code page} in a 1200 x {@code height} window, written to {@code shot} and decoded. */
    public static BufferedImage screenshot(Path page, Path shot, int height) throws IOException, InterruptedException {
        Path work = Files.createDirectories(shot.resolveSibling(shot.getFileName() + ".chromium"));
        Path log = work.resolve("chromium.log");
        Process p = new ProcessBuilder(CHROMIUM.toString(), "--headless", "--no-sandbox", "--disable-gpu",
                "--disable-quic", "--no-first-run", "--disable-background-networking", "--disable-component-update",
                "--disable-sync", "--user-data-dir=" + work.resolve("profile"), "--screenshot=" + shot,
                "--window-size=1200," + height, page.toUri().toString()).redirectErrorStream(true)
                .redirectOutput(log.toFile()).start();
        boolean ended = p.waitFor(WAIT_SECONDS, TimeUnit.SECONDS);
        if (!ended) {
            // A browser that hangs keeps its zygote and renderer children: end the whole tree.
            p.descendants().forEach(ProcessHandle::destroyForcibly);
            p.destroyForcibly();
        }
        assertTrue(ended, "chromium did not finish within " + WAIT_SECONDS + " s: " + Files.readString(log));
        assertTrue(Files.exists(shot), "no screenshot: " + Files.readString(log));
        return ImageIO.read(shot.toFile());
    }
}
