package dev.sweepline.sim.campaign;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The recommendation within the ensemble's noise, on synthetic runs with known differences. The grid
 * is integrationPeriods [4, 8, 16]; 8 is the demo cup's default (fsw-core instruments/demo-cup.yaml).
 * Paired 95 % intervals use t(0.975, 3) = 3.1824 (Student's t tables [memory]) over 4 members.
 */
class RecommendationTest {
    private static final String CAMPAIGN = """
            format: sweepline-campaign/1
            name: synthetic
            seed: 5
            runsPerSet: 4
            durationS: 10
            scenario: quiet-perihelion
            allocationBitsPerS: 9000
            grid:
              integrationPeriods: [4, 8, 16]
            """;
    /** Set 0 (4 periods): the best mean accuracy, 0.0115. */
    private static final double[] SET0 = {0.010, 0.012, 0.011, 0.013};
    /** Set 1 (8, the default): mean 0.0117; paired differences to set 0 {5, -2, 4, 1} x 1e-4. */
    private static final double[] SET1 = {0.0105, 0.0118, 0.0114, 0.0131};
    /** Set 2 (16): differences to set 0 {100, 110, 100, 110} x 1e-4: clearly worse, but fewer bits. */
    private static final double[] SET2 = {0.020, 0.023, 0.021, 0.024};

    private static RunRow row(int set, int run, double accuracy, double bits) {
        double[] e = {accuracy, accuracy, accuracy}; // accuracy() is the mean of the three
        return new RunRow(set, run, 1.0, 0, 1, 0.5, 1.5, bits, 0.85, 0.7, e, new double[] {1, 1, 1},
                new double[] {0.2, 0.5, 0.7}, 1, 0.5, new double[] {1, 1, 1}, 0, e, new double[] {1, 1, 1});
    }

    private static List<RunRow> rows(double[] set1) {
        List<RunRow> rows = new ArrayList<>();
        for (int run = 0; run < 4; run++) {
            rows.add(row(0, run, SET0[run], 5000));
            rows.add(row(1, run, set1[run], 5000));
            rows.add(row(2, run, SET2[run], 4000));
        }
        return rows;
    }

    private static Recommendation recommend(List<RunRow> rows) {
        CampaignSpec spec = CampaignReader.parse(CAMPAIGN, "synthetic.yaml", null);
        List<SetResult> sets = SetResult.aggregate(spec, rows);
        return Recommendation.of(spec, sets, ParetoFront.of(sets), rows);
    }

    @Test
    void shouldPreferTheDefaultTableWhenItCannotBeToldApartFromTheLeader() {
        Recommendation r = recommend(rows(SET1));
        assertEquals(0, r.leader().set()); // best mean accuracy on the front (set 1 is dominated by set 0)
        PairedInterval acc = r.versusLeader().get(1).accuracy();
        assertEquals(2.0e-4, acc.mean(), 1e-12); // (5 - 2 + 4 + 1) / 4 x 1e-4
        // sd = sqrt((9 + 16 + 4 + 1) / 3) x 1e-4 = 3.1623e-4; half-width 3.1824 x sd / 2 = 5.0319e-4
        assertEquals(2.0e-4 - 5.0319e-4, acc.low(), 1e-8);
        assertEquals(2.0e-4 + 5.0319e-4, acc.high(), 1e-8);
        assertTrue(r.versusLeader().get(1).tied()); // the interval holds zero; bits and cadence equal
        // set 2: mean 1.05e-2, sd 5.7735e-4, half-width 9.187e-4: the interval lies above zero
        assertTrue(r.versusLeader().get(2).accuracy().above());
        assertFalse(r.versusLeader().get(2).tied());
        assertTrue(r.withinNoise());
        assertEquals(List.of(0, 1), r.indistinguishable().stream().map(SetResult::set).toList());
        assertEquals(1, r.chosen().set()); // distance to the default 8: set 1 0, set 0 |4 - 8| / 12
    }

    @Test
    void shouldKeepTheLeaderWhenTheDifferenceIsBeyondTheNoise() {
        double[] worse = new double[4];
        for (int i = 0; i < 4; i++) {
            worse[i] = SET1[i] + 0.005; // differences {55, 48, 54, 51} x 1e-4: mean 5.2e-3, half-width 5.0e-4
        }
        Recommendation r = recommend(rows(worse));
        assertTrue(r.versusLeader().get(1).accuracy().above());
        assertFalse(r.withinNoise());
        assertEquals(0, r.chosen().set());
        assertEquals(r.leader(), r.chosen());
    }

    @Test
    void shouldGiveAnUnboundedIntervalBelowTwoMembers() {
        PairedInterval one = PairedInterval.of(new double[] {1.0, Double.NaN}, new double[] {0.5, 0.2});
        assertEquals(0.5, one.mean(), 0.0); // the one member with both values: 1.0 - 0.5
        assertEquals(Double.NEGATIVE_INFINITY, one.low()); // one member cannot tell the sets apart
        assertFalse(one.above() || one.below());
    }
}
