package dev.sweepline.fsw.sweep;

import dev.sweepline.fsw.DemoCup;
import dev.sweepline.fsw.link.StepCommand;
import dev.sweepline.fsw.table.SweepParameters;
import dev.sweepline.fsw.table.TableStatus;
import dev.sweepline.fsw.table.WindowTable;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

/**
 * Rule-based random test (style.md: precondition + action, checked against a simple model; recorded
 * seeds). Actions: plasma drift and shocks, lost replies, mode commands, table and parameter loads,
 * valid and invalid. After every action the model's rules must hold: every step lies in the active
 * table with its codes; focus steps lie in the band; no window repeats within a sweep and
 * consecutive steps are neighbours; a completed survey covers the table; the settle time is for the
 * largest change from every level the model's rails may stand at (after SAFE also 0, after a step
 * abandoned in flight also the levels before it); mode changes form a chain of legal transitions; SAFE steps nothing.
 */
class SchedulerModelTest {
    private static final int STEPS = 20_000;

    @ParameterizedTest
    @ValueSource(longs = {1L, 20261201L, 0x5EEDL, 987_654_321L, 42L})
    void shouldKeepModelRulesUnderRandomActions(long seed) {
        Random random = new Random(seed);
        SyntheticInstrument plasma = Fixtures.oneAu(seed);
        Model model = new Model();
        SweepScheduler scheduler = new SweepScheduler(DemoCup.INSTRUMENT, Fixtures.TABLE, DemoCup.parameters(), model);
        model.scheduler = scheduler;
        ClosedLoop loop = new ClosedLoop(scheduler, plasma);
        int focusSweepsSeen = 0;
        for (int k = 0; k < STEPS; k++) {
            evolvePlasma(plasma, random);
            plasma.mute = random.nextInt(100) == 0;
            int action = random.nextInt(2000);
            if (action == 0) {
                SweepMode m = SweepMode.values()[random.nextInt(3)];
                boolean inFlight = scheduler.awaitingReply(); // a lost reply: the step may or may not have flown
                SweepMode before = scheduler.mode();
                scheduler.requestMode(m, loop.nowMicros);
                if (inFlight && scheduler.mode() != before) {
                    model.abandoned();
                }
            } else if (action == 1) {
                loadRandomTable(scheduler, random);
            } else if (action == 2) {
                loadRandomParameters(scheduler, random);
            }
            if (scheduler.mode() == SweepMode.SAFE) {
                assertFalse(scheduler.nextStep(new StepCommand(), loop.nowMicros));
                model.hvOff();
                if (random.nextInt(20) == 0) {
                    scheduler.requestMode(random.nextBoolean() ? SweepMode.SURVEY : SweepMode.FOCUS, loop.nowMicros);
                }
                loop.nowMicros += 1000;
                continue;
            }
            assertTrue(loop.step());
            if (scheduler.lastSpectrum().mode() == SweepMode.FOCUS) {
                focusSweepsSeen++;
            }
        }
        // the run must have exercised the interesting paths, or it proves little
        assertTrue(model.sweepsCompleted > 50, "sweeps " + model.sweepsCompleted);
        assertTrue(model.focusSteps > 1000, "focus steps " + model.focusSteps);
        assertTrue(focusSweepsSeen > 0);
        assertTrue(model.lossOfLock > 0, "no loss of lock exercised");
    }

    private static void evolvePlasma(SyntheticInstrument p, Random r) {
        p.speedKmPerS *= 1 + 0.001 * r.nextGaussian();
        if (r.nextInt(3000) == 0) {
            p.speedKmPerS *= r.nextBoolean() ? Math.sqrt(1.82) : 1 / Math.sqrt(1.82); // shock front either way
        }
        p.speedKmPerS = Math.max(200, Math.min(900, p.speedKmPerS));
        p.protonDensityPerCm3 = Math.max(0.5, Math.min(5000, p.protonDensityPerCm3 * (1 + 0.01 * r.nextGaussian())));
        if (r.nextInt(5000) == 0) {
            p.protonDensityPerCm3 *= r.nextBoolean() ? 0.05 : 20;
        }
        if (r.nextInt(2000) == 0) {
            p.alphaPerProton = 0.01 + 0.14 * r.nextDouble();
        }
    }

    private static void loadRandomTable(SweepScheduler s, Random r) {
        int count = s.windowCount();
        if (r.nextBoolean()) {
            int windows = 16 + r.nextInt(WindowTable.CAPACITY - 16 + 1);
            assertEquals(TableStatus.OK, s.loadTable(WindowTable.logSpaced(windows, 50_000, 6_000_000, DemoCup.INSTRUMENT.millivoltsPerCode())));
        } else {
            int[] lows = {100, 90};
            int[] highs = {150, 160};
            assertNotEquals(TableStatus.OK, s.loadTable(lows, highs, 2));
            assertEquals(count, s.windowCount());
        }
    }

    private static void loadRandomParameters(SweepScheduler s, Random r) {
        SweepParameters p = DemoCup.parameters();
        p.integrationPeriods = 1 + r.nextInt(16);
        p.resurveyEveryFocusSweeps = 1 + r.nextInt(20);
        p.halfWidthPerFwhmQ8 = r.nextInt(1024);
        p.jumpWindows = 1 + r.nextInt(20);
        if (r.nextInt(4) == 0) {
            p.edgeWindows = p.minHalfWidthWindows; // invalid: refused with BAD_BAND
            assertEquals(TableStatus.BAD_BAND, s.loadParameters(p));
        } else {
            assertEquals(TableStatus.OK, s.loadParameters(p));
        }
    }

    /** The model: checks each event against what the scheduler should do. */
    private static final class Model implements SweepListener {
        SweepScheduler scheduler;
        final boolean[] seen = new boolean[WindowTable.CAPACITY];
        final SweepParameters active = new SweepParameters();
        int stepsInSweep;
        int lastWindow = -1;
        /** Every (low, high) the rails may stand at when the next step starts. */
        final List<int[]> rails = new ArrayList<>(List.of(new int[] {0, 0}));
        /** The same before the last step. */
        List<int[]> priorRails = new ArrayList<>();
        SweepMode modelMode = SweepMode.SAFE; // before START
        long sweepsCompleted;
        long focusSteps;
        long lossOfLock;

        /** SAFE: the HV may go off (the link watchdog) or stay at the levels it holds. */
        void hvOff() {
            addIfAbsent(rails, 0, 0);
            addIfAbsent(priorRails, 0, 0);
        }

        /** A mode change abandoned the last step before its reply: the rails are at its levels or before them. */
        void abandoned() {
            for (int[] r : priorRails) {
                addIfAbsent(rails, r[0], r[1]);
            }
        }

        private static void addIfAbsent(List<int[]> list, int low, int high) {
            for (int[] r : list) {
                if (r[0] == low && r[1] == high) {
                    return;
                }
            }
            list.add(new int[] {low, high});
        }

        void newSweep() {
            java.util.Arrays.fill(seen, false);
            stepsInSweep = 0;
            lastWindow = -1;
        }

        @Override
        public void onStep(StepCommand s, long nowMicros) {
            assertEquals(modelMode, scheduler.mode());
            assertTrue(s.window >= 0 && s.window < scheduler.windowCount(), "window in table");
            assertEquals(scheduler.dacLow(s.window), s.dacLow);
            assertEquals(scheduler.dacHigh(s.window), s.dacHigh);
            if (scheduler.mode() == SweepMode.FOCUS) {
                focusSteps++;
                assertTrue(s.window >= scheduler.bandFirst() && s.window <= scheduler.bandLast(), "focus step in band");
            }
            assertFalse(seen[s.window], "window repeated within a sweep");
            if (lastWindow >= 0) {
                assertEquals(1, Math.abs(s.window - lastWindow), "neighbour steps");
            }
            seen[s.window] = true;
            lastWindow = s.window;
            stepsInSweep++;
            assertTrue(s.gainRange >= 0 && s.gainRange <= 2);
            scheduler.activeParameters(active);
            int change = 0; // R13: the largest rail change from anywhere the rails may stand
            for (int[] r : rails) {
                change = Math.max(change, Math.max(Math.abs(s.dacLow - r[0]), Math.abs(s.dacHigh - r[1])));
            }
            assertEquals(active.fixedSettleMicros + ((change * active.settleMicrosPerCodeQ8) >> 8), s.settleMicros);
            assertEquals(active.integrationPeriods, s.integrationPeriods);
            assertTrue(s.hvEnabled);
            priorRails = new ArrayList<>(rails);
            rails.clear();
            rails.add(new int[] {s.dacLow, s.dacHigh});
        }

        @Override
        public void onSweepComplete(Spectrum spectrum, long nowMicros) {
            sweepsCompleted++;
            assertEquals(stepsInSweep, spectrum.count());
            if (spectrum.mode() == SweepMode.SURVEY) {
                assertEquals(scheduler.windowCount(), spectrum.count(), "survey covers the table");
            }
            newSweep();
        }

        @Override
        public void onModeChange(SweepMode from, SweepMode to, int reason, long nowMicros) {
            assertEquals(modelMode, from, "chain of mode changes");
            assertNotEquals(from, to);
            if (!legal(from, to, reason)) {
                fail("illegal transition " + from + " -> " + to + " " + ModeChangeReason.name(reason));
            }
            if (from == SweepMode.FOCUS && to == SweepMode.SURVEY && reason != ModeChangeReason.COMMANDED
                && reason != ModeChangeReason.RESURVEY && reason != ModeChangeReason.TABLE_LOADED) {
                lossOfLock++;
            }
            modelMode = to;
            newSweep(); // a mode change abandons or ends the sweep
            if (to == SweepMode.SAFE) {
                hvOff();
            }
        }

        private static boolean legal(SweepMode from, SweepMode to, int reason) {
            switch (reason) {
                case ModeChangeReason.START:
                    return from == SweepMode.SAFE && to == SweepMode.SURVEY;
                case ModeChangeReason.LOCK_ACQUIRED:
                    return from == SweepMode.SURVEY && to == SweepMode.FOCUS;
                case ModeChangeReason.PEAK_ON_EDGE:
                case ModeChangeReason.CURRENT_COLLAPSE:
                case ModeChangeReason.PEAK_JUMP:
                case ModeChangeReason.NO_PEAK:
                case ModeChangeReason.RESURVEY:
                case ModeChangeReason.TABLE_LOADED:
                    return from == SweepMode.FOCUS && to == SweepMode.SURVEY;
                case ModeChangeReason.NO_BAND:
                    return to == SweepMode.SURVEY;
                case ModeChangeReason.COMMANDED:
                    return true;
                case ModeChangeReason.LINK_TIMEOUT:
                    return to == SweepMode.SAFE;
                default:
                    return false;
            }
        }
    }
}
