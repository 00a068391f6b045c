package dev.sweepline.sim.bench;

import dev.sweepline.fsw.sweep.SweepMode;
import dev.sweepline.ground.decode.DecoderConfig;
import dev.sweepline.ground.decode.TelemetryDecoder;
import dev.sweepline.ground.product.FitCollector;
import dev.sweepline.ground.product.MomentRecord;
import dev.sweepline.ground.spectrum.Ccsds121QuadrantDecoder;
import dev.sweepline.ground.spectrum.WindowCatalogue;
import dev.sweepline.sim.plasma.PlasmaState;
import dev.sweepline.sim.design.ProtonInformation;
import java.util.ArrayList;
import java.util.List;
import java.util.TreeMap;

/**
 * The ground's focus fits of a closed-loop run with the truth of the speed over each sweep, for the drift fit
 * of interleaved spectra (docs/focus-design.md, "A drift-aware fit of interleaved spectra"): the decoder and
 * {@link FitCollector} of {@link GroundCheck}, read record by record.
 */
final class DriftFits {
    /**
     * One focus fit.
     *
     * @param driftFitted     the ground fitted ΔU (the packet was flagged interleaved)
     * @param speedChange     the fitted change of |U| over the sweep, km/s (ΔU_n / cos θ); NaN without ΔU
     * @param sigmaChange     its Cramér–Rao bound with the other parameters unknown, km/s; NaN without ΔU
     * @param trueChange      the truth's change of |U| from the first step's middle to the last's, km/s
     * @param speedError      fitted − true |U| at mid-sweep, km/s
     * @param sigmaSpeed      the bound of |U|, km/s
     * @param curvature       the truth's (U(start) + U(end)) / 2 − U(middle) over the same span, km/s
     * @param reducedChiSquare the fit's χ²/ν
     */
    record Fit(boolean driftFitted, double speedChange, double sigmaChange, double trueChange, double speedError,
            double sigmaSpeed, double curvature, double reducedChiSquare) {
    }

    private DriftFits() {
    }

    /** The focus fits of {@code config}'s run that have moments and a recorded sweep. */
    static List<Fit> of(BenchConfig config) {
        FitCollector fits = new FitCollector();
        TelemetryDecoder decoder = new TelemetryDecoder(DecoderConfig.icdDefaults()
                .withInstruments(GroundInstruments.of(config.instrument().spec())), new Ccsds121QuadrantDecoder(),
                new WindowCatalogue(), fits);
        ClosedLoopBench.Result r = ClosedLoopBench.run(config, ClosedLoopBench.Progress.NONE,
                ClosedLoopBench.Hooks.NONE.withFrames(decoder::accept));
        decoder.finish();
        TreeMap<Long, SweepRecord> byStart = GroundCheck.byStart(r.recorder().sweeps());
        List<Fit> out = new ArrayList<>();
        for (MomentRecord m : fits.records()) {
            if (!m.ok()) {
                continue;
            }
            SweepRecord s = GroundCheck.sweepAt(byStart, m.taiSeconds(), config.flight().coarseTimeAtTickZero);
            if (s == null || s.mode() != SweepMode.FOCUS) {
                continue;
            }
            // τ = 0 and 1 are the first and last steps' middles: half a step in from the sweep's ends
            int windows = s.lastWindow() - s.firstWindow() + 1;
            double step = (double) (s.endMicros() - s.startMicros()) / windows;
            long first = s.startMicros() + Math.round(step / 2);
            long last = s.endMicros() - Math.round(step / 2);
            double u0 = speed(r.recorder().truthAt(first));
            double u1 = speed(r.recorder().truthAt(last));
            double mid = speed(r.recorder().truthAt(s.midMicros()));
            double[] p = m.fit().normalParameters();
            double sec = m.speedKmPerS() * 1e3 / p[1];
            boolean drift = m.fit().driftFitted();
            double change = m.speedChangeKmPerS(); // moments.csv du_kms: NaN unless drift-fitted
            double sigmaChange = drift && m.bound() != null ? m.bound().sigma()[p.length - 1] * sec / 1e3 : Double.NaN;
            out.add(new Fit(drift, change, sigmaChange, u1 - u0, m.speedKmPerS() - mid, m.crlbSpeedKmPerS(),
                    (u0 + u1) / 2 - mid, m.fit().reducedChiSquare()));
        }
        return out;
    }

    /** |U| of the protons, km/s. */
    private static double speed(PlasmaState plasma) {
        return GroundCheck.truth(plasma, ProtonInformation.protons(plasma))[1];
    }
}
