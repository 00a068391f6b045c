package dev.sweepline.fsw.host;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sweepline.fsw.link.InstrumentLink;
import dev.sweepline.fsw.link.SampleReply;
import dev.sweepline.fsw.link.StepCommand;
import org.junit.jupiter.api.Test;

/** Arm-then-fire (hardware ICD, high-voltage note): time-out tested at T and T+1 (style.md). */
class HvArmingTest {
    private static final long TIMEOUT = 30_000_000L; // HvArming default, 30 s

    @Test
    void shouldStayOffUntilArmedAndFired() {
        HvArming hv = new HvArming(TIMEOUT);
        assertEquals(HvArming.State.OFF, hv.confirm("FIRE", 0)); // fire without arm does nothing
        hv.arm(1_000);
        assertFalse(hv.hvAllowed());
        assertEquals(HvArming.State.ENABLED, hv.confirm("FIRE", 1_000 + TIMEOUT)); // at T: in time
        assertTrue(hv.hvAllowed());
        hv.disarm();
        assertFalse(hv.hvAllowed());
    }

    @Test
    void shouldDisarmWhenLateOrWrong() {
        HvArming late = new HvArming(TIMEOUT);
        late.arm(0);
        assertEquals(HvArming.State.OFF, late.confirm("FIRE", TIMEOUT + 1)); // T+1: too late
        HvArming wrong = new HvArming(TIMEOUT);
        wrong.arm(0);
        assertEquals(HvArming.State.OFF, wrong.confirm("fire", 1)); // exact word only
    }

    @Test
    void shouldClearTheHvFlagOfEveryStepUntilFiredWithoutTouchingTheExecutivesStep() {
        HvArming hv = new HvArming(TIMEOUT);
        StepCommand[] seen = new StepCommand[1];
        HvGuardLink guard = new HvGuardLink(new InstrumentLink() {
            @Override
            public boolean send(StepCommand step, long nowMicros) {
                seen[0] = step;
                return true;
            }

            @Override
            public boolean poll(SampleReply into, long nowMicros) {
                return false;
            }
        }, hv);
        StepCommand s = new StepCommand();
        s.hvEnabled = true;
        guard.send(s, 0);
        assertFalse(seen[0].hvEnabled);
        assertTrue(s.hvEnabled);
        assertEquals(1, guard.stepsWithHvCleared());
        hv.arm(0);
        hv.confirm(HvArming.CONFIRM_WORD, 0);
        guard.send(s, 0);
        assertTrue(seen[0].hvEnabled);
        assertEquals(1, guard.stepsWithHvCleared());
    }
}
