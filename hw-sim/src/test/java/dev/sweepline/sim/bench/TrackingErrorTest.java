package dev.sweepline.sim.bench;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.sweepline.fsw.sweep.SweepMode;
import dev.sweepline.sim.scenario.Scenario.Jump;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * Tracking error and strict reacquisition on hand-made sweep records. Every expected value is worked
 * out by hand in the comment beside it from |window - true window| and the order statistic
 * sorted[floor(q n)] that {@link TrackingError} documents.
 */
class TrackingErrorTest {
    private static SweepRecord sweep(SweepMode mode, double startSeconds, int first, int last, double peak,
            double centre, int trueProton) {
        long start = Math.round(startSeconds * 1e6);
        return new SweepRecord(0, mode, start, start + 500_000, first, last, peak, centre, trueProton, -1, 0);
    }

    @Test
    void shouldMeasureCentreAndPeakAgainstTheTrueProtonPeak() {
        List<SweepRecord> records = List.of(
                sweep(SweepMode.SURVEY, 0, 0, 63, 10.5, Double.NaN, 12), // peak error 1.5, no centre
                sweep(SweepMode.FOCUS, 1, 0, 30, 12.25, 13.0, 12), // centre 1.0, peak 0.25
                sweep(SweepMode.FOCUS, 2, 5, 35, 20.0, 15.0, 20), // centre 5.0, peak 0
                sweep(SweepMode.FOCUS, 3, 5, 35, 19.0, 19.5, 20), // centre 0.5, peak 1.0
                sweep(SweepMode.FOCUS, 4, 5, 35, 30.0, 30.0, -1)); // protons absent: left out
        TrackingError t = TrackingError.of(records);
        assertEquals(3, t.centreSweeps()); // three focus sweeps with protons
        assertEquals(1.0, t.centreMedian(), 0.0); // sorted {0.5, 1, 5}[floor(0.5 * 3) = 1]
        assertEquals(5.0, t.centreP95(), 0.0); // sorted[floor(0.95 * 3) = 2]
        assertEquals(5.0, t.centreMax(), 0.0); // largest of {0.5, 1, 5}
        assertEquals(4, t.peakSweeps()); // every sweep with protons, survey included
        assertEquals(1.0, t.peakMedian(), 0.0); // sorted {0, 0.25, 1, 1.5}[floor(0.5 * 4) = 2]
        assertEquals(1.5, t.peakP95(), 0.0); // sorted[floor(0.95 * 4) = 3]
        assertEquals(1.5, t.peakMax(), 0.0); // largest
    }

    @Test
    void shouldCountStrictReacquisitionUntilTheBandIsCentredWithinTwoWindows() {
        Jump jump = new Jump(9.5, 0.5, "front"); // front at 9.5 + 0.5 = 10 s
        List<SweepRecord> records = List.of(
                sweep(SweepMode.FOCUS, 9, 0, 30, 12, 12, 12), // before the front: not counted
                sweep(SweepMode.SURVEY, 11, 0, 63, 20, Double.NaN, 20), // sweep 1 after the front
                sweep(SweepMode.FOCUS, 12, 0, 30, 16, 15, 20), // sweep 2: band holds 20, centre 5 off
                sweep(SweepMode.FOCUS, 13, 5, 35, 19, 18, 20)); // sweep 3: centre 2.0 off, within 2 (inclusive)
        Reacquisition loose = Reacquisition.after(jump, records);
        assertEquals(2, loose.sweeps()); // sweep 2 holds the peak
        assertEquals(2.0, loose.seconds(), 1e-9); // 12 s - 10 s
        Reacquisition strict = Reacquisition.strictAfter(jump, records);
        assertEquals(3, strict.sweeps()); // |18 - 20| = 2 <= STRICT_CENTRE_WINDOWS
        assertEquals(3.0, strict.seconds(), 1e-9); // 13 s - 10 s
        Reacquisition never = Reacquisition.strictAfter(jump, records.subList(0, 3));
        assertEquals(-1, never.sweeps()); // no centred focus sweep after the front
        assertEquals(Double.NaN, never.seconds());
    }
}
