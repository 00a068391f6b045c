package dev.sweepline.fsw.host;

import dev.sweepline.fsw.DemoCup;
import dev.sweepline.fsw.exec.FlightSoftware;
import dev.sweepline.fsw.link.FramedInstrumentLink;
import dev.sweepline.fsw.link.PipeTransport;
import dev.sweepline.fsw.sweep.SweepListener;
import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The end of every run (hardware ICD §4.2): permission withdrawn, HV-off steps, the readback confirmed
 * below the threshold within the bound, or not. One thread and a fake clock: each pause advances the
 * clock and lets the fake electronics answer, so the bound is tested at its deadline and just past it.
 */
class HvShutdownTest {
    private final PipeTransport[] ends = PipeTransport.pair(1 << 16);
    private final FakeElectronics electronics = new FakeElectronics(ends[1]);
    private final FramedInstrumentLink link = new FramedInstrumentLink(ends[0], DemoCup.INSTRUMENT);
    private final HvArming arming = new HvArming(HvArming.DEFAULT_TIMEOUT_MICROS);
    private final FlightSoftware fsw = new FlightSoftware(DemoCup.config(), new HvGuardLink(link, arming),
            (b, off, len) -> { }, SweepListener.NONE);
    private final ByteArrayOutputStream printed = new ByteArrayOutputStream();
    private long nowMicros;
    /** Fake time from which the electronics read their frames (before it the frames wait on the line). */
    private long answerFromMicros;

    private HvShutdown shutdown() {
        return new HvShutdown(fsw, arming, link, () -> nowMicros, micros -> {
            nowMicros += micros;
            if (nowMicros >= answerFromMicros) {
                electronics.doWork();
            }
        }, new PrintStream(printed, true, StandardCharsets.UTF_8));
    }

    private void fire() {
        arming.arm(0);
        arming.confirm(HvArming.CONFIRM_WORD, 0);
        fsw.operatorFireHv(0);
    }

    @Test
    void shouldWithdrawThePermissionSendAnHvOffStepAndConfirmTheReadback() {
        fire();
        HvShutdown.Result r = shutdown().run("planned end reached");
        assertTrue(r.confirmed());
        assertEquals(FakeElectronics.OFF_READING_CODES, r.monitorCode());
        assertEquals(1, r.stepsSent());
        assertEquals(HvArming.State.OFF, arming.state());
        assertFalse(fsw.hv().enabled()); // the core interlock too (commands.md §2.3)
        assertFalse(fsw.scheduler().hvPermitted());
        // the HV-off step of the hardware ICD §4.2: flags bit 0 clear, both levels 0
        assertFalse(electronics.last.hvEnabled);
        assertEquals(0, electronics.last.dacLow);
        assertEquals(0, electronics.last.dacHigh);
        assertEquals(1, electronics.hvOffSteps);
        assertTrue(printed.toString(StandardCharsets.UTF_8).startsWith("HV off confirmed: monitor 8 codes"),
                printed.toString(StandardCharsets.UTF_8));
    }

    @Test
    void shouldIgnoreTheLateReplyOfTheLastStepAndNumberTheOffStepAfterIt() {
        fire();
        fsw.doWork(0); // the executive's step goes out with the HV on, its reply not yet read
        electronics.doWork();
        int last = fsw.executive().currentStep().sequence;
        HvShutdown.Result r = shutdown().run("planned end reached");
        assertTrue(r.confirmed());
        assertEquals(FakeElectronics.OFF_READING_CODES, r.monitorCode()); // not the HV-on step's monitor
        assertEquals(last + 1, electronics.last.sequence); // a fresh number: no repeat for the electronics (§4)
    }

    @Test
    void shouldNotConfirmWhileTheMonitorStaysAboveTheThreshold() {
        fire();
        electronics.offMonitorCode = HvShutdown.OFF_THRESHOLD_CODES; // at the threshold is not below it
        HvShutdown.Result r = shutdown().run("planned end reached");
        assertFalse(r.confirmed());
        assertEquals(HvShutdown.OFF_THRESHOLD_CODES, r.monitorCode());
        assertTrue(r.text().startsWith("HV off NOT confirmed: monitor still 300 codes"), r.text());
        assertTrue(nowMicros - HvShutdown.CONFIRM_WAIT_MICROS <= HvShutdown.POLL_MICROS, "bounded by the wait");
        assertTrue(r.stepsSent() > 100, "a fresh reading after each reply; got " + r.stepsSent());
    }

    @Test
    void shouldTakeAReplyAtTheDeadlineButNotOnePollLater() {
        fire();
        answerFromMicros = HvShutdown.CONFIRM_WAIT_MICROS; // the first answer is read at the deadline: in time
        assertTrue(shutdown().run("planned end reached").confirmed());

        HvShutdownTest late = new HvShutdownTest();
        late.fire();
        late.answerFromMicros = HvShutdown.CONFIRM_WAIT_MICROS + 1; // next poll is past the deadline
        HvShutdown.Result r = late.shutdown().run("planned end reached");
        assertFalse(r.confirmed());
        assertTrue(r.text().startsWith("HV off NOT confirmed: no reply to"), r.text());
    }

    @Test
    void shouldResendTheOffStepWhenItsReplyDoesNotComeAndGiveUpAtTheBound() {
        fire();
        electronics.silent = true; // the steps arrive, the replies never come back
        HvShutdown.Result r = shutdown().run("link lost: no replies");
        assertFalse(r.confirmed());
        assertEquals(-1, r.monitorCode());
        // a fresh step when the last one is more than 100 ms (RESEND_MICROS) unanswered: at 0, 101 ms, ...,
        // 29 x 101 ms = 2.929 s; the 31st would be at 3.030 s, past the 3 s bound
        assertEquals(30, r.stepsSent());
        assertEquals(30, electronics.steps);
        assertTrue(r.text().contains("link watchdog (hardware ICD §4.1)"), r.text());
        assertTrue(r.text().endsWith("(run ended: link lost: no replies)"), r.text());
    }

    @Test
    void shouldReportALostLinkAtOnce() {
        fire();
        ends[1].close(); // the electronics' end is gone
        HvShutdown.Result r = shutdown().run("link lost: the transport ended");
        assertFalse(r.confirmed());
        assertTrue(r.text().startsWith("HV off NOT confirmed: link lost"), r.text());
        assertTrue(nowMicros <= HvShutdown.POLL_MICROS, "no waiting on a dead link");
    }

    @Test
    void shouldRunOnceWhoeverCallsItAndHowOften() {
        fire();
        HvShutdown s = shutdown();
        HvShutdown.Result first = s.run("planned end reached");
        long sent = electronics.steps;
        assertSame(first, s.run("stopped by a signal (shutdown hook)"));
        assertSame(first, s.awaitOrRun(0, "stopped by a signal (shutdown hook)"));
        assertEquals(sent, electronics.steps); // no second HV-off sequence
        assertEquals(1, printed.toString(StandardCharsets.UTF_8).lines().count()); // and one line printed
    }

    @Test
    void shouldRunItInTheHookWhenTheRunsThreadDoesNotComeToIt() {
        fire();
        HvShutdown s = shutdown();
        HvShutdown.Result r = s.awaitOrRun(0, "stopped by a signal (shutdown hook)"); // nobody claimed it
        assertTrue(r.confirmed());
        assertTrue(s.started());
        assertTrue(r.text().endsWith("(run ended: stopped by a signal (shutdown hook))"), r.text());
    }
}
