package dev.sweepline.ground.product;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashSet;
import java.util.Iterator;
import java.util.OptionalDouble;
import java.util.Set;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** What report.html and moments.json say, beyond the layout QuickLookReportTest checks. */
class ReportContentTest {
    @TempDir
    static Path dir;

    private static GroundProducts products;

    @BeforeAll
    static void process() throws Exception {
        Path in = Files.write(dir.resolve("t.tm"), SyntheticTelemetry.stream(7L));
        products = GroundProcessing.process(in, dir.resolve("out"), OptionalDouble.of(500));
    }

    @Test
    void shouldWriteCountsInWordsAndTheAllocationUnderTheBitRates() throws Exception {
        String html = Files.readString(products.report());
        assertFalse(html.contains("{}"), "an empty map printed raw");
        assertTrue(html.contains("frames dropped by VC count</td><td>none"), "no frame dropped says none");
        // the allocation sentence follows the bit-rate table, before the events section
        int bits = html.indexOf("<h2>Bits per second</h2>");
        int allocation = html.indexOf("Allocation 500.0 bit/s");
        int events = html.indexOf("<h2>Events and commands</h2>");
        assertTrue(bits < allocation && allocation < events, bits + " " + allocation + " " + events);
    }

    @Test
    void shouldGiveMomentsJsonEveryQuantityOfMomentsCsv() throws Exception {
        JsonNode first = new ObjectMapper().readTree(dir.resolve("out").resolve(GroundProcessing.MOMENTS_JSON)
                .toFile()).get("moments").get(0);
        Set<String> keys = new HashSet<>();
        for (Iterator<String> it = first.fieldNames(); it.hasNext();) {
            keys.add(it.next());
        }
        // the sigma, alpha and speed-change columns of MomentsCsv.HEADER, in the JSON's names
        for (String k : new String[] {"alphaUKmPerS", "alphaTK", "sigmaNPerCc", "sigmaUKmPerS", "sigmaTK",
            "sigmaThetaXDeg", "sigmaThetaYDeg", "sigmaAlphaNPerCc", "sigmaAlphaUKmPerS", "sigmaAlphaTK",
            "crlbAlphaNPerCc", "duKmPerS", "sigmaDuKmPerS"}) {
            assertTrue(keys.contains(k), k);
        }
        MomentRecord r = products.moments().get(0);
        assertEquals(r.fit().protons().sigmaSpeedMPerS() * 1e-3, first.get("sigmaUKmPerS").asDouble(), 1e-9);
        // a failed fit has no error bars: null, never NaN (MomentsJson); SyntheticTelemetry ends with degenerate spectra
        int failed = products.moments().size() - 1;
        assertFalse(products.moments().get(failed).ok());
        assertTrue(new ObjectMapper().readTree(dir.resolve("out").resolve(GroundProcessing.MOMENTS_JSON).toFile())
                .get("moments").get(failed).get("sigmaNPerCc").isNull());
    }
}
