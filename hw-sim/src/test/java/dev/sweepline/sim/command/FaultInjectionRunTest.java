package dev.sweepline.sim.command;

import dev.sweepline.fsw.fault.FaultMonitorId;
import dev.sweepline.fsw.fault.FaultResponse;
import dev.sweepline.ground.decode.EventReport;
import dev.sweepline.ground.decode.HousekeepingReport;
import dev.sweepline.fsw.exec.FlightSoftware;
import dev.sweepline.sim.bench.BenchConfig;
import dev.sweepline.sim.bench.ClosedLoopBench;
import dev.sweepline.sim.scenario.ScenarioLoader;
import java.util.List;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Every fault monitor tripped by a fault injected in the simulated instrument (or, for the cycle
 * overrun, in the host's cycle report) during a closed-loop run; its event and response are found by
 * the ground decoder in the frames (telemetry ICD §6 event 2, commands.md §6). Before the injection at
 * 3 s no monitor trips (the defaults stay quiet on a clean run).
 */
class FaultInjectionRunTest {
    /** Mode code of SAFE (telemetry ICD §5/§6). */
    private static final int SAFE = 0;
    /** Mode-change reason of a fault response (telemetry ICD §6: 12). */
    private static final int FAULT_REASON = FaultResponse.MODE_CHANGE_REASON;
    private static final long INJECT_MICROS = 3_000_000;

    private static List<Integer> responses(List<EventReport> faults) {
        return faults.stream().map(EventReport::argumentB).toList();
    }

    /** The monitor tripped, and only after the injection: the first housekeeping packet is stamped at t = 0. */
    private static void assertAfterInjection(DecodedRun run, List<EventReport> faults) {
        assertFalse(faults.isEmpty(), "no fault event");
        double sinceStart = faults.get(0).time().taiSeconds() - run.housekeeping.get(0).time().taiSeconds();
        assertTrue(sinceStart >= INJECT_MICROS / 1e6, "first trip at " + sinceStart + " s");
    }

    private static HousekeepingReport lastHk(DecodedRun run) {
        return run.housekeeping.get(run.housekeeping.size() - 1);
    }

    @Test
    void shouldRetryThenSafeOnHvReadbackFault() throws Exception {
        // a 500-code (50 V) monitor offset is beyond the 200-code default tolerance (FaultSettings.defaults)
        DecodedRun run = DecodedRun.of(List.of("3.0 INJECT HV_READBACK 500"), 8, null, f -> { });
        List<EventReport> f = run.faults(FaultMonitorId.HV_READBACK);
        assertAfterInjection(run, f);
        // default: RETRY with a budget of 2, then SAFE
        assertEquals(List.of(FaultResponse.RETRY, FaultResponse.RETRY, FaultResponse.SAFE), responses(f));
        assertEquals(1, run.modeChanges(SAFE, FAULT_REASON));
        assertEquals(0, lastHk(run).hvState()); // HV interlock off after the SAFE response
        assertEquals(3, lastHk(run).faultTrips());
        assertEquals(500, f.get(0).reasonCode(), 30); // detail = |readback - command|: the offset, plus monitor noise
    }

    @Test
    void shouldChangeGainOnSaturation() throws Exception {
        DecodedRun run = DecodedRun.of(List.of("3.0 INJECT SATURATE on"), 6, null, f -> { });
        List<EventReport> f = run.faults(FaultMonitorId.ADC_SATURATION);
        assertAfterInjection(run, f);
        assertEquals(FaultResponse.GAIN, f.get(0).argumentB());
        // the response halved the gain-up threshold (default 52429 = 80 % in Q16, SweepParameters.tunableDefaults)
        dev.sweepline.fsw.table.SweepParameters p = new dev.sweepline.fsw.table.SweepParameters();
        run.fsw.scheduler().activeParameters(p);
        assertTrue(p.gainUpFractionQ16 <= 52_429 / 2, "gain up " + p.gainUpFractionQ16);
    }

    @Test
    void shouldReportStuckQuadrant() throws Exception {
        DecodedRun run = DecodedRun.of(List.of("3.0 INJECT STUCK 2 1000"), 12, null, f -> { });
        List<EventReport> f = run.faults(FaultMonitorId.STUCK_CHANNEL);
        assertAfterInjection(run, f);
        assertEquals(FaultResponse.SURVEY, f.get(0).argumentB());
        assertEquals(2, f.get(0).reasonCode()); // detail = quadrant number 1..4, as the script counts them
    }

    @Test
    void shouldResumeSurveyThenSafeOnLinkTimeouts() throws Exception {
        DecodedRun run = DecodedRun.of(List.of("3.0 INJECT SEQUENCE on"), 8, null, f -> { });
        List<EventReport> f = run.faults(FaultMonitorId.LINK_TIMEOUT);
        assertAfterInjection(run, f);
        // default: 3 retries (each resumes SURVEY), then SAFE
        assertEquals(List.of(FaultResponse.RETRY, FaultResponse.RETRY, FaultResponse.RETRY, FaultResponse.SAFE),
                responses(f));
        assertEquals(4, run.modeChanges(SAFE, 11)); // the executive's LINK_TIMEOUT (ModeChangeReason 11)
        assertEquals(3, run.modeChanges(1, FAULT_REASON)); // resumed SURVEY by the retries
        assertEquals(0, lastHk(run).mode());
    }

    @Test
    void shouldSurveyWhenPeakLost() throws Exception {
        // threshold 3 sweeps instead of the default 64 so that the run stays short (about 1 s per sweep here)
        DecodedRun run = DecodedRun.of(List.of("3.0 INJECT DEAD on"), 10, null,
                f -> f.threshold[FaultMonitorId.PEAK_LOST] = 3);
        List<EventReport> f = run.faults(FaultMonitorId.PEAK_LOST);
        assertAfterInjection(run, f);
        assertEquals(FaultResponse.SURVEY, f.get(0).argumentB());
        assertEquals(3, f.get(0).reasonCode()); // detail = sweeps without a peak
    }

    @Test
    void shouldRetryThenSafeOnCycleOverrun() throws Exception {
        // 80 ms of work per cycle against the 50 ms budget, 3 cycles in a row (FaultSettings.defaults)
        DecodedRun run = DecodedRun.of(List.of("3.0 INJECT OVERRUN 80000"), 5, null, f -> { });
        List<EventReport> f = run.faults(FaultMonitorId.CYCLE_OVERRUN);
        assertAfterInjection(run, f);
        assertEquals(List.of(FaultResponse.RETRY, FaultResponse.RETRY, FaultResponse.SAFE), responses(f));
        assertEquals(1, run.modeChanges(SAFE, FAULT_REASON));
    }

    @Test
    void shouldTripNothingWithoutFault() throws Exception {
        DecodedRun run = DecodedRun.of(List.of(), 8, null, f -> { });
        assertEquals(0, run.events.stream().filter(e -> e.eventId() == EventReport.FAULT).count());
        assertEquals(0, lastHk(run).faultTrips());
        assertTrue(run.spectra.size() > 10, "spectra " + run.spectra.size());
    }

    @Test
    void shouldTripNoMonitorOnAnyBuiltInScenario() {
        // commands.md §6: the default thresholds stay quiet on every built-in scenario (20 s, seed 11)
        for (String name : ScenarioLoader.builtInNames()) {
            FlightSoftware[] fsw = new FlightSoftware[1];
            ClosedLoopBench.run(BenchConfig.defaults(ScenarioLoader.builtIn(name), 11, 20), ClosedLoopBench.Progress.NONE,
                    (f, off, len) -> { }, new ClosedLoopBench.CycleHook() {
                        @Override
                        public void beforeCycle(FlightSoftware flight, long nowMicros) {
                            fsw[0] = flight;
                        }
                    });
            assertEquals(0, fsw[0].faults().totalTrips(), name);
            assertTrue(fsw[0].scheduler().sweepCount() > 20, name);
        }
    }
}
