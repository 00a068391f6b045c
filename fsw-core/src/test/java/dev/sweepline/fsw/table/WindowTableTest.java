package dev.sweepline.fsw.table;

import dev.sweepline.fsw.DemoCup;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

class WindowTableTest {
    @Test
    void shouldBuildDefaultTableFromPhysicsSpec() {
        WindowTable t = DemoCup.table();
        // physics.md, the demo instrument: 128 contiguous log-spaced windows 50 V - 6000 V
        assertEquals(128, t.count());
        // 50 V and 6000 V at the nominal 0.1 V/code (DemoCup.INSTRUMENT.millivoltsPerCode()): exact codes
        assertEquals(500, t.dacLow(0));
        assertEquals(60_000, t.dacHigh(127));
        for (int w = 0; w + 1 < t.count(); w++) {
            assertEquals(t.dacHigh(w), t.dacLow(w + 1), "contiguous at " + w);
        }
        // E_k = 50 V * 120^(k/128): edge 64 is 50 * sqrt(120) = 547.72 V = 5477.2 codes, rounded to 5477
        assertEquals(5477, t.dacLow(64));
        assertEquals(TableStatus.OK, WindowTable.validate(lows(t), highs(t), t.count()));
    }

    @Test
    void shouldSpaceDefaultWindowsAtAboutFourPercent() {
        WindowTable t = DemoCup.table();
        // physics.md: Delta V / V about 3.8 % (120^(1/128) - 1 = 3.8100 %); the rounding of a code
        // moves a 19-code bottom window by up to 1/19, so allow 3.8 % +/- 0.3 % at the bottom, 0.05 % elsewhere
        for (int w = 0; w < t.count(); w++) {
            double width = (double) (t.dacHigh(w) - t.dacLow(w)) / t.dacLow(w);
            double tolerance = t.dacLow(w) < 2000 ? 0.003 : 0.0005;
            assertEquals(0.038100, width, tolerance, "window " + w);
        }
    }

    @Test
    void shouldBuildLogSpacedTable() {
        // 16 windows over a factor 16 (100 V .. 1600 V): each edge doubles every 4 windows, exact codes
        WindowTable t = WindowTable.logSpaced(16, 100_000, 1_600_000, DemoCup.INSTRUMENT.millivoltsPerCode());
        assertEquals(16, t.count());
        assertEquals(1000, t.dacLow(0));
        assertEquals(2000, t.dacLow(4));
        assertEquals(4000, t.dacLow(8));
        assertEquals(16_000, t.dacHigh(15));
    }

    @Test
    void shouldRefuseEmptyTable() {
        assertEquals(TableStatus.EMPTY, WindowTable.validate(new int[0], new int[0], 0));
    }

    @Test
    void shouldRefuseTooManyWindows() {
        int n = WindowTable.CAPACITY + 1; // capacity 256 (issue 2)
        int[] lows = new int[n];
        int[] highs = new int[n];
        for (int w = 0; w < n; w++) {
            lows[w] = 100 + w * 10;
            highs[w] = 105 + w * 10;
        }
        assertEquals(TableStatus.TOO_MANY_WINDOWS, WindowTable.validate(lows, highs, n));
        assertEquals(TableStatus.OK, WindowTable.validate(lows, highs, n - 1));
    }

    @Test
    void shouldRefuseCodesOutsideDacRange() {
        // 16-bit DAC: 0..65535 (hardware ICD §3.1 16-bit codes; demo-cup.yaml modulator.dacBits 16)
        assertEquals(TableStatus.OUT_OF_DAC_RANGE, WindowTable.validate(new int[] {100, 60_000}, new int[] {200, 65_536}, 2));
        assertEquals(TableStatus.OUT_OF_DAC_RANGE, WindowTable.validate(new int[] {-1, 100}, new int[] {50, 200}, 2));
        assertEquals(TableStatus.OK, WindowTable.validate(new int[] {0, 60_000}, new int[] {200, 65_535}, 2));
    }

    @Test
    void shouldRefuseNonMonotonicTables() {
        // issue 2: lows and highs strictly increasing, low < high
        assertEquals(TableStatus.NOT_MONOTONIC, WindowTable.validate(new int[] {100, 300}, new int[] {100, 400}, 2));
        assertEquals(TableStatus.NOT_MONOTONIC, WindowTable.validate(new int[] {100, 100}, new int[] {200, 300}, 2));
        assertEquals(TableStatus.NOT_MONOTONIC, WindowTable.validate(new int[] {100, 150}, new int[] {300, 300}, 2));
        assertEquals(TableStatus.NOT_MONOTONIC, WindowTable.validate(new int[] {300, 100}, new int[] {400, 200}, 2));
    }

    @Test
    void shouldRefuseMissingArrays() {
        assertEquals(TableStatus.MISSING_DATA, WindowTable.validate(null, new int[] {200}, 1));
        assertEquals(TableStatus.MISSING_DATA, WindowTable.validate(new int[] {100}, new int[] {200}, 2));
    }

    @Test
    void shouldThrowOnlyWhenFactoryIsMisused() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
            () -> WindowTable.of(new int[] {300, 100}, new int[] {400, 200}, 2));
        assertTrue(e.getMessage().contains("NOT_MONOTONIC"));
        assertThrows(IllegalArgumentException.class, () -> WindowTable.logSpaced(0, 50_000, 6_000_000, DemoCup.INSTRUMENT.millivoltsPerCode()));
    }

    @Test
    void shouldCopyInputArrays() {
        int[] lows = {100, 200};
        int[] highs = {150, 250};
        WindowTable t = WindowTable.of(lows, highs, 2);
        lows[0] = 999;
        assertEquals(100, t.dacLow(0)); // immutable after build (issue 2)
    }

    @Test
    void shouldNameEveryReasonCode() {
        assertEquals("OK", TableStatus.name(TableStatus.OK));
        assertEquals("NOT_MONOTONIC", TableStatus.name(TableStatus.NOT_MONOTONIC));
        assertEquals("BAD_NOISE", TableStatus.name(TableStatus.BAD_NOISE));
        assertEquals("UNKNOWN", TableStatus.name(99));
    }

    static int[] lows(WindowTable t) {
        int[] a = new int[t.count()];
        for (int w = 0; w < a.length; w++) {
            a[w] = t.dacLow(w);
        }
        return a;
    }

    static int[] highs(WindowTable t) {
        int[] a = new int[t.count()];
        for (int w = 0; w < a.length; w++) {
            a[w] = t.dacHigh(w);
        }
        return a;
    }
}
