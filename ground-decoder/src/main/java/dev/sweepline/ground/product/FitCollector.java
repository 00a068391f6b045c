package dev.sweepline.ground.product;

import dev.sweepline.ground.bound.CramerRaoBound;
import dev.sweepline.ground.bound.FisherMatrix;
import dev.sweepline.ground.decode.DecodeListener;
import dev.sweepline.ground.fit.DensityPrior;
import dev.sweepline.ground.fit.FitFlag;
import dev.sweepline.ground.fit.ModelCache;
import dev.sweepline.ground.fit.PlasmaFit;
import dev.sweepline.ground.fit.PlasmaModel;
import dev.sweepline.ground.fit.SpectrumFitter;
import dev.sweepline.ground.fit.SpectrumInput;
import dev.sweepline.ground.instrument.DefaultWindowTable;
import dev.sweepline.ground.instrument.GroundInstrument;
import dev.sweepline.ground.plot.SpectrogramData;
import dev.sweepline.ground.spectrum.DecodedSpectrum;
import dev.sweepline.ground.spectrum.SpectrumValues;
import dev.sweepline.ground.spectrum.SpectrumView;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Fits every decoded spectrum as it arrives, with its instrument's geometry and noise and its
 * Cramér–Rao bound, and keeps what the plots need: one spectrogram row per spectrum, on the default
 * table of the spectrum's instrument, and the example spectrum for the fit plot (the latest fitted
 * spectrum with the most windows, survey preferred). Spectra arrive in time order; the density of the
 * last fit inside the split's reach is carried to spectra beyond it ({@link DensityPrior}).
 */
public final class FitCollector implements DecodeListener {
    private final Map<Integer, SpectrumFitter> fitters = new LinkedHashMap<>();
    private final Map<Integer, Spectrogram> spectrograms = new LinkedHashMap<>();
    private final List<MomentRecord> records = new ArrayList<>();
    /** The models of the bounds: a band repeats sweep after sweep. */
    private final ModelCache boundModels = new ModelCache();
    /** Per instrument, the last fit whose angle the split measured: the density carried beyond the reach. */
    private final Map<Integer, MomentRecord> lastInReach = new LinkedHashMap<>();
    private double firstTai = Double.NaN;
    private long fitNanos;
    private SpectrumInput exampleInput;
    private PlasmaFit exampleFit;
    private GroundInstrument exampleInstrument;
    private String exampleTitle = "";
    private int exampleScore = -1;

    /** The rows of one instrument's spectrogram. */
    private record Spectrogram(GroundInstrument instrument, List<SpectrogramData.Row> rows) {
    }

    @Override
    public void onSpectrum(DecodedSpectrum s) {
        collect(s);
    }

    /** The decoder's view, read in place: the same records and rows as its owned copy, without the copy. */
    @Override
    public void onSpectrumView(SpectrumView view) {
        collect(view);
    }

    private void collect(SpectrumValues s) {
        long t0 = System.nanoTime();
        GroundInstrument instrument = s.instrument();
        SpectrumInput in = SpectrumInput.of(s);
        double tai = s.time().taiSeconds();
        PlasmaFit fit = fitters.computeIfAbsent(instrument.id(), id -> new SpectrumFitter(instrument))
                .fit(in, carried(instrument.id(), tai));
        CramerRaoBound bound = null;
        if (fit.ok()) {
            // an interleaved spectrum's drift fit: the bound of the speeds with ΔU unknown (its model's last parameter)
            PlasmaModel m = boundModels.model(in.lowVolts(), in.highVolts(), fit.areaM2(), fit.alphasFitted(),
                    fit.driftFitted() ? in.stepFraction() : null);
            bound = FisherMatrix.bound(m, fit.normalParameters(), in.sigmaAmps(), fit.alphaPrior());
            if (bound.singular()) {
                fit = fit.withFlag(FitFlag.SINGULAR_BOUND);
            }
        }
        fitNanos += System.nanoTime() - t0;
        if (Double.isNaN(firstTai)) {
            firstTai = tai;
        }
        MomentRecord record = new MomentRecord(tai, s.time().isoTai(), s.apid(), s.modeName(), s.sweep(), fit, bound,
                instrument.name());
        records.add(record);
        if (fit.ok() && fit.angles().measured() && !fit.flags().contains(FitFlag.BEYOND_SPLIT_REACH)) {
            lastInReach.put(instrument.id(), record);
        }
        spectrograms.computeIfAbsent(instrument.id(), id -> new Spectrogram(instrument, new ArrayList<>())).rows()
                .add(onDefaultGrid(s, tai - firstTai));
        int score = fit.ok() ? in.windows() * 2 + (s.mode() == DecodedSpectrum.MODE_SURVEY ? 1000 : 0) : -1;
        if (score >= exampleScore && score >= 0) {
            exampleScore = score;
            exampleInput = in;
            exampleFit = fit;
            exampleInstrument = instrument;
            exampleTitle = instrument.name() + " " + s.modeName() + " sweep " + s.sweep() + " at " + s.time().isoTai()
                    + " TAI";
        }
    }

    /** The density of instrument {@code id}'s last fit inside the reach, aged to {@code tai}; null for none. */
    private DensityPrior carried(int id, double tai) {
        MomentRecord r = lastInReach.get(id);
        return r == null ? null : DensityPrior.carried(r.fit().protons().densityPerM3(),
                r.fit().protons().sigmaDensityPerM3(), tai - r.taiSeconds());
    }

    /**
     * The spectrum's currents on its instrument's default-table E/q windows, so that one spectrogram can
     * hold spectra of uplinked tables too: each window's current goes to the default window holding its
     * geometric centre (several currents to one window are summed; saturated windows stay NaN).
     */
    static SpectrogramData.Row onDefaultGrid(SpectrumValues s, double seconds) {
        if (s.tableId() == DefaultWindowTable.TABLE_ID) {
            double[] amps = new double[s.windowCount()];
            for (int i = 0; i < amps.length; i++) {
                amps[i] = s.saturated(i) ? Double.NaN : s.totalAmps(i);
            }
            return new SpectrogramData.Row(seconds, s.firstWindow(), amps);
        }
        DefaultWindowTable table = s.instrument().windows();
        double[] amps = new double[table.windows()];
        Arrays.fill(amps, Double.NaN);
        for (int i = 0; i < s.windowCount(); i++) {
            double centre = Math.sqrt(s.lowVolts(i) * s.highVolts(i));
            int w = table.windowOf(centre);
            if (w < 0) {
                continue;
            }
            double a = s.saturated(i) ? Double.NaN : s.totalAmps(i);
            amps[w] = Double.isNaN(amps[w]) ? a : amps[w] + a;
        }
        return new SpectrogramData.Row(seconds, 0, amps);
    }

    /** The records so far, in stream order. */
    public List<MomentRecord> records() {
        return Collections.unmodifiableList(records);
    }

    /**
     * The instrument of the spectrogram: the one with the most spectra (the first seen of a tie), or
     * null before the first spectrum.
     */
    public GroundInstrument spectrogramInstrument() {
        Spectrogram best = null;
        for (Spectrogram g : spectrograms.values()) {
            if (best == null || g.rows().size() > best.rows().size()) {
                best = g;
            }
        }
        return best == null ? null : best.instrument();
    }

    /** Spectrogram rows so far of {@link #spectrogramInstrument()} (none before the first spectrum). */
    public SpectrogramData spectrogram() {
        GroundInstrument i = spectrogramInstrument();
        return new SpectrogramData(i == null ? List.of()
                : Collections.unmodifiableList(spectrograms.get(i.id()).rows()));
    }

    /** Spectra of instruments other than {@link #spectrogramInstrument()}, which its spectrogram leaves out. */
    public int spectraNotInSpectrogram() {
        return records.size() - spectrogram().rows().size();
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

    /** Its instrument, or null when no spectrum was fitted. */
    public GroundInstrument exampleInstrument() {
        return exampleInstrument;
    }

    /** Its title. */
    public String exampleTitle() {
        return exampleTitle;
    }
}
