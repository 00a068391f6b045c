package dev.sweepline.fsw.telemetry;

/**
 * The golden TM frames of the telemetry ICD (issue 3), copied verbatim from the ground decoder's test tree
 * ({@code ground-decoder/src/test/java/dev/sweepline/ground/decode/GoldenFrames.java}; fsw-core may not depend on
 * ground-decoder, not even in tests). Each is one 128-octet frame without its ASM.
 *
 * <p>Source: made by hand from the ICD with python3 struct packing, independently of both modules' Java code, by
 * {@code ground-decoder/src/test/resources/golden/make_golden_frames.py}; FECF = {@code binascii.crc_hqx(frame, 0xFFFF)}
 * (CRC-16/IBM-3740, standards.md). Field-by-field breakdown: see the ground copy's Javadoc. If the two copies ever
 * differ, the python script decides. The spectrum packet and its two frames are of layout version 2 (telemetry
 * ICD §4), made the same way by this module's {@code src/test/resources/golden/make_golden_frames_v2.py}, not
 * copied from this code's output; the other frames are unchanged by layout 2.
 */
final class GoldenFrames {
    /** T0 = 2026-01-01T00:00:00 TAI in CUC coarse seconds since 1958-01-01 (make_golden_frames.py: days x 86400). */
    static final long T0_COARSE = 0x7FE81780L;
    /** Frame length of every golden frame, octets (make_golden_frames.py L; ICD §1 allows 128..2048). */
    static final int FRAME_LENGTH = 128;

    /** VC 1, MC 5, VCC 3: housekeeping seq 42 at T0 + 0.25 s, idle packet seq 0 filling the tail. */
    static final String HOUSEKEEPING_WITH_IDLE_TAIL =
            "2c52050318000910c02a001f7fe8178040000101000123450001234000020003000501020304000100abcdef07ffc000"
            + "004b55555555555555555555555555555555555555555555555555555555555555555555555555555555555555555555"
            + "55555555555555555555555555555555555555555555555555555555555583e8";

    /**
     * The 173-octet survey spectrum packet in layout 2 (seq 7, T0 + 10.5 s, windows 40..55, raw 16-bit
     * samples, instrument 1): make_golden_frames_v2.py demo_spectrum(), the issue-3 spectrum with the four
     * octets of layout 2 (telemetry ICD §4) after the CUC.
     */
    static final String SPECTRUM_PACKET =
            "0900c00700a67fe8178a800082000110018001230000002800102f8000040015a50000800000200100016401c8022c02"
            + "9002f4035803bcffff048404e8054c05b00614067806dc0020010001320164019601c801fa022c025e029002c202f403"
            + "260358038a03bc03ee0020012c0133013a01410148014f0156015d0164016b0172017901800187018e0195002000fa00"
            + "fb00fc00fd00fe00ff0100010101020103010401050106010701080109";

    /** VC 0, MC 6, VCC 0x10, FHP 0: the first 120 octets of the spectrum packet (make_golden_frames_v2.py). */
    static final String SPECTRUM_PART_1 =
            "2c50061018000900c00700a67fe8178a800082000110018001230000002800102f8000040015a5000080000020010001"
            + "6401c8022c029002f4035803bcffff048404e8054c05b00614067806dc0020010001320164019601c801fa022c025e02"
            + "9002c202f403260358038a03bc03ee0020012c0133013a01410148014f01b146";

    /** VC 0, MC 7, VCC 0x11, FHP 53: the spectrum's last 53 octets, idle packet seq 1 (67 octets; make_golden_frames_v2.py). */
    static final String SPECTRUM_PART_2 =
            "2c500711183556015d0164016b0172017901800187018e0195002000fa00fb00fc00fd00fe00ff010001010102010301"
            + "040105010601070108010907ffc001003c55555555555555555555555555555555555555555555555555555555555555"
            + "555555555555555555555555555555555555555555555555555555555555d5d8";

    /**
     * The fine cup's focus spectrum in layout 2 (make_golden_frames_v2.py fine_spectrum()): APID 0x101 seq 3,
     * T0 + 20.25 s, instrument 2, 20-bit samples raw in 3 octets, windows 100..104 ascending, table 0xBEEF,
     * table-changed flag, no peak, 16 periods, gain 0,1,1,0,0, window 101 saturated.
     */
    static final String FINE_SPECTRUM_PACKET =
            "0901c003005f7fe8179440008200021402400009beef00640005ffff001014004000000f0004000fffff0123450abcde"
            + "000405000f000401000402000403000404000405000f000000000001000002000003000004000f0f00000e00000d0000"
            + "0c00000b0000";

    /** VC 7, MC 8, VCC 0, FHP 0x7FE: idle data only. */
    static final String IDLE_FRAME =
            "2c5e08001ffe555555555555555555555555555555555555555555555555555555555555555555555555555555555555"
            + "555555555555555555555555555555555555555555555555555555555555555555555555555555555555555555555555"
            + "555555555555555555555555555555555555555555555555555555555555b4a2";

    /** VC 1, MC 9, VCC 4: housekeeping seq 43..45 (T0 + 4.25, 8.25, 12.25 s), the 6-octet tail starts idle seq 2. */
    static final String THREE_HOUSEKEEPING_SPLIT_IDLE_1 =
            "2c52090418000910c02b001f7fe8178440000101000123450001234000020003000501020304000100abcdef0910c02c"
            + "001f7fe8178840000101000123450001234000020003000501020304000100abcdef0910c02d001f7fe8178c40000101"
            + "000123450001234000020003000501020304000100abcdef07ffc00200778e67";

    /** VC 1, MC 10, VCC 5, FHP 0x7FF: the rest of idle packet seq 2. */
    static final String THREE_HOUSEKEEPING_SPLIT_IDLE_2 =
            "2c520a051fff555555555555555555555555555555555555555555555555555555555555555555555555555555555555"
            + "555555555555555555555555555555555555555555555555555555555555555555555555555555555555555555555555"
            + "5555555555555555555555555555555555555555555555555555555555557b89";

    /** All frames in stream order (MC 5..10). */
    static final String[] STREAM = {HOUSEKEEPING_WITH_IDLE_TAIL, SPECTRUM_PART_1, SPECTRUM_PART_2, IDLE_FRAME,
        THREE_HOUSEKEEPING_SPLIT_IDLE_1, THREE_HOUSEKEEPING_SPLIT_IDLE_2};

    private GoldenFrames() {
    }
}
