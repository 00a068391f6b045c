package dev.sweepline.sim.campaign;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Locale;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/**
 * runs.csv rows: {@link RunRow#toCsv()} writes what {@code String.format(Locale.ROOT, "%s")} of each value
 * wrote before (Double.toString, the Java SE API's shortest round-tripping decimal), so the files of existing
 * campaigns stay octet for octet the same, and {@link RunRow#parse} reads every value back exactly.
 */
class RunRowTest {
    private static final double[] EDGES = {0.0, -0.0, Double.NaN, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY,
        Double.MIN_VALUE, Double.MAX_VALUE, 1e-3, 1e7, 0.1 + 0.2, -123.456e-300};

    @Test
    void shouldWriteWhatTheFormatWroteAndReadItBack() {
        SplittableRandom random = new SplittableRandom(2026);
        for (int k = 0; k < 2000; k++) {
            double[] d = new double[25];
            for (int i = 0; i < d.length; i++) {
                d[i] = k < EDGES.length ? EDGES[(k + i) % EDGES.length]
                        : Double.longBitsToDouble(random.nextLong()); // every bit pattern, NaNs among them
            }
            RunRow row = new RunRow(k, k % 7, d[0], k % 3, -1, d[1], d[2], d[3], d[4], d[5],
                    new double[] {d[6], d[7], d[8]}, new double[] {d[9], d[10], d[11]},
                    new double[] {d[12], d[13], d[14]}, k % 5 - 1, d[15], new double[] {d[16], d[17], d[18]}, k,
                    new double[] {d[19], d[20], d[21]}, new double[] {d[22], d[23], d[24]});
            assertEquals(formatted(row), row.toCsv());
            assertEquals(row.toCsv(), RunRow.parse(row.toCsv()).toCsv());
        }
    }

    /** The row as the bench wrote it before this writer (String.format with %s and %d). */
    private static String formatted(RunRow r) {
        return String.format(Locale.ROOT, "%d,%d,%s,%d,%d,%s,%s,%s,%s,%s,%s,%s,%s,%s,%s,%s,%s,%s,%s,%d,%s,%s,%s,%s,%d,%s,%s,%s,%s,%s,%s",
                r.set(), r.run(), r.lockFraction(), r.alphaLocks(), r.reacquireSweeps(), r.reacquireSeconds(),
                r.spectraPerSecond(), r.bitsPerSecond(), r.integratingFraction(), r.informationEfficiency(),
                r.momentError()[0], r.momentError()[1], r.momentError()[2], r.crlbRatio()[0], r.crlbRatio()[1],
                r.crlbRatio()[2], r.trackingCentre()[0], r.trackingCentre()[1], r.trackingCentre()[2],
                r.strictReacquireSweeps(), r.strictReacquireSeconds(), r.crlbRobust()[0], r.crlbRobust()[1],
                r.crlbRobust()[2], r.nonStationary(), r.errorUnflagged()[0], r.errorUnflagged()[1],
                r.errorUnflagged()[2], r.crlbUnflagged()[0], r.crlbUnflagged()[1], r.crlbUnflagged()[2]);
    }
}
