package dev.sweepline.sim.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sweepline.fsw.host.ExitStatus;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.PrintStream;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * Every error of the bench's command line is one line on stderr naming the command, the option or
 * file and what is wrong, with its {@link ExitStatus}; a bad value is refused before any work.
 */
class BenchCommandLineErrorTest {
    static final String CAMPAIGN = "src/main/resources/campaigns/perihelion-tuning.yaml";
    static final String PLAN = "src/main/resources/plans/cinder-orbit.yaml";
    @TempDir
    Path dir;

    /** A command's exit status, its standard output and its standard error. */
    record Run(int status, String out, String err) {
    }

    /** Runs the bench's command line in process, capturing both streams. */
    static Run run(String... args) {
        return run(cl -> { }, args);
    }

    /** As {@link #run(String...)}, {@code setup} given the command line first (to set a command's fields). */
    static synchronized Run run(java.util.function.Consumer<picocli.CommandLine> setup, String... args) {
        StringWriter err = new StringWriter();
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        PrintStream stdout = System.out;
        PrintStream stderr = System.err;
        int status;
        try {
            System.setOut(new PrintStream(out, true, StandardCharsets.UTF_8));
            System.setErr(new PrintStream(out, true, StandardCharsets.UTF_8));
            picocli.CommandLine commandLine = BenchMain.commandLine();
            setup.accept(commandLine);
            status = commandLine.setErr(new PrintWriter(err, true)).execute(args);
        } finally {
            System.setOut(stdout);
            System.setErr(stderr);
        }
        return new Run(status, out.toString(StandardCharsets.UTF_8), err.toString());
    }

    static void assertOneLine(Run r, int status, String... parts) {
        assertEquals(status, r.status(), r.err() + r.out());
        assertEquals(1, r.err().lines().count(), r.err());
        for (String p : parts) {
            assertTrue(r.err().contains(p), p + " in " + r.err());
        }
        assertFalse(r.err().contains("\tat ") || r.err().contains("Exception"), "no stack trace: " + r.err());
    }

    @Test
    void shouldNameAMissingCommandScript() {
        Path script = dir.resolve("MISSING");
        Run r = run("run", "--commands", script.toString(), "--minutes", "0.05", "--out", dir.resolve("o").toString());
        assertOneLine(r, ExitStatus.INPUT, "sweepline-bench run: --commands " + script + ": no such file");
        assertFalse(Files.exists(dir.resolve("o")));
    }

    @Test
    void shouldNameAFolderGivenAsAScenario() {
        Run r = run("run", "--scenario", dir.toString(), "--minutes", "0.05", "--out", dir.resolve("o").toString());
        assertOneLine(r, ExitStatus.INPUT, "--scenario " + dir + ": is a folder, not a scenario file");
    }

    @ParameterizedTest
    @ValueSource(strings = {"run", "tune", "budget"})
    void shouldRefuseAnOutputThatIsAFileOrUnderOne(String command) throws IOException {
        Path file = Files.write(dir.resolve("plain"), new byte[0]);
        Path under = file.resolve("sub");
        for (Path out : new Path[] {file, under}) {
            String[] args = switch (command) {
                case "run" -> new String[] {"run", "--minutes", "0.05", "--no-ground", "--out", out.toString()};
                case "tune" -> new String[] {"tune", CAMPAIGN, "--threads", "1", "--out", out.toString()};
                default -> new String[] {"budget", PLAN, "--threads", "1", "--out", out.toString()};
            };
            Run r = run(args);
            assertOneLine(r, ExitStatus.IO, "sweepline-bench " + command + ": --out " + out + ": ",
                    out == file ? "exists and is not a folder" : "cannot create the folder");
        }
    }

    @Test
    void shouldNameASerialPortThatDoesNotOpen() {
        Path tty = dir.resolve("ttyNOPE");
        Run r = run("serve", "--port", tty.toString(), "--as-fast-as-possible");
        assertOneLine(r, ExitStatus.IO, "sweepline-bench serve: --port " + tty + ": cannot open it");
    }

    @Test
    void shouldAskForTheShardFoldersOfAMerge() {
        Run r = run("merge", CAMPAIGN, "--out", dir.resolve("m").toString());
        assertOneLine(r, ExitStatus.USAGE, "sweepline-bench merge: Missing required parameter: 'SHARD_DIR'");
    }

    @Test
    void shouldNameAShardFolderWithoutRuns() throws IOException {
        Path shard = Files.createDirectories(dir.resolve("shard-1"));
        Run r = run("merge", CAMPAIGN, shard.toString(), "--out", dir.resolve("m").toString());
        assertOneLine(r, ExitStatus.INPUT, "sweepline-bench merge: merge error: ", shard.toString());
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "tune|0,99|set 99 is outside the campaign's sets 0..",
        "tune|-1,2|set -1 is outside the campaign's sets 0..",
        "tune|1,1|name two different sets",
        "tune|1|expected two set numbers A,B",
        "merge|2,x|expected two set numbers A,B",
        "merge|0,99|set 99 is outside the campaign's sets 0.."})
    void shouldRefuseACompareOutsideTheCampaignsSetsBeforeAnyWork(String command, String value, String why)
            throws IOException {
        Path out = dir.resolve("o");
        Path shard = Files.createDirectories(dir.resolve("shard-1"));
        Run r = run(command.equals("tune") ? new String[] {"tune", CAMPAIGN, "--out", out.toString(), "--compare", value}
                : new String[] {"merge", CAMPAIGN, shard.toString(), "--out", out.toString(), "--compare", value});
        assertOneLine(r, ExitStatus.USAGE, "sweepline-bench " + command + ": --compare " + value + ": " + why);
        assertFalse(Files.exists(out));
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "run|--allocation|-5|must be above 0, got -5",
        "run|--baud|0|must be 1 to 2147483647, got 0",
        "run|--minutes|-1|must be above 0, got -1",
        "run|--minutes|NaN|'NaN' is not a finite number",
        "tune|--threads|0|must be 1 to 2147483647, got 0",
        "tune|--jit|c2|expected c1 or tiered, got 'c2'",
        "budget|--threads|0|must be 1 to 2147483647, got 0",
        "serve|--baud|0|must be 1 to 2147483647, got 0",
        "serve|--speed|-1|must be 0 or more, got -1",
        "serve|--ber|2|must be a probability, 0 to 1, got 2",
        "serve|--drop|-0.1|must be a probability, 0 to 1, got -0.1",
        "serve|--stall-ms|-1|must be 0 or more, got -1"})
    void shouldRefuseAnOutOfRangeValueBeforeAnyWork(String command, String option, String value, String why) {
        Path out = dir.resolve("o");
        String[] args = switch (command) {
            case "run" -> new String[] {"run", "--out", out.toString(), option, value};
            case "tune" -> new String[] {"tune", CAMPAIGN, "--out", out.toString(), option, value};
            case "budget" -> new String[] {"budget", PLAN, "--out", out.toString(), option, value};
            default -> new String[] {"serve", "--port", "tcp::1", option, value};
        };
        Run r = run(args);
        assertOneLine(r, ExitStatus.USAGE, "sweepline-bench " + command + ": Invalid value for option '" + option + "'",
                why);
        assertFalse(Files.exists(out));
    }

    @Test
    void shouldSayTheLinkLoadAndAllocationWarningsAndExitWithTheWarningsStatus() throws IOException {
        Path out = dir.resolve("o");
        Run r = run("run", "--minutes", "0.05", "--no-ground", "--baud", "9600", "--allocation", "3000", "--out",
                out.toString());
        assertEquals(ExitStatus.WARNINGS, r.status(), r.out() + r.err());
        // LinkBudget: the demo cup's focus steps at 9600 baud, 8N1, load the line about 2.2 times over
        // (the figure summary.json's linkLoad carries; hardware ICD §6 warns above 80 %)
        assertTrue(r.out().lines().anyMatch(l -> l.startsWith("warning: --baud 9600: the focus sweep loads the serial link")
                && l.contains("above 80 %")), r.out());
        assertTrue(r.out().lines().anyMatch(l -> l.startsWith("warning: --allocation 3000: the telemetry's")), r.out());
        String summary = Files.readString(out.resolve("summary.json"));
        assertTrue(summary.replaceAll("\\s", "").contains("\"warning\":true"), summary);
    }

    @Test
    void shouldSummariseTheHoursAStoreOverflowsOnePhasePerLine() throws IOException {
        Path plan = Files.writeString(dir.resolve("small-store.yaml"),
                Files.readString(Path.of(PLAN)).replace("storageMegabits: 8000", "storageMegabits: 10"));
        Run r = run("budget", plan.toString(), "--threads", "2", "--out", dir.resolve("b").toString());
        assertEquals(ExitStatus.WARNINGS, r.status(), r.out() + r.err());
        long storeLines = r.out().lines().filter(l -> l.contains("the store holds more than its 10.0 Mbit")).count();
        // three phases in cinder-orbit.yaml: at most one line each, however many hours overflow
        assertTrue(storeLines >= 1 && storeLines <= 3, r.out());
        assertTrue(r.out().contains("hours over; fullest hour"), r.out());
    }
}
