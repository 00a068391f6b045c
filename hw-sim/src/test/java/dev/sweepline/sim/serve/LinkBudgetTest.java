package dev.sweepline.sim.serve;

import dev.sweepline.sim.instrument.InstrumentModel;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sweepline.fsw.table.SweepParameters;
import dev.sweepline.fsw.table.WindowTable;
import org.junit.jupiter.api.Test;

class LinkBudgetTest {
    @Test
    void shouldComputeTheLoadOfAStepRateAgainstAnEightNOneLine() {
        // hardware ICD §6: 19 octets per frame each way; 8N1 carries baud/10 octets/s (common practice)
        LinkBudget b = LinkBudget.of("x", 100, 115_200);
        assertEquals(19, LinkBudget.STEP_FRAME_OCTETS);
        assertEquals(19, LinkBudget.REPLY_FRAME_OCTETS);
        assertEquals(11_520, b.capacityPerSecond(), 1e-9);
        assertEquals(1_900, b.octetsPerSecond(), 1e-9);
        assertFalse(b.warning());
        // 500 steps/s at 115200: 9500 of 11520 = 82.5 %: above the 80 % line
        assertTrue(LinkBudget.of("x", 500, 115_200).warning());
        assertFalse(LinkBudget.of("x", 485, 115_200).warning()); // 9215 / 11520 = 79.99 %
    }

    @Test
    void shouldTimeSurveyAndFocusStepsAsTheSchedulerDoes() {
        WindowTable t = InstrumentModel.demo().flight().defaultTable();
        SweepParameters p = InstrumentModel.demo().flight().defaultParameters();
        LinkBudget survey = LinkBudget.survey(t, p, 115_200);
        LinkBudget focus = LinkBudget.focus(t, p, 115_200);
        System.out.println(survey.describe());
        System.out.println(focus.describe());
        // a step lasts at least the fixed settle + the integration (scheduler R13): 1 ms + 8 ms
        double ceiling = 1e6 / (p.fixedSettleMicros + p.integrationPeriods * 1000.0);
        assertTrue(survey.stepsPerSecond() < ceiling && focus.stepsPerSecond() < ceiling);
        // focus picks the narrowest-spaced band: never slower than the survey's average step
        assertTrue(focus.stepsPerSecond() >= survey.stepsPerSecond());
        assertTrue(survey.stepsPerSecond() > 50, "the default table steps at roughly 100/s (bench run: 107 steps/s)");
        assertFalse(survey.warning() || focus.warning());
        assertTrue(LinkBudget.survey(t, p, 9_600).warning()); // 9600 baud: 960 octets/s is too little
    }
}
