package dev.sweepline.fsw.exec;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sweepline.fsw.fault.FaultMonitorId;
import dev.sweepline.fsw.link.InstrumentLink;
import dev.sweepline.fsw.link.SampleReply;
import dev.sweepline.fsw.link.StepCommand;
import dev.sweepline.fsw.sweep.SweepListener;
import dev.sweepline.fsw.sweep.SweepMode;
import org.junit.jupiter.api.Test;

/**
 * The host's HV permission reaches the core: without it every step asks for the HV off, the
 * electronics keep it off, and the HV-readback monitor (which would otherwise see 0 V against a
 * commanded level) has nothing to complain about (hardware ICD §3.1 flags bit 0; commands.md §6).
 */
class HvPermissionTest {
    /** Electronics that keep the HV off unless the step asks for it, as the hardware ICD says. */
    private static final class HvHonouringLink implements InstrumentLink {
        private final InstrumentLink inner;
        private boolean lastHv;
        long stepsWithHv;

        HvHonouringLink(InstrumentLink inner) {
            this.inner = inner;
        }

        @Override
        public boolean send(StepCommand step, long nowMicros) {
            lastHv = step.hvEnabled;
            stepsWithHv += step.hvEnabled ? 1 : 0;
            return inner.send(step, nowMicros);
        }

        @Override
        public boolean poll(SampleReply into, long nowMicros) {
            boolean got = inner.poll(into, nowMicros);
            if (got && !lastHv) {
                into.hvMonitorCode = 0;
                into.status |= SampleReply.STATUS_HV_OFF;
            }
            return got;
        }
    }

    private static FlightSoftware run(boolean permitted, boolean liarMonitor, HvHonouringLink[] out) {
        FlightConfig config = FswRig.benchConfig();
        config.hvPermitted = permitted;
        FswRig rig = new FswRig();
        HvHonouringLink link = new HvHonouringLink(liarMonitor ? new ZeroMonitorLink(rig.link) : rig.link);
        out[0] = link;
        FlightSoftware fsw = new FlightSoftware(config, link, (f, off, len) -> { }, SweepListener.NONE);
        long now = 0;
        while (now < 3_000_000) { // 3 s: a few hundred steps
            fsw.doWork(now);
            now += 100;
        }
        return fsw;
    }

    @Test
    void shouldAskForNoHighVoltageAndRaiseNoReadbackFaultWithoutPermission() {
        HvHonouringLink[] link = new HvHonouringLink[1];
        FlightSoftware fsw = run(false, false, link);
        assertEquals(0, link[0].stepsWithHv);
        assertEquals(0, fsw.faults().trips(FaultMonitorId.HV_READBACK));
        assertFalse(fsw.scheduler().mode() == SweepMode.SAFE);
        assertFalse(fsw.scheduler().hvPermitted());
    }

    @Test
    void shouldTripTheReadbackMonitorWhenHighVoltageIsAskedForButAbsent() {
        // control: with the permission, an HV that never comes up is a fault (the monitor can fail)
        HvHonouringLink[] link = new HvHonouringLink[1];
        FlightSoftware fsw = run(true, true, link);
        assertTrue(link[0].stepsWithHv > 0);
        assertTrue(fsw.faults().trips(FaultMonitorId.HV_READBACK) > 0);
    }

    /** Electronics whose HV monitor always reads 0 (a dead supply). */
    private static final class ZeroMonitorLink implements InstrumentLink {
        private final InstrumentLink inner;

        ZeroMonitorLink(InstrumentLink inner) {
            this.inner = inner;
        }

        @Override
        public boolean send(StepCommand step, long nowMicros) {
            return inner.send(step, nowMicros);
        }

        @Override
        public boolean poll(SampleReply into, long nowMicros) {
            boolean got = inner.poll(into, nowMicros);
            if (got) {
                into.hvMonitorCode = 0;
            }
            return got;
        }
    }
}
