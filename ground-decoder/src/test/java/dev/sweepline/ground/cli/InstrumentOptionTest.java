package dev.sweepline.ground.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.sweepline.ground.decode.GoldenFrames;
import dev.sweepline.ground.decode.GoldenSpectraV2;
import dev.sweepline.ground.decode.Hex;
import java.io.IOException;
import java.io.InputStream;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

/** {@code --instrument NAME|FILE} of decode and inspect, and the {@code instruments} listing (FORMAT.md). */
class InstrumentOptionTest {
    @TempDir
    Path dir;

    private static String demoText() throws IOException {
        try (InputStream in = InstrumentOptionTest.class.getResourceAsStream("/instruments/demo-cup.yaml")) {
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        }
    }

    private record Run(int status, String out, String err) {
    }

    private static Run run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int rc = GroundMain.commandLine().setOut(new PrintWriter(out)).setErr(new PrintWriter(err)).execute(args);
        return new Run(rc, out.toString(), err.toString());
    }

    @Test
    void shouldListTheBuiltIns() {
        Run r = run("instruments");
        assertEquals(0, r.status());
        // demo-cup.yaml: id 1, 128 windows 50-6000 V, rated 6000 V, 16-bit ADC, 3 ranges from 40 pA, ×32
        assertTrue(r.out().contains("demo-cup         1     128  50-6000              6000 V       16  "
                + "3: 40 pA, 1.28 nA, 40.96 nA"), r.out());
        // fine-cup.yaml: id 2, 256 windows 100-8000 V, 20-bit ADC, 2 ranges from 80 pA, ×256
        assertTrue(r.out().contains("fine-cup         2     256  100-8000             8000 V       20  "
                + "2: 80 pA, 20.48 nA"), r.out());
    }

    @Test
    void shouldRefuseTheSpectraOfAnInstrumentNotGivenAndCountThem() throws IOException {
        Path in = Files.write(dir.resolve("g.tm"), Hex.stream(GoldenFrames.STREAM));
        Path out = dir.resolve("out");
        // the golden stream's spectrum is layout 1, the demo cup's (ICD §4): with fine-cup alone it is refused
        Run r = run("decode", in.toString(), "--out", out.toString(), "--instrument", "fine-cup");
        assertEquals(0, r.status(), r.err());
        JsonNode s = new ObjectMapper().readTree(out.resolve("summary.json").toFile());
        assertEquals(1, s.get("spectrumErrors").get("UNKNOWN_INSTRUMENT").asInt());
        assertEquals(4, s.get("housekeeping").asInt()); // the rest of the stream decodes (GoldenFrames: 4 packets)
    }

    @Test
    void shouldDecodeWithADescriptionFileAndShowIdAndWidth() throws IOException {
        // a third cup: demo-cup.yaml under another name and the id 7 of GoldenSpectraV2.UNKNOWN_ID
        Path seven = Files.writeString(dir.resolve("seven-cup.yaml"),
                demoText().replace("name: demo-cup", "name: seven-cup").replace("\nid: 1\n", "\nid: 7\n"));
        Path in = Files.write(dir.resolve("v2.tm"), Hex.stream(GoldenSpectraV2.STREAM));
        Run r = run("inspect", in.toString(), "--instrument", seven.toString(), "--instrument", "demo-cup");
        assertEquals(0, r.status(), r.err());
        assertTrue(r.out().contains("spectrum focus sweep=256 windows 60..63 peak=none compression=0 instrument=7 "
                + "(seven-cup) w=16 layout=2 table=0x0000\n"), r.out());
        assertTrue(r.out().contains("instrument=1 (demo-cup) w=16 layout=2"), r.out());
        // fine-cup (id 2) is not configured: its two spectra and the 16-bit one with its id are refused
        assertTrue(r.out().contains("SPECTRUM ERROR apid=0x100 seq=3 UNKNOWN_INSTRUMENT instrument id 2: no description "
                + "(the ground has seven-cup (id 7), demo-cup (id 1))"), r.out());
        assertTrue(r.out().contains("spectrum errors {UNKNOWN_INSTRUMENT=3}"), r.out());
    }

    @Test
    void shouldStopOnABrokenDescriptionNamingFileLineAndField() throws IOException {
        Path broken = Files.writeString(dir.resolve("broken.yaml"), demoText().replace("  count: 128", "  count: 300"));
        Path in = Files.write(dir.resolve("g.tm"), Hex.stream(GoldenFrames.STREAM));
        int line = demoText().substring(0, demoText().indexOf("  count: 128")).split("\n", -1).length;
        for (String cmd : new String[] {"inspect", "decode"}) {
            Run r = cmd.equals("decode")
                    ? run(cmd, in.toString(), "--out", dir.resolve("o").toString(), "--instrument", broken.toString())
                    : run(cmd, in.toString(), "--instrument", broken.toString());
            // exit 4: an input error (ExitCodes), one line; FORMAT.md windows.count 1..256
            assertEquals(ExitCodes.INPUT, r.status(), cmd);
            assertEquals(1, r.err().lines().count(), r.err());
            assertTrue(r.err().startsWith("sweepline-ground " + cmd + ": --instrument: " + broken + ":" + line
                    + ": windows.count: must be a whole number 1..256, got 300"), r.err());
        }
        Run r = run("inspect", in.toString(), "--instrument", "no-such-cup");
        assertEquals(ExitCodes.INPUT, r.status());
        assertTrue(r.err().contains("neither a built-in instrument (demo-cup, fine-cup) nor a readable description file"),
                r.err());
    }
}
