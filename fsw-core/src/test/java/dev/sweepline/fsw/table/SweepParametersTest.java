package dev.sweepline.fsw.table;

import dev.sweepline.fsw.DemoCup;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotSame;

class SweepParametersTest {
    @Test
    void shouldAcceptDefaults() {
        SweepParameters p = DemoCup.parameters();
        assertEquals(TableStatus.OK, p.validate(DemoCup.INSTRUMENT.rangeRatioShift()));
        // issue 2: dwell 8 periods, settle 1000 us, 1 us/code = 256 in Q8, re-survey K = 16
        assertEquals(8, p.integrationPeriods);
        assertEquals(1000, p.fixedSettleMicros);
        assertEquals(256, p.settleMicrosPerCodeQ8);
        assertEquals(16, p.resurveyEveryFocusSweeps);
    }

    @Test
    void shouldCarryPhysicsAlphaRatioInQ16() {
        // physics.md: V_alpha / V_p = 1.986300; Q16 rounding error at most 0.5 / 65536
        assertEquals(1.986300, DemoCup.parameters().alphaRatioQ16 / 65536.0, 0.5 / 65536);
    }

    @Test
    void shouldCarryGainThresholdsInQ16() {
        // physics.md, gain ranging: up above ~80 %, down below ~2 % of full scale; Q16 rounding 0.5 / 65536
        SweepParameters p = DemoCup.parameters();
        assertEquals(0.80, p.gainUpFractionQ16 / 65536.0, 0.5 / 65536);
        assertEquals(0.02, p.gainDownFractionQ16 / 65536.0, 0.5 / 65536);
    }

    @Test
    void shouldRefuseEachGroupWithItsReason() {
        assertEquals(TableStatus.BAD_INTEGRATION, with(p -> p.integrationPeriods = 0));
        assertEquals(TableStatus.BAD_SETTLE, with(p -> p.fixedSettleMicros = -1));
        assertEquals(TableStatus.BAD_SETTLE, with(p -> p.settleMicrosPerCodeQ8 = SweepParameters.MAX_SETTLE_MICROS_PER_CODE_Q8 + 1));
        assertEquals(TableStatus.BAD_BAND, with(p -> p.minHalfWidthWindows = p.edgeWindows));
        assertEquals(TableStatus.BAD_BAND, with(p -> p.maxBandWindows = 2 * p.minHalfWidthWindows));
        assertEquals(TableStatus.BAD_RESURVEY, with(p -> p.resurveyEveryFocusSweeps = 0));
        assertEquals(TableStatus.BAD_LOCK_LOSS, with(p -> p.collapseFractionQ8 = 257));
        assertEquals(TableStatus.BAD_LOCK_LOSS, with(p -> p.jumpWindows = 0));
        // commands.md §4.1: the edge search's reach has its own code, 0..WindowTable.CAPACITY (256) windows
        assertEquals(TableStatus.BAD_EDGE_SEARCH, with(p -> p.edgeSearchWindows = 9999));
        assertEquals(TableStatus.BAD_EDGE_SEARCH, with(p -> p.edgeSearchWindows = -1));
        assertEquals(TableStatus.OK, with(p -> p.edgeSearchWindows = 256));
        // down * 32 must stay below up, or a step down would land above the next range's up threshold
        assertEquals(TableStatus.BAD_GAIN_THRESHOLDS, with(p -> p.gainDownFractionQ16 = p.gainUpFractionQ16 / 32 + 1));
        assertEquals(TableStatus.BAD_ALPHA, with(p -> p.alphaRatioQ16 = 65_536));
        assertEquals(TableStatus.BAD_NOISE, with(p -> p.significanceSigmas = 0));
        // engineering flush: 0 (the build's) or 1..600 s (SweepParameters.MAX_ENGINEERING_FLUSH_SECONDS)
        assertEquals(TableStatus.OK, with(p -> p.engineeringFlushSeconds = 0));
        assertEquals(TableStatus.OK, with(p -> p.engineeringFlushSeconds = 600));
        assertEquals(TableStatus.BAD_FLUSH, with(p -> p.engineeringFlushSeconds = 601));
        assertEquals(TableStatus.BAD_FLUSH, with(p -> p.engineeringFlushSeconds = -1));
    }

    @Test
    void shouldCopyEveryField() {
        SweepParameters a = DemoCup.parameters();
        a.jumpWindows = 11;
        a.prominenceFractionQ8 = 77;
        SweepParameters b = a.copy();
        assertNotSame(a, b);
        assertEquals(11, b.jumpWindows);
        assertEquals(77, b.prominenceFractionQ8);
        a.jumpWindows = 3;
        assertEquals(11, b.jumpWindows);
    }

    private interface Edit {
        void apply(SweepParameters p);
    }

    private static int with(Edit edit) {
        SweepParameters p = DemoCup.parameters();
        edit.apply(p);
        return p.validate(DemoCup.INSTRUMENT.rangeRatioShift());
    }
}
