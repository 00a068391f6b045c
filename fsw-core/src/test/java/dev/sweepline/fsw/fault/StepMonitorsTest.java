package dev.sweepline.fsw.fault;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.sweepline.fsw.DemoCup;
import dev.sweepline.fsw.link.SampleReply;
import dev.sweepline.fsw.link.StepCommand;
import org.junit.jupiter.api.Test;

/**
 * The per-sample monitors at their thresholds (commands.md §6): each trips on the N-th consecutive
 * offending step and not on the (N−1)-th, and a value at the limit L does not offend while L + 1 does.
 * N and L are FaultSettings.defaults() (commands.md §6 table: HV readback 8 steps over 200 codes,
 * saturation 32 steps, stuck channel 64 steps while another quadrant moves by more than 64 counts).
 */
class StepMonitorsTest {
    private static final int HV = 1 << FaultMonitorId.HV_READBACK;
    private static final int SATURATION = 1 << FaultMonitorId.ADC_SATURATION;
    private static final int STUCK = 1 << FaultMonitorId.STUCK_CHANNEL;
    /** The demo cup's ADC top code: 2^16 − 1 (instruments/demo-cup.yaml adc.bits 16). */
    private static final int TOP = DemoCup.INSTRUMENT.adcTopCode();

    private final FaultSettings settings = FaultSettings.defaults();
    private final StepMonitors monitors = new StepMonitors(settings, TOP);
    private final StepCommand step = new StepCommand();
    private final SampleReply reply = new SampleReply();

    StepMonitorsTest() {
        step.hvEnabled = true;
        step.dacLow = 10_000;
        step.dacHigh = 20_000;
        for (int q = 0; q < 4; q++) {
            reply.quadrant[q] = 1000 + q;
        }
    }

    /** Feeds {@code steps} samples; returns the monitors tripped on the last one. */
    private int feed(int steps, Runnable before) {
        int last = 0;
        for (int i = 0; i < steps; i++) {
            before.run();
            last = monitors.onSample(step, reply);
        }
        return last;
    }

    @Test
    void shouldTripHvReadbackOnTheNthStepOverTheLimitOnly() {
        int n = settings.threshold[FaultMonitorId.HV_READBACK];
        int limit = settings.limit[FaultMonitorId.HV_READBACK];
        assertEquals(8, n); // commands.md §6 default
        assertEquals(200, limit); // commands.md §6 default, codes
        reply.hvMonitorCode = step.dacHigh + limit; // at L: in tolerance
        assertEquals(0, feed(n, () -> { }) & HV);
        reply.hvMonitorCode = step.dacHigh - limit - 1; // L + 1 below the command
        assertEquals(0, feed(n - 1, () -> { }) & HV, "not at N - 1");
        assertEquals(HV, monitors.onSample(step, reply) & HV, "at N");
        assertEquals(limit + 1, monitors.detail[FaultMonitorId.HV_READBACK]); // the last difference (commands.md §6)
    }

    @Test
    void shouldTripSaturationOnTheNthStepAtTheAdcTop() {
        int n = settings.threshold[FaultMonitorId.ADC_SATURATION];
        assertEquals(32, n); // commands.md §6 default
        reply.quadrant[2] = TOP - 1; // one code below the top: not saturated
        assertEquals(0, feed(n, () -> { }) & SATURATION);
        reply.quadrant[2] = TOP; // the description's top code: saturated (FORMAT.md derived values)
        assertEquals(0, feed(n - 1, () -> { }) & SATURATION, "not at N - 1");
        assertEquals(SATURATION, monitors.onSample(step, reply) & SATURATION, "at N");
    }

    @Test
    void shouldTripStuckChannelOnlyWhileAnotherQuadrantMovesByMoreThanTheLimit() {
        int n = settings.threshold[FaultMonitorId.STUCK_CHANNEL];
        int limit = settings.limit[FaultMonitorId.STUCK_CHANNEL];
        assertEquals(64, n); // commands.md §6 default
        assertEquals(64, limit); // commands.md §6 default, counts
        int[] toggle = {0};
        monitors.onSample(step, reply); // the first sample only sets the last codes
        // quadrant 1 moves by exactly L: not "moved", so the stuck quadrants count nothing
        assertEquals(0, feed(2 * n, () -> reply.quadrant[0] = 1000 + limit * (toggle[0] ^= 1)) & STUCK);
        // quadrant 1 moves by L + 1 every step; quadrants 2..4 repeat their codes
        assertEquals(0, feed(n - 1, () -> reply.quadrant[0] = 1000 + (limit + 1) * (toggle[0] ^= 1)) & STUCK,
                "not at N - 1");
        reply.quadrant[0] = 1000 + (limit + 1) * (toggle[0] ^= 1);
        assertEquals(STUCK, monitors.onSample(step, reply) & STUCK, "at N");
        // quadrants 2..4 all trip on this step; the detail names the last of them (commands.md §6: quadrant 1..4)
        assertEquals(4, monitors.detail[FaultMonitorId.STUCK_CHANNEL]);
    }
}
