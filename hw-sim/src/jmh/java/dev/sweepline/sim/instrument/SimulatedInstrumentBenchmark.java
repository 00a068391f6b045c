package dev.sweepline.sim.instrument;

import dev.sweepline.fsw.link.SampleReply;
import dev.sweepline.fsw.link.StepCommand;
import dev.sweepline.sim.plasma.IonPopulation;
import dev.sweepline.sim.plasma.IonSpecies;
import dev.sweepline.sim.plasma.PlasmaState;
import dev.sweepline.sim.plasma.ReusablePlasma;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.TearDown;
import org.openjdk.jmh.annotations.Warmup;

/**
 * Cost of one simulated step: a survey of 128 log-spaced windows over a proton + alpha wind flowing
 * 4 deg and 2 deg off the normal (two populations, so the split collector's cache hits on the second);
 * and the same survey with the flow direction turning a little from step to step, as the scenarios'
 * fluctuations turn it in a closed-loop run, so that the collector computes both populations every step.
 * Run: {@code mvn -q -pl hw-sim -am -Pjmh verify -DskipTests -Djmh.includes=SimulatedInstrumentBenchmark
 * -Djmh.args="-f 1 -wi 3 -i 5 -prof gc"}. Each step's reply and truth are checked; an iteration in which
 * no window saw the wind fails.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.NANOSECONDS)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
public class SimulatedInstrumentBenchmark {
    private final StepCommand[] survey = new StepCommand[128];
    private final SampleReply reply = new SampleReply();
    private final StepTruth truth = new StepTruth();
    private SimulatedInstrument instrument;
    private PlasmaState plasma;
    private final ReusablePlasma turning = new ReusablePlasma();
    private int next;
    private long nowMicros;
    private double peakTruthAmps;

    @Setup
    public void setUp() {
        instrument = new SimulatedInstrument(TestInstruments.DEMO_CUP, 1234L);
        double vx = 400e3 * Math.sin(Math.toRadians(4));
        double vy = 400e3 * Math.sin(Math.toRadians(2));
        double vz = Math.sqrt(400e3 * 400e3 - vx * vx - vy * vy);
        plasma = new PlasmaState(List.of(
                new IonPopulation(IonSpecies.PROTON, 5e6, vx, vy, vz, 45e3, 38e3),
                IonPopulation.isotropic(IonSpecies.ALPHA, 0.2e6, vx, vy, vz, 40.77e3)), 0.3, 0.2, 0.93);
        for (int i = 0; i < survey.length; i++) {
            StepCommand c = new StepCommand();
            c.sequence = i;
            c.window = i;
            c.dacLow = (int) Math.round(500 * Math.pow(120, i / 128.0));
            c.dacHigh = (int) Math.round(500 * Math.pow(120, (i + 1) / 128.0));
            c.gainRange = 0;
            c.settleMicros = 500;
            c.integrationPeriods = 10;
            c.hvEnabled = true;
            survey[i] = c;
        }
    }

    /** One step of the survey, checked ({@link #check}). */
    @Benchmark
    public int executeStep() {
        StepCommand c = survey[next];
        next = (next + 1) & 127;
        nowMicros = instrument.execute(c, nowMicros, plasma, reply, truth);
        check(c);
        peakTruthAmps = Math.max(peakTruthAmps, truth.totalAmps);
        return reply.quadrant[0] + reply.quadrant[3];
    }

    /**
     * One step of the survey in a wind whose direction goes round a circle of 0.3 deg about 4 deg and 2 deg
     * off the normal once every 360 simulated seconds (so it differs at every step), the alphas drifting
     * 30 km/s along the field; checked ({@link #check}).
     */
    @Benchmark
    public int executeStepTurningFlow() {
        StepCommand c = survey[next];
        next = (next + 1) & 127;
        double turn = Math.toRadians(nowMicros % 360_000_000L / 1e6);
        double thetaX = Math.toRadians(4 + 0.3 * Math.cos(turn));
        double thetaY = Math.toRadians(2 + 0.3 * Math.sin(turn));
        double vx = 400e3 * Math.sin(thetaX);
        double vy = 400e3 * Math.sin(thetaY);
        double vz = Math.sqrt(400e3 * 400e3 - vx * vx - vy * vy);
        turning.protons(5e6, vx, vy, vz, 45e3, 38e3);
        turning.alphas(0.2e6, vx + 30e3 * 0.3, vy + 30e3 * 0.2, vz + 30e3 * 0.93, 40.77e3, 40.77e3);
        nowMicros = instrument.execute(c, nowMicros, turning.set(true, 0.3, 0.2, 0.93), reply, truth);
        check(c);
        peakTruthAmps = Math.max(peakTruthAmps, truth.totalAmps);
        return reply.quadrant[0] + reply.quadrant[3];
    }

    /** Throws unless the reply answers {@code c} with the HV on and the truth current is a current. */
    void check(StepCommand c) {
        if (reply.sequence != c.sequence || (reply.status & SampleReply.STATUS_HV_OFF) != 0
                || !(truth.totalAmps >= 0) || Double.isInfinite(truth.totalAmps)) {
            throw new IllegalStateException("step " + c.sequence + ": reply " + reply.sequence + " status "
                    + reply.status + ", truth " + truth.totalAmps + " A");
        }
    }

    /** Fails the run if no window of the survey saw the wind (its proton peak carries about 1e-10 A). */
    @TearDown(Level.Iteration)
    public void sawTheWind() {
        if (!(peakTruthAmps > 1e-12)) {
            throw new IllegalStateException("largest truth current of the survey " + peakTruthAmps + " A");
        }
    }
}
