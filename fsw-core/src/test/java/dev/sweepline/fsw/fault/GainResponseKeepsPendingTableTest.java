package dev.sweepline.fsw.fault;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.sweepline.fsw.DemoCup;
import dev.sweepline.fsw.link.SampleReply;
import dev.sweepline.fsw.link.StepCommand;
import dev.sweepline.fsw.report.EventWriter;
import dev.sweepline.fsw.sweep.SweepScheduler;
import dev.sweepline.fsw.table.SweepParameters;
import dev.sweepline.fsw.table.TableStatus;
import dev.sweepline.fsw.telemetry.CucTime;
import dev.sweepline.fsw.telemetry.TelemetryWriter;
import org.junit.jupiter.api.Test;

/**
 * The GAIN response (commands.md §6) halves the gain thresholds of the parameters that fly from the next
 * sweep boundary: a committed table's parameters waiting for that boundary (sweep design note R14) are
 * the ones halved, not replaced by the running set. Values are FaultSettings.defaults() (saturation: GAIN
 * after 32 steps at the ADC's top code, commands.md §6 table) and DemoCup.parameters().
 */
class GainResponseKeepsPendingTableTest {
    private final SweepScheduler scheduler = new SweepScheduler(DemoCup.INSTRUMENT, DemoCup.table(),
            DemoCup.parameters(), null);
    private final TelemetryWriter telemetry = new TelemetryWriter(TelemetryWriter.DEFAULT_FRAME_LENGTH,
            Long.MAX_VALUE, new CucTime(0, 0), 64, (f, off, len) -> { });
    private final FaultProtection faults = new FaultProtection(FaultSettings.defaults(), scheduler,
            new EventWriter(telemetry));

    /** Trips the saturation monitor: its threshold of steps with a quadrant at the ADC's top code. */
    private void saturate() {
        StepCommand step = new StepCommand();
        SampleReply reply = new SampleReply();
        reply.quadrant[0] = DemoCup.INSTRUMENT.adcTopCode();
        int n = FaultSettings.defaults().threshold[FaultMonitorId.ADC_SATURATION];
        assertEquals(32, n); // commands.md §6 default, steps
        for (int i = 0; i < n; i++) {
            faults.onSample(step, reply);
        }
    }

    @Test
    void shouldHalveTheCommittedParametersThatWaitForTheBoundary() {
        SweepParameters committed = DemoCup.parameters();
        committed.jumpWindows = 9; // any tunable the running set does not have (its value: 6)
        committed.focusStyle = SweepParameters.FOCUS_STYLE_DESIGN | SweepParameters.FOCUS_STYLE_INTERLEAVED;
        committed.focusBudgetMicros = 1_000_000;
        assertEquals(TableStatus.OK, scheduler.loadParameters(committed)); // pending until the sweep boundary

        saturate();
        faults.respond(0, true, 0);

        scheduler.nextStep(new StepCommand(), 0); // the boundary: the pending set takes effect
        SweepParameters inForce = new SweepParameters();
        scheduler.activeParameters(inForce);
        assertEquals(9, inForce.jumpWindows, "the committed table's parameters fly");
        assertEquals(committed.focusStyle, inForce.focusStyle);
        assertEquals(committed.focusBudgetMicros, inForce.focusBudgetMicros);
        assertEquals(committed.gainUpFractionQ16 >> 1, inForce.gainUpFractionQ16, "halved by the GAIN response");
        assertEquals(committed.gainDownFractionQ16 >> 1, inForce.gainDownFractionQ16);
    }

    @Test
    void shouldHalveTheRunningParametersWhenNothingWaits() {
        SweepParameters running = DemoCup.parameters();
        saturate();
        faults.respond(0, true, 0);
        scheduler.nextStep(new StepCommand(), 0);
        SweepParameters inForce = new SweepParameters();
        scheduler.activeParameters(inForce);
        assertEquals(running.gainUpFractionQ16 >> 1, inForce.gainUpFractionQ16);
        assertEquals(running.gainDownFractionQ16 >> 1, inForce.gainDownFractionQ16);
        assertEquals(running.jumpWindows, inForce.jumpWindows);
    }
}
