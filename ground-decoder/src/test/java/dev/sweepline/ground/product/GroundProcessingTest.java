package dev.sweepline.ground.product;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.sweepline.ground.cli.GroundMain;
import dev.sweepline.ground.fit.FitFlag;
import java.io.IOException;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.OptionalDouble;
import java.util.Set;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class GroundProcessingTest {
    /** Recorded seed of the synthetic stream. */
    static final long SEED = 4242L;

    @TempDir
    static Path shared;

    @TempDir
    Path dir;

    private static GroundProducts products;

    /** One processing run shared by the checks: plotting costs a second or two. */
    @BeforeAll
    static void process() throws IOException {
        Path in = Files.write(shared.resolve("synthetic.tm"), SyntheticTelemetry.stream(SEED));
        products = GroundProcessing.process(in, shared.resolve("out"), OptionalDouble.of(2000));
    }

    private static GroundProducts run() {
        return products;
    }

    @Test
    void shouldFitTheNearSunSpectraNearTheirTruth() throws IOException {
        GroundProducts p = run();
        List<MomentRecord> m = p.moments();
        assertEquals(SyntheticTelemetry.GOOD_SPECTRA + SyntheticTelemetry.DEGENERATE_SPECTRA, m.size());
        for (int i = 0; i < SyntheticTelemetry.GOOD_SPECTRA; i++) {
            MomentRecord r = m.get(i);
            NearSunTruth.assertNearTruth(r);
            assertTrue(r.crlbDensityPerCc() > 0 && r.crlbDensityPerCc() < 36);
            assertTrue(r.fit().reducedChiSquare() < SpectrumFitterLimits.POOR, "χ² " + r.fit().reducedChiSquare());
        }
        // the degenerate spectra of SyntheticTelemetry: flagged, no moments
        Set<FitFlag> zero = m.get(SyntheticTelemetry.GOOD_SPECTRA).fit().flags();
        Set<FitFlag> saturated = m.get(SyntheticTelemetry.GOOD_SPECTRA + 1).fit().flags();
        Set<FitFlag> single = m.get(SyntheticTelemetry.GOOD_SPECTRA + 2).fit().flags();
        assertTrue(zero.contains(FitFlag.NO_SIGNAL), zero.toString());
        assertTrue(saturated.contains(FitFlag.SATURATED_DROPPED) && saturated.contains(FitFlag.TOO_FEW_WINDOWS));
        assertTrue(single.contains(FitFlag.TOO_FEW_WINDOWS), single.toString());
        assertEquals(SyntheticTelemetry.GOOD_SPECTRA, p.fits().fitted());
        assertEquals(1, p.fits().byFlag().get(FitFlag.NO_SIGNAL));
        assertEquals(2, p.fits().byFlag().get(FitFlag.TOO_FEW_WINDOWS));
    }

    @Test
    void shouldNeverWriteNanOrInfinityInAProduct() throws IOException {
        GroundProducts p = run();
        Path out = p.outDir();
        for (String f : List.of(GroundProcessing.MOMENTS_CSV, GroundProcessing.MOMENTS_JSON, GroundProcessing.SUMMARY)) {
            String text = Files.readString(out.resolve(f));
            assertFalse(text.contains("NaN") || text.contains("Infinity"), f);
        }
        List<CSVRecord> rows;
        try (Reader r = Files.newBufferedReader(out.resolve(GroundProcessing.MOMENTS_CSV))) {
            rows = CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true).get().parse(r).getRecords();
        }
        assertEquals(p.moments().size(), rows.size());
        for (CSVRecord row : rows) {
            for (String col : MomentsCsv.HEADER) {
                String v = row.get(col);
                if (col.startsWith("time_tai") && !col.endsWith("_s") || col.equals("apid") || col.equals("instrument")
                        || col.equals("mode") || col.equals("flags") || v.isEmpty()) {
                    continue;
                }
                assertTrue(Double.isFinite(Double.parseDouble(v)), col + " = " + v);
            }
        }
        // a failed fit leaves its moments empty and names its flags
        CSVRecord zero = rows.get(SyntheticTelemetry.GOOD_SPECTRA);
        assertEquals("", zero.get("n_cc"));
        assertEquals("", zero.get("crlb_n_cc"));
        assertTrue(zero.get("flags").contains("NO_SIGNAL"));
        JsonNode s = new ObjectMapper().readTree(out.resolve(GroundProcessing.SUMMARY).toFile());
        assertEquals(SyntheticTelemetry.GOOD_SPECTRA, s.get("fits").get("fitted").asInt());
        assertEquals(12.0 / 15, s.get("fits").get("fitFraction").asDouble(), 1e-12);
        JsonNode mj = new ObjectMapper().readTree(out.resolve(GroundProcessing.MOMENTS_JSON).toFile());
        assertTrue(mj.get("moments").get(SyntheticTelemetry.GOOD_SPECTRA).get("nPerCc").isNull());
    }

    @Test
    void shouldWriteTheProductsFromTheCommandLine() throws IOException {
        Path in = Files.write(dir.resolve("cli.tm"), SyntheticTelemetry.stream(SEED));
        Path out = dir.resolve("cli");
        // exit 0 (GroundMain doc); --allocation of the issue
        assertEquals(0, GroundMain.run("decode", in.toString(), "--out", out.toString(), "--allocation", "1e6"));
        for (String f : List.of(GroundProcessing.SPECTRA, GroundProcessing.SUMMARY, GroundProcessing.MOMENTS_CSV,
                GroundProcessing.MOMENTS_JSON, GroundProcessing.SPECTROGRAM_PNG, GroundProcessing.MOMENTS_PNG,
                GroundProcessing.SPECTRUM_FIT_PNG, GroundProcessing.REPORT)) {
            assertTrue(Files.size(out.resolve(f)) > 0, f);
        }
        String html = Files.readString(out.resolve(GroundProcessing.REPORT), StandardCharsets.UTF_8);
        assertTrue(html.contains("Allocation 1000000.0 bit/s") && html.contains("within the allocation"));
        assertNotNull(html);
    }

    /** Limits the test shares with the fitter. */
    static final class SpectrumFitterLimits {
        static final double POOR = dev.sweepline.ground.fit.SpectrumFitter.POOR_FIT_REDUCED_CHI2;
    }
}
