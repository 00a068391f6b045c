package dev.sweepline.sim.bench;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.sweepline.fsw.sweep.SweepMode;
import java.io.IOException;
import java.io.StringWriter;
import java.util.Locale;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/**
 * {@code decisions.csv} rows are the bytes the bench wrote with {@code String.format} before it wrote them
 * digit by digit: the reference is that format string itself ({@link #formatted}), over every Q8 window of a
 * 256-window table (exhaustive), microseconds up to a week and beyond, and the %.6g cells.
 */
class DecisionsCsvTest {
    /** The row as {@code RunReportWriter} formatted it before (its format string, unchanged). */
    private static String formatted(SweepRecord r, double[] change) {
        return String.format(Locale.ROOT, "%d,%s,%.6f,%.6f,%d,%d,%s,%s,%d,%d,%b,%b,%d,%s,%s,%s%n", r.sweep(),
                r.mode().name().toLowerCase(Locale.ROOT), r.startMicros() / 1e6, r.endMicros() / 1e6,
                r.firstWindow(), r.lastWindow(), Double.isNaN(r.peakWindow()) ? ""
                    : String.format(Locale.ROOT, "%.3f", r.peakWindow()),
                Double.isNaN(r.bandCentre()) ? "" : String.format(Locale.ROOT, "%.3f", r.bandCentre()),
                r.trueProtonWindow(), r.trueAlphaWindow(), r.locked(), r.alphaLock(), r.saturatedSamples(),
                cell(change[0]), cell(change[1]), cell(change[2]));
    }

    private static String cell(double v) {
        return Double.isFinite(v) ? String.format(Locale.ROOT, "%.6g", v) : "";
    }

    private static void assertSameRow(SweepRecord r, double[] change) throws IOException {
        StringWriter out = new StringWriter();
        new DecisionsCsv(out).add(r, change);
        assertEquals(DecisionsCsv.HEADER + formatted(r, change), out.toString());
    }

    @Test
    void shouldWriteEveryQ8WindowAsTheFormatterDid() throws IOException {
        StringWriter out = new StringWriter();
        StringBuilder expected = new StringBuilder(DecisionsCsv.HEADER);
        DecisionsCsv csv = new DecisionsCsv(out);
        double[] none = {Double.NaN, Double.NaN, Double.NaN};
        for (int q8 = 0; q8 < 256 * 256; q8++) { // every Q8 window of the fine cup's 256 windows
            SweepRecord r = new SweepRecord(q8, SweepMode.FOCUS, 0, 1, 0, 255, q8 / 256.0, (65535 - q8) / 256.0,
                    q8 >> 8, -1, 0);
            csv.add(r, none);
            expected.append(formatted(r, none));
        }
        assertEquals(expected.toString(), out.toString());
    }

    @Test
    void shouldWriteTimesCellsAndOddValuesAsTheFormatterDid() throws IOException {
        SplittableRandom rng = new SplittableRandom(7);
        long[] edges = {0, 1, 999_999, 1_000_000, 1_000_001, 604_800_000_000L, 999_999_999_999_999L,
            1_000_000_000_000_000L, -1, -1_500_000};
        for (long micros : edges) {
            assertSameRow(new SweepRecord(1, SweepMode.SURVEY, micros, micros + 7, 0, 127, Double.NaN, Double.NaN,
                    -1, -1, 3), new double[] {0, 1e-7, 123456.5});
        }
        for (int i = 0; i < 20_000; i++) {
            long start = rng.nextLong(700_000_000_000L); // up to about eight days
            double[] change = {rng.nextDouble() * Math.pow(10, rng.nextInt(-9, 3)), rng.nextInt(5) == 0 ? Double.NaN
                    : rng.nextDouble(), rng.nextDouble() * 1e-4};
            // windows off the Q8 grid, negative or huge go through the formatter itself
            double peak = switch (rng.nextInt(4)) {
                case 0 -> rng.nextDouble() * 128;
                case 1 -> -rng.nextInt(1000) / 256.0;
                case 2 -> 1e9 + rng.nextInt(256) / 256.0;
                default -> rng.nextInt(32768) / 256.0;
            };
            assertSameRow(new SweepRecord(i, SweepMode.FOCUS, start, start + rng.nextLong(2_000_000), 3, 60, peak,
                    rng.nextInt(32768) / 256.0, 30, 50, 0), change);
        }
    }

    @Test
    void shouldWriteTheGeneralCellsAsTheFormatterDid() throws IOException {
        // %.6g cells: zeros, ties at the seventh digit (the formatter rounds the shortest decimal half up:
        // 0.15 style cases), the carry to 1e6 and below 1e-4 where the notation switches, extremes
        double[] edges = {0.0, -0.0, 1.0000005, 0.15, 999999.5, 999999.4, 99999.95, 9.999995, 0.0000999995,
            0.00009999949, 1e-4, 1e6, 123456.5, 1.234565, -1.234565, 1e-300, 1e300, Double.MIN_VALUE,
            Double.MAX_VALUE, -Double.MAX_VALUE, 0.1, 1, -1, 2.5e-5, 0.5, 100, 1e7, 1e-3, 9.9999995e-5};
        SweepRecord r = new SweepRecord(1, SweepMode.FOCUS, 0, 1, 0, 127, Double.NaN, Double.NaN, -1, -1, 0);
        for (int k = 0; k + 2 < edges.length; k += 3) {
            assertSameRow(r, new double[] {edges[k], edges[k + 1], edges[k + 2]});
        }
        StringWriter out = new StringWriter();
        StringBuilder expected = new StringBuilder(DecisionsCsv.HEADER);
        DecisionsCsv csv = new DecisionsCsv(out);
        SplittableRandom rng = new SplittableRandom(6);
        for (int i = 0; i < 100_000; i++) {
            double[] change = new double[3];
            for (int k = 0; k < 3; k++) {
                change[k] = switch ((3 * i + k) % 6) {
                    case 0 -> rng.nextDouble(-2, 2); // the truth changes' own range
                    case 1 -> Math.scalb(rng.nextDouble(-1, 1), rng.nextInt(-40, 40));
                    case 2 -> Double.longBitsToDouble(rng.nextLong()); // every exponent (NaN, infinities: empty)
                    case 3 -> (rng.nextLong(1, 10_000_000) + 0.5) * Math.pow(10, rng.nextInt(-18, 2)); // ties
                    case 4 -> rng.nextInt(-2_000_000, 2_000_000) / 1e6;
                    default -> (rng.nextLong(100_000, 1_000_000) * 10 + 5) / Math.pow(10, rng.nextInt(0, 14));
                };
            }
            csv.add(r, change);
            expected.append(formatted(r, change));
        }
        assertEquals(expected.toString(), out.toString());
    }
}
