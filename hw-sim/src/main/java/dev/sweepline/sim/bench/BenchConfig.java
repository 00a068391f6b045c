package dev.sweepline.sim.bench;

import dev.sweepline.fsw.exec.FlightConfig;
import dev.sweepline.fsw.host.instrument.Instruments;
import dev.sweepline.sim.instrument.InstrumentModel;
import dev.sweepline.sim.scenario.Scenario;
import java.util.Objects;
import java.util.function.Consumer;

/**
 * Everything one closed-loop run depends on; the same config gives the same bytes. The flight
 * software's start-up configuration is carried whole (table, sweep parameters, frame length,
 * compression, fault settings, and whatever the flight software gains), so a flight option needs no
 * field here.
 *
 * <p>A value: the flight configuration is copied in and copied out ({@code FlightConfig.copy()}), so
 * neither a run, nor a hook completing one run's configuration, nor a caller changes a config once made.
 * Change it with {@link #withFlight}.
 *
 * @param scenario        the plasma to fly through
 * @param seed            root of the run's seed tree (scenario fluctuations, instrument noise, ...)
 * @param durationSeconds simulated time to run
 * @param flight          the flight software's start-up configuration (the bench adds its own two
 *                        settings to it, see {@link ClosedLoopBench#flightConfig})
 * @param instrument      the simulated instrument
 * @param allocationBitsPerSecond the downlink allocation the telemetry is checked against; NaN for none
 */
public record BenchConfig(Scenario scenario, long seed, double durationSeconds, FlightConfig flight,
        InstrumentModel instrument, double allocationBitsPerSecond) {

    /** Keeps a copy of {@code flight}. */
    public BenchConfig {
        flight = Objects.requireNonNull(flight, "flight").copy();
    }

    /** The default instrument (instruments/FORMAT.md: the demo cup) and its flight configuration, no allocation. */
    public static BenchConfig defaults(Scenario scenario, long seed, double durationSeconds) {
        return defaults(scenario, seed, durationSeconds, InstrumentModel.of(Instruments.defaultSpec()));
    }

    /** {@code instrument} and the flight software's configuration for its description, no allocation. */
    public static BenchConfig defaults(Scenario scenario, long seed, double durationSeconds, InstrumentModel instrument) {
        return new BenchConfig(scenario, seed, durationSeconds, FlightConfig.of(instrument.flight()), instrument,
                Double.NaN);
    }

    /** A copy of the flight software's start-up configuration; changing it changes nothing here. */
    @Override
    public FlightConfig flight() {
        return flight.copy();
    }

    /** This config with the flight configuration changed by {@code change} (on a copy). */
    public BenchConfig withFlight(Consumer<FlightConfig> change) {
        FlightConfig f = flight();
        change.accept(f);
        return new BenchConfig(scenario, seed, durationSeconds, f, instrument, allocationBitsPerSecond);
    }

    /** This config with another downlink allocation. */
    public BenchConfig withAllocation(double bitsPerSecond) {
        return new BenchConfig(scenario, seed, durationSeconds, flight, instrument, bitsPerSecond);
    }

    /** Simulated duration in microseconds. */
    public long durationMicros() {
        return Math.round(durationSeconds * 1e6);
    }
}
