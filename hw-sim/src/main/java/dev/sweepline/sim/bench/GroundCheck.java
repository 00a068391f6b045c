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
import dev.sweepline.sim.plasma.IonPopulation;
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

    /**
     * Moment errors of {@code records} (the ground's fits, from either the streaming check or the
     * ground's file processing) against the truth of the sweeps they came from.
     */
    public static GroundFigures compare(List<MomentRecord> records, List<SweepRecord> sweeps,
            LongFunction<PlasmaState> truthAt, long coarseAtTickZero) {
        TreeMap<Long, SweepRecord> byStart = byStart(sweeps);
        List<double[]> rel = new ArrayList<>(); // |fit - truth| / truth for n, U, T
        List<double[]> z = new ArrayList<>(); // (fit - truth) / bound for n, U, T
        List<double[]> relStationary = new ArrayList<>();
        List<double[]> zStationary = new ArrayList<>();
        int fitted = 0;
        for (MomentRecord m : records) {
            if (!m.ok()) {
                continue;
            }
            fitted++;
            SweepRecord sweep = sweepAt(byStart, m.taiSeconds(), coarseAtTickZero);
            if (sweep == null) {
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
            rel.add(r);
            z.add(zz);
            int dof = m.fit().windowsUsed() - m.fit().normalParameters().length;
            if (!NonStationarity.flagged(m.fit().reducedChiSquare(), dof)) {
                relStationary.add(r);
                zStationary.add(zz);
            }
        }
        MomentErrors all = MomentErrors.of(rel, z);
        MomentErrors stationary = MomentErrors.of(relStationary, zStationary);
        return new GroundFigures(records.size(), fitted, all.medianRelative(), all.p95Relative(), all.crlbRatio(),
                all.compared(), all.robustCrlbRatio(), rel.size() - relStationary.size(), stationary);
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
