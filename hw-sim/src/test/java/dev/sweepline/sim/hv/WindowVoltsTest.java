package dev.sweepline.sim.hv;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.sweepline.fsw.table.WindowTable;
import dev.sweepline.sim.instrument.TestInstruments;
import org.junit.jupiter.api.Test;

class WindowVoltsTest {
    private final HvCalibration calibration = HvCalibration.nominal(TestInstruments.DEMO_CUP.flight());

    @Test
    void shouldListAnEdgeThatAdjacentWindowsShareOnce() {
        // the demo cup's default table (instruments/demo-cup.yaml): 128 abutting windows, so 129 edges,
        // window w from edge w to edge w + 1
        WindowVolts windows = new WindowVolts(TestInstruments.DEMO_CUP.flight().defaultTable(), calibration);
        double[] edges = windows.edgeVolts();
        assertEquals(windows.count() + 1, edges.length);
        for (int w = 0; w < windows.count(); w++) {
            assertEquals(w, windows.lowEdge(w));
            assertEquals(w + 1, windows.highEdge(w));
            assertEquals(windows.lowVolts(w), edges[windows.lowEdge(w)], 0.0);
            assertEquals(windows.highVolts(w), edges[windows.highEdge(w)], 0.0);
        }
    }

    @Test
    void shouldListBothEdgesOfWindowsThatDoNotAbut() {
        // a table with a gap after the first window and an overlap after the second (codes chosen here):
        // windows 0 and 1 share no edge, nor do 1 and 2; 2 and 3 abut
        int[] low = {1000, 1200, 1300, 1500};
        int[] high = {1100, 1400, 1500, 1700};
        WindowVolts windows = new WindowVolts(WindowTable.of(low, high, 4), calibration);
        double[] edges = windows.edgeVolts();
        assertEquals(7, edges.length);
        int[] lowEdge = {0, 2, 4, 5};
        int[] highEdge = {1, 3, 5, 6};
        for (int w = 0; w < 4; w++) {
            assertEquals(lowEdge[w], windows.lowEdge(w), "window " + w);
            assertEquals(highEdge[w], windows.highEdge(w), "window " + w);
            assertEquals(calibration.volts(low[w]), edges[windows.lowEdge(w)], 0.0);
            assertEquals(calibration.volts(high[w]), edges[windows.highEdge(w)], 0.0);
        }
    }
}
