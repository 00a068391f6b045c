package dev.sweepline.sim.campaign;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.ObjectMapper;
import dev.sweepline.sim.report.XhtmlImages;
import java.awt.image.BufferedImage;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.w3c.dom.Document;

/** The campaign report from run rows made up in the test, so that what it must show is known in advance. */
class CampaignReportTest {
    @TempDir
    static Path dir;

    private static CampaignSpec spec;
    private static Document report;
    private static List<RunRow> rows;

    @BeforeAll
    static void write() throws Exception {
        // shock-tuning: edgeSearchWindows x halfWidthPerFwhm x resurveyEvery, two values each, 8 members
        spec = CampaignReader.load(Path.of("src/main/resources/campaigns/shock-tuning.yaml"));
        rows = new ArrayList<>();
        for (int set = 0; set < spec.setCount(); set++) {
            double[] v = spec.setValues(set); // edgeSearchWindows, halfWidthPerFwhm, resurveyEvery
            for (int run = 0; run < spec.runsPerSet(); run++) {
                // the metrics depend on the band width and the re-survey interval only: edgeSearchWindows is
                // inert by construction; the narrow band is the more accurate, the frequent re-survey costs bits
                double error = 0.001 * (1 + v[1]) + 1e-5 * run;
                double bits = 7000 + 4000.0 / v[2] + 3 * run;
                rows.add(new RunRow(set, run, 1.0, 0, 3, 1.5, 1.7, bits, 0.8, 0.6,
                        new double[] {error, error / 10, error}, new double[] {5, 4, 6}, new double[] {0.3, 0.9, 1.4},
                        4, 2.5, new double[] {5, 4, 6}, 0, new double[] {error, error / 10, error},
                        new double[] {5, 4, 6}));
            }
        }
        CampaignOutput.writeResults(dir, spec, rows);
        report = XhtmlImages.parse(dir.resolve("report.html"));
    }

    @Test
    void shouldWarnAboutTheAxisThatChangedNothingAndOnlyThatOne() throws Exception {
        Map<?, ?> summary = new ObjectMapper().readValue(dir.resolve("summary.json").toFile(), Map.class);
        assertEquals(List.of("edgeSearchWindows"), summary.get("inertAxes"));
        List<String> warnings = XhtmlImages.texts(report, "p").stream().filter(p -> p.startsWith("Warning")).toList();
        assertEquals(1, warnings.size(), warnings.toString());
        assertTrue(warnings.get(0).contains("edgeSearchWindows changed nothing"), warnings.get(0));
    }

    @Test
    void shouldPutTheTwoChosenSetsSideBySide() throws Exception {
        Path chosen = Files.createDirectories(dir.resolve("chosen"));
        SetResult best = CampaignOutput.writeResults(chosen, spec, rows, new int[] {6, 1});
        Document d = XhtmlImages.parse(chosen.resolve("report.html"));
        assertTrue(XhtmlImages.texts(d, "h2").contains("Side by side: set 6 and set 1"), XhtmlImages.texts(d, "h2").toString());
        List<String> th = XhtmlImages.texts(d, "th");
        // the column headings name the chosen sets, the recommended one marked (CampaignReport)
        assertTrue(th.contains("set 6" + (best.set() == 6 ? " (recommended)" : "")), th.toString());
        assertTrue(th.contains("set 1" + (best.set() == 1 ? " (recommended)" : "")), th.toString());
        List<String> td = XhtmlImages.texts(d, "td");
        // the parameters row carries both sets' values in order (shock-tuning.yaml's grid, set 6 and set 1)
        int at = td.indexOf("parameters");
        assertEquals(CampaignReport.describe(spec, SetResult.aggregate(spec, rows).get(6)), td.get(at + 1));
        assertEquals(CampaignReport.describe(spec, SetResult.aggregate(spec, rows).get(1)), td.get(at + 2));
        assertTrue(td.contains("telemetry (bit/s, mean and worst run)"));
    }

    @Test
    void shouldPutTheRecommendedSetBesideAnotherAndShowTheReacquisition() {
        List<String> headings = XhtmlImages.texts(report, "h2");
        assertTrue(headings.stream().anyMatch(h -> h.startsWith("Side by side: set ")), headings.toString());
        List<String> cells = XhtmlImages.texts(report, "th");
        // the shock scenario has a jump (its shock front): the sets table shows the reacquisition after it
        assertTrue(cells.contains("reacquired (worst)"), cells.toString());
        List<String> td = XhtmlImages.texts(report, "td");
        assertTrue(td.contains("3 sweeps, 1.50 s"), "the made-up reacquisition, as the report prints it");
        assertTrue(td.contains("band-centre error, windows (median, p95, max)"));
    }

    @Test
    void shouldDrawLabelledParetoChartsWithTheRecommendedSetAndTheAllocation() throws Exception {
        Map<String, BufferedImage> images = XhtmlImages.images(report);
        assertEquals(2, images.size());
        BufferedImage rate = XhtmlImages.decode(Files.readAllBytes(dir.resolve("pareto.png")));
        // the recommended set's diamond (ParetoChart.RECOMMENDED, rgb 230,120,0) is drawn on both charts
        for (BufferedImage img : images.values()) {
            assertTrue(XhtmlImages.pixelsNear(img, 0xE67800, 10) > 20, "recommended marker");
        }
        assertEquals(900, rate.getWidth()); // ParetoChart's size
        // shock-tuning gives no allocation, so no allocation line (ParetoChart.ALLOCATION, rgb 200,30,30)
        assertEquals(0, XhtmlImages.pixelsNear(rate, 0xC81E1E, 10));
    }
}
