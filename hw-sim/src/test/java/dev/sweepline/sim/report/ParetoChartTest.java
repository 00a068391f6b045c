package dev.sweepline.sim.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.util.List;
import org.junit.jupiter.api.Test;

class ParetoChartTest {
    @Test
    void shouldDrawTheAllocationLineWhenGiven() throws Exception {
        List<ParetoChart.Point> points = List.of(new ParetoChart.Point(0, 7000, 0.3, true, false),
                new ParetoChart.Point(1, 8000, 0.2, true, true), new ParetoChart.Point(2, 8200, 0.4, false, false));
        BufferedImage with = XhtmlImages.decode(ParetoChart.render("t", "bit/s", "%", points, 9000));
        BufferedImage without = XhtmlImages.decode(ParetoChart.render("t", "bit/s", "%", points, Double.NaN));
        // a 2 px dashed vertical line across the plot, anti-aliased: a hundred pixels and more near
        // ParetoChart.ALLOCATION (common practice); none without an allocation
        assertTrue(XhtmlImages.pixelsNear(with, 0xC81E1E, 40) > 100);
        assertEquals(0, XhtmlImages.pixelsNear(without, 0xC81E1E, 40));
    }

    @Test
    void shouldSayNoSetRatherThanDrawAPointAtTheOrigin() throws Exception {
        BufferedImage img = XhtmlImages.decode(ParetoChart.render("t", "bit/s", "%", List.of(), Double.NaN));
        assertEquals(0, XhtmlImages.pixelsNear(img, 0xE67800, 10));
        assertEquals(0, XhtmlImages.pixelsNear(img, 0x5A6EB4, 10)); // the "all sets" blue
    }
}
