package dev.sweepline.sim.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

class DecisionChartTest {
    /** Colours the chart draws (DecisionChart): found peak, true alpha peak, event line. */
    private static final int FOUND = 0xDC3C1E;
    private static final int ALPHA = 0x1E963C;
    private static final int EVENT = 0xC81E1E;

    @Test
    void shouldDrawBandPeaksTruthAndMarkersAsADecodablePng() throws Exception {
        List<DecisionChart.Sweep> sweeps = new ArrayList<>();
        for (int i = 0; i < 100; i++) {
            // a peak that jumps from window 60 to 80 at 50 s, found one sweep late: a closed form of the test
            int truth = i < 50 ? 60 : 80;
            double found = i < 51 ? 60.2 : 80.1;
            sweeps.add(new DecisionChart.Sweep(i, i % 10 != 0, truth - 20, truth + 20, found, truth, truth + 21));
        }
        byte[] png = DecisionChart.render(sweeps, List.of(new DecisionChart.Marker(50, "shock", true),
                new DecisionChart.Marker(51, "survey (PEAK_JUMP)", false)), 128);
        BufferedImage img = XhtmlImages.decode(png);
        assertEquals(1000, img.getWidth()); // DecisionChart's size
        // the found peak (dots), the alpha truth (a 2 px line across the chart) and the event line show;
        // thresholds far below what is drawn (hundreds of pixels each), above stray anti-aliasing (common practice)
        assertTrue(XhtmlImages.pixelsNear(img, FOUND, 12) > 100, "found-peak dots");
        assertTrue(XhtmlImages.pixelsNear(img, ALPHA, 12) > 300, "alpha truth line");
        assertTrue(XhtmlImages.pixelsNear(img, EVENT, 12) > 50, "event line");
    }

    @Test
    void shouldSaySoWhenThereIsNoSweepInsteadOfDrawingAPoint() throws Exception {
        BufferedImage img = XhtmlImages.decode(DecisionChart.render(List.of(), List.of(), 128));
        // nothing of the data colours is drawn (no point at the origin)
        assertEquals(0, XhtmlImages.pixelsNear(img, FOUND, 12));
        assertEquals(0, XhtmlImages.pixelsNear(img, ALPHA, 12));
    }
}
