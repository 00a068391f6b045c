package dev.sweepline.ground.product;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.sweepline.ground.fit.FitFlag;
import dev.sweepline.ground.fit.SpeciesMoments;
import java.util.List;

/**
 * Builds moments.json: {@code fits} (spectra, fitted, fitFraction, alphasFitted, byFlag, fitSeconds,
 * spectraPerSecond) and {@code moments} (one object per spectrum in product units; a value that is not
 * available is JSON null, never NaN). The keys name moments.csv's quantities in camel case, in its order
 * ({@link MomentsCsv}): {@code duKmPerS} and {@code sigmaDuKmPerS} are its {@code du_kms} and
 * {@code sigma_du_kms}, the speed's change over an interleaved sweep (ICD §4 flags bit 5) and its 1σ, null
 * unless the spectrum was fitted with the drift term.
 */
public final class MomentsJson {
    private MomentsJson() {
    }

    /** The fits section alone. */
    public static ObjectNode fits(ObjectMapper m, FitSummary s) {
        ObjectNode f = m.createObjectNode();
        f.put("spectra", s.spectra());
        f.put("fitted", s.fitted());
        f.put("fitFraction", s.fitFraction());
        f.put("alphasFitted", s.alphasFitted());
        ObjectNode by = f.putObject("byFlag");
        for (FitFlag flag : FitFlag.values()) {
            by.put(flag.name(), s.byFlag().get(flag));
        }
        f.put("fitSeconds", s.fitSeconds());
        f.put("spectraPerSecond", s.spectraPerSecond());
        return f;
    }

    /** The whole document. */
    public static ObjectNode build(ObjectMapper m, FitSummary s, List<MomentRecord> records) {
        ObjectNode root = m.createObjectNode();
        root.set("fits", fits(m, s));
        ArrayNode a = root.putArray("moments");
        for (MomentRecord r : records) {
            ObjectNode o = a.addObject();
            o.put("timeTaiSeconds", r.taiSeconds());
            o.put("timeTai", r.isoTai());
            o.put("instrument", r.instrument());
            o.put("mode", r.mode());
            o.put("sweep", r.sweep());
            num(o, "nPerCc", r.densityPerCc());
            num(o, "uKmPerS", r.speedKmPerS());
            num(o, "tK", r.temperatureK());
            num(o, "thetaXDeg", r.thetaXDeg());
            num(o, "thetaYDeg", r.thetaYDeg());
            SpeciesMoments p = r.fit().protons();
            SpeciesMoments al = r.fit().alphas();
            num(o, "alphaNPerCc", al.densityPerM3() * 1e-6);
            num(o, "alphaUKmPerS", al.speedMPerS() * 1e-3);
            num(o, "alphaTK", al.temperatureK());
            num(o, "duKmPerS", r.speedChangeKmPerS());
            num(o, "sigmaNPerCc", p.sigmaDensityPerM3() * 1e-6);
            num(o, "sigmaUKmPerS", p.sigmaSpeedMPerS() * 1e-3);
            num(o, "sigmaTK", p.sigmaTemperatureK());
            num(o, "sigmaThetaXDeg", Math.toDegrees(r.fit().angles().sigmaThetaXRad()));
            num(o, "sigmaThetaYDeg", Math.toDegrees(r.fit().angles().sigmaThetaYRad()));
            num(o, "sigmaAlphaNPerCc", al.sigmaDensityPerM3() * 1e-6);
            num(o, "sigmaAlphaUKmPerS", al.sigmaSpeedMPerS() * 1e-3);
            num(o, "sigmaAlphaTK", al.sigmaTemperatureK());
            num(o, "sigmaDuKmPerS", r.sigmaSpeedChangeKmPerS());
            num(o, "crlbNPerCc", r.crlbDensityPerCc());
            num(o, "crlbUKmPerS", r.crlbSpeedKmPerS());
            num(o, "crlbTK", r.crlbTemperatureK());
            num(o, "crlbAlphaNPerCc", r.crlbAlphaDensityPerCc());
            num(o, "chi2Reduced", r.fit().reducedChiSquare());
            o.put("flags", r.fit().flagText());
        }
        return root;
    }

    private static void num(ObjectNode o, String key, double v) {
        if (Double.isFinite(v)) {
            o.put(key, v);
        } else {
            o.putNull(key);
        }
    }
}
