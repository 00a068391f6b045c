package dev.sweepline.ground.product;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sweepline.ground.fit.FitFlag;
import dev.sweepline.ground.instrument.GroundInstrument;
import dev.sweepline.ground.instrument.InstrumentSet;
import java.io.IOException;
import java.io.Reader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The whole ground processing of layout-2 telemetry of the second built-in cup (fine-cup.yaml: 256 windows
 * 100-8000 V, 20-bit ADC, two ranges 256× apart, 0.5 cm², 2 kHz): currents, noise, geometry and
 * spectrogram come from its description, so the near-Sun plasma of {@link SyntheticTelemetry} fits to its
 * truth on a cup of half the demo cup's area.
 */
class FineCupProcessingTest {
    /** Recorded seed. */
    static final long SEED = 4343L;

    @TempDir
    Path dir;

    @Test
    void shouldFitTheFineCupsSpectraWithItsOwnDescription() throws IOException {
        GroundInstrument fine = InstrumentSet.builtIns().byName("fine-cup");
        Path in = Files.write(dir.resolve("fine.tm"), SyntheticTelemetry.stream(SEED, fine));
        GroundProducts p = GroundProcessing.process(in, dir.resolve("out"), OptionalDouble.empty());
        assertEquals(Map.of("fine-cup", 15L), p.stats().spectraByInstrument());
        assertTrue(p.stats().spectrumErrors().isEmpty(), p.stats().spectrumErrors().toString());
        List<MomentRecord> m = p.moments();
        for (int i = 0; i < SyntheticTelemetry.GOOD_SPECTRA; i++) {
            MomentRecord r = m.get(i);
            assertEquals("fine-cup", r.instrument());
            NearSunTruth.assertNearTruth(r);
            // the fit's area is the fine cup's 0.5 cm² (fine-cup.yaml) at an acceptance of 1 (3° < 24°)
            assertEquals(0.5e-4, r.fit().areaM2(), 1e-12);
        }
        assertEquals(SyntheticTelemetry.GOOD_SPECTRA, p.fits().fitted());
        assertEquals(1, p.fits().byFlag().get(FitFlag.NO_SIGNAL));
        assertEquals(2, p.fits().byFlag().get(FitFlag.TOO_FEW_WINDOWS));
        // spectra.csv: one row per window of the 256-window table, the instrument named, edges of fine-cup.yaml
        List<CSVRecord> rows;
        try (Reader r = Files.newBufferedReader(p.outDir().resolve(GroundProcessing.SPECTRA))) {
            rows = CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true).get().parse(r).getRecords();
        }
        assertEquals(256 * (SyntheticTelemetry.GOOD_SPECTRA + 2) + 1, rows.size());
        assertEquals("fine-cup", rows.get(0).get("instrument"));
        // FORMAT.md: code round(8 × 100) = 800, (1 − 0.001) × 0.125 V × 800 + 0.5 V = 100.4 V
        assertEquals(100.4, Double.parseDouble(rows.get(0).get("low_volts")), 1e-9);
        String html = Files.readString(p.report());
        assertTrue(html.contains("on the windows of fine-cup (id 2)"), "the spectrogram names its instrument");
    }
}
