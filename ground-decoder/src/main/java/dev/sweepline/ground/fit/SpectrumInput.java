package dev.sweepline.ground.fit;

import dev.sweepline.ground.spectrum.DecodedSpectrum;
import dev.sweepline.ground.spectrum.SpectrumValues;
import java.util.Arrays;

/**
 * The windows of one spectrum that the fit may use: calibrated edges, summed current and its 1σ, and the
 * four quadrant currents with their 1σ (each window's noise for its own integration periods, ICD §4
 * layout 3). Saturated windows and windows without known edges are left out
 * and counted. Arrays are not copied: treat them as read-only.
 *
 * @param lowVolts            low edge per window, volts
 * @param highVolts           high edge per window, volts
 * @param totalAmps           sum of the quadrant currents per window, A
 * @param sigmaAmps           1σ of the sum, A
 * @param quadrantAmps        [q][window] current of quadrant q+1, A; null when unknown
 * @param quadrantSigmaAmps   [q][window] 1σ of each quadrant sample, A; null when unknown
 * @param saturatedDropped    windows left out because a quadrant hit the ADC top
 * @param uncalibratedDropped windows left out because their edges are not known
 * @param stepFraction        per window kept, its place in the sweep's time order, τ = step / (c − 1) ∈ [0, 1]
 *                            (ICD §4, {@link SpectrumValues#stepOrder}), for a spectrum flagged interleaved; null
 *                            otherwise. Equal step spacing is taken: every interleaved step has the same rail
 *                            change of two windows (docs/physics.md, "Speed drift within an interleaved sweep")
 */
public record SpectrumInput(double[] lowVolts, double[] highVolts, double[] totalAmps, double[] sigmaAmps,
        double[][] quadrantAmps, double[][] quadrantSigmaAmps, int saturatedDropped, int uncalibratedDropped,
        double[] stepFraction) {

    /** A spectrum whose time order is not used (not interleaved): {@code stepFraction} null. */
    public SpectrumInput(double[] lowVolts, double[] highVolts, double[] totalAmps, double[] sigmaAmps,
            double[][] quadrantAmps, double[][] quadrantSigmaAmps, int saturatedDropped, int uncalibratedDropped) {
        this(lowVolts, highVolts, totalAmps, sigmaAmps, quadrantAmps, quadrantSigmaAmps, saturatedDropped,
                uncalibratedDropped, null);
    }

    /** True when the windows' time order is known and interleaved: the fit adds the speed drift ΔU. */
    public boolean interleaved() {
        return stepFraction != null;
    }

    /** The same windows read at the sweep fractions {@code tau} (one per window kept; null: not interleaved). */
    public SpectrumInput withStepFraction(double[] tau) {
        return new SpectrumInput(lowVolts, highVolts, totalAmps, sigmaAmps, quadrantAmps, quadrantSigmaAmps,
                saturatedDropped, uncalibratedDropped, tau);
    }

    /** Windows kept. */
    public int windows() {
        return totalAmps.length;
    }

    /** True when per-quadrant currents are present. */
    public boolean hasQuadrants() {
        return quadrantAmps != null;
    }

    /** A spectrum without quadrants and with the same 1σ in every window (for bounds and tests). */
    public static SpectrumInput summed(double[] lowVolts, double[] highVolts, double[] totalAmps, double sigmaAmps) {
        double[] s = new double[totalAmps.length];
        Arrays.fill(s, sigmaAmps);
        return new SpectrumInput(lowVolts, highVolts, totalAmps, s, null, null, 0, 0);
    }

    /**
     * The usable windows of a spectrum (an owned {@link dev.sweepline.ground.spectrum.DecodedSpectrum} or the
     * decoder's view, read in place), with its instrument's noise model (ICD §8) for the weights.
     */
    public static SpectrumInput of(SpectrumValues s) {
        NoiseModel noise = new NoiseModel(s.instrument());
        int c = s.windowCount();
        int keep = 0;
        int saturated = 0;
        int uncalibrated = 0;
        for (int i = 0; i < c; i++) {
            if (s.saturated(i)) {
                saturated++;
            } else if (!Double.isFinite(s.lowVolts(i)) || !Double.isFinite(s.highVolts(i))) {
                uncalibrated++;
            } else {
                keep++;
            }
        }
        double[] lo = new double[keep];
        double[] hi = new double[keep];
        double[] tot = new double[keep];
        double[] sig = new double[keep];
        double[][] qa = new double[DecodedSpectrum.QUADRANTS][keep];
        double[][] qs = new double[DecodedSpectrum.QUADRANTS][keep];
        double[] tau = s.interleaved() && c > 1 ? new double[keep] : null;
        int k = 0;
        for (int i = 0; i < c; i++) {
            if (s.saturated(i) || !Double.isFinite(s.lowVolts(i)) || !Double.isFinite(s.highVolts(i))) {
                continue;
            }
            lo[k] = s.lowVolts(i);
            hi[k] = s.highVolts(i);
            double var = 0;
            int range = s.gainRange(i);
            double bandwidthHz = noise.bandwidthHz(s.integrationPeriods(i));
            double thermal = noise.thermalVariance(range, bandwidthHz);
            double quantisation = noise.quantisationVariance(range);
            for (int q = 0; q < DecodedSpectrum.QUADRANTS; q++) {
                double a = s.currentAmps(q, i);
                double v = noise.quadrantVariance(a, bandwidthHz, thermal, quantisation);
                qa[q][k] = a;
                qs[q][k] = Math.sqrt(v);
                tot[k] += a;
                var += v;
            }
            sig[k] = Math.sqrt(var);
            if (tau != null) {
                tau[k] = s.stepOrder(i) / (double) (c - 1);
            }
            k++;
        }
        return new SpectrumInput(lo, hi, tot, sig, qa, qs, saturated, uncalibrated, tau);
    }
}
