package dev.sweepline.sim.campaign;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * Inert axes with linked axes (FORMAT.md, "Axes that change nothing" and {@code linked}): the linked axes move
 * together, so none of them is judged against the others' values; an axis crossed with them that changes
 * nothing is still found.
 */
class LinkedInertAxesTest {
    private static final String CAMPAIGN = """
            format: sweepline-campaign/1
            name: linked-inert
            seed: 1
            runsPerSet: 2
            durationS: 10
            scenario: quiet-perihelion
            grid:
              focusStyle: [0, 19]
              edgeSearchWindows: [20, 24]
              robustnessMarginWindows: [0, 1]
            linked: [focusStyle, robustnessMarginWindows]
            """;

    /** Rows whose metrics depend on the linked tables alone (the edge search is inert by construction). */
    private static List<RunRow> rows(CampaignSpec spec, boolean tablesDiffer) {
        List<RunRow> rows = new ArrayList<>();
        for (int set = 0; set < spec.setCount(); set++) {
            double table = tablesDiffer ? spec.setValues(set)[0] : 0;
            for (int run = 0; run < spec.runsPerSet(); run++) {
                double error = 0.001 * (1 + table) + 1e-5 * run;
                rows.add(new RunRow(set, run, 1.0, 0, 3, 1.5, 1.7, 7000 + run, 0.8, 0.6,
                        new double[] {error, error / 10, error}, new double[] {5, 4, 6}, new double[] {0.3, 0.9, 1.4},
                        4, 2.5, new double[] {5, 4, 6}, 0, new double[] {error, error / 10, error},
                        new double[] {5, 4, 6}));
            }
        }
        return rows;
    }

    @Test
    void shouldFindTheInertAxisBesideLinkedOnes() {
        CampaignSpec spec = CampaignReader.parse(CAMPAIGN, "linked-inert.yaml", null);
        assertEquals(4, spec.setCount());
        assertEquals(List.of("edgeSearchWindows"), InertAxes.of(spec, rows(spec, true)));
    }

    @Test
    void shouldCallLinkedAxesInertOnlyWhenTheirTablesChangeNothing() {
        CampaignSpec spec = CampaignReader.parse(CAMPAIGN, "linked-inert.yaml", null);
        assertEquals(List.of("focusStyle", "edgeSearchWindows", "robustnessMarginWindows"),
                InertAxes.of(spec, rows(spec, false)));
    }
}
