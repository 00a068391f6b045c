package dev.sweepline.fsw.exec;

import dev.sweepline.fsw.DemoCup;
import dev.sweepline.fsw.command.CommandCode;
import dev.sweepline.fsw.command.CommandReason;
import dev.sweepline.fsw.command.HvState;
import dev.sweepline.fsw.command.TcBuilder;
import dev.sweepline.fsw.link.InstrumentLink;
import dev.sweepline.fsw.link.SampleReply;
import dev.sweepline.fsw.link.StepCommand;
import dev.sweepline.fsw.sweep.SweepListener;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Hazardous functions start inhibited (common practice for spacecraft high-voltage functions;
 * commands.md §2.3): with the flight defaults the core HV interlock is OFF at power-up, no step asks
 * for HV, and only HV_ARM then HV_ENABLE (or the PC host's operator fire) lets the steps ask for it.
 */
class HvInhibitedAtStartTest {
    /** Counts the steps that ask for HV. */
    private static final class HvCountingLink implements InstrumentLink {
        private final InstrumentLink inner;
        long steps;
        long stepsWithHv;

        HvCountingLink(InstrumentLink inner) {
            this.inner = inner;
        }

        @Override
        public boolean send(StepCommand step, long nowMicros) {
            steps++;
            stepsWithHv += step.hvEnabled ? 1 : 0;
            return inner.send(step, nowMicros);
        }

        @Override
        public boolean poll(SampleReply into, long nowMicros) {
            return inner.poll(into, nowMicros);
        }
    }

    private final FswRig rig = new FswRig();
    private final HvCountingLink link = new HvCountingLink(rig.link);
    private final FlightSoftware fsw = new FlightSoftware(DemoCup.config(), link, (f, off, len) -> { },
            SweepListener.NONE);
    private final TcBuilder tc = TcBuilder.demo();
    private long now;

    private void run(long micros) {
        long end = now + micros;
        while (now < end) {
            fsw.doWork(now);
            now += 100;
        }
    }

    @Test
    void shouldStartWithTheInterlockOffAndNoStepAskingForHv() {
        assertEquals(HvState.OFF, fsw.hv().state(0));
        run(1_000_000);
        assertTrue(link.steps > 10, "the core still steps (HV off) so the link and monitors are exercised");
        assertEquals(0, link.stepsWithHv);
    }

    @Test
    void shouldAskForHvOnlyAfterArmAndEnable() {
        run(200_000);
        byte[] mode = tc.command(CommandCode.SET_MODE, (byte) 1);
        assertEquals(CommandReason.HV_NOT_ENABLED, fsw.acceptTelecommand(mode, 0, mode.length, now));
        byte[] enable = tc.command(CommandCode.HV_ENABLE);
        assertEquals(CommandReason.NOT_ARMED, fsw.acceptTelecommand(enable, 0, enable.length, now));
        assertEquals(0, link.stepsWithHv);
        byte[] arm = tc.command(CommandCode.HV_ARM);
        assertEquals(CommandReason.OK, fsw.acceptTelecommand(arm, 0, arm.length, now));
        byte[] enable2 = tc.command(CommandCode.HV_ENABLE);
        assertEquals(CommandReason.OK, fsw.acceptTelecommand(enable2, 0, enable2.length, now));
        long before = link.stepsWithHv;
        run(200_000);
        assertTrue(link.stepsWithHv > before, "steps ask for HV once the interlock is enabled");
    }

    @Test
    void shouldFollowTheOperatorsFireAndInhibit() {
        run(100_000);
        fsw.operatorFireHv(now);
        assertEquals(HvState.ENABLED, fsw.hv().state(now));
        run(200_000);
        long fired = link.stepsWithHv;
        assertTrue(fired > 0);
        fsw.operatorInhibitHv();
        assertFalse(fsw.hv().enabled());
        run(200_000);
        assertEquals(fired, link.stepsWithHv, "no step asks for HV after the inhibit");
    }
}
