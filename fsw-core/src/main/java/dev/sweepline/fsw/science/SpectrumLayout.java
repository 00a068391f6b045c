package dev.sweepline.fsw.science;

import dev.sweepline.fsw.octets.BigEndian;

/**
 * The spectrum packet's user data, layout version 2 (telemetry ICD §4): a flyweight over the packet
 * buffer with the fixed header's named offsets, then the variable part. Layout version 3 (a
 * support-dwell focus sweep) inserts after the header the support windows: b (1), then b × [window
 * offset from f (1) | integration periods (2)].
 *
 * <pre>
 *  0        1          3      4      5       6        8         10      12      14      16        18
 * +--------+----------+------+------+-------+--------+---------+-------+-------+-------+---------+
 * | 0x82   | instr id | w    | mode | flags | sweep  | table id| first | count | peak  | periods |
 * +--------+----------+------+------+-------+--------+---------+-------+-------+-------+---------+
 * flags: bit 7 stepped downward, bit 6 table changed, bit 5 interleaved order, bits 4..0 zero
 * then: gain tags ⌈c/4⌉ (2 bits a window, MSB first) | saturation ⌈c/8⌉ | compression (1) |
 *       4 × [ Lq (2) | Lq octets of quadrant q's c samples of w bits ]
 * </pre>
 *
 * Allocation-free; wrap it over a buffer, then write the fields. Threading: one thread.
 */
public final class SpectrumLayout {
    /** Layout version octet: bit 7 set (versioned), bits 6..0 = 2 (telemetry ICD §4). */
    public static final int LAYOUT_VERSION_2 = 0x82;
    /** Layout version octet of a spectrum with support windows: bit 7 set, bits 6..0 = 3 (telemetry ICD §4). */
    public static final int LAYOUT_VERSION_3 = 0x83;
    /** Layout 3: offset of the support window count b (1), 1..6. */
    public static final int SUPPORT_COUNT_OFFSET = 18;
    /** Layout 3: octets of one support window entry: offset from f (1), integration periods (2). */
    public static final int SUPPORT_ENTRY_OCTETS = 3;
    /** Layout 3: most support windows. */
    public static final int MAX_SUPPORT_WINDOWS = 6;
    /** Offset of the layout version (1). */
    public static final int VERSION_OFFSET = 0;
    /** Offset of the instrument id (2): the description's {@code id}. */
    public static final int INSTRUMENT_ID_OFFSET = 1;
    /** Offset of the sample width w, bits (1): the description's {@code adc.bits}. */
    public static final int SAMPLE_WIDTH_OFFSET = 3;
    /** Offset of the mode (1): {@code SweepMode.icdCode()}, 1 survey, 2 focus. */
    public static final int MODE_OFFSET = 4;
    /** Offset of the flags (1). */
    public static final int FLAGS_OFFSET = 5;
    /** Offset of the sweep number (2, wraps). */
    public static final int SWEEP_OFFSET = 6;
    /** Offset of the table id (2): CRC-16 of the parameter table image, 0 for the start-up table. */
    public static final int TABLE_ID_OFFSET = 8;
    /** Offset of the first window index f (2). */
    public static final int FIRST_WINDOW_OFFSET = 10;
    /** Offset of the window count c (2). */
    public static final int WINDOW_COUNT_OFFSET = 12;
    /** Offset of the refined proton peak, window units Q8 (2; {@link #NO_PEAK}: none). */
    public static final int PEAK_OFFSET = 14;
    /** Offset of the integration periods per window (2). */
    public static final int INTEGRATION_OFFSET = 16;
    /** Offset of the gain tags: the end of the fixed header. */
    public static final int GAIN_TAGS_OFFSET = 18;
    /** Octets of the fixed header. */
    public static final int HEADER_LENGTH = GAIN_TAGS_OFFSET;
    /** Flag bit 7: the sweep stepped downward. */
    public static final int FLAG_DESCENDING = 0x80;
    /** Flag bit 6: the first sweep flown with a newly applied table. */
    public static final int FLAG_TABLE_CHANGED = 0x40;
    /**
     * Flag bit 5: the sweep stepped in the interleaved focus order (sweep design note R22): the even offsets
     * from its starting end outward, then the odd ones back.
     */
    public static final int FLAG_INTERLEAVED = 0x20;
    /** Peak field value when the sweep held no valid peak. */
    public static final int NO_PEAK = 0xFFFF;
    /** Compression octet: CCSDS 121.0-B (telemetry ICD §4). */
    public static final int COMPRESSION_RICE = 0x01;
    /** Compression octet: raw samples, ⌈w/8⌉ octets each. */
    public static final int COMPRESSION_NONE = 0x00;

    private byte[] buffer;
    private int offset;
    private int supportOctets;

    /** Points this flyweight at the user data starting at {@code offset} of {@code buffer} (layout 2). */
    public SpectrumLayout wrap(byte[] buffer, int offset) {
        this.buffer = buffer;
        this.offset = offset;
        this.supportOctets = 0;
        return this;
    }

    /** Writes the version octet (layout 2), the instrument id and the sample width. */
    public SpectrumLayout instrument(int id, int sampleBits) {
        buffer[offset + VERSION_OFFSET] = (byte) LAYOUT_VERSION_2;
        BigEndian.put16(buffer, offset + INSTRUMENT_ID_OFFSET, id);
        buffer[offset + SAMPLE_WIDTH_OFFSET] = (byte) sampleBits;
        return this;
    }

    /** Writes the mode code and the flags. */
    public SpectrumLayout modeAndFlags(int modeCode, int flags) {
        buffer[offset + MODE_OFFSET] = (byte) modeCode;
        buffer[offset + FLAGS_OFFSET] = (byte) flags;
        return this;
    }

    /** Writes the sweep number (16 bits) and the table id. */
    public SpectrumLayout sweep(int sweepNumber, int tableId) {
        BigEndian.put16(buffer, offset + SWEEP_OFFSET, sweepNumber);
        BigEndian.put16(buffer, offset + TABLE_ID_OFFSET, tableId);
        return this;
    }

    /** Writes the first window, the window count, the peak (Q8) and the integration periods. */
    public SpectrumLayout windows(int first, int count, int peakQ8, int integrationPeriods) {
        BigEndian.put16(buffer, offset + FIRST_WINDOW_OFFSET, first);
        BigEndian.put16(buffer, offset + WINDOW_COUNT_OFFSET, count);
        BigEndian.put16(buffer, offset + PEAK_OFFSET, peakQ8);
        BigEndian.put16(buffer, offset + INTEGRATION_OFFSET, integrationPeriods);
        return this;
    }

    /**
     * Turns the packet into layout 3 with {@code b} support windows (1..{@value #MAX_SUPPORT_WINDOWS}):
     * the version octet and the count; write each entry with {@link #supportWindow}. After the header
     * fields.
     */
    public SpectrumLayout supportCount(int b) {
        buffer[offset + VERSION_OFFSET] = (byte) LAYOUT_VERSION_3;
        buffer[offset + SUPPORT_COUNT_OFFSET] = (byte) b;
        supportOctets = 1 + SUPPORT_ENTRY_OCTETS * b;
        return this;
    }

    /** Writes support window entry {@code k}: its offset from the first window and its integration periods. */
    public SpectrumLayout supportWindow(int k, int windowOffset, int integrationPeriods) {
        int at = offset + SUPPORT_COUNT_OFFSET + 1 + SUPPORT_ENTRY_OCTETS * k;
        buffer[at] = (byte) windowOffset;
        BigEndian.put16(buffer, at + 1, integrationPeriods);
        return this;
    }

    /** Offset in the buffer of the gain tags (the variable part), after the support windows in layout 3. */
    public int variablePartOffset() {
        return offset + GAIN_TAGS_OFFSET + supportOctets;
    }

    /** Octets of the gain tags of {@code c} windows, 2 bits each. */
    public static int gainTagOctets(int c) {
        return (c + 3) / 4;
    }

    /** Octets of the saturation flags of {@code c} windows, 1 bit each. */
    public static int saturationOctets(int c) {
        return (c + 7) / 8;
    }
}
