package dev.sweepline.ground.product;

import dev.sweepline.ground.decode.FrameStreamBuilder;
import dev.sweepline.ground.decode.TestPackets;
import dev.sweepline.ground.fit.CupGeometry;
import dev.sweepline.ground.fit.NoiseModel;
import dev.sweepline.ground.fit.PlasmaModel;
import dev.sweepline.ground.fit.Species;
import dev.sweepline.ground.instrument.BuiltInInstruments;
import dev.sweepline.ground.instrument.DefaultWindowTable;
import dev.sweepline.ground.instrument.GroundInstrument;
import java.util.Arrays;
import java.util.Random;

/**
 * A telemetry stream (ICD §1–§4, 1024-octet frames) of survey spectra of the near-Sun plasma of physics.md
 * (n 3600 cm⁻³, U 300 km/s, T_p 6e5 K, He/H 3 %, T_α 4 T_p, θx 3°) over every window of an instrument's
 * default table, ADC counts from the window model with the instrument's geometry, ICD §8 noise, gain
 * ranges and ADC, and, after them, the degenerate spectra the fit must flag: all zero, all saturated,
 * one window. The demo cup's stream is layout 1 (as recorded telemetry has it), any other instrument's
 * layout 2 with its id and sample width. Seeded.
 */
final class SyntheticTelemetry {
    static final long T0 = 0x87A1_2340L;
    static final double N_P = 3600e6;
    static final double U = 300e3;
    static final double T_P = 6e5;
    static final double THETA_X_DEG = 3;
    static final int GOOD_SPECTRA = 12;
    static final int DEGENERATE_SPECTRA = 3;
    static final int PERIODS = 4; // TestPackets.spectrum writes 4 integration periods

    private final GroundInstrument instrument;
    private final FrameStreamBuilder b = new FrameStreamBuilder(1024);
    private int seq;

    private SyntheticTelemetry(GroundInstrument instrument) {
        this.instrument = instrument;
    }

    /** The demo cup's stream, layout 1. */
    static byte[] stream(long seed) {
        return stream(seed, BuiltInInstruments.demoCup());
    }

    /** {@code instrument}'s stream: layout 1 for the demo cup, else layout 2. */
    static byte[] stream(long seed, GroundInstrument instrument) {
        return new SyntheticTelemetry(instrument).build(new Random(seed));
    }

    private byte[] build(Random rng) {
        DefaultWindowTable table = instrument.windows();
        int c = table.windows();
        double[] lo = new double[c];
        double[] hi = new double[c];
        for (int w = 0; w < c; w++) {
            lo[w] = table.lowVolts(w);
            hi[w] = table.highVolts(w);
        }
        CupGeometry cup = CupGeometry.of(instrument);
        NoiseModel noise = new NoiseModel(instrument);
        double tx = Math.tan(Math.toRadians(THETA_X_DEG));
        double cos = CupGeometry.cosOfFlow(tx, 0);
        double[] total = new double[c];
        new PlasmaModel(lo, hi, cup.effectiveAreaM2(), true).evaluate(new double[] {N_P, U * cos,
            Species.PROTON.thermalSpeed(T_P), 0.03 * N_P, U * cos, Species.ALPHA.thermalSpeed(4 * T_P)}, total, null);
        double[] share = new double[4];
        cup.quadrantShares(tx, 0, share);
        int top = instrument.adc().topCode();
        for (int s = 0; s < GOOD_SPECTRA; s++) {
            int[] gains = new int[c];
            int[][] adc = new int[4][c];
            for (int w = 0; w < c; w++) {
                gains[w] = range(total[w] * Math.max(share[0], share[1]), noise);
                for (int q = 0; q < 4; q++) {
                    double i = total[w] * share[q];
                    double sd = Math.sqrt(noise.quadrantVariance(i, gains[w], PERIODS));
                    long counts = Math.round((i + sd * rng.nextGaussian()) / noise.lsbAmps(gains[w]))
                            + instrument.adc().pedestalCounts();
                    adc[q][w] = (int) Math.max(0, Math.min(top, counts));
                }
            }
            spectrum(T0 + 10L * s, s, 0, gains, new boolean[c], adc);
            b.add(1, TestPackets.housekeeping(s, T0 + 10L * s, 0));
        }
        // all zero: every sample at the pedestal
        int[][] zero = new int[4][c];
        for (int[] q : zero) {
            Arrays.fill(q, instrument.adc().pedestalCounts());
        }
        spectrum(T0 + 10L * GOOD_SPECTRA, 100, 0, new int[c], new boolean[c], zero);
        // all saturated: every window flagged, samples at the ADC top
        int[][] full = new int[4][c];
        for (int[] q : full) {
            Arrays.fill(q, top);
        }
        boolean[] sat = new boolean[c];
        Arrays.fill(sat, true);
        spectrum(T0 + 10L * GOOD_SPECTRA + 1, 101, 0, new int[c], sat, full);
        // one window, at the proton peak's E/q (m U² / 2e, physics.md)
        int peak = table.windowOf(Species.PROTON.voltsAtSpeed(U));
        spectrum(T0 + 10L * GOOD_SPECTRA + 2, 102, peak, new int[1], new boolean[1],
                new int[][] {{30000}, {30000}, {30000}, {30000}});
        b.flush(1).flush(0);
        return b.stream();
    }

    /** The lowest gain range whose full scale exceeds 1.25 × the current (physics.md gain ranging: up above ~80 %). */
    private int range(double amps, NoiseModel noise) {
        int last = instrument.gains().ranges() - 1;
        for (int r = 0; r < last; r++) {
            if (amps * 1.25 < noise.fullScaleAmps(r)) {
                return r;
            }
        }
        return last;
    }

    private void spectrum(long coarse, int sweep, int first, int[] gains, boolean[] sat, int[][] adc) {
        boolean layoutOne = instrument.name().equals(BuiltInInstruments.DEMO_CUP);
        b.add(0, layoutOne ? TestPackets.spectrum(0x100, seq++, coarse, 0, sweep, first, gains, sat, adc)
                : TestPackets.spectrumV2(instrument.id(), instrument.sampleBits(), 0, 0x100, seq++, coarse, 0, sweep,
                        first, gains, sat, adc));
    }
}
