package dev.sweepline.ground.product;

import dev.sweepline.ground.bound.CramerRaoBound;
import dev.sweepline.ground.bound.FisherMatrix;
import dev.sweepline.ground.decode.DecodeListener;
import dev.sweepline.ground.fit.FitFlag;
import dev.sweepline.ground.fit.PlasmaFit;
import dev.sweepline.ground.fit.PlasmaModel;
import dev.sweepline.ground.fit.SpectrumFitter;
import dev.sweepline.ground.fit.SpectrumInput;
import dev.sweepline.ground.plot.SpectrogramData;
import dev.sweepline.ground.spectrum.DefaultWindowTable;
import dev.sweepline.ground.spectrum.DecodedSpectrum;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;

/**
 * Fits every decoded spectrum as it arrives, with its Cramér–Rao bound, and keeps what the plots need:
 * one spectrogram row per spectrum and the example spectrum for the fit plot (the latest fitted spectrum
 * with the most windows, survey preferred).
 */
public final class FitCollector implements DecodeListener {
    private final SpectrumFitter fitter = new SpectrumFitter();
    private final List<MomentRecord> records = new ArrayList<>();
    private final List<SpectrogramData.Row> rows = new ArrayList<>();
    private double firstTai = Double.NaN;
    private long fitNanos;
    private SpectrumInput exampleInput;
    private PlasmaFit exampleFit;
    private String exampleTitle = "";
    private int exampleScore = -1;

    @Override
    public void onSpectrum(DecodedSpectrum s) {
        long t0 = System.nanoTime();
        SpectrumInput in = SpectrumInput.of(s);
        PlasmaFit fit = fitter.fit(in);
        CramerRaoBound bound = null;
        if (fit.ok()) {
            PlasmaModel m = new PlasmaModel(in.lowVolts(), in.highVolts(), fit.areaM2(), fit.alphasFitted());
            bound = FisherMatrix.bound(m, fit.normalParameters(), in.sigmaAmps());
            if (bound.singular()) {
                fit = fit.withFlag(FitFlag.SINGULAR_BOUND);
            }
        }
        fitNanos += System.nanoTime() - t0;
        double tai = s.time().taiSeconds();
        if (Double.isNaN(firstTai)) {
            firstTai = tai;
        }
        records.add(new MomentRecord(tai, s.time().isoTai(), s.apid(), s.modeName(), s.sweep(), fit, bound));
        rows.add(onDefaultGrid(s, tai - firstTai));
        int score = fit.ok() ? in.windows() * 2 + (s.mode() == DecodedSpectrum.MODE_SURVEY ? 1000 : 0) : -1;
        if (score >= exampleScore && score >= 0) {
            exampleScore = score;
            exampleInput = in;
            exampleFit = fit;
            exampleTitle = s.modeName() + " sweep " + s.sweep() + " at " + s.time().isoTai() + " TAI";
        }
    }

    /**
     * The spectrum's currents on the default table's E/q windows, so that one spectrogram can hold
     * spectra of uplinked tables too: each window's current goes to the default window holding its
     * geometric centre (several currents to one window are summed; saturated windows stay NaN).
     */
    static SpectrogramData.Row onDefaultGrid(DecodedSpectrum s, double seconds) {
        if (s.tableId() == DefaultWindowTable.TABLE_ID) {
            double[] amps = s.totalAmps().clone();
            for (int i = 0; i < amps.length; i++) {
                amps[i] = s.saturated()[i] ? Double.NaN : amps[i];
            }
            return new SpectrogramData.Row(seconds, s.firstWindow(), amps);
        }
        double[] amps = new double[DefaultWindowTable.WINDOWS];
        java.util.Arrays.fill(amps, Double.NaN);
        for (int i = 0; i < s.windowCount(); i++) {
            double centre = Math.sqrt(s.lowVolts()[i] * s.highVolts()[i]);
            int w = DefaultWindowTable.windowOf(centre);
            if (w < 0) {
                continue;
            }
            double a = s.saturated()[i] ? Double.NaN : s.totalAmps()[i];
            amps[w] = Double.isNaN(amps[w]) ? a : amps[w] + a;
        }
        return new SpectrogramData.Row(seconds, 0, amps);
    }

    /** The records so far, in stream order. */
    public List<MomentRecord> records() {
        return Collections.unmodifiableList(records);
    }

    /** Spectrogram rows so far. */
    public SpectrogramData spectrogram() {
        return new SpectrogramData(Collections.unmodifiableList(rows));
    }

    /** Seconds spent fitting and bounding. */
    public double fitSeconds() {
        return fitNanos * 1e-9;
    }

    /** Example spectrum input, or null when no spectrum was fitted. */
    public SpectrumInput exampleInput() {
        return exampleInput;
    }

    /** Its fit. */
    public PlasmaFit exampleFit() {
        return exampleFit;
    }

    /** Its title. */
    public String exampleTitle() {
        return exampleTitle;
    }
}
