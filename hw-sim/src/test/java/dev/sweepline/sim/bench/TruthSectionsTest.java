package dev.sweepline.sim.bench;

import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sweepline.ground.report.QuickLookReport;
import java.nio.charset.StandardCharsets;
import java.util.List;
import org.junit.jupiter.api.Test;

/** The bench's sections of report.html: after the ground's quick-look, saying where the truth is taken. */
class TruthSectionsTest {
    @Test
    void shouldStateTheMidSweepTruthAfterTheGroundsReport() {
        byte[] ground = new QuickLookReport("Ground quick-look: x").heading("Fits").toBytes();
        GroundCheck.GroundFigures none = GroundCheck.figures(0, List.of());
        String html = new String(QuickLookReport.withSections(ground, TruthSections.of(none)), StandardCharsets.UTF_8);
        int fits = html.indexOf("<h2>Fits</h2>");
        int bench = html.indexOf("<h2>Bench: the ground against the truth</h2>");
        assertTrue(fits >= 0 && bench > fits, html);
        assertTrue(html.contains("compared with the plasma at mid-sweep"), html);
        assertTrue(html.indexOf("</body>") > bench && html.endsWith("</html>\n"), html);
        assertTrue(html.contains("<td>n/a</td>"), "no fits: no figures, n/a rather than NaN");
    }

    @Test
    void shouldRefuseADocumentWithoutABody() {
        assertThrows(IllegalArgumentException.class, () -> QuickLookReport.withSections(
                "<html></html>".getBytes(StandardCharsets.UTF_8), new QuickLookReport("t")));
    }
}
