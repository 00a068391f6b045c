package dev.sweepline.fsw.fault;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.sweepline.fsw.DemoCup;
import dev.sweepline.fsw.report.EventWriter;
import dev.sweepline.fsw.sweep.Spectrum;
import dev.sweepline.fsw.sweep.SweepScheduler;
import dev.sweepline.fsw.telemetry.CucTime;
import dev.sweepline.fsw.telemetry.TelemetryWriter;
import org.junit.jupiter.api.Test;

/**
 * The monitors fault protection keeps itself, at their thresholds (commands.md §6): peak lost trips on
 * the N-th sweep without a peak and not on the (N−1)-th; cycle overrun trips on the N-th cycle over the
 * limit L, a cycle of exactly L does not count and L + 1 does; the link monitor trips on every new SAFE
 * entry. N and L are FaultSettings.defaults() (commands.md §6 table).
 */
class FaultProtectionThresholdTest {
    private final FaultSettings defaults = FaultSettings.defaults();
    private final SweepScheduler scheduler = new SweepScheduler(DemoCup.INSTRUMENT, DemoCup.table(),
            DemoCup.parameters(), null);
    private final TelemetryWriter telemetry = new TelemetryWriter(TelemetryWriter.DEFAULT_FRAME_LENGTH,
            Long.MAX_VALUE, new CucTime(0, 0), 64, (f, off, len) -> { });
    private final FaultProtection faults = new FaultProtection(defaults, scheduler, new EventWriter(telemetry));
    /** A completed sweep without a valid peak: a fresh spectrum has none. */
    private final Spectrum noPeak = new Spectrum(DemoCup.INSTRUMENT);

    private long trips(int monitor) {
        faults.respond(0, true, 0);
        return faults.trips(monitor);
    }

    @Test
    void shouldTripPeakLostOnTheNthSweepWithoutAPeak() {
        int n = defaults.threshold[FaultMonitorId.PEAK_LOST];
        assertEquals(64, n); // commands.md §6 default, sweeps
        for (int i = 0; i < n - 1; i++) {
            faults.onSweepComplete(noPeak);
        }
        assertEquals(0, trips(FaultMonitorId.PEAK_LOST), "not at N - 1");
        faults.onSweepComplete(noPeak);
        assertEquals(1, trips(FaultMonitorId.PEAK_LOST), "at N");
    }

    @Test
    void shouldTripCycleOverrunOnTheNthCycleAboveTheLimit() {
        int n = defaults.threshold[FaultMonitorId.CYCLE_OVERRUN];
        int limit = defaults.limit[FaultMonitorId.CYCLE_OVERRUN];
        assertEquals(3, n); // commands.md §6 default, cycles
        assertEquals(50_000, limit); // commands.md §6 default, ticks (µs)
        for (int i = 0; i < 2 * n; i++) {
            faults.onCycleWork(limit); // at L: not an overrun
        }
        assertEquals(0, trips(FaultMonitorId.CYCLE_OVERRUN));
        for (int i = 0; i < n - 1; i++) {
            faults.onCycleWork(limit + 1);
        }
        assertEquals(0, trips(FaultMonitorId.CYCLE_OVERRUN), "not at N - 1");
        faults.onCycleWork(limit + 1);
        assertEquals(1, trips(FaultMonitorId.CYCLE_OVERRUN), "at N");
    }

    @Test
    void shouldTripTheLinkMonitorOnEveryNewSafeEntry() {
        assertEquals(1, defaults.threshold[FaultMonitorId.LINK_TIMEOUT]); // commands.md §6 default
        faults.respond(0, true, 0);
        assertEquals(0, faults.trips(FaultMonitorId.LINK_TIMEOUT), "no SAFE entry yet");
        faults.respond(1, true, 0);
        faults.respond(1, true, 0);
        assertEquals(1, faults.trips(FaultMonitorId.LINK_TIMEOUT), "one trip for one SAFE entry");
        faults.respond(2, true, 0);
        assertEquals(2, faults.trips(FaultMonitorId.LINK_TIMEOUT));
    }
}
