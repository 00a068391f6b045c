package dev.sweepline.fsw.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import dev.sweepline.fsw.DemoCup;
import org.junit.jupiter.api.Test;

/**
 * A FOCUS command while surveying with no band changes nothing (sweep design note R15: FOCUS without a band
 * gives SURVEY, the mode it is in): the survey in progress goes on, its step in flight keeps its reply,
 * and the sweep completes after the table's windows (128, the demo cup's default table), so a ground that
 * repeats the command does not keep the scheduler from ever finishing a survey.
 */
class FocusWithoutBandTest {
    @Test
    void shouldKeepTheSurveyInProgressWhenFocusIsCommandedWithoutBand() {
        RecordingListener l = new RecordingListener();
        ClosedLoop loop = Fixtures.loop(Fixtures.oneAu(67), DemoCup.parameters(), l);
        SweepScheduler s = loop.scheduler;
        int windows = s.windowCount();
        assertEquals(128, windows); // the demo cup's default table
        for (int k = 0; k < windows / 2; k++) {
            loop.step();
        }
        int changes = l.changes.size();
        s.nextStep(loop.step, loop.nowMicros); // a step in flight when the command arrives
        s.requestMode(SweepMode.FOCUS, loop.nowMicros);
        assertEquals(SweepMode.SURVEY, s.mode());
        assertEquals(changes, l.changes.size(), "no mode change");
        assertFalse(s.bandValid());
        loop.instrument.answer(loop.step, loop.reply);
        s.ingest(loop.reply, loop.nowMicros);
        assertEquals(0, s.ignoredReplies(), "the step in flight keeps its reply");
        for (int k = windows / 2 + 1; k < windows; k++) {
            loop.step();
        }
        assertEquals(1, s.sweepCount(), "the survey completed after the table's windows");
        assertEquals(windows, s.lastSpectrum().count());
        for (int i = 0; i < windows; i++) {
            assertEquals(0, s.lastSpectrum().status(i) & Spectrum.STATUS_MISSING, "window " + i + " read");
        }
    }
}
