package dev.sweepline.fsw.host;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.TimeoutException;
import java.util.function.LongSupplier;

/**
 * The operator's arm-then-fire at the console (hardware ICD §7): prints the caution, arms, takes the
 * confirmation word from {@code --hv-confirm} or from the console within the time-out, and says why
 * the HV was not fired when it was not: a wrong word, the time-out, or no input.
 *
 * <p>Threading: one thread. Time is data: the clock is given (tests give a fake one).
 */
final class HvPrompt {
    /** How the dialogue ended. */
    enum Outcome {
        /** Fired: the HV may be enabled. */
        FIRED,
        /** Another word than {@link HvArming#CONFIRM_WORD}. */
        WRONG_WORD,
        /** No word, or the right one too late, within the time-out. */
        TIMED_OUT,
        /** The console's input ended (closed, or not a terminal). */
        NO_INPUT
    }

    /** Where the confirmation is typed. */
    interface Console {
        /**
         * The next line, trimmed, or null at the end of the input.
         *
         * @throws TimeoutException when no line came within {@code timeoutMillis}
         */
        String readLine(long timeoutMillis) throws TimeoutException;
    }

    /**
     * The outcome and the line that says why the HV was not fired (null when fired).
     *
     * @param outcome how the dialogue ended
     * @param why     the console line for an HV not fired, null when fired
     */
    record Answer(Outcome outcome, String why) {
        /** True when fired. */
        boolean fired() {
            return outcome == Outcome.FIRED;
        }
    }

    private final Console console;
    private final LongSupplier nowMicros;
    private final PrintStream out;

    /** A prompt reading {@code console}, timed by {@code nowMicros}, printing to {@code out}. */
    HvPrompt(Console console, LongSupplier nowMicros, PrintStream out) {
        this.console = console;
        this.nowMicros = nowMicros;
        this.out = out;
    }

    /** The process's standard input as a console (a reader thread per line, abandoned at the time-out). */
    static Console stdin(InputStream in) {
        BufferedReader reader = new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8));
        return timeoutMillis -> {
            CompletableFuture<String> line = CompletableFuture.supplyAsync(() -> {
                try {
                    String s = reader.readLine();
                    return s == null ? null : s.trim();
                } catch (IOException e) {
                    return null; // unreadable input counts as none
                }
            }, HvPrompt::daemon);
            try {
                return line.get(timeoutMillis, TimeUnit.MILLISECONDS);
            } catch (ExecutionException e) {
                return null;
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                return null;
            }
        };
    }

    /** Runs {@code task} on a daemon thread: a reader still blocked after the time-out must not keep the JVM up. */
    private static void daemon(Runnable task) {
        Thread t = new Thread(task, "hv-console");
        t.setDaemon(true);
        t.start();
    }

    /**
     * Arms {@code arming} and confirms it with {@code confirmWord} (from {@code --hv-confirm}), or,
     * when that is null, with what the operator types within the arming's time-out.
     */
    Answer fire(HvArming arming, String confirmWord, long timeoutSeconds) {
        out.println(HvText.CAUTION);
        arming.arm(nowMicros.getAsLong());
        String word = confirmWord;
        if (word == null) {
            out.println("HV ARMED. Type " + HvArming.CONFIRM_WORD + " within " + timeoutSeconds
                    + " s to enable the high voltage; anything else keeps it off.");
            try {
                word = console.readLine(TimeUnit.SECONDS.toMillis(timeoutSeconds));
            } catch (TimeoutException e) {
                arming.disarm();
                return notFired(Outcome.TIMED_OUT, "time-out (no " + HvArming.CONFIRM_WORD + " within "
                        + timeoutSeconds + " s)");
            }
            if (word == null) {
                arming.disarm();
                return notFired(Outcome.NO_INPUT, "no input (standard input closed before "
                        + HvArming.CONFIRM_WORD + " was typed)");
            }
        }
        if (arming.confirm(word, nowMicros.getAsLong()) == HvArming.State.ENABLED) {
            return new Answer(Outcome.FIRED, null);
        }
        if (HvArming.CONFIRM_WORD.equals(word)) {
            return notFired(Outcome.TIMED_OUT, "time-out (" + HvArming.CONFIRM_WORD + " came after "
                    + timeoutSeconds + " s)");
        }
        return notFired(Outcome.WRONG_WORD, "wrong word '" + word + "' (expected " + HvArming.CONFIRM_WORD + ")");
    }

    private static Answer notFired(Outcome outcome, String why) {
        return new Answer(outcome, "HV not fired: " + why + "; running with HV off");
    }
}
