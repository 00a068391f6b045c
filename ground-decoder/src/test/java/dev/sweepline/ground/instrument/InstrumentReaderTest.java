package dev.sweepline.ground.instrument;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStream;
import java.io.StringReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Broken descriptions, each the built-in demo-cup.yaml with one line changed: every failure names the
 * file, the line the test changed and the dotted field (FORMAT.md: "A broken file fails with its file,
 * line and field named").
 */
class InstrumentReaderTest {
    private static final String FILE = "broken-cup.yaml";

    private static String demoText() {
        try (InputStream in = InstrumentReaderTest.class.getResourceAsStream("/instruments/demo-cup.yaml")) {
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new AssertionError(e);
        }
    }

    /** The demo text with the line starting {@code prefix} replaced; and that line's number. */
    private record Edit(String text, int line) {
    }

    private static Edit edit(String prefix, String replacement) {
        String[] lines = demoText().split("\n", -1);
        for (int i = 0; i < lines.length; i++) {
            if (lines[i].startsWith(prefix)) {
                lines[i] = replacement;
                return new Edit(String.join("\n", lines), i + 1);
            }
        }
        throw new AssertionError("demo-cup.yaml has no line " + prefix);
    }

    private static InstrumentFileException failure(String text) {
        return assertThrows(InstrumentFileException.class, () -> InstrumentReader.read(FILE, FILE, new StringReader(text)));
    }

    /** The failure of the edited text, named at {@code lineAfterEdit} lines after the edited one. */
    private static InstrumentFileException broken(String prefix, String replacement, String field, int lineAfterEdit) {
        Edit e = edit(prefix, replacement);
        InstrumentFileException x = failure(e.text());
        int line = e.line() + lineAfterEdit;
        assertEquals(FILE, x.file());
        assertEquals(line, x.line(), x.getMessage());
        assertEquals(field, x.field(), x.getMessage());
        assertTrue(x.getMessage().startsWith(FILE + ":" + line + ": " + field + ": "), x.getMessage());
        return x;
    }

    private static InstrumentFileException broken(String prefix, String replacement, String field) {
        return broken(prefix, replacement, field, 0);
    }

    @Test
    void shouldReadTheDemoTextUnchanged() {
        GroundInstrument d = InstrumentReader.read(FILE, FILE, new StringReader(demoText()));
        assertEquals("demo-cup", d.name());
        assertEquals(FILE, d.source());
    }

    @Test
    void shouldRefuseAnUnknownKeyNamingIt() {
        // FORMAT.md: an unknown key fails; a misspelt key is named as unknown, not as the key it misses
        InstrumentFileException x = broken("  collector: quadrants", "  collectr: quadrants", "geometry.collectr");
        assertTrue(x.problem().startsWith("unknown key") && x.problem().contains("collector"), x.getMessage());
        broken("  grids: 4", "  grids: 4\n  gridsExtra: 1", "geometry.gridsExtra", 1);
        broken("id: 1", "id: 1\ncolour: red", "colour", 1); // at the top level
    }

    @Test
    void shouldCheckTheOptionalSweepSection() {
        // FORMAT.md sweep: the campaign grid keys plus edgeWindows, gainUpFraction, gainDownFraction
        InstrumentReader.read(FILE, FILE, new StringReader(demoText() + "sweep:\n  jumpWindows: 12\n  gainDownFraction: 0.002\n"));
        int sweepLine = (int) demoText().lines().count() + 1;
        InstrumentFileException x = failure(demoText() + "sweep:\n  jumpWindows: 12\n  jumpWindow: 3\n");
        assertEquals(sweepLine + 2, x.line(), x.getMessage());
        assertEquals("sweep.jumpWindow", x.field());
        // a window count beyond the 128-window table (demo-cup.yaml windows.count)
        InstrumentFileException y = failure(demoText() + "sweep:\n  maxBandWindows: 129\n");
        assertEquals(sweepLine + 1, y.line(), y.getMessage());
        assertEquals("sweep.maxBandWindows", y.field());
    }

    @Test
    void shouldRefuseANegativeRadius() {
        // FORMAT.md geometry: apertureRadiusMm > 0 (given instead of the area)
        InstrumentFileException x = broken("  effectiveAreaCm2:", "  apertureRadiusMm: -7", "geometry.apertureRadiusMm");
        assertTrue(x.problem().contains("> 0") && x.problem().contains("-7"), x.getMessage());
        broken("  collectorRadiusMm:", "  collectorRadiusMm: -12.5", "geometry.collectorRadiusMm");
    }

    @Test
    void shouldRefuse257Windows() {
        // FORMAT.md windows.count: 1..256
        InstrumentFileException x = broken("  count: 128", "  count: 257", "windows.count");
        assertTrue(x.problem().contains("1..256") && x.problem().contains("257"), x.getMessage());
        broken("  count: 128", "  count: 12.5", "windows.count"); // a count is whole
    }

    @Test
    void shouldRefuseAVoltageLimitAboveTheDacsReach() {
        // FORMAT.md: maxVolts <= (2^dacBits − 1) × scale: 65535 × 100 mV = 6553.5 V for the demo cup
        InstrumentFileException x = broken("  maxVolts: 6000", "  maxVolts: 7000", "modulator.maxVolts");
        assertTrue(x.problem().contains("6553.5"), x.getMessage());
    }

    @Test
    void shouldRefuseValuesThatContradictEachOther() {
        // FORMAT.md: collectorRadiusMm >= R (6.9653 mm for the demo cup)
        broken("  collectorRadiusMm:", "  collectorRadiusMm: 5", "geometry.collectorRadiusMm");
        // FORMAT.md: minVolts <= lowVolts
        broken("  lowVolts: 50", "  lowVolts: 40", "windows.lowVolts");
        // FORMAT.md: pedestalCounts 0 .. 2^bits / 4 = 16384
        broken("  pedestalCounts: 256", "  pedestalCounts: 16385", "adc.pedestalCounts");
        // FORMAT.md: fixedSettleMicros >= 5 × settleTauMicros = 750
        broken("  fixedSettleMicros: 1000", "  fixedSettleMicros: 700", "cadence.fixedSettleMicros");
        // FORMAT.md: rangeRatio a power of two
        broken("  rangeRatio: 32", "  rangeRatio: 30", "preamp.rangeRatio");
        // FORMAT.md: exactly one of effectiveAreaCm2 and apertureRadiusMm; named at the radius, the line after
        broken("  effectiveAreaCm2:", "  effectiveAreaCm2: 1.0\n  apertureRadiusMm: 7", "geometry.apertureRadiusMm", 1);
    }

    @Test
    void shouldRefuseAMissingKeyAndAWrongKind() {
        // a missing key is named with the line of the mapping that lacks it (the document's first key, line 4)
        InstrumentFileException x = failure(edit("id: 1", "").text());
        assertEquals("id", x.field());
        assertEquals(4, x.line(), x.getMessage()); // demo-cup.yaml: "format:" on line 4 after three comment lines
        assertTrue(x.problem().startsWith("missing"), x.getMessage());
        broken("  grids: 4", "  grids: four", "geometry.grids");
        broken("  grids: 4", "  grids: \"4\"", "geometry.grids"); // quoted: text, not a number
        broken("format:", "format: sweepline-instrument/2", "format");
        broken("name:", "name: Demo_Cup", "name");
        broken("  spacing: log", "  spacing: linear", "windows.spacing");
        broken("  grids: 4", "  grids: 4\n  grids: 5", "geometry.grids", 1); // written twice
    }

    @Test
    void shouldNameTheFileOfADescriptionOnDisk(@TempDir Path dir) throws IOException {
        Path f = dir.resolve("my-cup.yaml");
        Files.writeString(f, edit("  count: 128", "  count: 0").text());
        InstrumentFileException x = assertThrows(InstrumentFileException.class, () -> InstrumentReader.readFile(f));
        assertEquals(f.toString(), x.file());
        assertEquals("windows.count", x.field());
        // a name that is neither built in nor a file
        InstrumentFileException y = assertThrows(InstrumentFileException.class,
                () -> InstrumentSet.resolve(List.of(dir.resolve("absent.yaml").toString())));
        assertTrue(y.problem().contains("demo-cup, fine-cup"), y.getMessage());
    }

    @Test
    void shouldRefuseTwoDescriptionsOfOneId(@TempDir Path dir) throws IOException {
        Path f = dir.resolve("copy.yaml");
        Files.writeString(f, edit("name:", "name: copy-cup").text()); // id 1 still
        IllegalArgumentException x = assertThrows(IllegalArgumentException.class,
                () -> InstrumentSet.resolve(List.of("demo-cup", f.toString())));
        assertTrue(x.getMessage().contains("share id 1"), x.getMessage());
        // a file given by path is read even when a built-in has its name elsewhere
        assertEquals("copy-cup", InstrumentSet.resolve(List.of(f.toString())).all().get(0).name());
    }
}
