package dev.sweepline.fsw.sweep;

import dev.sweepline.fsw.DemoCup;
import dev.sweepline.fsw.link.SampleReply;
import dev.sweepline.fsw.link.StepCommand;
import dev.sweepline.fsw.table.SweepParameters;
import dev.sweepline.fsw.table.TableStatus;
import dev.sweepline.fsw.table.WindowTable;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Table and parameter loading, SAFE, the decision hash (sweep design note R14-R17). */
class CommandTest {
    @Test
    void shouldRefuseBadTablesWithReasonAndKeepOldTable() {
        RecordingListener l = new RecordingListener();
        ClosedLoop loop = Fixtures.loop(Fixtures.oneAu(61), DemoCup.parameters(), l);
        SweepScheduler s = loop.scheduler;
        int[][] lows = {{}, new int[257], {100, 70_000}, {300, 200}, {100, 200}};
        int[][] highs = {{}, new int[257], {200, 70_100}, {400, 300}, {150}};
        int[] counts = {0, 257, 2, 2, 2};
        int[] reasons = {TableStatus.EMPTY, TableStatus.TOO_MANY_WINDOWS, TableStatus.OUT_OF_DAC_RANGE,
            TableStatus.NOT_MONOTONIC, TableStatus.MISSING_DATA};
        for (int k = 0; k < reasons.length; k++) {
            assertEquals(reasons[k], s.loadTable(lows[k], highs[k], counts[k]), TableStatus.name(reasons[k]));
        }
        loop.runSweeps(1);
        // the old (default) table is still the one stepped
        assertEquals(128, s.windowCount());
        assertEquals(128, l.sweeps.get(0)[2]);
        assertEquals(Fixtures.TABLE.dacLow(5), s.dacLow(5));
    }

    @Test
    void shouldRefuseTableAboveTheVoltageLimitByEveryPath() {
        RecordingListener l = new RecordingListener();
        ClosedLoop loop = Fixtures.loop(Fixtures.oneAu(61), DemoCup.parameters(), l);
        SweepScheduler s = loop.scheduler;
        // demo cup: maxVolts 6000 at 100 mV per code = code 60 000, within the 16-bit DAC (demo-cup.yaml;
        // commands.md §4.4)
        int limit = DemoCup.INSTRUMENT.limits().maxLevelCode;
        assertEquals(60_000, limit);
        assertTrue(limit < DemoCup.INSTRUMENT.dacTopCode());
        int[] lows = {100, 59_000};
        int[] highs = {200, limit + 1};
        assertEquals(TableStatus.ABOVE_VOLTAGE_LIMIT, s.loadTable(lows, highs, 2));
        assertEquals(TableStatus.ABOVE_VOLTAGE_LIMIT, s.loadTable(WindowTable.of(lows, highs, 2)));
        highs[1] = limit;
        assertEquals(TableStatus.OK, s.loadTable(WindowTable.of(lows, highs, 2))); // at the limit: accepted
        assertThrows(IllegalArgumentException.class, () -> new SweepScheduler(DemoCup.INSTRUMENT,
                WindowTable.of(new int[] {100, 59_000}, new int[] {200, limit + 1}, 2), DemoCup.parameters(), null));
        loop.runSweeps(1);
        assertEquals(2, s.windowCount()); // the accepted table, not a refused one
        assertEquals(limit, s.dacHigh(1));
    }

    @Test
    void shouldApplyNewTableAtSweepBoundary() {
        RecordingListener l = new RecordingListener();
        ClosedLoop loop = Fixtures.loop(Fixtures.oneAu(62), DemoCup.parameters(), l);
        loop.runSweeps(3);
        assertEquals(SweepMode.FOCUS, loop.scheduler.mode());
        loop.step(); // mid focus sweep
        WindowTable coarse = WindowTable.logSpaced(64, 50_000, 6_000_000, DemoCup.INSTRUMENT.millivoltsPerCode());
        assertEquals(TableStatus.OK, loop.scheduler.loadTable(coarse));
        loop.step();
        assertEquals(Fixtures.TABLE.dacLow(l.steps.get(l.steps.size() - 1).window()), l.steps.get(l.steps.size() - 1).dacLow());
        loop.runSweeps(1); // finishes the focus sweep on the old table
        loop.step();
        // the band meant windows of the old table: survey on the new one, reason TABLE_LOADED
        assertEquals(ModeChangeReason.TABLE_LOADED, l.lastChange().reason());
        assertEquals(64, loop.scheduler.windowCount());
        RecordingListener.Step first = l.steps.get(l.steps.size() - 1);
        assertEquals(coarse.dacLow(first.window()), first.dacLow());
        assertEquals(2, first.gainRange()); // the gain memory belonged to the old windows: top range again
    }

    @Test
    void shouldRefuseBadParametersAndKeepOld() {
        RecordingListener l = new RecordingListener();
        ClosedLoop loop = Fixtures.loop(Fixtures.oneAu(63), DemoCup.parameters(), l);
        SweepParameters bad = DemoCup.parameters();
        bad.integrationPeriods = 0;
        assertEquals(TableStatus.BAD_INTEGRATION, loop.scheduler.loadParameters(bad));
        assertEquals(TableStatus.MISSING_DATA, loop.scheduler.loadParameters(null));
        loop.runSweeps(1);
        assertEquals(8, l.steps.get(l.steps.size() - 1).periods());
    }

    @Test
    void shouldApplyParametersAtSweepBoundary() {
        RecordingListener l = new RecordingListener();
        ClosedLoop loop = Fixtures.loop(Fixtures.oneAu(64), DemoCup.parameters(), l);
        loop.step();
        SweepParameters p = DemoCup.parameters();
        p.integrationPeriods = 16;
        assertEquals(TableStatus.OK, loop.scheduler.loadParameters(p));
        p.integrationPeriods = 99; // the scheduler copied the set: later edits do not leak in
        loop.runSweeps(1);
        assertEquals(8, l.steps.get(127).periods());
        loop.step();
        assertEquals(16, l.steps.get(128).periods());
    }

    @Test
    void shouldStepNothingInSafe() {
        RecordingListener l = new RecordingListener();
        ClosedLoop loop = Fixtures.loop(Fixtures.oneAu(65), DemoCup.parameters(), l);
        loop.runSweeps(3);
        loop.step();
        loop.scheduler.requestMode(SweepMode.SAFE, loop.nowMicros);
        assertEquals(ModeChangeReason.COMMANDED, l.lastChange().reason());
        StepCommand out = new StepCommand();
        for (int k = 0; k < 1000; k++) {
            assertFalse(loop.scheduler.nextStep(out, k));
        }
        // a reply arriving in SAFE (to the abandoned step) is ignored
        loop.scheduler.ingest(new SampleReply(), 0);
        assertEquals(1, loop.scheduler.ignoredReplies());
        assertEquals(SweepMode.SAFE, loop.scheduler.mode());
    }

    @Test
    void shouldLeaveSafeOnlyByCommandAndSettleFromTheFartherOfHvOffAndLastLevels() {
        RecordingListener l = new RecordingListener();
        ClosedLoop loop = Fixtures.loop(Fixtures.oneAu(66), DemoCup.parameters(), l);
        loop.runSweeps(3);
        RecordingListener.Step before = l.steps.get(l.steps.size() - 1);
        loop.scheduler.requestMode(SweepMode.SAFE, loop.nowMicros);
        loop.scheduler.requestMode(SweepMode.FOCUS, loop.nowMicros); // band still valid: FOCUS
        assertEquals(SweepMode.FOCUS, loop.scheduler.mode());
        loop.step();
        RecordingListener.Step s = l.steps.get(l.steps.size() - 1);
        // SAFE sends no step: the rails hold the last step's levels until the link watchdog switches the HV
        // off (hardware ICD §4.1), so they stand anywhere from there down to 0 and the settle is for the
        // larger change (R13; demo cup: 1000 us fixed + 1 us per code, demo-cup.yaml cadence)
        int fromOff = s.dacHigh();
        int fromLast = Math.max(Math.abs(s.dacLow() - before.dacLow()), Math.abs(s.dacHigh() - before.dacHigh()));
        assertEquals(1000 + Math.max(fromOff, fromLast), s.settleMicros());
    }

    @Test
    void shouldSettleAfterShortSafeForTheRailsStillAtTheLastLevels() {
        RecordingListener l = new RecordingListener();
        ClosedLoop loop = Fixtures.loop(Fixtures.oneAu(66), DemoCup.parameters(), l);
        for (int k = 0; k < 100; k++) {
            loop.step(); // the first survey, up from HV off (R12), to window 99
        }
        RecordingListener.Step before = l.steps.get(l.steps.size() - 1);
        assertEquals(99, before.window());
        loop.scheduler.requestMode(SweepMode.SAFE, ModeChangeReason.LINK_TIMEOUT, loop.nowMicros);
        loop.scheduler.requestMode(SweepMode.SURVEY, loop.nowMicros); // a RETRY response resumes at once
        loop.step();
        RecordingListener.Step s = l.steps.get(l.steps.size() - 1);
        assertEquals(0, s.window()); // the survey starts at the end nearer HV off (R12)
        // the rails may still stand at window 99's levels: the fall to window 0 is far more than the rise
        // from 0 (R13; demo cup: 1000 us fixed + 1 us per code, demo-cup.yaml cadence)
        int fromLast = Math.max(Math.abs(s.dacLow() - before.dacLow()), Math.abs(s.dacHigh() - before.dacHigh()));
        assertTrue(fromLast > s.dacHigh());
        assertEquals(1000 + fromLast, s.settleMicros());
    }

    @Test
    void shouldSettleFromHvOffAfterStepsWithoutHv() {
        RecordingListener l = new RecordingListener();
        ClosedLoop loop = Fixtures.loop(Fixtures.oneAu(66), DemoCup.parameters(), l);
        loop.scheduler.permitHv(false); // steps ask for the HV off: the rails stand at 0 V (hardware ICD §3.1)
        for (int k = 0; k < 50; k++) {
            loop.step();
        }
        loop.scheduler.permitHv(true);
        loop.step();
        RecordingListener.Step s = l.steps.get(l.steps.size() - 1);
        assertEquals(50, s.window());
        // the first step with the HV on rises from 0 V, not from window 49's levels (R13; demo cup: 1000 us
        // fixed + 1 us per code, demo-cup.yaml cadence)
        assertEquals(1000 + s.dacHigh(), s.settleMicros());
    }

    @Test
    void shouldSurveyWhenFocusCommandedWithoutBand() {
        RecordingListener l = new RecordingListener();
        ClosedLoop loop = Fixtures.loop(Fixtures.oneAu(67), DemoCup.parameters(), l);
        loop.step();
        loop.scheduler.requestMode(SweepMode.SAFE, loop.nowMicros);
        loop.scheduler.requestMode(SweepMode.FOCUS, loop.nowMicros);
        assertEquals(SweepMode.SURVEY, loop.scheduler.mode());
        assertEquals(ModeChangeReason.NO_BAND, l.lastChange().reason());
    }

    @Test
    void shouldGiveSameHashForSameInputs() {
        long a = run(71, 0);
        long b = run(71, 0);
        assertEquals(a, b);
        // one different command (window table) changes the decisions and so the hash
        assertNotEquals(a, run(71, 1));
    }

    @Test
    void shouldRefuseInvalidConstructionParameters() {
        SweepParameters p = DemoCup.parameters();
        p.resurveyEveryFocusSweeps = 0;
        assertThrows(IllegalArgumentException.class, () -> new SweepScheduler(DemoCup.INSTRUMENT, Fixtures.TABLE, p, null));
    }

    @Test
    void shouldRecordMissingReplyAndCarryOn() {
        SyntheticInstrument plasma = Fixtures.oneAu(68);
        ClosedLoop loop = Fixtures.loop(plasma, DemoCup.parameters(), new RecordingListener());
        loop.step();
        plasma.mute = true;
        loop.step(); // window 1: no reply
        plasma.mute = false;
        loop.runSweeps(1);
        Spectrum s = loop.scheduler.lastSpectrum();
        assertTrue((s.status(1) & Spectrum.STATUS_MISSING) != 0);
        assertEquals(0, s.status(2) & Spectrum.STATUS_MISSING);
    }

    private static long run(long seed, int variant) {
        ClosedLoop loop = Fixtures.loop(Fixtures.oneAu(seed), DemoCup.parameters(), new RecordingListener());
        if (variant == 1) {
            loop.scheduler.loadTable(WindowTable.logSpaced(100, 50_000, 6_000_000, DemoCup.INSTRUMENT.millivoltsPerCode()));
        }
        loop.runSweeps(20);
        return loop.scheduler.decisionHash();
    }
}
