package dev.sweepline.fsw.sweep;

import dev.sweepline.fsw.DemoCup;
import dev.sweepline.fsw.link.SampleReply;
import dev.sweepline.fsw.link.StepCommand;
import dev.sweepline.fsw.table.SweepParameters;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Zero allocation on the step path (architecture.md, determinism: the per-step path allocates
 * nothing): nextStep + ingest + sweep analysis over 10 windows of 10k steps after a 100k warm-up,
 * with the rule of {@link AllocationMeter}, in the band style and in the design style with a budget, a
 * margin and a quick survey (sweep design note R21), and that with the interleaved order and the support
 * dwell, unpaired and paired (R22, R23), and the alpha-clear band with either (R24). Not timed.
 */
class AllocationTest {
    private long nowMicros;

    @ParameterizedTest
    @ValueSource(ints = {SweepParameters.FOCUS_STYLE_BAND, SweepParameters.FOCUS_STYLE_DESIGN, 7, 15, 19, 31})
    void shouldAllocateNothingPerStep(int focusStyle) {
        SyntheticInstrument plasma = Fixtures.oneAu(81);
        CannedReplies canned = new CannedReplies(Fixtures.TABLE, plasma);
        SweepParameters p = focusStyle == SweepParameters.FOCUS_STYLE_BAND ? DemoCup.parameters() : Fixtures.designStyle();
        p.focusStyle = focusStyle; // 7: design, interleaved, support dwell (R23)
        p.focusFloorPeriods = p.supportDwell() ? 1 : 0; // 15: and paired support (R23); 19, 31: alpha-clear (R24)
        SweepScheduler scheduler = new SweepScheduler(DemoCup.INSTRUMENT, Fixtures.TABLE, p, SweepListener.NONE);
        StepCommand step = new StepCommand();
        SampleReply reply = new SampleReply();
        AllocationMeter.assertAllocationFree(steps -> {
            for (int k = 0; k < steps; k++) {
                scheduler.nextStep(step, nowMicros);
                nowMicros += step.durationMicros(DemoCup.MODULATION_PERIOD_MICROS);
                canned.answer(step, reply);
                scheduler.ingest(reply, nowMicros);
            }
        });
        // the measured loop went through surveys and focus sweeps, not one state
        assertTrue(scheduler.sweepCount() > 2000, "sweeps " + scheduler.sweepCount());
    }
}
