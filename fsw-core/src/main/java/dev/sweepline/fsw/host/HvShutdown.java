package dev.sweepline.fsw.host;

import dev.sweepline.fsw.exec.FlightSoftware;
import dev.sweepline.fsw.link.FramedInstrumentLink;
import dev.sweepline.fsw.link.LinkWatchdog;
import dev.sweepline.fsw.link.SampleReply;
import dev.sweepline.fsw.link.StepCommand;
import java.io.PrintStream;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.function.LongSupplier;

/**
 * The end of every {@code sweepline-fsw.jar run}, whatever ended it (hardware ICD §4.2): withdraws the
 * host's HV permission ({@link FlightSoftware#operatorInhibitHv()}, {@link HvArming#disarm()}), sends
 * the electronics explicit HV-off steps (flags bit 0 clear, both levels 0) and waits, at most
 * {@link #CONFIRM_WAIT_MICROS}, for a reply to one of them that says HV off (status bit 2) with the
 * HV monitor below {@link #OFF_THRESHOLD_CODES}. It prints what it saw, once.
 *
 * <p>Idempotent: the first caller of {@link #run} does the work; any later or concurrent caller waits
 * for that run and gets its result, so the shutdown hook and the run's own end never both drive
 * the link.
 *
 * <p>Threading: any thread, one at a time by construction; the link is used only by the thread that
 * claimed the run. Time is data: the clock and the pause between polls are given (tests give fakes).
 */
public final class HvShutdown {
    /**
     * HV monitor reading below which the HV counts as off, DAC codes (hardware ICD §4.2): 300 codes,
     * 30 V at the nominal 0.1 V per code. Half the 60 V DC limit of the extra-low-voltage class of
     * the usual equipment-safety standards (ES1 / SELV, [memory]) and far above the off reading of
     * the simulated electronics (offset and noise: about 8 ± 5 codes), so noise never withholds the
     * confirmation and a rail still at a hazardous level never gives it.
     */
    public static final int OFF_THRESHOLD_CODES = 300;
    /**
     * Longest wait for the confirmation, microseconds (hardware ICD §4.2): 3 s, the electronics' link
     * watchdog ({@link LinkWatchdog#TIMEOUT_MICROS}, 2 s) plus 1 s, so that when the host
     * cannot confirm, electronics whose watchdog works have switched the HV off by the time the run
     * reports it.
     */
    public static final long CONFIRM_WAIT_MICROS = LinkWatchdog.TIMEOUT_MICROS + 1_000_000L;
    /**
     * Wait for the reply to one HV-off step before a fresh one goes out, microseconds (hardware ICD
     * §4.2): ten times the step's 11 ms plus the 3.3 ms wire time of both frames at 115200 baud (§6).
     */
    public static final long RESEND_MICROS = 100_000L;
    /** Settle time of the HV-off step: the rails fall for 10 ms before the monitor is read (hardware ICD §4.2). */
    public static final int OFF_STEP_SETTLE_MICROS = 10_000;
    /** Pause between polls of the link, microseconds (a tenth of the HV-off step's duration). */
    static final long POLL_MICROS = 1_000L;
    /** How much longer than the confirmation a second caller waits for the first one's result, milliseconds. */
    private static final long SECOND_CALLER_SLACK_MILLIS = 1_000L;
    private static final int SEQUENCE_MASK = 0xFFFF;

    /**
     * What the shutdown saw.
     *
     * @param confirmed   true when a reply said HV off with the monitor below the threshold
     * @param monitorCode the last HV monitor reading of a reply to an HV-off step, -1 when none came
     * @param stepsSent   HV-off steps sent
     * @param text        the line printed
     */
    public record Result(boolean confirmed, int monitorCode, int stepsSent, String text) {
    }

    /** Waits between polls of the link. */
    public interface Pause {
        /** Pauses about {@code micros}. */
        void pause(long micros);
    }

    private final FlightSoftware fsw;
    private final HvArming arming;
    private final FramedInstrumentLink link;
    private final LongSupplier nowMicros;
    private final Pause pause;
    private final PrintStream out;
    private final StepCommand off = new StepCommand();
    private final SampleReply reply = new SampleReply();
    private final AtomicBoolean claimed = new AtomicBoolean();
    private final CountDownLatch done = new CountDownLatch(1);
    private volatile Result result;

    /**
     * A shutdown of {@code fsw}'s HV over {@code link}, printing to {@code out}.
     *
     * @param nowMicros the wall clock, microseconds (not a simulated run time)
     * @param pause     what waits between polls
     */
    public HvShutdown(FlightSoftware fsw, HvArming arming, FramedInstrumentLink link, LongSupplier nowMicros,
            Pause pause, PrintStream out) {
        this.fsw = fsw;
        this.arming = arming;
        this.link = link;
        this.nowMicros = nowMicros;
        this.pause = pause;
        this.out = out;
    }

    /** A pause that parks the thread. */
    public static Pause parking() {
        return micros -> java.util.concurrent.locks.LockSupport.parkNanos(micros * 1_000);
    }

    /**
     * Commands the HV off and waits for the confirmation, or, when another caller got here first,
     * waits for that caller's result.
     *
     * @param why what ended the run, for the printed line
     */
    public Result run(String why) {
        if (!claimed.compareAndSet(false, true)) {
            return awaitResult(TimeUnit.MICROSECONDS.toMillis(CONFIRM_WAIT_MICROS) + SECOND_CALLER_SLACK_MILLIS);
        }
        Result r;
        try {
            r = shutDown();
        } catch (RuntimeException e) {
            r = new Result(false, -1, 0, "HV off NOT confirmed: " + e);
        }
        result = new Result(r.confirmed(), r.monitorCode(), r.stepsSent(), r.text() + " (run ended: " + why + ")");
        out.println(result.text());
        done.countDown();
        return result;
    }

    /**
     * For the shutdown hook: gives the run's own thread {@code graceMillis} to claim the shutdown (it
     * does so as soon as its loop returns), and runs it here when that thread did not (stuck, e.g. in
     * a blocked write); then waits for the result.
     */
    public Result awaitOrRun(long graceMillis, String why) {
        long deadline = System.nanoTime() + TimeUnit.MILLISECONDS.toNanos(graceMillis);
        while (!claimed.get() && System.nanoTime() - deadline < 0) {
            pause.pause(POLL_MICROS);
        }
        return run(why);
    }

    /** True once a caller has started the shutdown. */
    public boolean started() {
        return claimed.get();
    }

    /** The result, null until a run has finished. */
    public Result result() {
        return result;
    }

    private Result awaitResult(long millis) {
        try {
            if (!done.await(millis, TimeUnit.MILLISECONDS)) {
                return new Result(false, -1, 0, "HV off NOT confirmed: the shutdown in progress did not finish");
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
        return result;
    }

    private Result shutDown() {
        arming.disarm();
        fsw.operatorInhibitHv();
        long start = nowMicros.getAsLong();
        long deadline = start + CONFIRM_WAIT_MICROS;
        // fresh numbers after the executive's last step, so the electronics never take one for a repeat (§4)
        int firstSequence = (fsw.executive().currentStep().sequence + 1) & SEQUENCE_MASK;
        int sent = 0;
        int monitor = -1;
        boolean awaiting = false;
        long sentMicros = start;
        for (long now = start; now - deadline <= 0; now = nowMicros.getAsLong()) {
            if (link.ended()) {
                return new Result(false, monitor, sent, "HV off NOT confirmed: link lost (the transport ended) after "
                        + sent + " HV-off step(s); " + watchdogNote());
            }
            if (!awaiting || now - sentMicros > RESEND_MICROS) {
                offStep((firstSequence + sent) & SEQUENCE_MASK);
                if (link.send(off, now)) {
                    awaiting = true;
                    sentMicros = now;
                    sent++;
                }
            }
            while (link.poll(reply, now)) {
                // a reply to any HV-off step sent counts (as exec E2); the last step's late reply does not
                if (((reply.sequence - firstSequence) & SEQUENCE_MASK) < sent) {
                    awaiting = false;
                    monitor = reply.hvMonitorCode;
                    if ((reply.status & SampleReply.STATUS_HV_OFF) != 0 && monitor < OFF_THRESHOLD_CODES) {
                        return new Result(true, monitor, sent, "HV off confirmed: monitor " + monitor
                                + " codes (below " + OFF_THRESHOLD_CODES + ", after " + sent + " HV-off step(s), "
                                + (now - start) / 1_000 + " ms)");
                    }
                }
            }
            pause.pause(POLL_MICROS);
        }
        String seen;
        if (sent == 0) {
            seen = "no HV-off step could be sent (the link takes no octets)";
        } else if (monitor < 0) {
            seen = "no reply to " + sent + " HV-off step(s)";
        } else {
            seen = "monitor still " + monitor + " codes (threshold " + OFF_THRESHOLD_CODES + ")";
        }
        return new Result(false, monitor, sent, "HV off NOT confirmed: " + seen + " within "
                + CONFIRM_WAIT_MICROS / 1_000 + " ms; " + watchdogNote());
    }

    private static String watchdogNote() {
        return "the electronics' link watchdog (hardware ICD §4.1) must switch the HV off; check it before "
                + "approaching the cup";
    }

    /** The HV-off step of the hardware ICD §4.2: flags bit 0 clear, both levels 0, 10 ms settle, one period. */
    private void offStep(int sequence) {
        off.sequence = sequence;
        off.window = 0;
        off.dacLow = 0;
        off.dacHigh = 0;
        off.gainRange = 0;
        off.settleMicros = OFF_STEP_SETTLE_MICROS;
        off.integrationPeriods = 1;
        off.hvEnabled = false;
    }
}
