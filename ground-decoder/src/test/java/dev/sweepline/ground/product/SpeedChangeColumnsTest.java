package dev.sweepline.ground.product;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.sweepline.ground.bound.CramerRaoBound;
import dev.sweepline.ground.bound.FisherMatrix;
import dev.sweepline.ground.fit.DemoCup;
import dev.sweepline.ground.fit.PlasmaFit;
import dev.sweepline.ground.fit.PlasmaModel;
import dev.sweepline.ground.fit.Species;
import dev.sweepline.ground.fit.SpectrumFitter;
import dev.sweepline.ground.fit.SpectrumInput;
import dev.sweepline.ground.spectrum.SpectrumValues;
import java.io.StringReader;
import java.io.StringWriter;
import java.util.Arrays;
import java.util.List;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.Test;

/**
 * moments.csv's {@code du_kms} and {@code sigma_du_kms} and moments.json's {@code duKmPerS} and
 * {@code sigmaDuKmPerS}: the speed's change over a sweep flagged interleaved (telemetry ICD §4 flags bit 5,
 * docs/physics.md "Speed drift within an interleaved sweep"), empty / null for a monotonic sweep. The spectrum is
 * {@link SyntheticTelemetry}'s near-Sun protons (n 3600 cm⁻³, U 300 km/s, T_p 6e5 K) on a focus band of 32
 * demo-cup windows around their peak, noise-free, weighted by the ICD §8 noise of the summed quadrants.
 */
class SpeedChangeColumnsTest {
    private static final int BAND = 32;
    /** A change of 1 km/s over the sweep: fast-wind's median 0.9 km/s (docs/focus-design.md). */
    private static final double DRIFT = 1e3;
    /** Integration periods of a spectrum (TestPackets.spectrum writes 4). */
    private static final int PERIODS = 4;

    private static final double[] LOW = new double[BAND];
    private static final double[] HIGH = new double[BAND];
    /** Each window's step over c − 1 in the interleaved upward order (ICD §4). */
    private static final double[] TAU = new double[BAND];

    static {
        double peakVolts = Species.PROTON.voltsAtSpeed(SyntheticTelemetry.U);
        int peak = 0;
        while (peak < DemoCup.TABLE.windows() - 1 && DemoCup.TABLE.highVolts(peak) < peakVolts) {
            peak++;
        }
        for (int j = 0; j < BAND; j++) {
            LOW[j] = DemoCup.TABLE.lowVolts(peak - BAND / 2 + j);
            HIGH[j] = DemoCup.TABLE.highVolts(peak - BAND / 2 + j);
            TAU[j] = SpectrumValues.stepOf(j, BAND, false, true) / (double) (BAND - 1);
        }
    }

    private static double[] truth(double drift) {
        return new double[] {SyntheticTelemetry.N_P, SyntheticTelemetry.U,
            Species.PROTON.thermalSpeed(SyntheticTelemetry.T_P), drift};
    }

    private static PlasmaModel model(boolean drift) {
        return new PlasmaModel(LOW, HIGH, DemoCup.CUP.effectiveAreaM2(), false, drift ? TAU : null);
    }

    /** 1σ of each window's summed current: four independent quadrants in the lowest range that holds them (ICD §8). */
    private static double[] sigma(double[] amps) {
        double[] s = new double[amps.length];
        for (int j = 0; j < amps.length; j++) {
            double q = amps[j] / 4;
            int range = 0;
            while (range < 2 && Math.abs(q) * 1.25 >= DemoCup.NOISE.fullScaleAmps(range)) {
                range++;
            }
            s[j] = Math.sqrt(4 * DemoCup.NOISE.quadrantVariance(q, range, PERIODS));
        }
        return s;
    }

    private static MomentRecord record(int sweep, PlasmaFit fit) {
        return new MomentRecord(SyntheticTelemetry.T0 + 10.0 * sweep, "t" + sweep, 0x101, "focus", sweep, fit, null,
                DemoCup.INSTRUMENT.name());
    }

    @Test
    void shouldGiveAnInterleavedSpectrumsSpeedChangeAndLeaveAMonotonicOnesEmpty() throws Exception {
        SpectrumFitter fitter = new SpectrumFitter(DemoCup.CUP);
        double[] drifting = new double[BAND];
        model(true).evaluate(truth(DRIFT), drifting, null);
        double[] sigma = sigma(drifting);
        // ICD §4 flags bit 5 set: the windows' sweep fractions are known and the fit takes ΔU
        PlasmaFit interleaved = fitter.fit(new SpectrumInput(LOW, HIGH, drifting, sigma, null, null, 0, 0, TAU));
        double[] still = new double[BAND];
        model(false).evaluate(Arrays.copyOf(truth(0), 3), still, null);
        // bit 5 clear: a monotonic sweep, fitted without the drift term
        PlasmaFit monotonic = fitter.fit(new SpectrumInput(LOW, HIGH, still, sigma(still), null, null, 0, 0));
        assertTrue(interleaved.ok() && interleaved.driftFitted(), interleaved.flagText());
        assertTrue(monotonic.ok() && !monotonic.driftFitted(), monotonic.flagText());

        List<MomentRecord> records = List.of(record(1, interleaved), record(2, monotonic));
        StringWriter text = new StringWriter();
        MomentsCsv.write(text, records);
        List<CSVRecord> rows = CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true).get()
                .parse(new StringReader(text.toString())).getRecords();
        JsonNode moments = MomentsJson.build(new ObjectMapper(), FitSummary.of(records, 0), records).get("moments");

        // noise-free currents: the fit lands on the truth, ΔU = 1 km/s (no quadrants, so the flow is taken
        // along the normal and ΔU cos θ = ΔU); 1e-6 km/s is far below the bound of ΔU (tens of m/s, physics.md)
        double du = Double.parseDouble(rows.get(0).get("du_kms"));
        assertEquals(DRIFT * 1e-3, du, 1e-6, text.toString());
        assertEquals(du, moments.get(0).get("duKmPerS").asDouble(), 0.0);
        // at the truth the fit covariance is the inverse Fisher matrix of the same model and weights: its 1σ of
        // ΔU is the Cramér–Rao bound's (FisherMatrix), to 1e-6 of it (the solution's last digits)
        CramerRaoBound bound = FisherMatrix.bound(model(true), truth(DRIFT), sigma);
        double sdu = Double.parseDouble(rows.get(0).get("sigma_du_kms"));
        assertEquals(bound.sigma()[3] * 1e-3, sdu, 1e-6 * bound.sigma()[3] * 1e-3, text.toString());
        assertEquals(sdu, moments.get(0).get("sigmaDuKmPerS").asDouble(), 0.0);
        // U's 1σ comes from the same covariance (MomentsCsv): it is there for both rows
        assertFalse(rows.get(0).get("sigma_u_kms").isEmpty());
        assertFalse(rows.get(1).get("sigma_u_kms").isEmpty());

        // not fitted with the drift term: an empty cell and JSON null (MomentsCsv, MomentsJson), never NaN
        assertEquals("", rows.get(1).get("du_kms"));
        assertEquals("", rows.get(1).get("sigma_du_kms"));
        assertTrue(moments.get(1).get("duKmPerS").isNull());
        assertTrue(moments.get(1).get("sigmaDuKmPerS").isNull());
        // the quick-look's summary counts the one drift fit with its |ΔU|
        assertEquals("1 (median |dU| 1.000 km/s)", QuickLook.driftFits(records));
    }
}
