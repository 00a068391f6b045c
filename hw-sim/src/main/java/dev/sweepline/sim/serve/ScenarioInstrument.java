package dev.sweepline.sim.serve;

import dev.sweepline.fsw.instrument.InstrumentDescription;
import dev.sweepline.fsw.link.HousekeepingReply;
import dev.sweepline.fsw.link.SampleReply;
import dev.sweepline.fsw.link.StepCommand;
import dev.sweepline.sim.instrument.InstrumentModel;
import dev.sweepline.sim.instrument.SimulatedInstrument;
import dev.sweepline.sim.instrument.StepTruth;
import dev.sweepline.sim.scenario.AlphaDriftDirection;
import dev.sweepline.sim.scenario.PlasmaStates;
import dev.sweepline.sim.scenario.Scenario;
import dev.sweepline.sim.scenario.ScenarioTimeline;
import dev.sweepline.sim.seed.SeedTree;

/**
 * The simulated electronics flying through a scenario, as the in-process bench builds them: the
 * instrument's noise seeded with {@link SeedTree#instrument()} of the run seed, the plasma of the
 * scenario's timeline for the same seed evaluated at each step's mid-integration time (as
 * {@code InProcessLink} does). Same seed, same steps at the same times: the same samples.
 *
 * <p>Threading: one thread.
 */
public final class ScenarioInstrument implements StepExecutor {
    /** Kelvin at 0 degC (definition of the Celsius scale). */
    private static final double ZERO_CELSIUS_K = 273.15;

    private final SimulatedInstrument instrument;
    private final ScenarioTimeline timeline;
    private final AlphaDriftDirection drift;
    private final StepTruth truth = new StepTruth();
    private int lastHvHighCode;
    private int lastLowCode;
    private final int modulationPeriodMicros;

    /** Instrument {@code model} in {@code scenario} with run seed {@code seed}. */
    public ScenarioInstrument(Scenario scenario, long seed, InstrumentModel model) {
        this.instrument = new SimulatedInstrument(model, SeedTree.of(seed).instrument());
        this.timeline = scenario.timeline(seed);
        this.drift = scenario.alphaDriftDirection();
        this.modulationPeriodMicros = model.flight().modulationPeriodMicros();
    }

    @Override
    public InstrumentDescription instrument() {
        return instrument.model().flight();
    }

    @Override
    public long execute(StepCommand cmd, long startMicros, SampleReply reply) {
        long midMicros = startMicros + cmd.settleMicros + (cmd.durationMicros(modulationPeriodMicros) - cmd.settleMicros) / 2;
        long end = instrument.execute(cmd, startMicros, PlasmaStates.of(timeline.at(midMicros / 1e6), drift),
                reply, truth);
        lastHvHighCode = reply.hvMonitorCode;
        lastLowCode = cmd.hvEnabled ? cmd.dacLow : 0;
        return end;
    }

    @Override
    public void switchHvOff(long atMicros) {
        lastHvHighCode = instrument.switchHvOff(atMicros); // housekeeping reports the reading after the trip
        lastLowCode = 0;
    }

    /** What really happened in the last step. */
    public StepTruth lastTruth() {
        return truth;
    }

    @Override
    public void housekeeping(HousekeepingReply hk) {
        hk.hvMonitorHighCode = lastHvHighCode;
        hk.hvMonitorLowCode = lastLowCode; // the model has no low-rail monitor: report the commanded level
        hk.temperatureCentiCelsius = (int) Math.round((instrument.model().preamp().temperatureK() - ZERO_CELSIUS_K) * 100);
    }
}
