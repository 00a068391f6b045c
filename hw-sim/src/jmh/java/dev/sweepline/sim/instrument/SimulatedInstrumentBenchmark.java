package dev.sweepline.sim.instrument;

import dev.sweepline.fsw.link.SampleReply;
import dev.sweepline.fsw.link.StepCommand;
import dev.sweepline.sim.plasma.IonPopulation;
import dev.sweepline.sim.plasma.IonSpecies;
import dev.sweepline.sim.plasma.PlasmaState;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/**
 * Cost of one simulated step: a survey of 128 log-spaced windows over a proton + alpha wind flowing
 * 4 deg and 2 deg off the normal (two populations, so the split collector's cache hits on the second).
 * Run: {@code mvn -q -pl hw-sim -am -Pjmh verify -DskipTests -Djmh.includes=SimulatedInstrumentBenchmark
 * -Djmh.args="-f 1 -wi 3 -i 5 -prof gc"}.
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
    private int next;
    private long nowMicros;

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

    @Benchmark
    public int executeStep() {
        StepCommand c = survey[next];
        next = (next + 1) & 127;
        nowMicros = instrument.execute(c, nowMicros, plasma, reply, truth);
        return reply.quadrant[0] + reply.quadrant[3];
    }
}
