package dev.sweepline.ground.spectrum;

import dev.sweepline.ground.frame.BigEndian;

/**
 * The fixed fields at the start of a spectrum packet's user data, in either layout (ICD §4). The first
 * octet tells them apart: layout 2 begins with {@code 0x82} (bit 7 set), then the instrument id and the
 * sample width; layout 1 (recorded demo-cup telemetry) begins with the mode, bit 7 clear, and has
 * neither, so it is the demo cup's with 16-bit samples.
 *
 * <pre>
 * layout 2   layout 1   octets  field
 *  0          -          1       layout version 0x82
 *  1          -          2       instrument id
 *  3          -          1       sample width w, bits
 *  4          0          1       mode (1 survey, 2 focus)
 *  5          1          1       flags: bit 7 stepped downward, bit 6 table changed at this sweep
 *  6          2          2       sweep number
 *  8          4          2       table id
 * 10          6          2       first window f
 * 12          8          2       window count c
 * 14         10          2       peak, window units Q8 (0xFFFF none)
 * 16         12          2       integration periods per window
 * 18         14          ...     gain-range tags, saturation flags, compression, quadrant streams
 * </pre>
 *
 * <p>A flyweight: {@link #wrap} points it at a packet's user data and the accessors read the fields from
 * there, so that one header per decoder serves every packet. Valid while the packet's buffer is.
 */
final class SpectrumHeader {
    /** First octet of layout 2: bit 7 set (versioned), bits 6..0 the version 2 (ICD §4). */
    static final int LAYOUT_2_MARKER = 0x82;
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

    /** The fixed octets the layout announced by first octet {@code first} has, or −1 for an unknown layout. */
    static int octetsOf(int first) {
        if ((first & VERSIONED_BIT) == 0) {
            return LAYOUT_1_OCTETS;
        }
        return first == LAYOUT_2_MARKER ? LAYOUT_2_OCTETS : -1;
    }

    private byte[] b;
    /** User-data offset of the first octet. */
    private int u;
    /** Offset of the mode octet: the fields from there on are those of layout 1. */
    private int m;
    private boolean two;

    /** Reads the fixed fields at user-data offset {@code u}; {@link #octetsOf} octets must be there. */
    SpectrumHeader wrap(byte[] buf, int userData) {
        this.b = buf;
        this.u = userData;
        this.two = (buf[userData] & 0xFF) == LAYOUT_2_MARKER;
        this.m = two ? userData + LAYOUT_2_OCTETS - LAYOUT_1_OCTETS : userData;
        return this;
    }

    /** 1 or 2. */
    int layout() {
        return two ? 2 : 1;
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

    /** Modulation periods per window. */
    int integrationPeriods() {
        return BigEndian.u16(b, m + 12);
    }

    /** Length of the fixed fields: where the gain tags start. */
    int octets() {
        return two ? LAYOUT_2_OCTETS : LAYOUT_1_OCTETS;
    }

    boolean steppedDown() {
        return (flags() & STEPPED_DOWN) != 0;
    }

    boolean tableChanged() {
        return (flags() & TABLE_CHANGED) != 0;
    }
}
