package dev.sweepline.ground.product;

import dev.sweepline.ground.decode.FrameStreamBuilder;
import dev.sweepline.ground.decode.TestPackets;
import dev.sweepline.ground.fit.CupGeometry;
import dev.sweepline.ground.fit.NoiseModel;
import dev.sweepline.ground.fit.PlasmaModel;
import dev.sweepline.ground.fit.Species;
import dev.sweepline.ground.spectrum.DefaultWindowTable;
import java.util.Random;

/**
 * A telemetry stream (ICD §1–§4, 1024-octet frames) of survey spectra of the near-Sun plasma of physics.md
 * (n 3600 cm⁻³, U 300 km/s, T_p 6e5 K, He/H 3 %, T_α 4 T_p, θx 3°), ADC counts from the window model
 * with the ICD §8 noise and gain ranges, and, after them, the degenerate spectra the fit must flag: all
 * zero, all saturated, one window. Seeded.
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

    private SyntheticTelemetry() {
    }

    static byte[] stream(long seed) {
        Random rng = new Random(seed);
        FrameStreamBuilder b = new FrameStreamBuilder(1024);
        int c = DefaultWindowTable.WINDOWS;
        double[] lo = new double[c];
        double[] hi = new double[c];
        for (int w = 0; w < c; w++) {
            lo[w] = DefaultWindowTable.lowVolts(w);
            hi[w] = DefaultWindowTable.highVolts(w);
        }
        double tx = Math.tan(Math.toRadians(THETA_X_DEG));
        double cos = CupGeometry.cosOfFlow(tx, 0);
        double[] total = new double[c];
        new PlasmaModel(lo, hi, CupGeometry.EFFECTIVE_AREA_M2, true).evaluate(new double[] {N_P, U * cos,
            Species.PROTON.thermalSpeed(T_P), 0.03 * N_P, U * cos, Species.ALPHA.thermalSpeed(4 * T_P)}, total, null);
        double[] share = new double[4];
        CupGeometry.quadrantShares(tx, 0, share);
        int seq = 0;
        for (int s = 0; s < GOOD_SPECTRA; s++) {
            int[] gains = new int[c];
            int[][] adc = new int[4][c];
            for (int w = 0; w < c; w++) {
                double max = total[w] * Math.max(share[0], share[1]);
                gains[w] = max * 1.25 < NoiseModel.fullScaleAmps(0) ? 0 : max * 1.25 < NoiseModel.fullScaleAmps(1) ? 1 : 2;
                for (int q = 0; q < 4; q++) {
                    double i = total[w] * share[q];
                    double sd = Math.sqrt(NoiseModel.quadrantVariance(i, gains[w], PERIODS));
                    double lsb = NoiseModel.fullScaleAmps(gains[w]) / NoiseModel.ADC_SPAN_COUNTS;
                    adc[q][w] = (int) Math.max(0, Math.min(65535, Math.round((i + sd * rng.nextGaussian()) / lsb) + 256));
                }
            }
            b.add(0, TestPackets.spectrum(0x100, seq++, T0 + 10L * s, 0, s, 0, gains, new boolean[c], adc));
            b.add(1, TestPackets.housekeeping(s, T0 + 10L * s, 0));
        }
        // all zero: every sample at the pedestal
        int[][] zero = new int[4][c];
        for (int[] q : zero) {
            java.util.Arrays.fill(q, 256);
        }
        b.add(0, TestPackets.spectrum(0x100, seq++, T0 + 10L * GOOD_SPECTRA, 0, 100, 0, new int[c], new boolean[c], zero));
        // all saturated: every window flagged, samples at the ADC top
        int[][] top = new int[4][c];
        for (int[] q : top) {
            java.util.Arrays.fill(q, 65535);
        }
        boolean[] sat = new boolean[c];
        java.util.Arrays.fill(sat, true);
        b.add(0, TestPackets.spectrum(0x100, seq++, T0 + 10L * GOOD_SPECTRA + 1, 0, 101, 0, new int[c], sat, top));
        // one window, at the proton peak
        b.add(0, TestPackets.spectrum(0x100, seq, T0 + 10L * GOOD_SPECTRA + 2, 0, 102, 48, new int[1],
                new boolean[1], new int[][] {{30000}, {30000}, {30000}, {30000}}));
        b.flush(1).flush(0);
        return b.stream();
    }
}
