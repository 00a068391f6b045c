package dev.sweepline.sim.bench;

import dev.sweepline.fsw.exec.FlightConfig;
import dev.sweepline.fsw.telemetry.FrameSink;
import dev.sweepline.ground.decode.DecoderConfig;
import dev.sweepline.ground.decode.TelemetryDecoder;
import dev.sweepline.ground.instrument.InstrumentSet;
import dev.sweepline.ground.product.FitCollector;
import dev.sweepline.ground.product.MomentRecord;
import dev.sweepline.ground.spectrum.Ccsds121QuadrantDecoder;
import dev.sweepline.ground.spectrum.WindowCatalogue;
import dev.sweepline.sim.physics.PhysicalConstants;
import dev.sweepline.fsw.sweep.SweepMode;
import dev.sweepline.sim.plasma.IonPopulation;
import dev.sweepline.sim.plasma.IonSpecies;
import dev.sweepline.sim.plasma.PlasmaState;
import dev.sweepline.sim.design.ProtonInformation;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.function.LongFunction;

/**
 * The ground's view of a run, against the truth: the run's frames go, as they are made, through the
 * independent ground decoder and its fitter, and every fitted spectrum is compared with the
 * scenario's protons at the sweep's mid-time. The truth is what the cup can measure: the density, the
 * bulk speed, and the temperature along the cup normal (from the thermal speed along the normal).
 * The truth is taken at the sweep's mid-time: a sweep during which the plasma moves is scored against
 * the plasma at its middle ({@link TruthChange} says how much it moved). Sweeps whose fit is
 * non-stationary ({@link NonStationarity}) are counted, and the errors are given with and without them.
 */
public final class GroundCheck {
    private final FitCollector fits = new FitCollector();
    private final TelemetryDecoder decoder;
    private final long coarseAtTickZero;

    /** A check of a run of {@code flight} that knows the built-in window tables, decoding with {@code instruments}. */
    public GroundCheck(FlightConfig flight, InstrumentSet instruments) {
        this(flight, instruments, new WindowCatalogue());
    }

    /** A check that also knows the uplinked tables of {@code windows}. */
    public GroundCheck(FlightConfig flight, InstrumentSet instruments, WindowCatalogue windows) {
        decoder = new TelemetryDecoder(DecoderConfig.icdDefaults().withInstruments(instruments),
                new Ccsds121QuadrantDecoder(), windows, fits);
        coarseAtTickZero = flight.coarseTimeAtTickZero;
    }

    /** Where the run's frames go. */
    public FrameSink frames() {
        return decoder::accept;
    }

    /** Moment errors against the truth, from the recorded sweeps (call after the run). */
    public GroundFigures compare(List<SweepRecord> sweeps, LongFunction<PlasmaState> truthAt) {
        decoder.finish();
        return compare(fits.records(), sweeps, truthAt, coarseAtTickZero);
    }

    /** Every fit of the run against its truth ({@link #compared(List, List, LongFunction, long)}; call after the run). */
    public List<ComparedFit> compared(List<SweepRecord> sweeps, LongFunction<PlasmaState> truthAt) {
        decoder.finish();
        return compared(fits.records(), sweeps, truthAt, coarseAtTickZero);
    }

    /**
     * Moment errors of {@code records} (the ground's fits, from either the streaming check or the
     * ground's file processing) against the truth of the sweeps they came from.
     */
    public static GroundFigures compare(List<MomentRecord> records, List<SweepRecord> sweeps,
            LongFunction<PlasmaState> truthAt, long coarseAtTickZero) {
        return figures(records.size(), compared(records, sweeps, truthAt, coarseAtTickZero));
    }

    /**
     * One fitted spectrum against the truth of its sweep (at mid-sweep).
     *
     * @param relative       |fit - truth| / truth of n, U, T
     * @param z              (fit - truth) / bound of n, U, T
     * @param flagged        the fit is non-stationary ({@link NonStationarity})
     * @param reducedChiSquare the fit's chi-square / nu
     * @param dof            nu: windows used - fitted parameters
     * @param alphasReported the ground fitted (reported) alphas
     * @param truthHasAlphas the plasma had alphas at mid-sweep
     * @param mode           the sweep's mode
     */
    public record ComparedFit(double[] relative, double[] z, boolean flagged, double reducedChiSquare, int dof,
            boolean alphasReported, boolean truthHasAlphas, SweepMode mode) {
    }

    /** The fits of {@code records} that have moments and a recorded sweep, each against its truth. */
    public static List<ComparedFit> compared(List<MomentRecord> records, List<SweepRecord> sweeps,
            LongFunction<PlasmaState> truthAt, long coarseAtTickZero) {
        TreeMap<Long, SweepRecord> byStart = byStart(sweeps);
        List<ComparedFit> out = new ArrayList<>();
        for (MomentRecord m : records) {
            if (!m.ok()) {
                continue;
            }
            SweepRecord sweep = sweepAt(byStart, m.taiSeconds(), coarseAtTickZero);
            if (sweep == null) {
                out.add(null); // fitted, but no sweep of the run to compare it with
                continue;
            }
            PlasmaState plasma = truthAt.apply(sweep.midMicros());
            IonPopulation p = ProtonInformation.protons(plasma);
            double[] truth = truth(plasma, p);
            double[] fit = {m.densityPerCc(), m.speedKmPerS(), m.temperatureK()};
            double[] bound = {m.crlbDensityPerCc(), m.crlbSpeedKmPerS(), m.crlbTemperatureK()};
            double[] r = new double[3];
            double[] zz = new double[3];
            for (int k = 0; k < 3; k++) {
                r[k] = Math.abs(fit[k] - truth[k]) / truth[k];
                zz[k] = (fit[k] - truth[k]) / bound[k];
            }
            int dof = m.fit().windowsUsed() - m.fit().normalParameters().length;
            double chi2 = m.fit().reducedChiSquare();
            out.add(new ComparedFit(r, zz, NonStationarity.flagged(chi2, dof), chi2, dof, m.fit().alphasFitted(),
                    hasAlphas(plasma), sweep.mode()));
        }
        return out;
    }

    /** The figures of {@code compared} (nulls: fitted spectra without a sweep) out of {@code spectra} decoded. */
    public static GroundFigures figures(int spectra, List<ComparedFit> compared) {
        List<double[]> rel = new ArrayList<>();
        List<double[]> z = new ArrayList<>();
        List<double[]> relStationary = new ArrayList<>();
        List<double[]> zStationary = new ArrayList<>();
        for (ComparedFit c : compared) {
            if (c == null) {
                continue;
            }
            rel.add(c.relative());
            z.add(c.z());
            if (!c.flagged()) {
                relStationary.add(c.relative());
                zStationary.add(c.z());
            }
        }
        MomentErrors all = MomentErrors.of(rel, z);
        MomentErrors stationary = MomentErrors.of(relStationary, zStationary);
        return new GroundFigures(spectra, compared.size(), all.medianRelative(), all.p95Relative(), all.crlbRatio(),
                all.compared(), all.robustCrlbRatio(), rel.size() - relStationary.size(), stationary);
    }

    private static boolean hasAlphas(PlasmaState plasma) {
        for (IonPopulation p : plasma.populations()) {
            if (p.species().equals(IonSpecies.ALPHA) && p.densityPerM3() > 0) {
                return true;
            }
        }
        return false;
    }

    /** The sweeps by start time, microseconds. */
    static TreeMap<Long, SweepRecord> byStart(List<SweepRecord> sweeps) {
        TreeMap<Long, SweepRecord> byStart = new TreeMap<>();
        for (SweepRecord r : sweeps) {
            byStart.put(r.startMicros(), r);
        }
        return byStart;
    }

    /** The sweep a spectrum time-tagged {@code taiSeconds} came from, or null. */
    static SweepRecord sweepAt(TreeMap<Long, SweepRecord> byStart, double taiSeconds, long coarseAtTickZero) {
        long start = Math.round((taiSeconds - coarseAtTickZero) * 1e6);
        Map.Entry<Long, SweepRecord> e = byStart.floorEntry(start + 20); // CUC fine: 2^-16 s, truncated
        return e == null || start - e.getKey() > 100 ? null : e.getValue();
    }

    /** n (cm^-3), |U| (km/s), T along the normal (K) of the protons. */
    static double[] truth(PlasmaState plasma, IonPopulation p) {
        double u = Math.sqrt(p.vxMetresPerSecond() * p.vxMetresPerSecond()
                + p.vyMetresPerSecond() * p.vyMetresPerSecond() + p.vzMetresPerSecond() * p.vzMetresPerSecond());
        double w = plasma.normalThermalSpeed(p);
        double t = p.species().massKg() * w * w / (2 * PhysicalConstants.BOLTZMANN_JOULE_PER_KELVIN);
        return new double[] {p.densityPerM3() / 1e6, u / 1e3, t};
    }

    /**
     * What the ground recovered.
     *
     * @param spectra         spectra the ground decoded
     * @param fitted          of those, fitted without a failure flag
     * @param medianRelative  median relative error of n, U, T
     * @param p95Relative     95th-percentile relative error of n, U, T
     * @param crlbRatio       rms of (fit - truth) / Cramér-Rao bound of n, U, T: 1 is as good as the measurement allows
     * @param compared        fits compared with the truth
     * @param robustCrlbRatio {@link MomentErrors#MAD_SCALE} x median |(fit - truth) / bound| of n, U, T
     * @param nonStationary   compared fits flagged non-stationary ({@link NonStationarity})
     * @param stationary      the errors without the flagged fits
     */
    public record GroundFigures(int spectra, int fitted, double[] medianRelative, double[] p95Relative,
            double[] crlbRatio, int compared, double[] robustCrlbRatio, int nonStationary, MomentErrors stationary) {
        /** Names of the three moments, in order. */
        public static final String[] MOMENTS = {"n", "U", "T"};
    }
}
