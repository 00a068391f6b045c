package dev.sweepline.ground.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sweepline.ground.decode.DecoderConfig;
import dev.sweepline.ground.product.GroundProcessing;
import dev.sweepline.ground.product.GroundSession;
import dev.sweepline.ground.product.ReportAdditions;
import dev.sweepline.ground.product.SyntheticTelemetryAccess;
import dev.sweepline.ground.report.HeadlessChromium;
import dev.sweepline.ground.spectrum.WindowCatalogue;
import java.awt.image.BufferedImage;
import java.io.ByteArrayInputStream;
import java.io.OutputStream;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.net.ServerSocket;
import java.net.Socket;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.util.Base64;
import java.util.OptionalDouble;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import javax.imageio.ImageIO;
import javax.xml.parsers.DocumentBuilderFactory;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;

/** {@code decode --follow}: the report is rewritten while frames arrive, and a real browser sees it grow. */
class FollowTest {
    /** Frame length of SyntheticTelemetry: 4 octets of ASM + a 1024-octet frame (telemetry ICD §1). */
    private static final int FRAME = 1028;
    private static final Pattern SO_FAR = Pattern.compile("\\((\\d+) spectra so far\\)");

    @TempDir
    Path dir;

    @Test
    void shouldRewriteTheReportOfAGrowingFileAndShowTheSpectrogramGrowInABrowser() throws Exception {
        byte[] stream = SyntheticTelemetryAccess.stream(5L);
        int half = stream.length / FRAME / 2 * FRAME;
        Path tm = dir.resolve("live.tm");
        Files.write(tm, java.util.Arrays.copyOf(stream, half));
        Path out = dir.resolve("out");
        Path report = out.resolve(GroundProcessing.REPORT);
        AtomicBoolean stop = new AtomicBoolean();
        Thread follower = follow(FollowLoop.open(tm.toString()), out, stop);
        int first = waitForSpectra(report, 1);
        Document early = parse(report);
        assertEquals("refresh", meta(early), "a live report reloads itself");
        byte[] spectrogramEarly = image(early, "spectrogram");
        BufferedImage shotEarly = screenshotIfInstalled(report, dir.resolve("early.png"));

        Files.write(tm, java.util.Arrays.copyOfRange(stream, half, stream.length), StandardOpenOption.APPEND);
        // every spectrum of SyntheticTelemetry: 12 good + 3 degenerate ones
        int last = waitForSpectra(report, 15);
        assertTrue(last > first, first + " then " + last);
        byte[] spectrogramLate = image(parse(report), "spectrogram");
        assertFalse(java.util.Arrays.equals(spectrogramEarly, spectrogramLate), "the spectrogram was redrawn");
        BufferedImage shotLate = screenshotIfInstalled(report, dir.resolve("late.png"));
        stop.set(true);
        follower.join(30_000);
        assertFalse(follower.isAlive());
        assertEquals("", meta(parse(report)), "the finished report no longer reloads");
        if (shotEarly != null) {
            // the browser shows the change: the two screenshots differ in more than a few stray pixels
            // (the spectrogram's columns and the spectra count; common practice for a rendered-page diff)
            assertTrue(differingPixels(shotEarly, shotLate) > 1000, "screenshots differ");
        }
    }

    @Test
    void shouldFollowATcpStreamUntilTheServerClosesIt() throws Exception {
        byte[] stream = SyntheticTelemetryAccess.stream(6L);
        int half = stream.length / FRAME / 2 * FRAME;
        try (ServerSocket server = new ServerSocket(0)) {
            Thread sender = new Thread(() -> {
                try (Socket s = server.accept(); OutputStream o = s.getOutputStream()) {
                    o.write(stream, 0, half);
                    o.flush();
                    Thread.sleep(FollowLoop.REFRESH_MILLIS * 2L);
                    o.write(stream, half, stream.length - half);
                } catch (Exception e) {
                    throw new IllegalStateException(e);
                }
            });
            sender.start();
            Path out = dir.resolve("tcp");
            StringWriter log = new StringWriter();
            try (FollowLoop.Source source = FollowLoop.open("tcp://127.0.0.1:" + server.getLocalPort());
                    GroundSession session = session(out)) {
                FollowLoop.run(source, session, () -> false, new PrintWriter(log));
                assertEquals(stream.length, session.octets());
                assertEquals(15, session.spectra()); // SyntheticTelemetry: 12 good + 3 degenerate spectra
            }
            sender.join();
            // the products were written on the way (a progress line per rewrite), then once more at the end
            assertTrue(log.toString().contains(" spectra"), log.toString());
            assertEquals("", meta(parse(out.resolve(GroundProcessing.REPORT))));
        }
    }

    @Test
    void shouldRefuseAMalformedTcpAddressInOneLine() throws Exception {
        StringWriter err = new StringWriter();
        picocli.CommandLine cl = GroundMain.commandLine();
        cl.setErr(new PrintWriter(err));
        int status = cl.execute("decode", "tcp://nohostport", "--out", dir.resolve("x").toString(), "--follow");
        assertEquals(ExitCodes.INPUT, status);
        assertEquals(1, err.toString().strip().lines().count(), err.toString());
        assertTrue(err.toString().contains("tcp://HOST:PORT"), err.toString());
    }

    /**
     * A session on the ICD's 1024-octet frames: with the length detected, the decoder would wait for 16 kB
     * before its first frame (FrameSynchroniser), more than half of this short stream.
     */
    private static GroundSession session(Path out) throws java.io.IOException {
        return new GroundSession("live", out, OptionalDouble.empty(), DecoderConfig.icdDefaults(), new WindowCatalogue(),
                ReportAdditions.NONE);
    }

    private static Thread follow(FollowLoop.Source source, Path out, AtomicBoolean stop) {
        Thread t = new Thread(() -> {
            try (source; GroundSession session = session(out)) {
                FollowLoop.run(source, session, stop::get, new PrintWriter(new StringWriter()));
            } catch (Exception e) {
                throw new IllegalStateException(e);
            }
        });
        t.start();
        return t;
    }

    /** Waits (up to a minute: the machine may be loaded) until the live report counts at least {@code n} spectra. */
    private static int waitForSpectra(Path report, int n) throws Exception {
        long deadline = System.nanoTime() + 60_000_000_000L;
        while (System.nanoTime() < deadline) {
            if (Files.exists(report)) {
                Matcher m = SO_FAR.matcher(Files.readString(report));
                if (m.find() && Integer.parseInt(m.group(1)) >= n) {
                    return Integer.parseInt(m.group(1));
                }
            }
            Thread.sleep(100);
        }
        throw new AssertionError("the report never counted " + n + " spectra");
    }

    private static Document parse(Path file) throws Exception {
        DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
        f.setNamespaceAware(true);
        f.setFeature("http://apache.org/xml/features/nonvalidating/load-external-dtd", false);
        return f.newDocumentBuilder().parse(file.toFile());
    }

    /** The http-equiv of the page's second meta element, "" when there is none. */
    private static String meta(Document d) {
        NodeList metas = d.getElementsByTagNameNS("http://www.w3.org/1999/xhtml", "meta");
        for (int i = 0; i < metas.getLength(); i++) {
            String e = ((Element) metas.item(i)).getAttribute("http-equiv");
            if (!e.isEmpty()) {
                return e;
            }
        }
        return "";
    }

    /** The embedded PNG of {@code alt}, checked to decode. */
    private static byte[] image(Document d, String alt) throws Exception {
        NodeList imgs = d.getElementsByTagNameNS("http://www.w3.org/1999/xhtml", "img");
        for (int i = 0; i < imgs.getLength(); i++) {
            Element e = (Element) imgs.item(i);
            if (e.getAttribute("alt").equals(alt)) {
                byte[] png = Base64.getDecoder().decode(e.getAttribute("src").substring("data:image/png;base64,".length()));
                assertNotNull(ImageIO.read(new ByteArrayInputStream(png)), alt);
                return png;
            }
        }
        throw new AssertionError("no image " + alt);
    }

    private static BufferedImage screenshotIfInstalled(Path report, Path shot) throws Exception {
        if (!java.nio.file.Files.isExecutable(HeadlessChromium.CHROMIUM)) {
            return null;
        }
        // a copy, so the browser reads one version while the follower may rewrite the report
        Path copy = Files.copy(report, shot.resolveSibling(shot.getFileName() + ".html"));
        return HeadlessChromium.screenshot(copy, shot, 2600);
    }

    private static long differingPixels(BufferedImage a, BufferedImage b) {
        long n = 0;
        for (int y = 0; y < Math.min(a.getHeight(), b.getHeight()); y++) {
            for (int x = 0; x < Math.min(a.getWidth(), b.getWidth()); x++) {
                n += a.getRGB(x, y) != b.getRGB(x, y) ? 1 : 0;
            }
        }
        return n;
    }
}
