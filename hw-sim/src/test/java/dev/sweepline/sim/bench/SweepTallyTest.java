package dev.sweepline.sim.bench;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import dev.sweepline.fsw.sweep.SweepMode;
import dev.sweepline.sim.scenario.Scenario.Jump;
import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/**
 * The bounded tally gives the figures the list functions give over every record ({@link TrackingError#of},
 * {@link Reacquisition#after}, {@link Reacquisition#strictAfter}), to the bit: the reference is those
 * functions themselves, over the same records.
 */
class SweepTallyTest {
    /** Q8 windows (k / 256) as the recorder makes them; protons sometimes absent, some sweeps without a peak. */
    private static List<SweepRecord> records(long seed, int count, int windows) {
        SplittableRandom rng = new SplittableRandom(seed);
        List<SweepRecord> out = new ArrayList<>();
        for (int i = 0; i < count; i++) {
            SweepMode mode = rng.nextInt(10) == 0 ? SweepMode.SURVEY : SweepMode.FOCUS;
            int truth = rng.nextInt(20) == 0 ? -1 : rng.nextInt(windows);
            int first = Math.max(0, truth - rng.nextInt(30));
            int last = Math.min(windows - 1, first + 15 + rng.nextInt(40));
            double peak = rng.nextInt(8) == 0 ? Double.NaN : rng.nextInt(windows * 256) / 256.0;
            double centre = mode == SweepMode.FOCUS ? rng.nextInt(windows * 256) / 256.0 : Double.NaN;
            long start = i * 600_000L;
            out.add(new SweepRecord(i + 1, mode, start, start + 550_000, first, last, peak, centre, truth,
                    rng.nextInt(3) == 0 ? -1 : rng.nextInt(windows), 0));
        }
        return out;
    }

    @Test
    void shouldGiveTheListFiguresToTheBit() {
        for (int windows : new int[] {128, 256}) { // the demo and fine cups' tables
            List<SweepRecord> records = records(windows, 5001, windows);
            List<Jump> jumps = List.of(new Jump(100, 2, "early"), new Jump(2000, 0, "late"),
                    new Jump(1e6, 0, "after the end"));
            SweepTally tally = new SweepTally(windows, jumps);
            records.forEach(tally::add);
            assertEquals(TrackingError.of(records), tally.tracking());
            for (int j = 0; j < jumps.size(); j++) {
                assertEquals(Reacquisition.after(jumps.get(j), records), tally.reacquisitions().get(j));
                assertEquals(Reacquisition.strictAfter(jumps.get(j), records), tally.strictReacquisitions().get(j));
            }
            long focus = records.stream().filter(r -> r.mode() == SweepMode.FOCUS).count();
            assertEquals(focus, tally.focusSweeps());
            assertEquals(records.stream().filter(SweepRecord::locked).count(), tally.lockedSweeps());
            assertEquals(records.stream().filter(SweepRecord::alphaLock).count(), tally.alphaLocks());
            assertEquals((int) (records.size() - focus), tally.sweepsByMode().get(SweepMode.SURVEY));
        }
    }

    @Test
    void shouldGiveNaNWithoutSweepsAndRefuseAnErrorOffTheQ8Grid() {
        SweepTally tally = new SweepTally(128, List.of());
        TrackingError none = tally.tracking();
        assertEquals(0, none.centreSweeps());
        assertEquals(Double.NaN, none.centreMedian());
        assertEquals(Double.NaN, none.peakMax());
        // a centre 1/3 window off is no multiple of 1/256: counting it exactly is impossible, so it is refused
        SweepRecord off = new SweepRecord(1, SweepMode.FOCUS, 0, 1, 0, 20, Double.NaN, 10 + 1 / 3.0, 10, -1, 0);
        assertThrows(IllegalArgumentException.class, () -> tally.add(off));
    }

    @Test
    void shouldCountExactlyAnErrorBeyondTheTableAndBoundTheCountsByIt() {
        // errors of 0 to 300 windows on a 128-window table (a peak off the table): the list figures
        // still, to the bit; the counts grow to the largest error, not beyond twice it
        SplittableRandom rng = new SplittableRandom(300);
        List<SweepRecord> records = new ArrayList<>();
        for (int i = 0; i < 2000; i++) {
            int truth = rng.nextInt(128);
            double peak = truth + rng.nextInt(300 * 256) / 256.0;
            long start = i * 600_000L;
            records.add(new SweepRecord(i + 1, SweepMode.FOCUS, start, start + 550_000, 0, 127, peak, peak, truth, -1, 0));
        }
        SweepTally tally = new SweepTally(128, List.of());
        records.forEach(tally::add);
        assertEquals(TrackingError.of(records), tally.tracking());
        SweepTally.ErrorCounts counts = new SweepTally.ErrorCounts(128);
        counts.add(3.5); // 896 units: the first 1024 counts
        assertEquals(1024, counts.length());
        counts.add(100); // 25 600 units: doubled to 32 768, the table's 128 x 256
        assertEquals(128 * 256, counts.length());
        counts.add(200); // beyond the table: doubled past 51 200 units
        assertEquals(65536, counts.length());
        assertEquals(200, counts.max());
        assertEquals(3.5, counts.quantile(0));
        assertEquals(100, counts.quantile(0.5)); // sorted[floor(0.5 x 3)] = sorted[1]
    }
}
