package dev.sweepline.sim.bench;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;

/** Architecture, determinism: same scenario and seed, same decisions, in one JVM and across JVMs. */
class ClosedLoopDeterminismTest {
    @Test
    void shouldRepeatTheDecisionLogHashTwiceInARow() {
        String first = DeterminismProbe.hash("shock-sheath", 11, 60);
        String second = DeterminismProbe.hash("shock-sheath", 11, 60);
        assertEquals(first, second);
    }

    @Test
    void shouldGiveAnotherHashForAnotherSeed() {
        // the instrument noise differs, so gain choices and refined peaks differ somewhere in a minute
        assertNotEquals(DeterminismProbe.hash("quiet-perihelion", 1, 60), DeterminismProbe.hash("quiet-perihelion", 2, 60));
    }

    @Test
    void shouldRepeatTheDecisionLogHashInAnotherJvm() throws IOException, InterruptedException {
        String here = DeterminismProbe.hash("stream-interface", 5, 90);
        Path java = Path.of(System.getProperty("java.home"), "bin", "java");
        Process p = new ProcessBuilder(List.of(java.toString(), "-cp", System.getProperty("java.class.path"),
                DeterminismProbe.class.getName(), "stream-interface", "5", "90"))
                .redirectErrorStream(true).start();
        String out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8).trim();
        p.waitFor(60, TimeUnit.SECONDS);
        assertEquals(0, p.exitValue(), out);
        assertEquals(here, out);
    }
}
