package dev.sweepline.ground.product;

import dev.sweepline.ground.fit.PlasmaFit;
import dev.sweepline.ground.fit.SpeciesMoments;
import java.io.IOException;
import java.io.Writer;
import java.util.ArrayList;
import java.util.List;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;

/**
 * Writes moments.csv: one row per spectrum (fitted or not). Units: cm⁻³, km/s, K, degrees. A value
 * that is not available (failed fit, alphas or angles not fitted, singular bound) is an empty cell, never
 * NaN or Infinity. {@code flags} lists the fit flags separated by '|'.
 *
 * <p>The values come in the order of the fit's parameters (protons, angles, alphas, then the speed drift),
 * their 1σ {@code sigma_*} in the same order, then the Cramér–Rao bounds {@code crlb_*}. {@code du_kms} is
 * ΔU, the bulk speed's change over the sweep of a spectrum flagged interleaved (telemetry ICD §4 flags bit 5;
 * docs/physics.md, "Speed drift within an interleaved sweep"; fit design note F15), with the speeds
 * {@code u_kms} and {@code alpha_u_kms} then at mid-sweep; {@code sigma_du_kms} is its 1σ from the fit
 * covariance with the angles' 1σ propagated, as {@code sigma_u_kms}. Both are empty for a spectrum not fitted
 * with the drift term (monotonic, or the drift refit not kept).
 */
public final class MomentsCsv {
    /** Column names, in order. */
    public static final String[] HEADER = {"time_tai_s", "time_tai", "apid", "instrument", "mode", "sweep", "windows",
        "n_cc", "u_kms", "t_k", "theta_x_deg", "theta_y_deg", "alpha_n_cc", "alpha_u_kms", "alpha_t_k", "du_kms",
        "sigma_n_cc", "sigma_u_kms", "sigma_t_k", "sigma_theta_x_deg", "sigma_theta_y_deg",
        "sigma_alpha_n_cc", "sigma_alpha_u_kms", "sigma_alpha_t_k", "sigma_du_kms",
        "crlb_n_cc", "crlb_u_kms", "crlb_t_k", "crlb_alpha_n_cc", "chi2_reduced", "flags"};

    private MomentsCsv() {
    }

    /** A number, or "" when not finite. */
    static String cell(double v) {
        return Double.isFinite(v) ? Double.toString(v) : "";
    }

    /** Writes all records with a header. */
    public static void write(Writer out, List<MomentRecord> records) throws IOException {
        try (CSVPrinter csv = new CSVPrinter(out, CSVFormat.DEFAULT.builder().setHeader(HEADER).get())) {
            for (MomentRecord r : records) {
                csv.printRecord(row(r));
            }
        }
    }

    private static List<String> row(MomentRecord r) {
        PlasmaFit f = r.fit();
        SpeciesMoments p = f.protons();
        SpeciesMoments a = f.alphas();
        List<String> c = new ArrayList<>();
        c.add(cell(r.taiSeconds()));
        c.add(r.isoTai());
        c.add(String.format("0x%03X", r.apid()));
        c.add(r.instrument());
        c.add(r.mode());
        c.add(Integer.toString(r.sweep()));
        c.add(Integer.toString(f.windowsUsed()));
        c.add(cell(r.densityPerCc()));
        c.add(cell(r.speedKmPerS()));
        c.add(cell(r.temperatureK()));
        c.add(cell(r.thetaXDeg()));
        c.add(cell(r.thetaYDeg()));
        c.add(cell(a.densityPerM3() * 1e-6));
        c.add(cell(a.speedMPerS() * 1e-3));
        c.add(cell(a.temperatureK()));
        c.add(cell(r.speedChangeKmPerS()));
        c.add(cell(p.sigmaDensityPerM3() * 1e-6));
        c.add(cell(p.sigmaSpeedMPerS() * 1e-3));
        c.add(cell(p.sigmaTemperatureK()));
        c.add(cell(Math.toDegrees(f.angles().sigmaThetaXRad())));
        c.add(cell(Math.toDegrees(f.angles().sigmaThetaYRad())));
        c.add(cell(a.sigmaDensityPerM3() * 1e-6));
        c.add(cell(a.sigmaSpeedMPerS() * 1e-3));
        c.add(cell(a.sigmaTemperatureK()));
        c.add(cell(r.sigmaSpeedChangeKmPerS()));
        c.add(cell(r.crlbDensityPerCc()));
        c.add(cell(r.crlbSpeedKmPerS()));
        c.add(cell(r.crlbTemperatureK()));
        c.add(cell(r.crlbAlphaDensityPerCc()));
        c.add(cell(f.reducedChiSquare()));
        c.add(f.flagText());
        return c;
    }
}
