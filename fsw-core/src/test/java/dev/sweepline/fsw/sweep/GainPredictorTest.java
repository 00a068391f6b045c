package dev.sweepline.fsw.sweep;

import dev.sweepline.fsw.DemoCup;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Gain prediction and hysteresis (physics.md, noise and gain ranging: up above ~80 %, down below ~2 %
 * of full scale, ranges 32x apart). Full scale of one quadrant in range 0 is 65535 - 256 = 65279
 * counts above the pedestal (instruments/demo-cup.yaml adc: 16 bits, pedestal 256), so in range-0 units, with the Q16 fractions
 * 52429 (0.80000) and 1311 (0.020004): up of range 0 = 65279 * 52429 >> 16 = 52223; down of range 1
 * = (65279 << 5) * 1311 >> 16 = 41787. The checks sit 2 units either side.
 */
class GainPredictorTest {
    private static final int UP_0 = 52_223;
    private static final int DOWN_1 = 41_787;
    private GainPredictor g;

    @BeforeEach
    void setUp() {
        g = new GainPredictor(DemoCup.INSTRUMENT);
        g.reset(128);
        g.configure(DemoCup.parameters());
    }

    @Test
    void shouldUseTopRangeForUnmeasuredWindows() {
        assertEquals(2, g.choose(10)); // issue 2: never measured -> highest range
    }

    @Test
    void shouldUseTopRangeAfterSaturation() {
        g.record(10, 100, true, 0);
        assertEquals(2, g.choose(10)); // issue 2: saturated last time -> highest range
    }

    @Test
    void shouldSwitchUpAboveEightyPercent() {
        g.record(10, UP_0 + 2, false, 0);
        assertEquals(1, g.choose(10));
        g.record(10, UP_0 - 2, false, 0);
        assertEquals(0, g.choose(10));
    }

    @Test
    void shouldSwitchDownBelowTwoPercent() {
        g.record(10, DOWN_1 - 2, false, 1);
        assertEquals(0, g.choose(10));
        g.record(10, DOWN_1 + 2, false, 1);
        assertEquals(1, g.choose(10));
    }

    @Test
    void shouldHoldRangeInsideHysteresisBand() {
        // 45000 units: 69 % of range 0, 2.15 % of range 1 - either range is right, so each window keeps its own
        g.record(10, 45_000, false, 0);
        g.record(20, 45_000, false, 1);
        assertEquals(0, g.choose(10));
        assertEquals(1, g.choose(20));
    }

    @Test
    void shouldDropSeveralRangesAtOnceForSmallSignals() {
        g.record(10, 300, false, 2); // far below 2 % of range 1 (41787): straight to range 0
        assertEquals(0, g.choose(10));
    }

    @Test
    void shouldClimbSeveralRangesAtOnceForLargeSignals() {
        g.record(10, 2_000_000, false, 0); // above 80 % of range 1 (1.67e6): straight to range 2
        assertEquals(2, g.choose(10));
    }

    @Test
    void shouldPredictFromNeighboursBecausePeakDrifts() {
        g.record(10, 1000, false, 0);
        g.record(11, 60_000, false, 1);
        g.record(12, 1000, false, 0);
        g.record(13, 1000, false, 0);
        assertEquals(1, g.choose(10)); // neighbour 11 over 80 % of range 0
        assertEquals(1, g.choose(12));
        assertEquals(0, g.choose(13)); // two away: not a neighbour
    }

    @Test
    void shouldFollowTheReadNeighbourInAnUnreadWindow() {
        // never read, neighbour 9 read: prediction = its reading x 8 (GainPredictor.UNREAD_HEADROOM_SHIFT),
        // from the top range down: range 0 below DOWN_1 / 8 = 5223.4 units, range 1 above (class comment)
        g.record(9, 5_223, false, 2);
        assertEquals(0, g.choose(10));
        g.record(9, 5_224, false, 2);
        assertEquals(1, g.choose(10));
        g.record(11, 5_223, false, 0); // the larger neighbour counts
        assertEquals(1, g.choose(10));
    }

    @Test
    void shouldUseTopRangeBesideASaturatedNeighbourInAnUnreadWindow() {
        g.record(9, 100, true, 0); // saturated in range 0: the next window's current is unknown, upwards
        assertEquals(2, g.choose(10));
    }

    @Test
    void shouldFindAWeakPeakInTheFirstSurvey() {
        // physics.md worked case P1 at a fifth of its density (n 1 cm^-3, U 400 km/s, T 1e5 K): the peak
        // current per quadrant is about 1 pA, a few codes of the top range; ranged down it is found
        // in the first survey, where the noise-free currents peak
        SyntheticInstrument weak = Fixtures.oneAu(43);
        weak.protonDensityPerCm3 = 1;
        assertFirstSurveyPeak(weak);
    }

    @Test
    void shouldFindAColdBeamInTheFirstSurvey() {
        // worked case P1 with the protons at 2e4 K (U/w = 22): a few windows wide, found in the first survey
        SyntheticInstrument cold = Fixtures.oneAu(44);
        cold.protonThermalKmPerS = SyntheticInstrument.thermalKmPerS(2e4, SyntheticInstrument.PROTON_MASS);
        assertFirstSurveyPeak(cold);
    }

    private static void assertFirstSurveyPeak(SyntheticInstrument plasma) {
        ClosedLoop loop = Fixtures.loop(plasma, DemoCup.parameters(), new RecordingListener());
        loop.runSweeps(1);
        Spectrum s = loop.scheduler.lastSpectrum();
        assertTrue(s.peakValid(), "no peak in the first survey");
        // the reference: the 3-point parabola vertex of the noise-free window currents (Fixtures, the
        // reference of the Q8 refinement); half a window for the noise of one survey (common practice)
        assertEquals(Fixtures.parabolaPeak(Fixtures.trueCurrents(plasma)), s.peakWindowQ8() / 256.0, 0.5);
    }

    @Test
    void shouldForgetEverythingOnReset() {
        g.record(10, 1000, false, 0);
        g.reset(128);
        assertEquals(2, g.choose(10));
    }

    @Test
    void shouldNeverSaturateAfterFirstSurveyNearTheSun() {
        RecordingListener l = new RecordingListener();
        ClosedLoop loop = Fixtures.loop(Fixtures.nearSun(41), DemoCup.parameters(), l);
        loop.runSweeps(1);
        int saturatedInFirst = l.saturatedSamples;
        loop.runSweeps(20);
        assertEquals(saturatedInFirst, l.saturatedSamples);
        // and it uses more than one range: the near-Sun peak (~0.2 nA per quadrant) needs range 1, the wings range 0
        boolean[] used = new boolean[3];
        for (RecordingListener.Step s : l.steps.subList(128, l.steps.size())) {
            used[s.gainRange()] = true;
        }
        assertTrue(used[0] && used[1]);
    }

    @Test
    void shouldKeepEveryRangedSampleBelowUpThreshold() {
        // after ranging, every quadrant reads under 80 % of its range's full scale (otherwise the
        // prediction would have chosen a higher range); drift between sweeps is nil here
        SyntheticInstrument plasma = Fixtures.nearSun(42);
        plasma.protonDensityPerCm3 = 20_000; // ~0.7 nA per quadrant at the peak, near range 1's 80 %
        ClosedLoop loop = Fixtures.loop(plasma, DemoCup.parameters(), new RecordingListener());
        loop.runSweeps(3);
        Spectrum s = loop.scheduler.lastSpectrum();
        for (int i = 0; i < s.count(); i++) {
            for (int q = 0; q < 4; q++) {
                assertTrue(s.quadrant(i, q) - 256 < 0.8 * 65279, "entry " + i);
            }
        }
    }
}
