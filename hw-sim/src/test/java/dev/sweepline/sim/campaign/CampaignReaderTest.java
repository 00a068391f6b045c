package dev.sweepline.sim.campaign;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sweepline.fsw.host.yaml.FileFormatException;
import java.nio.file.Path;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;

class CampaignReaderTest {
    @Test
    void shouldLoadTheDemoCampaign() {
        CampaignSpec spec = CampaignReader.load(Path.of("src/main/resources/campaigns/perihelion-tuning.yaml"));
        assertEquals("perihelion-tuning", spec.name());
        assertEquals(3 * 3 * 2, spec.setCount()); // the grid's three axes in the file
        assertEquals(6, spec.draws().size());
    }

    @Test
    void shouldTakeLinkedAxesTogether() {
        // FORMAT.md, linked: the linked axes are one axis of the grid, at the place of the first of them;
        // crossed with the others, the last axis varying fastest
        String text = """
                format: sweepline-campaign/1
                name: linked
                seed: 1
                runsPerSet: 1
                durationS: 10
                scenario: quiet-perihelion
                grid:
                  focusStyle: [0, 19]
                  jumpWindows: [5, 6, 7]
                  robustnessMarginWindows: [0, 1]
                linked: [focusStyle, robustnessMarginWindows]
                """;
        CampaignSpec spec = CampaignReader.parse(text, "linked.yaml", null);
        assertEquals(2 * 3, spec.setCount());
        double[][] expected = {{0, 5, 0}, {0, 6, 0}, {0, 7, 0}, {19, 5, 1}, {19, 6, 1}, {19, 7, 1}};
        for (int s = 0; s < expected.length; s++) {
            assertArrayEquals(expected[s], spec.setValues(s), "set " + s);
        }
        assertEquals(19, spec.parameters(4).focusStyle);
        assertEquals(1, spec.parameters(4).robustnessMarginWindows);
        assertEquals(6, spec.parameters(4).jumpWindows);
        // the demo campaign: three whole tables, default first
        CampaignSpec demo = CampaignReader.load(Path.of("src/main/resources/campaigns/focus-style.yaml"));
        assertEquals(3, demo.setCount());
        assertArrayEquals(new double[] {0, 0, 0, 0, 16}, demo.setValues(0));
        assertArrayEquals(new double[] {19, 350_000, 3, 2, 128}, demo.setValues(2));
    }

    /** Each broken line names its file, line and field (the bad-input rule of the project). */
    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "runsPerSet: 0|5|runsPerSet|must be positive",
        "bogus: 1|5|bogus|unknown key",
        "draws: {protonDensity: {normal: [100, 10]}}|5|draws.protonDensity|normal distribution",
        "draws: {protonDensity: {uniform: [-5, 10]}}|5|draws.protonDensity|draws must lie in",
        "draws: {alphaAbundance: {uniform: [0.1, 0.9]}}|5|draws.alphaAbundance|draws must lie in",
        "draws: {protonSpeed: {uniform: [400, 300]}}|5|draws.protonSpeed|upper bound",
        "grid: {resurveyEvery: [0]}|5|grid|refused by the flight software",
        // commands.md §4.1: the edge search has its own reason code, not BAD_LOCK_LOSS
        "grid: {edgeSearchWindows: [9999]}|5|grid|refused by the flight software: BAD_EDGE_SEARCH (edgeSearchWindows must be 0..256)",
        // the demo cup's HV supply slews 1 code per us and settles with tau 150 us (its description):
        // 0.5 us per code and 300 us fixed settle are below what it needs (commands.md §4.4)
        "grid: {settleMicrosPerCode: [1, 0.5]}|5|grid|SETTLE_BELOW_SLEW (the HV supply's slew limit",
        "grid: {fixedSettleMicros: [1000, 300]}|5|grid|SETTLE_TOO_SHORT (the HV supply's settling",
        // FORMAT.md, linked: grid keys, each once, with as many values each
        "linked: [jumpWindows, bogus]|5|linked|bogus is not a grid key",
        "linked: [jumpWindows, jumpWindows]|5|linked|jumpWindows is named twice",
        // YAML 1.2 §10.3.2 (core schema): ~ and null are the null value, not a key's name; '' the empty text
        "linked: [jumpWindows, ~]|5|linked|entry 2 of 2 is null",
        "linked: [null, jumpWindows]|5|linked|entry 1 of 2 is null",
        "linked: [jumpWindows, '']|5|linked|entry 2 of 2 is empty, not a grid key",
        "linked: [jumpWindows]|5|linked|a list of two or more grid keys",
        "linked: [jumpWindows, maxBandWindows]|5|linked|as many values each",
        // SweepParameters' fields are Java ints (JLS §4.2.1): 2^32 + 750 would run as 750
        "grid: {fixedSettleMicros: [4294968046]}|5|grid.fixedSettleMicros|beyond the flight software's 32-bit field",
        "grid: {fixedSettleMicros: [1e999]}|5|grid.fixedSettleMicros|beyond the flight software's 32-bit field",
        // FORMAT.md: runsPerSet counts ensemble members, a whole number
        "runsPerSet: 2.5|5|runsPerSet|must be positive and a whole number",
        "runsPerSet: 1e999|5|runsPerSet|must be positive and a whole number, at most 1000000",
    })
    void shouldNameFileLineAndField(String line, int lineNo, String field, String problem) {
        String head = """
                format: sweepline-campaign/1
                name: broken
                seed: 1
                durationS: 10
                %s
                scenario: quiet-perihelion
                """.formatted(line);
        String text = head + (line.startsWith("runsPerSet") ? "" : "runsPerSet: 2\n")
                + (line.startsWith("grid") ? "" : line.startsWith("linked")
                        ? "grid: {jumpWindows: [5, 6], maxBandWindows: [64]}\n" : "grid: {integrationPeriods: [8]}\n");
        FileFormatException e = assertThrows(FileFormatException.class,
                () -> CampaignReader.parse(text, "broken.yaml", null));
        assertEquals("broken.yaml", e.file());
        assertEquals(lineNo, e.line(), e.getMessage());
        assertTrue(e.field().startsWith(field), e.getMessage());
        assertTrue(e.getMessage().contains(problem), e.getMessage());
    }

    /** A whole-number or bounded key of the head lines: the file, line and field named. */
    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        // the seed is read as a double: 2^53 + 1 would be read as 2^53 (IEEE 754 binary64, 53-bit significand)
        "seed: 1.5|3|seed|must be a whole number",
        "seed: 9007199254740993|3|seed|must be a whole number from 0 to 9007199254740991",
        "seed: 1e999|3|seed|must be a whole number from 0 to 9007199254740991",
        // 1e999 overflows to infinity (Double.parseDouble): a run that never ends; the scenario format's own
        // limit of a run's duration, 1e6 s (scenarios/FORMAT.md)
        "durationS: 1e999|4|durationS|must be positive and at most 1e6 s",
        "durationS: 2e6|4|durationS|must be positive and at most 1e6 s",
    })
    void shouldNameAHeadKeyOutOfItsRange(String line, int lineNo, String field, String problem) {
        String text = """
                format: sweepline-campaign/1
                name: broken
                seed: 1
                durationS: 10
                runsPerSet: 2
                scenario: quiet-perihelion
                grid: {integrationPeriods: [8]}
                """.replaceFirst("(?m)^" + field + ": .*$", line);
        FileFormatException e = assertThrows(FileFormatException.class,
                () -> CampaignReader.parse(text, "broken.yaml", null));
        assertEquals(lineNo, e.line(), e.getMessage());
        assertEquals(field, e.field(), e.getMessage());
        assertTrue(e.getMessage().contains(problem), e.getMessage());
    }

    @Test
    void shouldCountTheSetsOfAHugeGridWithoutOverflow() {
        // 16 axes of 4 values: 4^16 = 2^32 sets, which an int product wraps to 0 (JLS §15.17.1)
        StringBuilder grid = new StringBuilder("grid:\n");
        for (TunableParameter t : TunableParameter.values()) {
            grid.append("  ").append(t.key()).append(": [1, 2, 3, 4]\n");
        }
        assertEquals(16, TunableParameter.values().length);
        String text = """
                format: sweepline-campaign/1
                name: huge
                seed: 1
                runsPerSet: 1
                durationS: 10
                scenario: quiet-perihelion
                """ + grid;
        FileFormatException e = assertThrows(FileFormatException.class, () -> CampaignReader.parse(text, "huge.yaml", null));
        assertEquals(7, e.line(), e.getMessage());
        assertTrue(e.getMessage().contains("4294967296 sets x 1 runs is more than 1000000 runs"), e.getMessage());
    }
}
