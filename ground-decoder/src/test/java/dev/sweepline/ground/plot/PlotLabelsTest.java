package dev.sweepline.ground.plot;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.io.ByteArrayInputStream;
import java.util.List;
import java.util.Set;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.Test;

class PlotLabelsTest {
    @Test
    void shouldLabelTheEnergyAxisAtOneTwoFiveVoltsOnTheWindowHoldingEach() {
        // 128 log-spaced windows from 50 V to 8 kV (the demo cup's range, demo-cup.yaml): a closed form
        double ratio = Math.pow(8000.0 / 50, 1.0 / 128);
        List<String> y = SpectrogramPlot.voltLabels(128, w -> 50 * Math.pow(ratio, w));
        List<String> shown = y.stream().filter(s -> !s.isBlank()).toList();
        // the 1-2-5 voltages inside [50 V, 8 kV): 50, 100, 200, 500, 1000, 2000, 5000
        assertEquals(List.of("50", "100", "200", "500", "1000", "2000", "5000"), shown);
        // 100 V lies in the window w with 50 r^w <= 100 < 50 r^(w+1): w = floor(log 2 / log r) = 17
        assertEquals("100", y.get((int) Math.floor(Math.log(2) / Math.log(ratio))));
        assertEquals(128, Set.copyOf(y).size(), "category names must be distinct");
    }

    @Test
    void shouldLabelTimeAtRoundMultiplesOfAOneTwoFiveStep() {
        // 179 s over 80 bins, about eight labels wanted: the step is the 1-2-5 value at or above 179/8 = 22.4, i.e. 50
        assertEquals(50, SpectrogramPlot.niceStep(179 / 8.0), 0);
        assertEquals(20, SpectrogramPlot.niceStep(20), 0);
        List<String> x = SpectrogramPlot.timeLabels(0, 179, 80);
        assertEquals(List.of("0", "50", "100", "150"), x.stream().filter(s -> !s.isBlank()).toList());
        // 100 s is in bin floor(100 / 179 * 80) = 44
        assertEquals("100", x.get(44));
    }

    @Test
    void shouldDrawNoCellForAnEmptySpectrogram() throws Exception {
        byte[] png = SpectrogramPlot.render(new SpectrogramData(List.of()), 128, w -> 50 * Math.pow(1.04, w), 1e-15,
                600, 300);
        BufferedImage img = ImageIO.read(new ByteArrayInputStream(png));
        // none of the colour scale's ends (SpectrogramPlot: rgb 20,20,80 and 230,60,30) is drawn
        assertEquals(0, near(img, 20, 20, 80) + near(img, 230, 60, 30));
    }

    private static long near(BufferedImage img, int r, int g, int b) {
        long n = 0;
        for (int y = 0; y < img.getHeight(); y++) {
            for (int x = 0; x < img.getWidth(); x++) {
                int p = img.getRGB(x, y);
                n += Math.abs(((p >> 16) & 0xFF) - r) < 10 && Math.abs(((p >> 8) & 0xFF) - g) < 10
                        && Math.abs((p & 0xFF) - b) < 10 ? 1 : 0;
            }
        }
        return n;
    }

    @Test
    void shouldDrawNoPointForAnEmptySeries() throws Exception {
        byte[] png = MomentsPlot.render(List.of(new TimeSeries("n (cm^-3)", new double[0], new double[0],
                new double[0], null)), 600, 260);
        BufferedImage img = ImageIO.read(new ByteArrayInputStream(png));
        // XChart's first series colour is its default blue; no pixel of it may be drawn (no point at (0, 0))
        long blue = 0;
        for (int yy = 0; yy < img.getHeight(); yy++) {
            for (int xx = 0; xx < img.getWidth(); xx++) {
                int p = img.getRGB(xx, yy);
                int r = (p >> 16) & 0xFF;
                int g = (p >> 8) & 0xFF;
                int b = p & 0xFF;
                blue += b > 150 && r < 100 && g < 150 ? 1 : 0;
            }
        }
        assertEquals(0, blue);
        assertTrue(img.getWidth() == 600);
    }
}
