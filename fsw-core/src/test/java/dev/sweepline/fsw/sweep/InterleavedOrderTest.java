package dev.sweepline.fsw.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sweepline.fsw.DemoCup;
import dev.sweepline.fsw.link.StepCommand;
import dev.sweepline.fsw.table.SweepParameters;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The interleaved focus order (SweepParameters.FOCUS_STYLE_INTERLEAVED, sweep design note R22,
 * docs/focus-design.md): the even offsets outward, then the odd ones back. Closed forms derived here: for
 * n steps, even offset 2i is step i and odd offset 2i + 1 is step n − 1 − i, so every pair of neighbouring
 * windows (2i, 2i + 1) has its mean step time at the sweep's middle, (n − 1) / 2, and no rail change
 * exceeds two windows.
 */
class InterleavedOrderTest {
    @Test
    void shouldVisitEveryWindowOnceSymmetricInTimeWithStepsOfAtMostTwoWindows() {
        for (int n = 1; n <= 128; n++) {
            int[] stepOf = new int[n];
            java.util.Arrays.fill(stepOf, -1);
            int previous = -1;
            for (int k = 0; k < n; k++) {
                int o = SweepScheduler.interleavedOffset(k, n);
                assertTrue(o >= 0 && o < n, "n " + n + " step " + k + " offset " + o);
                assertEquals(-1, stepOf[o], "n " + n + ": offset " + o + " twice");
                stepOf[o] = k;
                if (previous >= 0) {
                    assertTrue(Math.abs(o - previous) <= 2, "n " + n + " step " + k + ": " + previous + " -> " + o);
                }
                previous = o;
            }
            for (int i = 0; 2 * i + 1 < n; i++) {
                assertEquals(i, stepOf[2 * i]);
                assertEquals(n - 1 - i, stepOf[2 * i + 1]);
                assertEquals(n - 1, stepOf[2 * i] + stepOf[2 * i + 1]); // mean (n - 1) / 2
            }
        }
    }

    /**
     * The step of window entry {@code i} (window f + i) of a sweep of {@code n} windows by the telemetry ICD §4
     * rule for a spectrum flagged interleaved: offset o from the starting end (i stepping upward, n − 1 − i
     * downward) is read at step o/2 for even o, at ⌈n/2⌉ + (o_last − o)/2 for odd o.
     */
    private static int icdStep(int i, int n, boolean ascending) {
        int o = ascending ? i : n - 1 - i;
        int lastOdd = n % 2 == 0 ? n - 1 : n - 2;
        return o % 2 == 0 ? o / 2 : (n + 1) / 2 + (lastOdd - o) / 2;
    }

    @Test
    void shouldMarkInterleavedFocusSpectraAndStepThemAsTheIcdSays() {
        for (int style : new int[] {SweepParameters.FOCUS_STYLE_BAND, SweepParameters.FOCUS_STYLE_INTERLEAVED}) {
            SweepParameters p = DemoCup.parameters();
            p.focusStyle = style;
            List<Integer> windows = new ArrayList<>();
            int[] checked = new int[2];
            SweepListener l = new SweepListener() {
                @Override
                public void onStep(StepCommand step, long nowMicros) {
                    windows.add(step.window);
                }

                @Override
                public void onSweepComplete(Spectrum s, long nowMicros) {
                    boolean expected = s.mode() == SweepMode.FOCUS && style == SweepParameters.FOCUS_STYLE_INTERLEAVED;
                    assertEquals(expected, s.interleaved(), s.mode() + " style " + style);
                    int n = s.count();
                    if (s.interleaved() && windows.size() == n) {
                        for (int k = 0; k < n; k++) {
                            assertEquals(k, icdStep(windows.get(k) - s.firstWindow(), n, s.ascending()), "step " + k + " of " + n);
                        }
                        checked[s.ascending() ? 0 : 1]++;
                    }
                    windows.clear();
                }
            };
            ClosedLoop loop = new ClosedLoop(new SweepScheduler(DemoCup.INSTRUMENT, Fixtures.TABLE, p, l), Fixtures.nearSun(31));
            loop.runSweeps(12);
            if (style == SweepParameters.FOCUS_STYLE_INTERLEAVED) {
                assertTrue(checked[0] + checked[1] > 5, "interleaved focus sweeps checked: " + Arrays.toString(checked));
            }
        }
    }

    @Test
    void shouldInterleaveFocusSweepsOnlyAndKeepTheMonotonicOrderByDefault() {
        for (int style : new int[] {SweepParameters.FOCUS_STYLE_BAND, SweepParameters.FOCUS_STYLE_INTERLEAVED,
            SweepParameters.FOCUS_STYLE_DESIGN | SweepParameters.FOCUS_STYLE_INTERLEAVED}) {
            SweepParameters p = DemoCup.parameters();
            p.focusStyle = style;
            p.focusBudgetMicros = (style & SweepParameters.FOCUS_STYLE_DESIGN) != 0 ? 600_000 : 0;
            List<int[]> steps = new ArrayList<>();
            SweepScheduler[] s = new SweepScheduler[1];
            SweepListener l = new SweepListener() {
                @Override
                public void onStep(StepCommand step, long nowMicros) {
                    steps.add(new int[] {s[0].mode().ordinal(), step.window});
                }
            };
            ClosedLoop loop = new ClosedLoop(new SweepScheduler(DemoCup.INSTRUMENT, Fixtures.TABLE, p, l), Fixtures.nearSun(31));
            s[0] = loop.scheduler;
            loop.runSweeps(12);
            int focusSteps = 0;
            int jumps = 0;
            for (int k = 1; k < steps.size(); k++) {
                if (steps.get(k)[0] != steps.get(k - 1)[0]) {
                    continue;
                }
                int d = Math.abs(steps.get(k)[1] - steps.get(k - 1)[1]);
                if (steps.get(k)[0] == SweepMode.FOCUS.ordinal()) {
                    focusSteps++;
                    if (d == 2) {
                        jumps++;
                    }
                } else {
                    assertTrue(d != 2, "survey steps stay monotonic: " + d);
                }
            }
            assertTrue(focusSteps > 100, "focus steps " + focusSteps);
            if ((style & SweepParameters.FOCUS_STYLE_INTERLEAVED) != 0) {
                assertTrue(jumps > focusSteps * 9 / 10, "interleaved steps of two windows " + jumps + " of " + focusSteps);
            } else {
                assertEquals(0, jumps, "monotonic focus sweeps step one window");
            }
        }
    }
}
