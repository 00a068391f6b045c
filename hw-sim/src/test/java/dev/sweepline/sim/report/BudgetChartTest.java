package dev.sweepline.sim.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

class BudgetChartTest {
    private static List<BudgetChart.Hour> hours(double store) {
        List<BudgetChart.Hour> h = new ArrayList<>();
        for (int i = 0; i < 48; i++) {
            h.add(new BudgetChart.Hour(i, 5000 + 10 * i, i < 24 ? 8000 : 6000, store * i));
        }
        return h;
    }

    @Test
    void shouldDrawRateStoreAndPassesInTwoPanels() throws Exception {
        BufferedImage img = XhtmlImages.decode(BudgetChart.render(hours(10),
                List.of(new BudgetChart.Phase("cruise", 0, 0.3), new BudgetChart.Phase("encounter", 24, 0.1)),
                List.of(new BudgetChart.Pass(10, 4)), 1000));
        assertEquals(720, img.getHeight()); // two 360 px panels (BudgetChart)
        // the pass band (BudgetChart.PASS over white: about rgb 171,223,171) fills a 4 h strip of the store panel
        assertTrue(XhtmlImages.pixelsNear(img, 0xABDFAB, 16) > 1000, "downlink pass");
    }

    @Test
    void shouldSaySoWhenThePlanHasNoStore() throws Exception {
        BufferedImage img = XhtmlImages.decode(BudgetChart.render(hours(Double.NaN),
                List.of(new BudgetChart.Phase("cruise", 0, 0.3)), List.of(new BudgetChart.Pass(10, 4)), Double.NaN));
        assertEquals(0, XhtmlImages.pixelsNear(img, 0xABDFAB, 16), "no pass band without a store");
    }
}
