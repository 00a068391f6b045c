package dev.sweepline.fsw.host.instrument;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sweepline.fsw.host.yaml.FileFormatException;
import dev.sweepline.fsw.instrument.InstrumentDescription;
import dev.sweepline.fsw.table.SweepParameters;
import dev.sweepline.fsw.table.WindowTable;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/** The instrument description reader (instruments/FORMAT.md, format sweepline-instrument/1). */
public class InstrumentFileReaderTest {
    private static final String DEMO_TEXT = Instruments.BUILT_INS.resource("instruments/demo-cup.yaml");

    /** The text of instruments/demo-cup.yaml, for tests that break it. */
    public static String demoText() {
        return DEMO_TEXT;
    }

    @Test
    void shouldLoadEveryBuiltInWithItsOwnName() {
        List<String> names = Instruments.builtInNames();
        assertEquals(List.of("demo-cup", "fine-cup"), names); // instruments/index.txt
        for (String name : names) {
            InstrumentSpec spec = Instruments.resolve(name);
            assertEquals(name, spec.name());
            assertEquals(name, spec.flight().name());
        }
        assertEquals("demo-cup", Instruments.defaultName()); // FORMAT.md: the default
    }

    @Test
    void shouldDeriveTheDemoCupsValuesAsFormatMdSays() {
        InstrumentSpec demo = Instruments.builtIn("demo-cup");
        // FORMAT.md derived values: R = sqrt(1 cm² / (pi × 0.9^4)) = 6.9653 mm (telemetry ICD §8, 4 decimals)
        assertEquals(6.9653, demo.geometry().apertureRadiusMm(), 5e-5);
        // highest code = floor(6000 V × 1000 / 100 mV) = 60000 (FORMAT.md; commands.md §4.4)
        assertEquals(60_000, demo.modulator().maxLevelCode());
        InstrumentDescription d = demo.flight();
        assertEquals(60_000, d.limits().maxLevelCode);
        // settle limits: fixed 5 × 150 us = 750 us; per code 100 mV / (100 V/ms) = 1 us = Q8 256 (FORMAT.md)
        assertEquals(750, d.limits().minFixedSettleMicros);
        assertEquals(256, d.limits().minSettleMicrosPerCodeQ8);
        // 16-bit ADC: top code 2^16 - 1, 2 octets a sample (FORMAT.md; hardware ICD §3.2)
        assertEquals(65_535, d.adcTopCode());
        assertEquals(2, d.sampleOctets());
        assertEquals(256, d.pedestalCounts()); // demo-cup.yaml adc.pedestalCounts
        assertEquals(40_000L, d.fullScaleRange0Femtoamps()); // demo-cup.yaml: 40 pA
        assertEquals(5, d.rangeRatioShift()); // rangeRatio 32 = 2^5
        assertEquals(1000, d.modulationPeriodMicros()); // demo-cup.yaml modulator.modulationPeriodMicros
    }

    @Test
    void shouldDeriveTheFineCupsValuesAsFormatMdSays() {
        InstrumentSpec fine = Instruments.builtIn("fine-cup");
        // FORMAT.md: floor(8000 V × 1000 / 125 mV) = 64000 (fine-cup.yaml: "code 64000 is 8000 V")
        assertEquals(64_000, fine.modulator().maxLevelCode());
        // per-code settle 125 mV / (200 V/ms) = 0.625 us = Q8 160; fixed 5 × 100 us = 500 us (FORMAT.md)
        assertEquals(0.625, fine.modulator().minSettleMicrosPerCode(), 1e-12);
        InstrumentDescription d = fine.flight();
        assertEquals(160, d.limits().minSettleMicrosPerCodeQ8);
        assertEquals(500, d.limits().minFixedSettleMicros);
        // 20-bit ADC: top 2^20 - 1 = 1048575, ceil(20/8) = 3 octets (hardware ICD §3.2)
        assertEquals(1_048_575, d.adcTopCode());
        assertEquals(3, d.sampleOctets());
        assertEquals(8, d.rangeRatioShift()); // rangeRatio 256
        assertEquals(2, d.id()); // fine-cup.yaml id
        // R = sqrt(0.5 cm² / (pi × 0.92^3)) by hand: 0.92^3 = 0.778688, 50 mm² / (pi × 0.778688) = 20.4388 mm²,
        // sqrt = 4.5209 mm (FORMAT.md derived values; 4 decimals)
        assertEquals(4.5209, fine.geometry().apertureRadiusMm(), 5e-5);
        SweepParameters p = d.defaultParameters();
        // fine-cup.yaml cadence and sweep section, at the parameter table's scales (campaigns FORMAT.md)
        assertEquals(16, p.integrationPeriods);
        assertEquals(600, p.fixedSettleMicros);
        assertEquals(160, p.settleMicrosPerCodeQ8); // 0.625 × 256
        assertEquals(50, p.noiseCountsPerQuadrant);
        assertEquals(8, p.minHalfWidthWindows);
        assertEquals(128, p.maxBandWindows);
        assertEquals(12, p.jumpWindows);
        assertEquals(4, p.edgeWindows);
        assertEquals(48, p.edgeSearchWindows);
        assertEquals(131, p.gainDownFractionQ16); // round(0.002 × 65536) = 131
        WindowTable t = d.defaultTable();
        assertEquals(256, t.count());
        assertEquals(800, t.dacLow(0)); // 100 V / 0.125 V
        assertEquals(64_000, t.dacHigh(255)); // 8000 V / 0.125 V
    }

    @Test
    void shouldGiveTheDemoCupTheTableAndParametersOfTheFlightSoftwareBeforeDescriptions() {
        InstrumentDescription d = Instruments.builtIn("demo-cup").flight();
        WindowTable t = d.defaultTable();
        // 128 log-spaced windows 50..6000 V at 0.1 V per code (telemetry ICD §4 "Converting to current"):
        // low(0) = round(500), high(127) = round(60000), and low(64) = round(500 × 120^0.5) = 5477
        assertEquals(128, t.count());
        assertEquals(500, t.dacLow(0));
        assertEquals(60_000, t.dacHigh(127));
        assertEquals(5477, t.dacLow(64));
        SweepParameters p = d.defaultParameters();
        // the start-up parameters the flight software had as constants (sweep design note defaults)
        assertEquals(8, p.integrationPeriods);
        assertEquals(1000, p.fixedSettleMicros);
        assertEquals(256, p.settleMicrosPerCodeQ8);
        assertEquals(4, p.noiseCountsPerQuadrant);
        assertEquals(4, p.minHalfWidthWindows);
        assertEquals(64, p.maxBandWindows);
        assertEquals(2, p.edgeWindows);
        assertEquals(24, p.edgeSearchWindows);
        assertEquals(52_429, p.gainUpFractionQ16);
        assertEquals(1_311, p.gainDownFractionQ16);
    }

    /** Edits of the demo cup's file, each breaking one rule of FORMAT.md: the new text, the field named. */
    static Stream<Arguments> brokenFiles() {
        return Stream.of(
                // an unknown key (FORMAT.md: "an unknown key")
                Arguments.of("  grids: 4 ", "  colour: red\n  grids: 4 ", "geometry.colour"),
                // a negative radius (FORMAT.md geometry.apertureRadiusMm > 0)
                Arguments.of("  effectiveAreaCm2: 1.0 ", "  apertureRadiusMm: -3 ", "geometry.apertureRadiusMm"),
                // 257 windows (FORMAT.md windows.count 1..256; telemetry ICD §4 window count)
                Arguments.of("  count: 128", "  count: 257", "windows.count"),
                // above the DAC's reach: 7000 V > 65535 × 0.1 V = 6553.5 V (FORMAT.md modulator.maxVolts)
                Arguments.of("  maxVolts: 6000 ", "  maxVolts: 7000 ", "modulator.maxVolts"),
                // min >= max (FORMAT.md maxVolts > minVolts)
                Arguments.of("  minVolts: 50", "  minVolts: 6000", "modulator.maxVolts"),
                // settle below the slew: 0.5 us < 100 mV / (100 V/ms) = 1 us (FORMAT.md cadence.settleMicrosPerCode)
                Arguments.of("  settleMicrosPerCode: 1.0", "  settleMicrosPerCode: 0.5", "cadence.settleMicrosPerCode"),
                // fixed settle below 5 tau = 750 us (FORMAT.md cadence.fixedSettleMicros)
                Arguments.of("  fixedSettleMicros: 1000", "  fixedSettleMicros: 700", "cadence.fixedSettleMicros"),
                // range ratio not a power of two (FORMAT.md preamp.rangeRatio)
                Arguments.of("  rangeRatio: 32", "  rangeRatio: 30", "preamp.rangeRatio"),
                // an ADC wider than 24 bits (FORMAT.md adc.bits 8..24)
                Arguments.of("  bits: 16\n", "  bits: 25\n", "adc.bits"),
                // a cadence key in the sweep section (FORMAT.md sweep: the cadence keys live in cadence)
                Arguments.of("  settleMicrosPerCode: 1.0", "  settleMicrosPerCode: 1.0\nsweep:\n  integrationPeriods: 4",
                        "sweep.integrationPeriods"));
    }

    @ParameterizedTest(name = "{2}")
    @MethodSource("brokenFiles")
    void shouldNameTheFileLineAndFieldOfABrokenFile(String original, String replacement, String field) {
        assertTrue(DEMO_TEXT.contains(original), original);
        String text = DEMO_TEXT.replace(original, replacement);
        String key = field.substring(field.lastIndexOf('.') + 1) + ":";
        int line = lineOf(text, key, replacement);
        FileFormatException e = assertThrows(FileFormatException.class, () -> InstrumentFileReader.read(text, "broken.yaml"));
        assertEquals("broken.yaml", e.file());
        assertEquals(field, e.field(), e.getMessage());
        assertEquals(line, e.line(), e.getMessage());
        assertTrue(e.getMessage().startsWith("broken.yaml:" + line + ": " + field + ": "), e.getMessage());
    }

    @Test
    void shouldRefuseAFileThatIsNeitherABuiltInNorThere() {
        FileFormatException e = assertThrows(FileFormatException.class, () -> Instruments.resolve("no-such-cup"));
        assertTrue(e.getMessage().contains("demo-cup, fine-cup"), e.getMessage()); // the built-ins are listed
    }

    /** 1-based line of the first {@code key} at or after the replaced text (the line the reader must name). */
    private static int lineOf(String text, String key, String replacement) {
        int keyAt = text.indexOf("  " + key, text.indexOf(replacement));
        return (int) text.substring(0, keyAt).chars().filter(c -> c == '\n').count() + 1;
    }
}
