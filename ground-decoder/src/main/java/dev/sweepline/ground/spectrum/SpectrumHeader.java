package dev.sweepline.ground.spectrum;

import dev.sweepline.ground.frame.BigEndian;

/**
 * The fixed fields at the start of a spectrum packet's user data, in either layout (ICD §4). The first
 * octet tells them apart: layout 2 begins with {@code 0x82} (bit 7 set), then the instrument id and the
 * sample width; layout 3 (a focus sweep with support windows) begins with {@code 0x83} and is layout 2
 * with the support windows inserted after the integration periods; layout 1 (recorded demo-cup
 * telemetry) begins with the mode, bit 7 clear, and has neither, so it is the demo cup's with 16-bit
 * samples.
 *
 * <pre>
 * layout 2   layout 1   octets  field
 *  0          -          1       layout version 0x82
 *  1          -          2       instrument id
 *  3          -          1       sample width w, bits
 *  4          0          1       mode (1 survey, 2 focus)
 *  5          1          1       flags: bit 7 stepped downward, bit 6 table changed at this sweep,
 *                                 bit 5 interleaved order
 *  6          2          2       sweep number
 *  8          4          2       table id
 * 10          6          2       first window f
 * 12          8          2       window count c
 * 14         10          2       peak, window units Q8 (0xFFFF none)
 * 16         12          2       integration periods per window
 * 18         14          ...     gain-range tags, saturation flags, compression, quadrant streams
 *
 * layout 3: as layout 2 to offset 17, then
 * 18                     1       support windows b (1..6)
 * 19                     3 b     b × [window offset from f (1), integration periods (2)]
 * 19 + 3 b               ...     gain-range tags, ...
 * </pre>
 *
 * <p>A flyweight: {@link #wrap} points it at a packet's user data and the accessors read the fields from
 * there, so that one header per decoder serves every packet. Valid while the packet's buffer is.
 */
final class SpectrumHeader {
    /** First octet of layout 2: bit 7 set (versioned), bits 6..0 the version 2 (ICD §4). */
    static final int LAYOUT_2_MARKER = 0x82;
    /** First octet of layout 3: bit 7 set, bits 6..0 the version 3 (ICD §4). */
    static final int LAYOUT_3_MARKER = 0x83;
    /** Layout 3: octets of one support window entry, offset (1) and integration periods (2) (ICD §4). */
    static final int SUPPORT_ENTRY_OCTETS = 3;
    /** Layout 3: most support windows (ICD §4). */
    static final int MAX_SUPPORT_WINDOWS = 6;
    /**
     * Most integration periods of a window (ICD §4: a support window's 1..1000; commands.md §4.1: no sweep
     * dwells above the limit of 1000, the table's integrationPeriods included).
     */
    static final int MAX_DWELL_PERIODS = 1000;
    /** Bit 7 of the first octet: set in every versioned layout (ICD §4). */
    static final int VERSIONED_BIT = 0x80;
    /** Fixed octets of layout 1, before the gain tags (ICD §4). */
    static final int LAYOUT_1_OCTETS = 14;
    /** Fixed octets of layout 2 (ICD §4). */
    static final int LAYOUT_2_OCTETS = 18;
    /** Flags bit 7: the sweep stepped downward (ICD §4). */
    static final int STEPPED_DOWN = 0x80;
    /** Flags bit 6: the first sweep flown with a newly applied table (ICD §4). */
    static final int TABLE_CHANGED = 0x40;
    /** Flags bit 5: the sweep stepped in the interleaved focus order (ICD §4). */
    static final int INTERLEAVED = 0x20;

    /**
     * The fixed octets the layout announced by first octet {@code first} has at least (layout 3: up to its
     * support window count b), or −1 for an unknown layout.
     */
    static int octetsOf(int first) {
        if ((first & VERSIONED_BIT) == 0) {
            return LAYOUT_1_OCTETS;
        }
        return first == LAYOUT_2_MARKER ? LAYOUT_2_OCTETS : first == LAYOUT_3_MARKER ? LAYOUT_2_OCTETS + 1 : -1;
    }

    private byte[] b;
    /** User-data offset of the first octet. */
    private int u;
    /** Offset of the mode octet: the fields from there on are those of layout 1. */
    private int m;
    private boolean two;
    private boolean three;

    /** Reads the fixed fields at user-data offset {@code u}; {@link #octetsOf} octets must be there. */
    SpectrumHeader wrap(byte[] buf, int userData) {
        this.b = buf;
        this.u = userData;
        int first = buf[userData] & 0xFF;
        this.three = first == LAYOUT_3_MARKER;
        this.two = first == LAYOUT_2_MARKER || three;
        this.m = two ? userData + LAYOUT_2_OCTETS - LAYOUT_1_OCTETS : userData;
        return this;
    }

    /** 1, 2 or 3. */
    int layout() {
        return three ? 3 : two ? 2 : 1;
    }

    /** Support windows b (layout 3; 0 in the others). */
    int supportCount() {
        return three ? b[u + LAYOUT_2_OCTETS] & 0xFF : 0;
    }

    /** Offset from f of support window {@code k} (layout 3, k < b, within {@link #octets()}). */
    int supportOffset(int k) {
        return b[u + LAYOUT_2_OCTETS + 1 + SUPPORT_ENTRY_OCTETS * k] & 0xFF;
    }

    /** Integration periods of support window {@code k} (layout 3). */
    int supportPeriods(int k) {
        return BigEndian.u16(b, u + LAYOUT_2_OCTETS + 2 + SUPPORT_ENTRY_OCTETS * k);
    }

    /** The instrument id (layout 2), 0 in layout 1 (which names none). */
    int instrumentId() {
        return two ? BigEndian.u16(b, u + 1) : 0;
    }

    /** w (layout 2), 16 in layout 1. */
    int sampleBits() {
        return two ? b[u + 3] & 0xFF : QuadrantDecompressor.LAYOUT_1_SAMPLE_BITS;
    }

    /** 1 survey, 2 focus. */
    int mode() {
        return b[m] & 0xFF;
    }

    /** The flags octet. */
    int flags() {
        return b[m + 1] & 0xFF;
    }

    /** Sweep number. */
    int sweep() {
        return BigEndian.u16(b, m + 2);
    }

    /** Table id. */
    int tableId() {
        return BigEndian.u16(b, m + 4);
    }

    /** First window f. */
    int firstWindow() {
        return BigEndian.u16(b, m + 6);
    }

    /** Window count c. */
    int windowCount() {
        return BigEndian.u16(b, m + 8);
    }

    /** Peak, Q8 window units. */
    int peakQ8() {
        return BigEndian.u16(b, m + 10);
    }

    /** Modulation periods per window (layout 3: per window but the support windows). */
    int integrationPeriods() {
        return BigEndian.u16(b, m + 12);
    }

    /** Length of the fixed fields: where the gain tags start (layout 3: after the b support windows). */
    int octets() {
        return three ? LAYOUT_2_OCTETS + 1 + SUPPORT_ENTRY_OCTETS * supportCount() : two ? LAYOUT_2_OCTETS : LAYOUT_1_OCTETS;
    }

    boolean steppedDown() {
        return (flags() & STEPPED_DOWN) != 0;
    }

    boolean tableChanged() {
        return (flags() & TABLE_CHANGED) != 0;
    }

    boolean interleaved() {
        return (flags() & INTERLEAVED) != 0;
    }
}
