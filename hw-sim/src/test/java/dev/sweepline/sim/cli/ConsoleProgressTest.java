package dev.sweepline.sim.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import org.junit.jupiter.api.Test;

/** Progress when standard output is not a terminal: a plain line at every tenth, no carriage returns. */
class ConsoleProgressTest {
    private long nanos;

    @Test
    void shouldPrintAboutTenPlainLinesWhenNotOnATerminal() {
        ByteArrayOutputStream text = new ByteArrayOutputStream();
        try (ConsoleProgress p = new ConsoleProgress("run calm", " s", false,
                new PrintStream(text, true, StandardCharsets.UTF_8), () -> nanos)) {
            nanos = ConsoleProgress.SHOW_AFTER_NANOS; // long work: past the quiet start
            for (long done = 0; done <= 600; done++) { // 600 updates, as many as a bar would redraw
                nanos += 1_000_000;
                p.step(done, 600);
            }
        }
        String out = text.toString(StandardCharsets.UTF_8);
        assertFalse(out.contains("\r"), out);
        assertEquals(ConsoleProgress.PLAIN_LINES, out.lines().count(), out);
        assertTrue(out.lines().toList().get(0).startsWith("run calm: 60 of 600 s (10 %)"), out);
        assertTrue(out.lines().toList().get(9).startsWith("run calm: 600 of 600 s (100 %)"), out);
    }

    @Test
    void shouldPrintNothingForShortWork() {
        ByteArrayOutputStream text = new ByteArrayOutputStream();
        try (ConsoleProgress p = new ConsoleProgress("tune", " runs", false,
                new PrintStream(text, true, StandardCharsets.UTF_8), () -> nanos)) {
            for (int done = 0; done <= 10; done++) {
                p.step(done, 10); // all within the first 2 s
            }
        }
        assertEquals("", text.toString(StandardCharsets.UTF_8));
    }
}
