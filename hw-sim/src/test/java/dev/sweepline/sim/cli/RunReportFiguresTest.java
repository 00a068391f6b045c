package dev.sweepline.sim.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sweepline.sim.report.XhtmlImages;
import java.awt.image.BufferedImage;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.w3c.dom.Document;

/** The report.html of {@code bench run}: the sweep-decision chart, the truth on the moments, the fit's note. */
class RunReportFiguresTest {
    @TempDir
    static Path dir;

    private static Document report;

    @BeforeAll
    static void run() throws Exception {
        // shock-sheath: the shock front at 40 s (scenario file), so a 48 s run holds an event and a mode change
        int status = BenchMain.commandLine().execute("run", "--scenario", "shock-sheath", "--minutes", "0.8",
                "--no-auth", "--out", dir.toString());
        assertEquals(0, status);
        report = XhtmlImages.parse(dir.resolve("report.html"));
    }

    @Test
    void shouldAddTheSweepDecisionChartAfterTheGroundPlots() throws Exception {
        List<String> headings = XhtmlImages.texts(report, "h2");
        assertTrue(headings.indexOf("Sweep decisions") > headings.indexOf("Plots"), headings.toString());
        Map<String, BufferedImage> images = XhtmlImages.images(report);
        assertEquals(List.of("spectrogram", "moments", "spectrum fit", "sweep decisions"), List.copyOf(images.keySet()));
        BufferedImage chart = images.get("sweep decisions");
        // the same chart is written beside decisions.csv
        BufferedImage file = XhtmlImages.decode(Files.readAllBytes(dir.resolve("decisions.png")));
        assertEquals(chart.getWidth(), file.getWidth());
        // the shock front (an event line, red dashed; DecisionChart's colour) is drawn
        assertTrue(XhtmlImages.pixelsNear(chart, 0xC81E1E, 12) > 50, "event line");
    }

    @Test
    void shouldDrawTheSweepDecisionsWithoutTheGroundToo(@TempDir Path quick) throws Exception {
        assertEquals(0, BenchMain.commandLine().execute("run", "--minutes", "0.2", "--no-ground", "--no-auth", "--out",
                quick.toString()));
        assertEquals(1000, XhtmlImages.decode(Files.readAllBytes(quick.resolve("decisions.png"))).getWidth());
    }

    @Test
    void shouldDrawTheTruthUnderTheMomentsAndNameTheFitsQuality() throws Exception {
        String captions = String.join("\n", XhtmlImages.texts(report, "p"));
        assertTrue(captions.contains("the grey line is the truth"), captions);
        assertTrue(captions.contains("reduced chi-square") && captions.contains("flags"), captions);
        // the truth line (MomentsPlot.TRUTH, rgb 110,110,110) runs through the five panels
        assertTrue(XhtmlImages.pixelsNear(XhtmlImages.images(report).get("moments"), 0x6E6E6E, 4) > 1000);
    }
}
