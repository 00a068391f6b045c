package dev.sweepline.ground.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sweepline.ground.product.GroundProcessing;
import dev.sweepline.ground.product.GroundProducts;
import java.awt.image.BufferedImage;
import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Base64;
import java.util.List;
import java.util.OptionalDouble;
import javax.imageio.ImageIO;
import javax.xml.parsers.DocumentBuilderFactory;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;

class QuickLookReportTest {
    @TempDir
    static Path dir;

    private static Path report;

    @BeforeAll
    static void process() throws Exception {
        // a stream with frames lost: the report must show its gaps too (SyntheticTelemetry + a cut frame)
        byte[] s = dev.sweepline.ground.product.SyntheticTelemetryAccess.stream(99L);
        byte[] damaged = new byte[s.length - 1028];
        System.arraycopy(s, 0, damaged, 0, 1028 * 2);
        System.arraycopy(s, 1028 * 3, damaged, 1028 * 2, s.length - 1028 * 3);
        Path in = Files.write(dir.resolve("t.tm"), damaged);
        GroundProducts p = GroundProcessing.process(in, dir.resolve("out"), OptionalDouble.of(500));
        report = p.report();
    }

    private static Document parse() throws Exception {
        DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
        f.setNamespaceAware(true);
        f.setFeature("http://apache.org/xml/features/nonvalidating/load-external-dtd", false);
        return f.newDocumentBuilder().parse(report.toFile());
    }

    @Test
    void shouldBeWellFormedSelfContainedXhtml() throws Exception {
        Document d = parse();
        assertEquals("html", d.getDocumentElement().getLocalName());
        String html = Files.readString(report);
        // self-contained (issue: no network, inline CSS): no script, no stylesheet link, no remote source
        assertFalse(html.contains("<script"));
        assertFalse(html.contains("<link"));
        assertFalse(html.replace("xmlns=\"http://www.w3.org/1999/xhtml\"", "").contains("http"));
        // sections of the issue: run summary, frames and gaps, bits per second against the allocation, plots
        for (String h : List.of("Run summary", "Frames and gaps", "Bits per second", "Fits", "Plots")) {
            assertTrue(html.contains("<h2>" + h + "</h2>"), h);
        }
        // 15 spectra of ~1 kB each in 122 s (SyntheticTelemetry) need ~1 kbit/s of frames, over the 500 bit/s
        // allocation given; the frame cut out above shows as one VC gap of one frame
        assertTrue(html.contains("OVER the allocation"));
        assertTrue(html.contains("1 gaps, 1 frames missing"), "the cut frame");
    }

    @Test
    void shouldEmbedImagesThatDecode() throws Exception {
        NodeList imgs = parse().getElementsByTagNameNS("http://www.w3.org/1999/xhtml", "img");
        // spectrogram, moments, one spectrum with its fit (issue: the plots)
        assertEquals(3, imgs.getLength());
        for (int i = 0; i < imgs.getLength(); i++) {
            String src = ((Element) imgs.item(i)).getAttribute("src");
            assertTrue(src.startsWith("data:image/png;base64,"), src.substring(0, Math.min(40, src.length())));
            BufferedImage img = ImageIO.read(new ByteArrayInputStream(Base64.getDecoder().decode(
                    src.substring("data:image/png;base64,".length()))));
            assertNotNull(img, "image " + i);
            assertTrue(img.getWidth() >= 500 && img.getHeight() >= 200, img.getWidth() + "x" + img.getHeight());
        }
    }

    @Test
    void shouldRenderToANonBlankScreenshotInHeadlessChromium() throws Exception {
        HeadlessChromium.assumeInstalled();
        BufferedImage img = HeadlessChromium.screenshot(report, dir.resolve("shot.png"), 2000);
        long dark = 0;
        long colour = 0;
        for (int y = 0; y < img.getHeight(); y += 2) {
            for (int x = 0; x < img.getWidth(); x += 2) {
                int rgb = img.getRGB(x, y);
                int r = (rgb >> 16) & 0xFF;
                int g = (rgb >> 8) & 0xFF;
                int b = rgb & 0xFF;
                dark += r + g + b < 300 ? 1 : 0;
                colour += Math.max(r, Math.max(g, b)) - Math.min(r, Math.min(g, b)) > 80 ? 1 : 0;
            }
        }
        long samples = (long) (img.getWidth() / 2) * (img.getHeight() / 2);
        // not blank: text (dark pixels) and the spectrogram's colours both show (common practice: a blank
        // or failed page is all one colour); thresholds far below what the page shows (~3 % and ~10 %)
        assertTrue(dark > samples / 500, "dark pixels " + dark + " of " + samples);
        assertTrue(colour > samples / 100, "coloured pixels " + colour + " of " + samples);
    }
}
