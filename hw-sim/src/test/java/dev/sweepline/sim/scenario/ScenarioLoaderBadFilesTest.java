package dev.sweepline.sim.scenario;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Every kind of bad file fails with the right file, line and field. Source of every expected value:
 * the bad file itself in src/test/resources/scenarios-bad/, whose offending line carries the marker
 * {@code # <-- error} (written by hand from FORMAT.md's rules, independently of the loader), and the
 * rule of FORMAT.md that the file breaks, whose wording the message fragment quotes.
 */
class ScenarioLoaderBadFilesTest {
    private static final Path BAD = Path.of("src/test/resources/scenarios-bad");
    private static final Pattern MARKER = Pattern.compile("#\\s*<-- error$");

    static Stream<Arguments> badFiles() {
        return Stream.of(
                // FORMAT.md "Rules": only the keys it lists are allowed.
                Arguments.of("unknown-key.yaml", "protons.densty", "unknown key; allowed here: densityPerCc"),
                Arguments.of("event-unknown-parameter.yaml", "events[0].set.density", "unknown key"),
                // FORMAT.md "protons": density and temperature must be positive.
                Arguments.of("negative-density.yaml", "protons.densityPerCc", "must be positive, got -3"),
                Arguments.of("zero-temperature.yaml", "protons.temperatureK", "must be positive, got 0"),
                Arguments.of("event-negative-density.yaml", "events[2].set.protonDensity", "must be positive, got -3"),
                // FORMAT.md: required fields; a missing one is reported at its enclosing mapping.
                Arguments.of("missing-field.yaml", "protons.speedKmPerS", "missing required field"),
                Arguments.of("missing-top-field.yaml", "durationS", "missing required field"),
                // FORMAT.md "Values": numbers, booleans, lists where stated.
                Arguments.of("wrong-type.yaml", "protons.speedKmPerS", "expected a finite number, got the text 'fast'"),
                Arguments.of("wrong-type-section.yaml", "events", "expected a list of events, got the number 5"),
                Arguments.of("wrong-type-boolean.yaml", "events[0].jump", "expected true or false"),
                // YAML 1.1 syntax (the file is not YAML at all).
                Arguments.of("unparsable.yaml", "flow.thetaYDeg", "not valid YAML"),
                Arguments.of("duplicate-key.yaml", "protons.densityPerCc", "duplicate key (first given on line 9)"),
                Arguments.of("two-documents.yaml", "", "only one YAML document"),
                // FORMAT.md "events": in time order, within the duration, ramps of one parameter apart.
                Arguments.of("events-out-of-order.yaml", "events[1].atS", "events must be in time order"),
                Arguments.of("event-after-duration.yaml", "events[0].atS", "must be within the duration 0..120 s, got 200"),
                Arguments.of("ramp-past-duration.yaml", "events[0].rampS", "the ramp ends at 130 s, after the duration 120 s"),
                Arguments.of("overlapping-ramps.yaml", "events[1].scale.protonSpeed", "inside the ramp of events[0]"),
                Arguments.of("event-empty.yaml", "events[0]", "an event must change something"),
                Arguments.of("event-zero-factor.yaml", "events[0].scale.protonSpeed", "a factor must be positive, got 0"),
                // FORMAT.md "alphas": He/H within 0..0.5, also after an event's factor.
                Arguments.of("abundance-too-high.yaml", "alphas.abundance", "must be within 0..0.5, got 0.6"),
                Arguments.of("event-scale-abundance.yaml", "events[0].scale.alphaAbundance",
                        "gives 0.6 after the event; must be within 0..0.5"),
                // FORMAT.md "flow", "field": angles within -60..60 deg.
                Arguments.of("angle-too-large.yaml", "flow.thetaXDeg", "must be within -60..60 deg, got 65"),
                Arguments.of("event-angle-too-large.yaml", "events[0].set.fieldThetaY", "must be within -60..60 deg, got -61"),
                // FORMAT.md top-level keys.
                Arguments.of("bad-format.yaml", "format", "expected 'sweepline-scenario/1'"),
                Arguments.of("bad-distance.yaml", "distanceAu", "got 0"));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("badFiles")
    void shouldNameFileLineAndFieldOfEveryBadFile(String name, String field, String fragment) throws IOException {
        Path file = BAD.resolve(name);
        int line = markedLine(file);

        ScenarioException e = assertThrows(ScenarioException.class, () -> ScenarioLoader.load(file));

        assertEquals(file.toString(), e.file(), "file");
        assertEquals(line, e.line(), () -> "line; message was: " + e.getMessage());
        assertEquals(field, e.field(), () -> "field; message was: " + e.getMessage());
        assertTrue(e.problem().contains(fragment), () -> "problem '" + e.problem() + "' lacks '" + fragment + "'");
        String where = file + ":" + line + ": " + (field.isEmpty() ? "" : field + ": ");
        assertTrue(e.getMessage().startsWith(where), () -> "message '" + e.getMessage() + "' should start with " + where);
    }

    @Test
    void shouldHaveATestRowForEveryBadFile() throws IOException {
        // Source: the folder itself; a bad file without a row would check nothing.
        List<String> rows = badFiles().map(a -> (String) a.get()[0]).sorted().toList();
        try (Stream<Path> files = Files.list(BAD)) {
            List<String> onDisk = files.map(p -> p.getFileName().toString()).sorted().toList();
            assertEquals(onDisk, rows);
        }
    }

    @Test
    void shouldReportAMissingFileWithoutALine() {
        // Source: ScenarioException contract (line 0 when the problem has no line).
        Path missing = BAD.resolve("no-such-file.yaml");
        ScenarioException e = assertThrows(ScenarioException.class, () -> ScenarioLoader.load(missing));
        assertEquals(0, e.line());
        assertEquals(missing + ": no such file", e.getMessage());
    }

    @Test
    void shouldReportAnEmptyDocument() {
        // Source: FORMAT.md "a file is one YAML mapping".
        ScenarioException e = assertThrows(ScenarioException.class, () -> ScenarioLoader.parse("# nothing\n", "empty.yaml"));
        assertEquals("empty.yaml:1: the file is empty", e.getMessage());
    }

    /** The 1-based line carrying the marker; exactly one per bad file. */
    private static int markedLine(Path file) throws IOException {
        List<String> lines = Files.readAllLines(file);
        int found = 0;
        for (int i = 0; i < lines.size(); i++) {
            if (MARKER.matcher(lines.get(i)).find()) {
                assertEquals(0, found, "more than one marker in " + file);
                found = i + 1;
            }
        }
        assertTrue(found > 0, "no marker in " + file);
        return found;
    }
}
