package dev.sweepline.sim.command;

import dev.sweepline.fsw.host.script.ScriptException;
import dev.sweepline.fsw.host.script.CommandScript;
import dev.sweepline.fsw.command.NonVolatileStore;
import dev.sweepline.fsw.exec.FlightConfig;
import dev.sweepline.fsw.exec.FlightSoftware;
import dev.sweepline.fsw.fault.FaultSettings;
import dev.sweepline.ground.decode.CommandReport;
import dev.sweepline.ground.decode.DecodeListener;
import dev.sweepline.ground.decode.DecoderConfig;
import dev.sweepline.ground.decode.EventReport;
import dev.sweepline.ground.decode.HousekeepingReport;
import dev.sweepline.ground.decode.TelemetryDecoder;
import dev.sweepline.ground.spectrum.Ccsds121QuadrantDecoder;
import dev.sweepline.ground.spectrum.DecodedSpectrum;
import dev.sweepline.sim.bench.BenchConfig;
import dev.sweepline.sim.bench.ClosedLoopBench;
import dev.sweepline.sim.instrument.SimulatedInstrument;
import dev.sweepline.sim.scenario.ScenarioLoader;
import java.io.ByteArrayOutputStream;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Consumer;

/** A scripted closed-loop run whose frames are decoded by the ground decoder (sweepline-ground's chain). */
final class DecodedRun {
    final List<EventReport> events = new ArrayList<>();
    final List<CommandReport> reports = new ArrayList<>();
    final List<DecodedSpectrum> spectra = new ArrayList<>();
    final List<HousekeepingReport> housekeeping = new ArrayList<>();
    final ScriptRunner runner;
    TelemetryDecoder decoder;
    FlightSoftware fsw;

    private DecodedRun(ScriptRunner runner) {
        this.runner = runner;
    }

    /**
     * Runs the quiet-perihelion scenario for {@code seconds} with {@code script}, fault settings
     * adjusted by {@code faults}, then decodes every frame.
     */
    static DecodedRun of(List<String> script, double seconds, NonVolatileStore store, Consumer<FaultSettings> faults)
            throws ScriptException {
        ScriptRunner runner = new ScriptRunner(CommandScript.parse(script), true, store);
        DecodedRun run = new DecodedRun(runner);
        ByteArrayOutputStream frames = new ByteArrayOutputStream();
        ClosedLoopBench.CycleHook hook = new ClosedLoopBench.CycleHook() {
            @Override
            public void configure(FlightConfig flight, SimulatedInstrument instrument) {
                faults.accept(flight.faults);
                runner.configure(flight, instrument);
            }

            @Override
            public void beforeCycle(FlightSoftware fsw, long nowMicros) {
                run.fsw = fsw;
                runner.beforeCycle(fsw, nowMicros);
            }
        };
        ClosedLoopBench.run(BenchConfig.defaults(ScenarioLoader.builtIn("quiet-perihelion"), 7, seconds),
                ClosedLoopBench.Progress.NONE, (f, off, len) -> frames.write(f, off, len), hook);
        byte[] stream = frames.toByteArray();
        run.decoder = new TelemetryDecoder(DecoderConfig.icdDefaults(), new Ccsds121QuadrantDecoder(), new DecodeListener() {
            @Override
            public void onEvent(EventReport r) {
                run.events.add(r);
            }

            @Override
            public void onCommandReport(CommandReport r) {
                run.reports.add(r);
            }

            @Override
            public void onSpectrum(DecodedSpectrum s) {
                run.spectra.add(s);
            }

            @Override
            public void onHousekeeping(HousekeepingReport h) {
                run.housekeeping.add(h);
            }
        });
        run.decoder.accept(stream, 0, stream.length);
        run.decoder.finish();
        return run;
    }

    /** Fault events of {@code monitor}, in order. */
    List<EventReport> faults(int monitor) {
        return events.stream().filter(e -> e.eventId() == EventReport.FAULT && e.argumentA() == monitor).toList();
    }

    /** Mode-change events into {@code toMode} with {@code reason}. */
    long modeChanges(int toMode, int reason) {
        return events.stream().filter(e -> e.eventId() == EventReport.MODE_CHANGE && e.argumentB() == toMode
                && e.reasonCode() == reason).count();
    }
}
