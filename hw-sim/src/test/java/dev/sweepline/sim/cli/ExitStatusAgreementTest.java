package dev.sweepline.sim.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sweepline.fsw.host.FswMain;
import dev.sweepline.ground.cli.GroundMain;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import picocli.CommandLine;

/**
 * The three jars agree: the same exit statuses with the same words in every {@code --help} (the
 * flight software's {@code run} adds status 3, HV off not confirmed), and the same version, the
 * Maven build's.
 */
class ExitStatusAgreementTest {
    private static String output(CommandLine cl, String... args) {
        StringWriter text = new StringWriter();
        cl.setOut(new PrintWriter(text, true));
        assertEquals(0, cl.execute(args));
        return text.toString();
    }

    /** The lines of the help's "Exit status:" section. */
    private static List<String> statuses(String help) {
        List<String> lines = new ArrayList<>();
        boolean in = false;
        for (String line : help.lines().toList()) {
            if (line.startsWith("Exit status:")) {
                in = true;
            } else if (in && line.matches("\\s+\\d\\s.*")) {
                lines.add(line.trim().replaceAll("\\s+", " "));
            } else if (in && !line.isBlank() && !line.startsWith(" ")) {
                in = false;
            }
        }
        return lines;
    }

    @Test
    void shouldListTheSameExitStatusesInAllThreeJars() {
        List<String> fsw = statuses(output(FswMain.commandLine(), "run", "--help"));
        List<String> bench = statuses(output(BenchMain.commandLine(), "run", "--help"));
        List<String> ground = statuses(output(GroundMain.commandLine(), "decode", "--help"));
        assertEquals(6, bench.size(), bench.toString()); // ExitStatus: 0, 1, 2, 4, 5, 6
        assertEquals(bench, ground);
        List<String> fswWithoutHv = new ArrayList<>(fsw);
        assertTrue(fswWithoutHv.removeIf(l -> l.startsWith("3 HV off NOT confirmed")), fsw.toString());
        assertEquals(bench, fswWithoutHv);
        for (String sub : new String[] {"tune", "budget", "serve", "merge"}) {
            assertEquals(bench, statuses(output(BenchMain.commandLine(), sub, "--help")), sub);
        }
    }

    @Test
    void shouldPrintOneVersionInAllThreeJars() {
        String fsw = output(FswMain.commandLine(), "--version").trim();
        String bench = output(BenchMain.commandLine(), "--version").trim();
        String ground = output(GroundMain.commandLine(), "--version").trim();
        String version = bench.substring("sweepline-bench ".length());
        assertEquals("sweepline-fsw " + version, fsw);
        assertEquals("sweepline-ground " + version, ground);
        // version.properties is filtered by the Maven build: the pom's project version, never the placeholder
        assertFalse(version.contains("${") || version.equals("unknown"), version);
    }

    @Test
    void shouldHaveAHelpCommandInAllThreeJars() {
        assertTrue(output(FswMain.commandLine(), "help", "run").contains("Usage: sweepline-fsw run"));
        assertTrue(output(BenchMain.commandLine(), "help", "run").contains("Usage: sweepline-bench run"));
        assertTrue(output(GroundMain.commandLine(), "help", "decode").contains("Usage: sweepline-ground decode"));
    }
}
