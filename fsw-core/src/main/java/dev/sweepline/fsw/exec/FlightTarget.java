package dev.sweepline.fsw.exec;

import dev.sweepline.fsw.command.CommandReason;
import dev.sweepline.fsw.command.CommandTarget;
import dev.sweepline.fsw.command.ParameterTable;
import dev.sweepline.fsw.fault.FaultProtection;
import dev.sweepline.fsw.report.EventWriter;
import dev.sweepline.fsw.sweep.SweepScheduler;
import dev.sweepline.fsw.table.TableStatus;
import dev.sweepline.fsw.telemetry.TelemetryWriter;

/**
 * The command processor's view of the rest of the flight software: counter resets, and a committed
 * table put in force (the scheduler at its next sweep boundary; fault protection, housekeeping period
 * and spectrum decimation now; a TABLE_COMMITTED event). Allocation-free. Threading: the executive's.
 */
final class FlightTarget implements CommandTarget {
    private final SweepScheduler scheduler;
    private final FaultProtection faults;
    private final SweepRouting routing;
    private final HousekeepingClock housekeeping;
    private final EventWriter events;
    private final TelemetryWriter telemetry;

    FlightTarget(SweepScheduler scheduler, FaultProtection faults, SweepRouting routing, HousekeepingClock housekeeping,
            EventWriter events, TelemetryWriter telemetry) {
        this.telemetry = telemetry;
        this.scheduler = scheduler;
        this.faults = faults;
        this.routing = routing;
        this.housekeeping = housekeeping;
        this.events = events;
    }

    @Override
    public void resetCounters(int mask) {
        if ((mask & RESET_FAULT_COUNTERS) != 0) {
            faults.resetCounters();
        }
        if ((mask & RESET_SWEEP_COUNTERS) != 0) {
            routing.resetCounters();
        }
    }

    @Override
    public int applyTable(ParameterTable table, int tableId, long nowMicros) {
        int status = scheduler.loadTable(table.dacLow, table.dacHigh, table.windowCount);
        if (status == TableStatus.OK) {
            status = scheduler.loadParameters(table.sweep);
        }
        if (status != TableStatus.OK || faults.configure(table.faults) != 0) {
            return CommandReason.TABLE_INVALID; // cannot happen: the table was validated
        }
        housekeeping.period(table.housekeepingSeconds * 1_000_000L, nowMicros);
        routing.tableCommitted(tableId, table.spectrumDecimation);
        telemetry.engineeringFlush(table.sweep.engineeringFlushSeconds);
        events.write(EventWriter.TABLE_COMMITTED, 0, 0, tableId, nowMicros);
        return CommandReason.OK;
    }
}
