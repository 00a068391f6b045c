package dev.sweepline.sim.interop;

import dev.sweepline.fsw.exec.FlightConfig;
import dev.sweepline.fsw.exec.FlightSoftware;
import dev.sweepline.fsw.sweep.Spectrum;
import dev.sweepline.fsw.sweep.SweepListener;
import dev.sweepline.fsw.telemetry.FrameSink;
import dev.sweepline.sim.bench.PlasmaStates;
import dev.sweepline.sim.instrument.InstrumentModel;
import dev.sweepline.sim.instrument.SimulatedInstrument;
import dev.sweepline.sim.link.InProcessLink;
import dev.sweepline.sim.plasma.PlasmaState;
import dev.sweepline.sim.scenario.AlphaDriftDirection;
import dev.sweepline.sim.scenario.Scenario;
import dev.sweepline.sim.scenario.ScenarioTimeline;
import java.util.ArrayList;
import java.util.List;

/**
 * The closed loop of {@code ClosedLoopBench.run} (same instrument, link, plasma and time stepping) with
 * the flight software's sweep observer exposed, which {@code ClosedLoopBench} does not offer: every
 * completed spectrum is copied as the flight software saw it, and the frames go to a caller's sink.
 */
public final class FlightLoop {
    /** Time step while nothing is in flight (ClosedLoopBench.IDLE_MICROS). */
    private static final long IDLE_MICROS = 10_000;

    private final List<RecordedSpectrum> spectra = new ArrayList<>();
    private final FlightSoftware fsw;
    private final InProcessLink link;
    private final long endMicros;

    /**
     * A loop over {@code scenario} for {@code seconds} of simulated time.
     *
     * @param seed   seeds the scenario's fluctuations and the instrument's noise
     * @param flight the flight software's configuration (frame length, compression)
     * @param frames receives every frame, ASM first
     */
    public FlightLoop(Scenario scenario, long seed, double seconds, FlightConfig flight, FrameSink frames) {
        ScenarioTimeline timeline = scenario.timeline(seed);
        AlphaDriftDirection drift = scenario.alphaDriftDirection();
        SimulatedInstrument instrument = new SimulatedInstrument(InstrumentModel.demo(), seed * 31 + 7);
        this.link = new InProcessLink(instrument, micros -> plasma(timeline, drift, micros),
                (step, reply, truth, start) -> { });
        this.fsw = new FlightSoftware(flight, link, frames, new SweepListener() {
            @Override
            public void onSweepComplete(Spectrum spectrum, long nowMicros) {
                if (spectrum.count() > 0) { // FlightSoftware packs only non-empty sweeps
                    spectra.add(RecordedSpectrum.of(spectrum));
                }
            }
        });
        this.endMicros = Math.round(seconds * 1e6);
    }

    private static PlasmaState plasma(ScenarioTimeline timeline, AlphaDriftDirection drift, long micros) {
        return PlasmaStates.of(timeline.at(micros / 1e6), drift);
    }

    /** Runs to the end and closes the flight software (last housekeeping, frames flushed). */
    public FlightLoop run() {
        long now = 0;
        int stalls = 0;
        while (now < endMicros) {
            int work = fsw.doWork(now);
            long next = link.nextReplyMicros();
            long before = now;
            if (next != Long.MAX_VALUE) {
                now = Math.max(now, next);
            } else if (work == 0) {
                now += IDLE_MICROS;
            }
            stalls = (now == before && work == 0) ? stalls + 1 : 0;
            if (stalls > 3) {
                now++;
            }
        }
        fsw.close(endMicros);
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
