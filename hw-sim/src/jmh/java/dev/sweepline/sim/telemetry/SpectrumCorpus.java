package dev.sweepline.sim.telemetry;

import dev.sweepline.sim.instrument.TestInstruments;
import dev.sweepline.sim.instrument.InstrumentModel;
import dev.sweepline.fsw.exec.FlightConfig;
import dev.sweepline.sim.interop.FlightLoop;
import dev.sweepline.sim.interop.RecordedSpectrum;
import dev.sweepline.sim.scenario.ScenarioLoader;
import java.util.ArrayList;
import java.util.List;

/**
 * Simulated preamplifier spectra for the compression study: every spectrum the flight software completed
 * in closed-loop runs of built-in scenarios (survey and focus sweeps as they really alternate), each as its
 * four quadrant streams of 16-bit ADC samples, and as the big-endian octets the raw packet would carry
 * (telemetry ICD §4 compression 0x00: quadrant 1..4, each c samples).
 */
public final class SpectrumCorpus {
    /** The scenarios of the study: quiet near-Sun wind, fast wind, a shock and its sheath. */
    public static final List<String> SCENARIOS = List.of("quiet-perihelion", "fast-wind", "shock-sheath");
    /** Recorded seed of every run (scenario fluctuations and instrument noise). */
    public static final long SEED = 20261201L;

    private final List<String> scenarioOf = new ArrayList<>();
    private final List<int[][]> quadrants = new ArrayList<>();
    private final List<byte[]> raw = new ArrayList<>();

    private SpectrumCorpus() {
    }

    /** Runs each scenario of {@link #SCENARIOS} for its whole duration and keeps every spectrum. */
    public static SpectrumCorpus simulate() {
        return simulate(Double.POSITIVE_INFINITY);
    }

    /** Runs each scenario for its duration or {@code maxSeconds}, whichever is shorter (a small corpus for tests). */
    public static SpectrumCorpus simulate(double maxSeconds) {
        SpectrumCorpus corpus = new SpectrumCorpus();
        for (String name : SCENARIOS) {
            var scenario = ScenarioLoader.builtIn(name);
            double seconds = Math.min(maxSeconds, scenario.durationSeconds());
            FlightLoop loop = new FlightLoop(scenario, SEED, seconds, FlightConfig.of(TestInstruments.DEMO_CUP.flight()),
                    (f, off, len) -> { }).run();
            for (RecordedSpectrum s : loop.spectra()) {
                corpus.add(name, s.adc());
            }
        }
        return corpus;
    }

    private void add(String scenario, int[][] q) {
        scenarioOf.add(scenario);
        quadrants.add(q);
        int c = q[0].length;
        byte[] b = new byte[q.length * c * 2];
        int p = 0;
        for (int[] stream : q) {
            for (int x : stream) {
                b[p++] = (byte) (x >>> 8);
                b[p++] = (byte) x;
            }
        }
        raw.add(b);
    }

    /** Spectra in the corpus. */
    public int size() {
        return quadrants.size();
    }

    /** Scenario spectrum {@code k} came from. */
    public String scenario(int k) {
        return scenarioOf.get(k);
    }

    /** Quadrant streams of spectrum {@code k}: [quadrant][window entry]. */
    public int[][] quadrants(int k) {
        return quadrants.get(k);
    }

    /** Raw big-endian octets of spectrum {@code k} (2 per sample). */
    public byte[] raw(int k) {
        return raw.get(k);
    }

    /** 16-bit samples in spectrum {@code k}. */
    public int samples(int k) {
        return quadrants.get(k).length * quadrants.get(k)[0].length;
    }

    /** 16-bit samples in the whole corpus. */
    public long samples() {
        long n = 0;
        for (int k = 0; k < size(); k++) {
            n += samples(k);
        }
        return n;
    }
}
