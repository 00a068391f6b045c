package dev.sweepline.sim.interop;

import dev.sweepline.sim.instrument.TestInstruments;
import dev.sweepline.fsw.exec.FlightConfig;
import dev.sweepline.fsw.exec.FlightSoftware;
import dev.sweepline.fsw.sweep.Spectrum;
import dev.sweepline.fsw.sweep.SweepListener;
import dev.sweepline.fsw.telemetry.FrameSink;
import dev.sweepline.sim.bench.BenchConfig;
import dev.sweepline.sim.bench.ClosedLoopBench;
import dev.sweepline.sim.instrument.InstrumentModel;
import dev.sweepline.sim.scenario.Scenario;
import java.util.ArrayList;
import java.util.List;

/**
 * A {@link ClosedLoopBench} run with the flight software's spectra copied as it completed them and
 * the flight software kept for its counters; the frames go to a caller's sink.
 */
public final class FlightLoop {
    private final List<RecordedSpectrum> spectra = new ArrayList<>();
    private final BenchConfig config;
    private final FrameSink frames;
    private FlightSoftware fsw;

    /**
     * A loop over {@code scenario} for {@code seconds} of simulated time.
     *
     * @param seed   seeds the scenario's fluctuations and the instrument's noise
     * @param flight the flight software's start-up configuration (frame length, compression, ...)
     * @param frames receives every frame, ASM first
     */
    public FlightLoop(Scenario scenario, long seed, double seconds, FlightConfig flight, FrameSink frames) {
        this.config = new BenchConfig(scenario, seed, seconds, flight, TestInstruments.DEMO_CUP, Double.NaN);
        this.frames = frames;
    }

    /** Runs to the end and closes the flight software (last housekeeping, frames flushed). */
    public FlightLoop run() {
        ClosedLoopBench.run(config, ClosedLoopBench.Progress.NONE, ClosedLoopBench.Hooks.NONE.withFrames(frames)
                .withSetup(f -> fsw = f).withObserver(new SweepListener() {
                    @Override
                    public void onSweepComplete(Spectrum spectrum, long nowMicros) {
                        if (spectrum.count() > 0) { // FlightSoftware packs only non-empty sweeps
                            spectra.add(RecordedSpectrum.of(spectrum));
                        }
                    }
                }));
        return this;
    }

    /** The spectra the flight software completed and packed, in order. */
    public List<RecordedSpectrum> spectra() {
        return spectra;
    }

    /** The flight software (executive counters, telemetry counters). */
    public FlightSoftware flightSoftware() {
        return fsw;
    }
}
