package dev.sweepline.ground.spectrum;

import dev.sweepline.ground.frame.Crc16Ibm3740;
import java.util.HashMap;
import java.util.Map;

/**
 * The window tables the ground knows, by table id: the built-in table (id 0, telemetry ICD §4/§8)
 * and any uplinked table image registered from its file (commands.md §4.1: marker "ST", length L at
 * offset 4, window count n at offset 6, windows from offset 136 as low/high DAC codes, CRC-16/IBM-3740
 * of octets 0..L-3 at L-2, which is also the table id). Edges are calibrated volts (ICD §8).
 */
public final class WindowCatalogue {
    private static final int MARKER = 0x5354;
    private static final int WINDOWS_AT = 136;

    private final Map<Integer, double[][]> edges = new HashMap<>();

    /** A catalogue holding the built-in table. */
    public WindowCatalogue() {
        double[][] builtIn = new double[2][DefaultWindowTable.WINDOWS];
        for (int w = 0; w < DefaultWindowTable.WINDOWS; w++) {
            builtIn[0][w] = DefaultWindowTable.lowVolts(w);
            builtIn[1][w] = DefaultWindowTable.highVolts(w);
        }
        edges.put(DefaultWindowTable.TABLE_ID, builtIn);
    }

    /**
     * Registers a table image.
     *
     * @return its table id, or -1 when the octets are not an intact image
     */
    public int add(byte[] image) {
        if (image.length < WINDOWS_AT + 2 + 4 || u16(image, 0) != MARKER) {
            return -1;
        }
        int length = u16(image, 4);
        int n = u16(image, 6);
        if (length != image.length || n < 1 || n > 256 || length != WINDOWS_AT + 2 + 4 * n) {
            return -1;
        }
        int crc = u16(image, length - 2);
        if (Crc16Ibm3740.compute(image, 0, length - 2) != crc) {
            return -1;
        }
        double[][] e = new double[2][n];
        for (int w = 0; w < n; w++) {
            e[0][w] = DefaultWindowTable.calibratedVolts(u16(image, WINDOWS_AT + 4 * w));
            e[1][w] = DefaultWindowTable.calibratedVolts(u16(image, WINDOWS_AT + 4 * w + 2));
        }
        edges.put(crc, e);
        return crc;
    }

    /** True when {@code tableId} is known. */
    public boolean knows(int tableId) {
        return edges.containsKey(tableId);
    }

    /**
     * Writes the calibrated edges of windows {@code first .. first + count - 1} of table {@code tableId}
     * into {@code low} and {@code high} (NaN where unknown): one lookup per spectrum.
     */
    public void edges(int tableId, int first, int count, double[] low, double[] high) {
        double[][] e = edges.get(tableId);
        for (int i = 0; i < count; i++) {
            int w = first + i;
            boolean known = e != null && w >= 0 && w < e[0].length;
            low[i] = known ? e[0][w] : Double.NaN;
            high[i] = known ? e[1][w] : Double.NaN;
        }
    }

    /** Calibrated low edge of window {@code w} of table {@code tableId}, volts; NaN when unknown. */
    public double lowVolts(int tableId, int w) {
        double[][] e = edges.get(tableId);
        return e == null || w < 0 || w >= e[0].length ? Double.NaN : e[0][w];
    }

    /** Calibrated high edge of window {@code w} of table {@code tableId}, volts; NaN when unknown. */
    public double highVolts(int tableId, int w) {
        double[][] e = edges.get(tableId);
        return e == null || w < 0 || w >= e[1].length ? Double.NaN : e[1][w];
    }

    private static int u16(byte[] b, int at) {
        return ((b[at] & 0xFF) << 8) | (b[at + 1] & 0xFF);
    }
}
