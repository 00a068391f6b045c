package dev.sweepline.fsw.host;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.util.concurrent.TimeoutException;
import org.junit.jupiter.api.Test;

/** The arm-then-fire dialogue says why the HV was not fired (hardware ICD §7); time-outs on a fake clock. */
class HvPromptTest {
    private static final long TIMEOUT_S = 30; // HvArming default
    private final ByteArrayOutputStream printed = new ByteArrayOutputStream();
    private long nowMicros;

    private HvPrompt.Answer fire(HvPrompt.Console console, String confirm) {
        HvArming arming = new HvArming(TIMEOUT_S * 1_000_000L);
        HvPrompt.Answer a = new HvPrompt(console, () -> nowMicros, new PrintStream(printed, true, StandardCharsets.UTF_8))
                .fire(arming, confirm, TIMEOUT_S);
        assertEquals(a.fired(), arming.hvAllowed());
        return a;
    }

    /** A console where the operator types {@code line} after {@code typingMicros} of fake time. */
    private HvPrompt.Console typing(String line, long typingMicros) {
        return timeoutMillis -> {
            nowMicros += typingMicros;
            return line;
        };
    }

    @Test
    void shouldFireOnTheWordWithinTheTimeOut() {
        HvPrompt.Answer a = fire(typing("FIRE", TIMEOUT_S * 1_000_000L), null); // at T: in time
        assertTrue(a.fired());
        assertNull(a.why());
        assertTrue(printed.toString(StandardCharsets.UTF_8).contains("HV ARMED. Type FIRE within 30 s"));
    }

    @Test
    void shouldSayWrongWord() {
        HvPrompt.Answer a = fire(typing("fire", 1), null);
        assertEquals(HvPrompt.Outcome.WRONG_WORD, a.outcome());
        assertEquals("HV not fired: wrong word 'fire' (expected FIRE); running with HV off", a.why());
        assertEquals(HvPrompt.Outcome.WRONG_WORD, fire(typing("x", 1), "FIRE!").outcome()); // --hv-confirm too
    }

    @Test
    void shouldSayTimeOutForTheRightWordOneMicrosecondLate() {
        HvPrompt.Answer a = fire(typing("FIRE", TIMEOUT_S * 1_000_000L + 1), null); // T+1
        assertEquals(HvPrompt.Outcome.TIMED_OUT, a.outcome());
        assertEquals("HV not fired: time-out (FIRE came after 30 s); running with HV off", a.why());
    }

    @Test
    void shouldSayTimeOutWhenNothingWasTyped() {
        long[] askedMillis = {-1};
        HvPrompt.Answer a = fire(timeoutMillis -> {
            askedMillis[0] = timeoutMillis;
            throw new TimeoutException();
        }, null);
        assertEquals(TIMEOUT_S * 1_000, askedMillis[0]); // the console waits the arming's time-out
        assertEquals(HvPrompt.Outcome.TIMED_OUT, a.outcome());
        assertEquals("HV not fired: time-out (no FIRE within 30 s); running with HV off", a.why());
    }

    @Test
    void shouldSayNoInputWhenStandardInputIsClosed() {
        HvPrompt.Answer a = fire(HvPrompt.stdin(new ByteArrayInputStream(new byte[0])), null);
        assertEquals(HvPrompt.Outcome.NO_INPUT, a.outcome());
        assertEquals("HV not fired: no input (standard input closed before FIRE was typed); running with HV off",
                a.why());
    }

    @Test
    void shouldTakeTheConfirmationFlagWithoutReadingTheConsole() {
        HvPrompt.Answer a = fire(timeoutMillis -> {
            throw new AssertionError("the console must not be read with --hv-confirm");
        }, "FIRE");
        assertTrue(a.fired());
        assertFalse(printed.toString(StandardCharsets.UTF_8).contains("HV ARMED"));
        assertTrue(printed.toString(StandardCharsets.UTF_8).contains("HIGH VOLTAGE")); // the caution, always
    }
}
