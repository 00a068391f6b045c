package dev.sweepline.sim.instrument;

import dev.sweepline.fsw.instrument.InstrumentDescription;
import dev.sweepline.fsw.link.SampleReply;
import dev.sweepline.fsw.link.StepCommand;
import dev.sweepline.sim.cup.FaradayCup;
import dev.sweepline.sim.hv.HvSupply;
import dev.sweepline.sim.plasma.PlasmaState;
import dev.sweepline.sim.preamp.Preamplifier;
import java.util.SplittableRandom;

/**
 * The simulated electronics: executes one {@link StepCommand} against a plasma and answers with a
 * {@link SampleReply} (hardware ICD), filling a {@link StepTruth} on the side.
 *
 * <p>One step: set the HV supply at the start (or switch it off), wait the settle time, integrate
 * for the commanded number of modulation periods; the window is taken at the rails' actual levels at
 * mid-integration, the quadrant currents come from the cup model, noise and quantisation from the
 * preamplifier in the commanded range (clamped to the ranges that exist, and reported). The HV
 * monitor is read at integration start; if it differs from the commanded high code by more than the
 * model's tolerance the reply carries {@link SampleReply#STATUS_HV_UNSETTLED}. A step of zero
 * periods is given the noise of one period.
 *
 * <p>Faults ({@link #faults()}) alter the reply after it is computed: HV readback offset, ADC
 * saturation, a stuck quadrant, a dead collector, a corrupted sequence number.
 *
 * <p>Determinism: all randomness comes from one {@link SplittableRandom} seeded at construction, so
 * the same seed and the same calls give the same replies. Threading: not thread-safe; one instance
 * per simulated instrument. Allocates nothing per step (measured with JMH -prof gc).
 */
public final class SimulatedInstrument {
    private final InstrumentModel model;
    private final FaradayCup cup;
    private final HvSupply hv;
    private final Preamplifier preamp;
    private final SplittableRandom rng;
    private final InstrumentFaults faults;
    private final int gainRanges;
    private final int modulationPeriodMicros;

    /** An instrument of {@code model}, its noise drawn from a stream seeded with {@code seed}; HV initially off. */
    public SimulatedInstrument(InstrumentModel model, long seed) {
        this.model = model;
        this.cup = new FaradayCup(model.cup());
        this.hv = new HvSupply(model.calibration(), model.hv());
        this.preamp = model.preamp();
        this.rng = new SplittableRandom(seed);
        InstrumentDescription d = model.flight();
        this.faults = new InstrumentFaults(d);
        this.gainRanges = d.gainRanges();
        this.modulationPeriodMicros = d.modulationPeriodMicros();
    }

    /** The injectable faults of this instrument (all off at construction); applied to every later reply. */
    public InstrumentFaults faults() {
        return faults;
    }

    /** The instrument's parameter set. */
    public InstrumentModel model() {
        return model;
    }

    /**
     * Switches the HV off at {@code nowMicros} (the link watchdog, hardware ICD §4.1): the supply's
     * output is crowbarred to 0 V, as for a step with the HV disabled.
     *
     * @return the HV monitor's reading then, noise-free (the noise stream of the steps is not drawn from)
     */
    public int switchHvOff(long nowMicros) {
        hv.disable(nowMicros);
        return hv.calibration().code(hv.highVoltsAt(nowMicros));
    }

    /**
     * Executes one step.
     *
     * @param cmd         the step
     * @param startMicros time the step starts (the HV is commanded then), microseconds
     * @param plasma      the plasma during the step
     * @param reply       receives the sample
     * @param truth       receives what really happened
     * @return the time the step ends, {@code startMicros + cmd.durationMicros()}
     */
    public long execute(StepCommand cmd, long startMicros, PlasmaState plasma, SampleReply reply, StepTruth truth) {
        if (cmd.hvEnabled) {
            hv.command(cmd.dacLow, cmd.dacHigh, startMicros);
        } else {
            hv.disable(startMicros);
        }
        int range = Math.max(0, Math.min(gainRanges - 1, cmd.gainRange));
        long integrationMicros = (long) cmd.integrationPeriods * modulationPeriodMicros;
        long integrationStart = startMicros + Math.max(0, cmd.settleMicros);
        long mid = integrationStart + integrationMicros / 2;
        double low = hv.lowVoltsAt(mid);
        double high = hv.highVoltsAt(mid);
        int monitor = hv.monitorCode(integrationStart, rng);
        boolean unsettled = cmd.hvEnabled && Math.abs(monitor - cmd.dacHigh) > model.hvUnsettledToleranceCodes();

        cup.quadrantCurrents(plasma, low, high, truth.firstPopulation, truth.quadrantAmps);
        double integrationSeconds = Math.max(1, cmd.integrationPeriods) * modulationPeriodMicros * 1e-6;
        preamp.sample(truth.quadrantAmps, range, integrationSeconds, rng, reply.quadrant);
        boolean saturated = false;
        double total = 0;
        for (int q = 0; q < InstrumentDescription.QUADRANTS; q++) {
            saturated |= preamp.isSaturated(reply.quadrant[q]);
            total += truth.quadrantAmps[q];
        }

        reply.sequence = cmd.sequence;
        reply.status = (saturated ? SampleReply.STATUS_SATURATED : 0)
                | (unsettled ? SampleReply.STATUS_HV_UNSETTLED : 0)
                | (cmd.hvEnabled ? 0 : SampleReply.STATUS_HV_OFF);
        reply.hvMonitorCode = monitor;
        reply.gainRange = range;
        if (faults.any()) {
            faults.apply(reply);
        }

        long end = startMicros + cmd.durationMicros(modulationPeriodMicros);
        truth.lowVolts = low;
        truth.highVolts = high;
        truth.totalAmps = total;
        truth.integrationStartMicros = integrationStart;
        truth.endMicros = end;
        truth.saturated = saturated;
        truth.hvUnsettled = unsettled;
        return end;
    }
}
