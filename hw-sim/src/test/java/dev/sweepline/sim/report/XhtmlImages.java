package dev.sweepline.sim.report;

import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Base64;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import javax.imageio.ImageIO;
import javax.xml.parsers.DocumentBuilderFactory;
import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;

/** Test helper: a report parsed by the JDK's XML parser, and its embedded PNGs decoded by ImageIO. */
public final class XhtmlImages {
    /** The XHTML namespace (XHTML 1.0, W3C). */
    public static final String XHTML = "http://www.w3.org/1999/xhtml";
    private static final String PREFIX = "data:image/png;base64,";

    private XhtmlImages() {
    }

    /** The document; fails when the file is not well-formed XML. */
    public static Document parse(Path file) throws Exception {
        DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
        f.setNamespaceAware(true);
        f.setFeature("http://apache.org/xml/features/nonvalidating/load-external-dtd", false);
        return f.newDocumentBuilder().parse(file.toFile());
    }

    /** Text of every element named {@code tag}, in order. */
    public static List<String> texts(Document d, String tag) {
        NodeList n = d.getElementsByTagNameNS(XHTML, tag);
        List<String> out = new ArrayList<>();
        for (int i = 0; i < n.getLength(); i++) {
            out.add(n.item(i).getTextContent());
        }
        return out;
    }

    /** Every embedded image by its alt text, decoded; fails on one that is not a PNG ImageIO reads. */
    public static Map<String, BufferedImage> images(Document d) throws IOException {
        NodeList imgs = d.getElementsByTagNameNS(XHTML, "img");
        Map<String, BufferedImage> out = new LinkedHashMap<>();
        for (int i = 0; i < imgs.getLength(); i++) {
            Element e = (Element) imgs.item(i);
            String src = e.getAttribute("src");
            assertTrue(src.startsWith(PREFIX), "image " + e.getAttribute("alt") + " is not an embedded PNG");
            out.put(e.getAttribute("alt"), decode(Base64.getDecoder().decode(src.substring(PREFIX.length()))));
        }
        return out;
    }

    /** A PNG decoded; fails when ImageIO cannot read it. */
    public static BufferedImage decode(byte[] png) throws IOException {
        BufferedImage img = ImageIO.read(new ByteArrayInputStream(png));
        assertNotNull(img, "not a PNG ImageIO can decode");
        return img;
    }

    /** Pixels within {@code tolerance} per channel of the colour {@code rgb}. */
    public static long pixelsNear(BufferedImage img, int rgb, int tolerance) {
        long n = 0;
        for (int y = 0; y < img.getHeight(); y++) {
            for (int x = 0; x < img.getWidth(); x++) {
                int p = img.getRGB(x, y);
                boolean near = true;
                for (int shift = 0; shift <= 16; shift += 8) {
                    near &= Math.abs(((p >> shift) & 0xFF) - ((rgb >> shift) & 0xFF)) <= tolerance;
                }
                n += near ? 1 : 0;
            }
        }
        return n;
    }
}
