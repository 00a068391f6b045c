package dev.sweepline.sim.link;

import dev.sweepline.fsw.instrument.InstrumentDescription;
import dev.sweepline.sim.instrument.TestInstruments;
import dev.sweepline.sim.instrument.InstrumentModel;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sweepline.fsw.table.SweepParameters;
import dev.sweepline.fsw.table.WindowTable;
import org.junit.jupiter.api.Test;

/**
 * The serial link's load, against values computed by hand from the hardware ICD's framing (§2),
 * message lengths (§3), line (§1) and budget (§6). Exact values are compared exactly (tolerance 0)
 * where the code computes them with the same operations as the comment; to 1e-12 relative where a
 * division is compared with its decimal expansion.
 */
class LinkBudgetTest {
    /** The demo cup (instruments/demo-cup.yaml): 1 ms modulation, 2-octet samples. */
    private static final InstrumentDescription DEMO = TestInstruments.DEMO_CUP.flight();
    /** Three contiguous windows, DAC codes chosen so that every step's settle is easy to add up by hand. */
    private static final WindowTable THREE = WindowTable.of(new int[] {1000, 1075, 1175},
            new int[] {1075, 1175, 1300}, 3);

    @Test
    void shouldFrameAStepAndAReplyInNineteenOctets() {
        // hardware ICD §3.1 and §3.2: step and reply payloads are 15 octets; §2: + CRC-16 (2) = 17 octets,
        // COBS adds one code octet per started 254-octet block (Cheshire and Baker 1999): 17 -> 18,
        // + the 0x00 delimiter = 19 octets on the wire (the figure of §6)
        assertEquals(19, LinkBudget.STEP_FRAME_OCTETS);
        assertEquals(19, LinkBudget.replyFrameOctets(DEMO));
        // hardware ICD §1: 8N1 is a start bit, 8 data bits and a stop bit: 10 bits per octet
        assertEquals(10, LinkBudget.BITS_PER_OCTET_8N1);
    }

    @Test
    void shouldLoadTheLineWithNineteenOctetsPerStep() {
        LinkBudget b = LinkBudget.of("x", 100, 115_200, DEMO);
        // 115 200 baud / 10 bits per octet = 11 520 octets/s (hardware ICD §6: "11 520 octets/s")
        assertEquals(11_520.0, b.capacityPerSecond(), 0);
        // 100 steps/s x 19 octets = 1 900 octets/s in each direction (step out, reply back)
        assertEquals(1_900.0, b.octetsPerSecond(), 0);
        // 1 900 / 11 520 = 0.164930555...
        assertEquals(0.16493055555555555, b.loadFraction(), 0);
        assertFalse(b.warning());
    }

    @Test
    void shouldWarnAboveEightyPercentOfTheLine() {
        // hardware ICD §6: warning above 80 % (common practice for serial links)
        // 485 steps/s x 19 = 9 215 octets/s, 9 215 / 11 520 = 0.79991: below the line
        assertEquals(9_215.0 / 11_520, LinkBudget.of("x", 485, 115_200, DEMO).loadFraction(), 0);
        assertFalse(LinkBudget.of("x", 485, 115_200, DEMO).warning());
        // 486 steps/s x 19 = 9 234 octets/s, 9 234 / 11 520 = 0.80156: above it
        assertTrue(LinkBudget.of("x", 486, 115_200, DEMO).warning());
    }

    @Test
    void shouldTimeSurveyStepsAsTheSchedulerDoes() {
        SweepParameters p = parameters();
        // step = fixed settle 1000 us + (change x 384) >> 8 (1.5 us per code, Q8, truncated) + 8 x 1000 us
        // (integration periods of 1000 us, hardware ICD §3.1); change = the larger rail move from the
        // previous step; the first step of a sweep sits where the last sweep ended (alternating order):
        //   w0: change 0                          -> 1000 +   0 + 8000 = 9000 us
        //   w1: max(1075-1000, 1175-1075) = 100   -> 1000 + 150 + 8000 = 9150 us
        //   w2: max(1175-1075, 1300-1175) = 125   -> 1000 + 187 + 8000 = 9187 us (187.5 truncated)
        // 3 steps in 27 337 us: 3e6 / 27 337 = 109.741376156857...
        LinkBudget survey = LinkBudget.survey(DEMO, THREE, p, 115_200);
        assertEquals(3e6 / 27_337, survey.stepsPerSecond(), 0);
        assertEquals(109.741376156857, survey.stepsPerSecond(), 1e-12 * 110);
        // x 19 octets = 2 085.086147... octets/s
        assertEquals(19 * 3e6 / 27_337, survey.octetsPerSecond(), 1e-12 * 2100);
    }

    @Test
    void shouldTakeTheBusiestBandForFocus() {
        SweepParameters p = parameters();
        p.maxBandWindows = 2;
        // bands of 2 windows, each sweep starting where the last ended (no change on its first step):
        //   w0..w1: 9000 + 9150 = 18 150 us -> 2e6 / 18 150 = 110.192837465565...
        //   w1..w2: 9000 + 9187 = 18 187 us -> 2e6 / 18 187 = 109.968658932204...
        // the busier band is w0..w1
        LinkBudget focus = LinkBudget.focus(DEMO, THREE, p, 115_200);
        assertEquals(2e6 / 18_150, focus.stepsPerSecond(), 0);
        assertEquals(110.192837465565, focus.stepsPerSecond(), 1e-12 * 110);
    }

    @Test
    void shouldGiveTheFiguresOfTheIcdForTheDefaultTable() {
        // hardware ICD §6, default table and parameters: survey 105.7 steps/s = 2 007 octets/s (17.4 %),
        // focus 110.2 steps/s = 2 093 octets/s (18.2 %); the ICD rounds to the digits shown
        WindowTable t = TestInstruments.DEMO_CUP.flight().defaultTable();
        SweepParameters p = TestInstruments.DEMO_CUP.flight().defaultParameters();
        LinkBudget survey = LinkBudget.survey(DEMO, t, p, 115_200);
        LinkBudget focus = LinkBudget.focus(DEMO, t, p, 115_200);
        assertEquals(105.7, survey.stepsPerSecond(), 0.05);
        assertEquals(2_007, survey.octetsPerSecond(), 0.5);
        assertEquals(0.174, survey.loadFraction(), 0.0005);
        assertEquals(110.2, focus.stepsPerSecond(), 0.05);
        assertEquals(2_093, focus.octetsPerSecond(), 0.5);
        assertEquals(0.182, focus.loadFraction(), 0.0005);
        // hardware ICD §6: 9600 baud (960 octets/s) would not carry it
        assertTrue(LinkBudget.survey(DEMO, t, p, 9_600).warning());
    }

    /** The defaults with a settle slope of 1.5 us per code (384 in Q8), so that truncation shows. */
    private static SweepParameters parameters() {
        SweepParameters p = TestInstruments.DEMO_CUP.flight().defaultParameters();
        p.fixedSettleMicros = 1000;
        p.settleMicrosPerCodeQ8 = 384;
        p.integrationPeriods = 8;
        return p;
    }
}
