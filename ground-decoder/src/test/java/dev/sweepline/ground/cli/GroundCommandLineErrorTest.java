package dev.sweepline.ground.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sweepline.ground.decode.GoldenFrames;
import dev.sweepline.ground.decode.Hex;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Every error of the ground's command line is one line on stderr naming the option or file and what
 * is wrong, with the exit status of {@link ExitCodes}; the help lists the statuses; help and version.
 */
class GroundCommandLineErrorTest {
    @TempDir
    Path dir;

    private record Run(int status, String out, String err) {
    }

    private static Run run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int rc = GroundMain.commandLine().setOut(new PrintWriter(out, true)).setErr(new PrintWriter(err, true))
                .execute(args);
        return new Run(rc, out.toString(), err.toString());
    }

    private static void assertOneLine(Run r, int status, String... parts) {
        assertEquals(status, r.status(), r.err());
        assertEquals(1, r.err().lines().count(), r.err());
        for (String p : parts) {
            assertTrue(r.err().contains(p), p + " in " + r.err());
        }
        assertFalse(r.err().contains("\tat ") || r.err().contains("Exception"), "no stack trace: " + r.err());
    }

    private Path golden() throws IOException {
        return Files.write(dir.resolve("golden.tm"), Hex.stream(GoldenFrames.STREAM));
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        // telemetry ICD §1: frames of 128..2048 octets
        "--frame-length|100|must be 128..2048 octets or auto, got 100",
        "--frame-length|4096|must be 128..2048 octets or auto, got 4096",
        "--frame-length|big|'big' is not a whole number",
        // CCSDS 132.0-B-3 §4.1.2.2.3: the spacecraft id is a 10-bit field
        "--scid|zz|'zz' is not a whole number",
        "--scid|0x400|must be 0..0x3FF",
        "--allocation|-5|must be above 0, got -5",
        "--allocation|0|must be above 0, got 0"})
    void shouldRefuseABadOptionValueInOneLine(String option, String value, String why) throws IOException {
        Run r = run("decode", golden().toString(), "--out", dir.resolve("o").toString(), option, value);
        assertOneLine(r, ExitCodes.USAGE, "sweepline-ground decode: Invalid value for option '" + option + "'", why);
        assertFalse(Files.exists(dir.resolve("o")));
    }

    @Test
    void shouldBlameTheMissingTableImageNotTheTelemetry() throws IOException {
        Path in = golden();
        Path table = dir.resolve("missing.table");
        Run r = run("decode", in.toString(), "--out", dir.resolve("o").toString(), "--table", table.toString());
        assertOneLine(r, ExitCodes.INPUT, "--table " + table + ": no such file or directory");
        assertFalse(r.err().contains(in.toString()), r.err());
    }

    @Test
    void shouldRefuseATableFileThatIsNoImage() throws IOException {
        Path table = Files.write(dir.resolve("junk.table"), new byte[] {1, 2, 3});
        Run r = run("decode", golden().toString(), "--out", dir.resolve("o").toString(), "--table", table.toString());
        assertOneLine(r, ExitCodes.INPUT, "--table " + table + ": not an intact table image");
    }

    @Test
    void shouldNameAMissingOrFolderTelemetryInput() {
        Path missing = dir.resolve("missing.tm");
        assertOneLine(run("decode", missing.toString(), "--out", dir.resolve("o").toString()), ExitCodes.INPUT,
                missing + ": no such file");
        assertOneLine(run("inspect", dir.toString()), ExitCodes.INPUT, dir + ": is a folder, not a telemetry file");
    }

    @Test
    void shouldRefuseAnOutputThatIsAFileOrUnderOne() throws IOException {
        Path in = golden();
        Path file = Files.write(dir.resolve("plain"), new byte[0]);
        assertOneLine(run("decode", in.toString(), "--out", file.toString()), ExitCodes.IO,
                "--out " + file + ": exists and is not a folder");
        Path under = file.resolve("sub");
        assertOneLine(run("decode", in.toString(), "--out", under.toString()), ExitCodes.IO,
                "--out " + under + ": cannot create the folder");
    }

    @Test
    void shouldRefuseAMissingRequiredOptionInOneLine() throws IOException {
        assertOneLine(run("decode", golden().toString()), ExitCodes.USAGE, "sweepline-ground decode: Missing required",
                "--out");
    }

    @Test
    void shouldListTheExitStatusesAndHaveHelpAndAVersion() {
        Run help = run("help", "decode");
        assertEquals(ExitCodes.OK, help.status());
        for (String line : new String[] {"Exit status:", "2   usage error", "4   input error", "5   I/O error"}) {
            assertTrue(help.out().contains(line), line + " in " + help.out());
        }
        Run version = run("--version");
        assertEquals(ExitCodes.OK, version.status());
        // the Maven build filters version.properties with the project version: never the placeholder
        assertTrue(version.out().startsWith("sweepline-ground ") && !version.out().contains("${")
                && !version.out().contains("unknown"), version.out());
    }
}
