package dev.sweepline.fsw.command;

import dev.sweepline.fsw.fault.FaultMonitorId;
import dev.sweepline.fsw.instrument.InstrumentLimits;
import dev.sweepline.fsw.octets.BigEndian;
import dev.sweepline.fsw.octets.Crc16;
import dev.sweepline.fsw.table.SweepParameters;
import dev.sweepline.fsw.table.TableStatus;
import dev.sweepline.fsw.table.WindowTable;

/**
 * The parameter table image (commands.md §4.1), octet by octet, big-endian:
 *
 * <pre>
 *   0   2  marker 0x5354 ("ST")
 *   2   1  format version v: 1, 2, 3 or 4
 *   3   1  reserved, 0 (an image with another value is not intact: a later format may give it a meaning)
 *   4   2  image length L = 138 + 4 n (v 1), 154 + 4 n (v 2), 158 + 4 n (v 3) or 162 + 4 n (v 4), octets, CRC included
 *   6   2  window count n (1..256)
 *   8  76  sweep parameters, 19 signed 32-bit values (order in commands.md §4.1)
 *  84   2  housekeeping period, seconds (1..3600)
 *  86   2  spectrum decimation (1..256)
 *  88  48  fault settings, monitors 1..6: response (1), retries (1), threshold (2), limit (4)
 * 136  4n  windows: low code (2), high code (2)
 * 136+4n 16  v 2, 3 and 4: focusStyle, focusBudgetMicros, robustnessMarginWindows, surveyIntegrationPeriods (signed 32-bit)
 * 152+4n  4  v 3 and 4: engineeringFlushSeconds (signed 32-bit)
 * 156+4n  4  v 4 only: focusFloorPeriods (signed 32-bit)
 * L-2   2  CRC-16/IBM-3740 over octets 0 .. L-3
 * </pre>
 *
 * The table id is the CRC. An image is written in version 1 when its styles are the defaults (so
 * every version-1 table keeps its bytes and its id), in version 2 when only its styles differ, and in
 * version 3 when its engineering flush is not the build's, in version 4 when its focus floor dwell is
 * set; a version-1 image decodes with the default styles, a version-1 or 2 image with the build's flush
 * (0), a version-1, 2 or 3 image with no floor dwell (0). Decoding is allocation-free and never throws on bad bytes.
 */
public final class TableImage {
    /** Marker "ST". */
    public static final int MARKER = 0x5354;
    /** Format version of an image with the default styles. */
    public static final int VERSION = 1;
    /** Format version of an image that carries the styles (the extension after the windows). */
    public static final int VERSION_STYLES = 2;
    /** Octets before the windows. */
    public static final int WINDOWS_AT = 136;
    /** Octets of a version-1 image besides the windows (header, values, CRC). */
    public static final int FIXED_OCTETS = WINDOWS_AT + 2;
    /** Octets of the version-2 extension: four signed 32-bit style values. */
    public static final int STYLE_OCTETS = 16;
    /** Format version of an image that also carries the engineering flush interval after the styles. */
    public static final int VERSION_FLUSH = 3;
    /** Octets of the version-3 flush field. */
    public static final int FLUSH_OCTETS = 4;
    /** Format version of an image that also carries the focus floor dwell after the flush interval. */
    public static final int VERSION_FLOOR = 4;
    /** Octets of the version-4 floor field. */
    public static final int FLOOR_OCTETS = 4;
    /** Shortest image (one window, version 1). */
    public static final int MIN_OCTETS = FIXED_OCTETS + 4;
    /** Longest image ({@link WindowTable#CAPACITY} windows, version 4). */
    public static final int MAX_OCTETS = FIXED_OCTETS + STYLE_OCTETS + FLUSH_OCTETS + FLOOR_OCTETS + 4 * WindowTable.CAPACITY;
    /** {@link #decode} result: the image is not intact (marker, version, reserved octet, length or CRC). */
    public static final int CORRUPT = -1;

    private static final int RESERVED_AT = 3;
    private static final int PARAMETERS_AT = 8;
    private static final int HOUSEKEEPING_AT = 84;
    private static final int DECIMATION_AT = 86;
    private static final int FAULTS_AT = 88;
    private static final int FAULT_ENTRY_OCTETS = 8;

    private TableImage() {
    }

    /** Image length for {@code windows} windows in version 1. */
    public static int length(int windows) {
        return FIXED_OCTETS + 4 * windows;
    }

    /** Image length for {@code windows} windows in format {@code version} (1..4). */
    public static int length(int windows, int version) {
        return length(windows) + (version >= VERSION_STYLES ? STYLE_OCTETS : 0)
            + (version >= VERSION_FLUSH ? FLUSH_OCTETS : 0) + (version == VERSION_FLOOR ? FLOOR_OCTETS : 0);
    }

    /** The table id (CRC) of an image of {@code length} octets, as stored in its last two octets. */
    public static int tableId(byte[] b, int length) {
        return Telecommand.u16(b, length - 2);
    }

    /**
     * Checks the integrity of an image of {@code length} octets: marker, version, reserved octet (0),
     * length field, window count and CRC.
     *
     * @return true when intact
     */
    public static boolean intact(byte[] b, int length) {
        if (length < MIN_OCTETS || length > MAX_OCTETS || b.length < length) {
            return false;
        }
        int n = Telecommand.u16(b, 6);
        int version = b[2] & 0xFF;
        return Telecommand.u16(b, 0) == MARKER && version >= VERSION && version <= VERSION_FLOOR
            && b[RESERVED_AT] == 0 && Telecommand.u16(b, 4) == length
            && n >= 1 && n <= WindowTable.CAPACITY && length(n, version) == length
            && Crc16.of(b, 0, length - 2) == Telecommand.u16(b, length - 2);
    }

    /**
     * Decodes an intact image into {@code into} and validates its values against {@code limits}.
     *
     * @return 0 when valid; {@link #CORRUPT} when not intact; else a {@link TableStatus} code
     *         (windows, sweep parameters, instrument limits), or 100 + the id of a fault monitor entry
     *         outside its safe range, or 200 for a telemetry allocation out of range. {@code into}
     *         holds the decoded values either way.
     */
    public static int decode(byte[] b, int length, ParameterTable into, InstrumentLimits limits) {
        if (!intact(b, length)) {
            return CORRUPT;
        }
        int n = Telecommand.u16(b, 6);
        into.windowCount = n;
        for (int w = 0; w < n; w++) {
            into.dacLow[w] = Telecommand.u16(b, WINDOWS_AT + 4 * w);
            into.dacHigh[w] = Telecommand.u16(b, WINDOWS_AT + 4 * w + 2);
        }
        readParameters(b, into.sweep);
        int version = b[2] & 0xFF;
        readStyles(b, version >= VERSION_STYLES ? WINDOWS_AT + 4 * n : -1, into.sweep);
        into.sweep.engineeringFlushSeconds = version >= VERSION_FLUSH ? s32(b, WINDOWS_AT + 4 * n + STYLE_OCTETS) : 0;
        into.sweep.focusFloorPeriods = version == VERSION_FLOOR
                ? s32(b, WINDOWS_AT + 4 * n + STYLE_OCTETS + FLUSH_OCTETS) : 0;
        into.housekeepingSeconds = Telecommand.u16(b, HOUSEKEEPING_AT);
        into.spectrumDecimation = Telecommand.u16(b, DECIMATION_AT);
        for (int m = 1; m <= FaultMonitorId.COUNT; m++) {
            int p = FAULTS_AT + (m - 1) * FAULT_ENTRY_OCTETS;
            into.faults.response[m] = b[p] & 0xFF;
            into.faults.retries[m] = b[p + 1] & 0xFF;
            into.faults.threshold[m] = Telecommand.u16(b, p + 2);
            into.faults.limit[m] = s32(b, p + 4);
        }
        return validate(into, limits);
    }

    /** Validates decoded values against {@code limits}: the same codes as {@link #decode}. */
    public static int validate(ParameterTable t, InstrumentLimits limits) {
        int status = limits.validateTable(t.dacLow, t.dacHigh, t.windowCount);
        if (status != TableStatus.OK) {
            return status;
        }
        status = limits.validateParameters(t.sweep);
        if (status != TableStatus.OK) {
            return status;
        }
        int fault = t.faults.validateSafe();
        if (fault != 0) {
            return 100 + fault;
        }
        if (t.housekeepingSeconds < ParameterTable.MIN_HOUSEKEEPING_SECONDS
            || t.housekeepingSeconds > ParameterTable.MAX_HOUSEKEEPING_SECONDS
            || t.spectrumDecimation < 1 || t.spectrumDecimation > ParameterTable.MAX_SPECTRUM_DECIMATION) {
            return 200;
        }
        return 0;
    }

    /**
     * Writes the image of {@code t} (values as they are; validate first) into {@code b}.
     *
     * @return the image length
     */
    public static int encode(ParameterTable t, byte[] b) {
        int version = !t.sweep.defaultFloor() ? VERSION_FLOOR
                : !t.sweep.defaultFlush() ? VERSION_FLUSH : t.sweep.defaultStyles() ? VERSION : VERSION_STYLES;
        int length = length(t.windowCount, version);
        put16(b, 0, MARKER);
        b[2] = (byte) version;
        b[RESERVED_AT] = 0;
        put16(b, 4, length);
        put16(b, 6, t.windowCount);
        writeParameters(t.sweep, b);
        put16(b, HOUSEKEEPING_AT, t.housekeepingSeconds);
        put16(b, DECIMATION_AT, t.spectrumDecimation);
        for (int m = 1; m <= FaultMonitorId.COUNT; m++) {
            int p = FAULTS_AT + (m - 1) * FAULT_ENTRY_OCTETS;
            b[p] = (byte) t.faults.response[m];
            b[p + 1] = (byte) t.faults.retries[m];
            put16(b, p + 2, t.faults.threshold[m]);
            put32(b, p + 4, t.faults.limit[m]);
        }
        for (int w = 0; w < t.windowCount; w++) {
            put16(b, WINDOWS_AT + 4 * w, t.dacLow[w]);
            put16(b, WINDOWS_AT + 4 * w + 2, t.dacHigh[w]);
        }
        if (version >= VERSION_STYLES) {
            int i = WINDOWS_AT + 4 * t.windowCount;
            put32(b, i, t.sweep.focusStyle);
            put32(b, i + 4, t.sweep.focusBudgetMicros);
            put32(b, i + 8, t.sweep.robustnessMarginWindows);
            put32(b, i + 12, t.sweep.surveyIntegrationPeriods);
        }
        if (version >= VERSION_FLUSH) {
            put32(b, WINDOWS_AT + 4 * t.windowCount + STYLE_OCTETS, t.sweep.engineeringFlushSeconds);
        }
        if (version == VERSION_FLOOR) {
            put32(b, WINDOWS_AT + 4 * t.windowCount + STYLE_OCTETS + FLUSH_OCTETS, t.sweep.focusFloorPeriods);
        }
        put16(b, length - 2, Crc16.of(b, 0, length - 2));
        return length;
    }

    private static void readParameters(byte[] b, SweepParameters p) {
        int i = PARAMETERS_AT;
        p.integrationPeriods = s32(b, i);
        p.fixedSettleMicros = s32(b, i + 4);
        p.settleMicrosPerCodeQ8 = s32(b, i + 8);
        p.minHalfWidthWindows = s32(b, i + 12);
        p.halfWidthPerFwhmQ8 = s32(b, i + 16);
        p.maxBandWindows = s32(b, i + 20);
        p.resurveyEveryFocusSweeps = s32(b, i + 24);
        p.collapseFractionQ8 = s32(b, i + 28);
        p.jumpWindows = s32(b, i + 32);
        p.edgeWindows = s32(b, i + 36);
        p.edgeSearchWindows = s32(b, i + 40);
        p.gainUpFractionQ16 = s32(b, i + 44);
        p.gainDownFractionQ16 = s32(b, i + 48);
        p.alphaRatioQ16 = s32(b, i + 52);
        p.alphaToleranceQ16 = s32(b, i + 56);
        p.noiseCountsPerQuadrant = s32(b, i + 60);
        p.significanceSigmas = s32(b, i + 64);
        p.prominenceFractionQ8 = s32(b, i + 68);
        p.focusEnabled = s32(b, i + 72);
    }

    /** The styles from the extension at {@code at}, or the defaults when {@code at} is negative (version 1). */
    private static void readStyles(byte[] b, int at, SweepParameters p) {
        p.focusStyle = at < 0 ? SweepParameters.FOCUS_STYLE_BAND : s32(b, at);
        p.focusBudgetMicros = at < 0 ? 0 : s32(b, at + 4);
        p.robustnessMarginWindows = at < 0 ? 0 : s32(b, at + 8);
        p.surveyIntegrationPeriods = at < 0 ? 0 : s32(b, at + 12);
    }

    private static void writeParameters(SweepParameters p, byte[] b) {
        int i = PARAMETERS_AT;
        put32(b, i, p.integrationPeriods);
        put32(b, i + 4, p.fixedSettleMicros);
        put32(b, i + 8, p.settleMicrosPerCodeQ8);
        put32(b, i + 12, p.minHalfWidthWindows);
        put32(b, i + 16, p.halfWidthPerFwhmQ8);
        put32(b, i + 20, p.maxBandWindows);
        put32(b, i + 24, p.resurveyEveryFocusSweeps);
        put32(b, i + 28, p.collapseFractionQ8);
        put32(b, i + 32, p.jumpWindows);
        put32(b, i + 36, p.edgeWindows);
        put32(b, i + 40, p.edgeSearchWindows);
        put32(b, i + 44, p.gainUpFractionQ16);
        put32(b, i + 48, p.gainDownFractionQ16);
        put32(b, i + 52, p.alphaRatioQ16);
        put32(b, i + 56, p.alphaToleranceQ16);
        put32(b, i + 60, p.noiseCountsPerQuadrant);
        put32(b, i + 64, p.significanceSigmas);
        put32(b, i + 68, p.prominenceFractionQ8);
        put32(b, i + 72, p.focusEnabled);
    }

    private static int s32(byte[] b, int i) {
        return BigEndian.get32(b, i);
    }

    private static void put16(byte[] b, int i, int v) {
        BigEndian.put16(b, i, v);
    }

    private static void put32(byte[] b, int i, int v) {
        BigEndian.put32(b, i, v);
    }
}
