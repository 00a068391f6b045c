package dev.sweepline.fsw.telemetry;

/**
 * The golden TM frames of the telemetry ICD (issue 3), copied verbatim from the ground decoder's test tree
 * ({@code ground-decoder/src/test/java/dev/sweepline/ground/decode/GoldenFrames.java}; fsw-core may not depend on
 * ground-decoder, not even in tests). Each is one 128-octet frame without its ASM.
 *
 * <p>Source: made by hand from the ICD with python3 struct packing, independently of both modules' Java code, by
 * {@code ground-decoder/src/test/resources/golden/make_golden_frames.py}; FECF = {@code binascii.crc_hqx(frame, 0xFFFF)}
 * (CRC-16/IBM-3740, standards.md). Field-by-field breakdown: see the ground copy's Javadoc. If the two copies ever
 * differ, the python script decides.
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

    /** The 169-octet survey spectrum packet (seq 7, T0 + 10.5 s, windows 40..55, raw samples). */
    static final String SPECTRUM_PACKET =
            "0900c00700a27fe8178a8000018001230000002800102f8000040015a50000800000200100016401c8022c029002f403"
            + "5803bcffff048404e8054c05b00614067806dc0020010001320164019601c801fa022c025e029002c202f40326035803"
            + "8a03bc03ee0020012c0133013a01410148014f0156015d0164016b0172017901800187018e0195002000fa00fb00fc00"
            + "fd00fe00ff0100010101020103010401050106010701080109";

    /** VC 0, MC 6, VCC 0x10, FHP 0: the first 120 octets of the spectrum packet. */
    static final String SPECTRUM_PART_1 =
            "2c50061018000900c00700a27fe8178a8000018001230000002800102f8000040015a50000800000200100016401c802"
            + "2c029002f4035803bcffff048404e8054c05b00614067806dc0020010001320164019601c801fa022c025e029002c202"
            + "f403260358038a03bc03ee0020012c0133013a01410148014f0156015d01c3b3";

    /** VC 0, MC 7, VCC 0x11, FHP 49: the spectrum's last 49 octets, idle packet seq 1 (71 octets). */
    static final String SPECTRUM_PART_2 =
            "2c500711183164016b0172017901800187018e0195002000fa00fb00fc00fd00fe00ff01000101010201030104010501"
            + "0601070108010907ffc00100405555555555555555555555555555555555555555555555555555555555555555555555"
            + "5555555555555555555555555555555555555555555555555555555555552ecc";

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
