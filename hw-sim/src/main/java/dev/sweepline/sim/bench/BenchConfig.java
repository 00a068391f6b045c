package dev.sweepline.sim.bench;

import dev.sweepline.fsw.instrument.InstrumentDescription;
import dev.sweepline.fsw.table.SweepParameters;
import dev.sweepline.fsw.table.WindowTable;
import dev.sweepline.fsw.telemetry.TelemetryWriter;
import dev.sweepline.sim.instrument.InstrumentModel;
import dev.sweepline.sim.scenario.Scenario;

/**
 * Everything one closed-loop run depends on; the same config gives the same bytes.
 *
 * @param scenario        the plasma to fly through
 * @param seed            seeds the scenario's fluctuations and the instrument's noise
 * @param durationSeconds simulated time to run
 * @param table           the flight software's window table
 * @param parameters      the flight software's sweep parameters
 * @param instrument      the simulated instrument
 * @param frameLength     telemetry transfer frame length, octets
 * @param allocationBitsPerSecond the downlink allocation the telemetry is checked against; NaN for none
 * @param compressSpectra CCSDS 121 coding of spectrum packets (the ICD's compression 0x01), else raw
 */
public record BenchConfig(Scenario scenario, long seed, double durationSeconds, WindowTable table,
        SweepParameters parameters, InstrumentModel instrument, int frameLength, double allocationBitsPerSecond,
        boolean compressSpectra) {

    /** The demo instrument with its default table and parameters, the default frame length, no allocation. */
    public static BenchConfig defaults(Scenario scenario, long seed, double durationSeconds) {
        InstrumentModel instrument = InstrumentModel.demo();
        InstrumentDescription flight = instrument.flight();
        return new BenchConfig(scenario, seed, durationSeconds, flight.defaultTable(), flight.defaultParameters(),
                instrument, TelemetryWriter.DEFAULT_FRAME_LENGTH, Double.NaN, true);
    }

    /** This config with another downlink allocation. */
    public BenchConfig withAllocation(double bitsPerSecond) {
        return new BenchConfig(scenario, seed, durationSeconds, table, parameters, instrument, frameLength,
                bitsPerSecond, compressSpectra);
    }

    /** Simulated duration in microseconds. */
    public long durationMicros() {
        return Math.round(durationSeconds * 1e6);
    }
}
