package dev.sweepline.ground.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
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
import picocli.CommandLine;

class InspectCommandTest {
    @TempDir
    Path dir;

    @Test
    void shouldListEveryFrameAndPacket() throws IOException {
        byte[] s = Hex.stream(GoldenFrames.STREAM);
        s[4 + 60] ^= 0x04; // damage the first frame
        Path in = Files.write(dir.resolve("g.tm"), s);
        StringWriter text = new StringWriter();
        int rc = GroundMain.commandLine().setOut(new PrintWriter(text)).execute("inspect", in.toString());
        String out = text.toString();
        assertEquals(0, rc);
        // 5 good frame lines, one BAD_CRC line (six golden frames, the first damaged)
        assertEquals(5, out.lines().filter(l -> l.startsWith("frame  @")).count());
        assertTrue(out.contains("BAD    @4          BAD_CRC (128 octets)"), out);
        // the spectrum of GoldenFrames: sweep 0x0123 = 291, windows 40..55, peak 47.5; layout 1, so the demo
        // cup (id 1, demo-cup.yaml) with 16-bit samples (ICD §4)
        assertTrue(out.contains("spectrum survey sweep=291 windows 40..55 peak=47.500 compression=0 instrument=1 "
                + "(demo-cup) w=16 layout=1 table=0x0000\n"), out);
        assertTrue(out.contains("packet vc=1 apid=0x110 seq=   45"), out);
        // housekeeping names the interlock state, the table in force and the command counters (ICD §5)
        String hk = out.lines().filter(l -> l.contains("housekeeping mode=")).findFirst().orElseThrow();
        assertTrue(hk.contains(" interlock=") && hk.contains(" table=0x") && hk.contains(" commands accepted="), hk);
    }

    @Test
    void shouldNameModeChangeReasonsAndInterlockStatesAsTheIcdDoes() {
        // telemetry ICD §6, event 1: reason 5 peak jump, 12 fault response; §5: interlock 1 armed
        assertEquals("PEAK_JUMP", dev.sweepline.ground.decode.ModeNames.reason(5));
        assertEquals("FAULT_RESPONSE", dev.sweepline.ground.decode.ModeNames.reason(12));
        assertEquals("reason 99", dev.sweepline.ground.decode.ModeNames.reason(99));
        assertEquals("armed", dev.sweepline.ground.decode.ModeNames.interlock(1));
    }

    @Test
    void shouldListDroppedFramesAndCountThem() throws IOException {
        java.util.List<String> frames = new java.util.ArrayList<>(java.util.List.of(GoldenFrames.STREAM));
        frames.add(3, frames.get(2)); // the third golden frame twice (ICD §10: a repeat)
        Path in = Files.write(dir.resolve("r.tm"), Hex.stream(frames.toArray(new String[0])));
        StringWriter text = new StringWriter();
        int rc = GroundMain.commandLine().setOut(new PrintWriter(text)).execute("inspect", in.toString());
        String out = text.toString();
        assertEquals(0, rc);
        int vcc = dev.sweepline.ground.frame.TmFrameHeader.vcCount(Hex.bytes(frames.get(2)), 0);
        assertTrue(out.contains("DROPPED vc=0 vcc=" + vcc + " DUPLICATE frame"), out);
        assertTrue(out.contains("dropped {DUPLICATE=1}, 0 VC restarts"), out);
        // the spectrum the repeated frame carries a part of comes out once (GoldenFrames: sweep 291)
        assertEquals(1, out.lines().filter(l -> l.contains("spectrum survey sweep=291")).count());
        assertTrue(!out.contains("GAP"), out);
    }
}
