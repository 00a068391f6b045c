package dev.sweepline.ground.spectrum;

import dev.sweepline.ground.frame.BigEndian;
import dev.sweepline.ground.frame.Crc16Ibm3740;
import dev.sweepline.ground.instrument.BuiltInInstruments;
import dev.sweepline.ground.instrument.DefaultWindowTable;
import dev.sweepline.ground.instrument.GroundInstrument;
import dev.sweepline.ground.instrument.HvCalibration;
import java.util.HashMap;
import java.util.Map;

/**
 * The window tables the ground knows, by table id: the built-in table (id 0), which is each
 * instrument's own default table (FORMAT.md {@code windows}), and any uplinked table image registered
 * from its file (commands.md §4.1: marker "ST", format version 1, 2, 3 or 4 at offset 2, length L at offset 4
 * (138 + 4 n in version 1, 154 + 4 n in version 2, whose 16 octets of sweep styles follow the windows,
 * 158 + 4 n in version 3, whose engineering flush interval, seconds, signed 32-bit, follows the styles,
 * 162 + 4 n in version 4, whose focus floor dwell follows the flush),
 * window count n at offset 6, windows from offset 136 as low/high DAC codes, CRC-16/IBM-3740 of octets 0..L-3 at L-2, which is also
 * the table id). An image holds DAC codes and names no instrument, so its edges are the codes put
 * through the calibration of the instrument whose spectrum asks (telemetry ICD §8). Edges are
 * calibrated volts. Not thread-safe while tables are added.
 */
public final class WindowCatalogue {
    private static final int MARKER = 0x5354;
    private static final int WINDOWS_AT = 136;
    private static final int MAX_WINDOWS = 256;
    /** Octets of the version-2 style extension after the windows (commands.md §4.1). */
    private static final int STYLE_OCTETS = 16;
    /** Octets of the version-3 engineering flush field after the styles (commands.md §4.1). */
    private static final int FLUSH_OCTETS = 4;
    /** Octets of the version-4 focus floor dwell after the flush (commands.md §4.1). */
    private static final int FLOOR_OCTETS = 4;

    /** Engineering flush interval, seconds, of uplinked tables by id (0: the build's). */
    private final Map<Integer, Integer> flushSeconds = new HashMap<>();
    /** Uplinked tables by id: [0] low codes, [1] high codes. */
    private final Map<Integer, int[][]> uplinked = new HashMap<>();

    /** A catalogue holding the built-in table (of every instrument) and no uplinked one. */
    public WindowCatalogue() {
    }

    /**
     * Registers a table image.
     *
     * @return its table id, or -1 when the octets are not an intact image
     */
    public int add(byte[] image) {
        if (image.length < WINDOWS_AT + 2 + 4 || BigEndian.u16(image, 0) != MARKER) {
            return -1;
        }
        int length = BigEndian.u16(image, 4);
        int n = BigEndian.u16(image, 6);
        int version = image[2] & 0xFF;
        int extension = (version >= 2 ? STYLE_OCTETS : 0) + (version >= 3 ? FLUSH_OCTETS : 0)
            + (version == 4 ? FLOOR_OCTETS : 0);
        if (length != image.length || n < 1 || n > MAX_WINDOWS || version < 1 || version > 4
            || length != WINDOWS_AT + 2 + 4 * n + extension) {
            return -1;
        }
        int crc = BigEndian.u16(image, length - 2);
        if (Crc16Ibm3740.compute(image, 0, length - 2) != crc) {
            return -1;
        }
        int[][] codes = new int[2][n];
        for (int w = 0; w < n; w++) {
            codes[0][w] = BigEndian.u16(image, WINDOWS_AT + 4 * w);
            codes[1][w] = BigEndian.u16(image, WINDOWS_AT + 4 * w + 2);
        }
        uplinked.put(crc, codes);
        flushSeconds.put(crc, version >= 3 ? (int) BigEndian.u32(image, WINDOWS_AT + 4 * n + STYLE_OCTETS) : 0);
        return crc;
    }

    /**
     * The engineering flush interval, seconds, that table {@code tableId} sets (commands.md §4.1):
     * 0 for the build's (the built-in table, a version-1 or 2 image), -1 for an unknown table.
     */
    public int engineeringFlushSeconds(int tableId) {
        return tableId == DefaultWindowTable.TABLE_ID ? 0 : flushSeconds.getOrDefault(tableId, -1);
    }

    /** True when {@code tableId} is known: the built-in table or a registered image. */
    public boolean knows(int tableId) {
        return tableId == DefaultWindowTable.TABLE_ID || uplinked.containsKey(tableId);
    }

    /**
     * Writes the calibrated edges of windows {@code first .. first + count - 1} of table {@code tableId},
     * as {@code instrument} flies it, into {@code low} and {@code high} (NaN where the table or the
     * window is not known): one lookup per spectrum.
     */
    public void edges(GroundInstrument instrument, int tableId, int first, int count, double[] low, double[] high) {
        if (tableId == DefaultWindowTable.TABLE_ID) {
            DefaultWindowTable t = instrument.windows();
            for (int i = 0; i < count; i++) {
                low[i] = t.lowVolts(first + i);
                high[i] = t.highVolts(first + i);
            }
            return;
        }
        int[][] codes = uplinked.get(tableId);
        for (int i = 0; i < count; i++) {
            low[i] = volts(instrument.calibration(), codes, 0, first + i);
            high[i] = volts(instrument.calibration(), codes, 1, first + i);
        }
    }

    /** Calibrated low edge of window {@code w} of table {@code tableId} on {@code instrument}, V; NaN if unknown. */
    public double lowVolts(GroundInstrument instrument, int tableId, int w) {
        return edge(instrument, tableId, w, 0);
    }

    /** Calibrated high edge of window {@code w} of table {@code tableId} on {@code instrument}, V; NaN if unknown. */
    public double highVolts(GroundInstrument instrument, int tableId, int w) {
        return edge(instrument, tableId, w, 1);
    }

    /** As {@link #edges(GroundInstrument, int, int, int, double[], double[])} for the demo cup. */
    public void edges(int tableId, int first, int count, double[] low, double[] high) {
        edges(BuiltInInstruments.demoCup(), tableId, first, count, low, high);
    }

    /** Calibrated low edge of window {@code w} of table {@code tableId} on the demo cup, volts; NaN when unknown. */
    public double lowVolts(int tableId, int w) {
        return lowVolts(BuiltInInstruments.demoCup(), tableId, w);
    }

    /** Calibrated high edge of window {@code w} of table {@code tableId} on the demo cup, volts; NaN when unknown. */
    public double highVolts(int tableId, int w) {
        return highVolts(BuiltInInstruments.demoCup(), tableId, w);
    }

    private double edge(GroundInstrument instrument, int tableId, int w, int side) {
        if (tableId == DefaultWindowTable.TABLE_ID) {
            DefaultWindowTable t = instrument.windows();
            return side == 0 ? t.lowVolts(w) : t.highVolts(w);
        }
        return volts(instrument.calibration(), uplinked.get(tableId), side, w);
    }

    /** Calibrated edge {@code side} (0 low, 1 high) of window {@code w} of an image's codes; NaN when unknown. */
    private static double volts(HvCalibration cal, int[][] codes, int side, int w) {
        return codes == null || w < 0 || w >= codes[side].length ? Double.NaN : cal.volts(codes[side][w]);
    }
}
