package dev.sweepline.ground.decode;

/**
 * Golden TM frames of the telemetry ICD (issue 3), shared with fsw-core's tests: fsw-core must write
 * exactly these octets. Each is one 128-octet frame WITHOUT its ASM (1A CF FC 1D goes before each on
 * the wire, ICD §1).
 *
 * <p>How they were made: by hand from the ICD with python3 struct packing, independently of the Java
 * code, by {@code src/test/resources/golden/make_golden_frames.py}; the FECF (last two octets) is
 * {@code binascii.crc_hqx(frame[:-2], 0xFFFF)}, i.e. CRC-16/CCITT-FALSE = CRC-16/IBM-3740 (standards.md).
 *
 * <p>Common values: L = 128 octets (ICD §1, allowed 128..2048), data field 120 octets; SCID 0x2C5; TFVN 00;
 * OCF flag 0; data field status S=0 Y=0 O=0 SLI=11, so the status word is 0x1800 | FHP (ICD §2).
 * T0 = 2026-01-01T00:00:00 TAI = 0x7FE81780 coarse seconds since 1958 (python: days × 86400).
 * Idle packets (APID 0x7FF) carry NO secondary header (sec-hdr flag 0, as CCSDS 133.0-B-2 requires of
 * idle packets and as the ICD's 7-octet minimum implies), user data 0x55, one sequence count for APID
 * 0x7FF across both VCs (read from "idle packets carry their own sequence count", ICD §2).
 */
public final class GoldenFrames {
    private GoldenFrames() {
    }

    /**
     * VC 1, MC 0x05, VC count 0x03, FHP 0. Header {@code 2C 52 05 03 18 00}.
     * <ul>
     *   <li>Housekeeping packet, 38 octets: {@code 09 10 C0 2A 00 1F} (TM, sec hdr, APID 0x110,
     *       unsegmented, seq 42, data length 31); CUC {@code 7F E8 17 80 40 00} = T0 + 0.25 s; user data
     *       (ICD §5) mode 1 survey, HV 1, steps sent 0x00012345, replies accepted 0x00012340,
     *       sequence errors 2, time-outs 3, retries 5, survey sweeps 0x0102, focus sweeps 0x0304,
     *       lock losses 1, telemetry octets 0x00ABCDEF.</li>
     *   <li>Idle packet filling the tail, 82 octets: {@code 07 FF C0 00 00 4B} (APID 0x7FF, seq 0,
     *       data length 75) + 76 × 0x55.</li>
     *   <li>FECF 0x83E8.</li>
     * </ul>
     */
    public static final String HOUSEKEEPING_WITH_IDLE_TAIL =
            "2c52050318000910c02a001f7fe8178040000101000123450001234000020003000501020304000100abcdef07ffc000"
            + "004b55555555555555555555555555555555555555555555555555555555555555555555555555555555555555555555"
            + "55555555555555555555555555555555555555555555555555555555555583e8";

    /**
     * The survey spectrum packet (169 octets) carried by {@link #SPECTRUM_PART_1} (first 120 octets) and
     * {@link #SPECTRUM_PART_2} (last 49). Fields (ICD §3–§4):
     * <ul>
     *   <li>{@code 09 00 C0 07 00 A2}: APID 0x100, sec hdr, unsegmented, seq 7, data length 162;</li>
     *   <li>CUC {@code 7F E8 17 8A 80 00} = T0 + 10.5 s;</li>
     *   <li>mode 1 survey; flags 0x80 (stepped downward); sweep 0x0123; table id 0; first window 40;
     *       window count 16; peak 0x2F80 (47.5 windows Q8); integration periods 4;</li>
     *   <li>gain tags {@code 00 15 A5 00}: windows 40..55 ranges 0,0,0,0, 0,1,1,1, 2,2,1,1, 0,0,0,0;</li>
     *   <li>saturation {@code 00 80}: window 48 (index 8) only;</li>
     *   <li>compression 0x00 (raw); each quadrant Lq = 0x0020 then 16 big-endian samples, index i = 0..15:
     *       q1 = 256 + 100 i except q1[8] = 65535; q2 = 256 + 50 i; q3 = 300 + 7 i; q4 = 250 + i.</li>
     * </ul>
     */
    public static final String SPECTRUM_PACKET =
            "0900c00700a27fe8178a8000018001230000002800102f8000040015a50000800000200100016401c8022c029002f403"
            + "5803bcffff048404e8054c05b00614067806dc0020010001320164019601c801fa022c025e029002c202f40326035803"
            + "8a03bc03ee0020012c0133013a01410148014f0156015d0164016b0172017901800187018e0195002000fa00fb00fc00"
            + "fd00fe00ff0100010101020103010401050106010701080109";

    /**
     * VC 0, MC 0x06, VC count 0x10, FHP 0. Header {@code 2C 50 06 10 18 00}; data field = the first
     * 120 octets of {@link #SPECTRUM_PACKET}; FECF 0xC3B3.
     */
    public static final String SPECTRUM_PART_1 =
            "2c50061018000900c00700a27fe8178a8000018001230000002800102f8000040015a50000800000200100016401c802"
            + "2c029002f4035803bcffff048404e8054c05b00614067806dc0020010001320164019601c801fa022c025e029002c202"
            + "f403260358038a03bc03ee0020012c0133013a01410148014f0156015d01c3b3";

    /**
     * VC 0, MC 0x07, VC count 0x11, FHP 49 (0x031). Header {@code 2C 50 07 11 18 31}; data field = the
     * last 49 octets of {@link #SPECTRUM_PACKET}, then an idle packet of 71 octets
     * {@code 07 FF C0 01 00 40} (seq 1, data length 64) + 65 × 0x55; FECF 0x2ECC.
     */
    public static final String SPECTRUM_PART_2 =
            "2c500711183164016b0172017901800187018e0195002000fa00fb00fc00fd00fe00ff01000101010201030104010501"
            + "0601070108010907ffc00100405555555555555555555555555555555555555555555555555555555555555555555555"
            + "5555555555555555555555555555555555555555555555555555555555552ecc";

    /** VC 7, MC 0x08, VC count 0x00, FHP 0x7FE (idle only). Header {@code 2C 5E 08 00 1F FE}; 120 × 0x55; FECF 0xB4A2. */
    public static final String IDLE_FRAME =
            "2c5e08001ffe555555555555555555555555555555555555555555555555555555555555555555555555555555555555"
            + "555555555555555555555555555555555555555555555555555555555555555555555555555555555555555555555555"
            + "555555555555555555555555555555555555555555555555555555555555b4a2";

    /**
     * VC 1, MC 0x09, VC count 0x04, FHP 0. Header {@code 2C 52 09 04 18 00}; three housekeeping packets
     * (as in {@link #HOUSEKEEPING_WITH_IDLE_TAIL} but seq 43, 44, 45 and CUC T0 + 4.25, 8.25, 12.25 s, i.e.
     * a 4 s housekeeping period) fill 114 octets; the 6-octet tail, shorter than an idle packet's
     * 7-octet minimum, holds the header {@code 07 FF C0 02 00 77} of an idle packet (seq 2, data length
     * 119, 126 octets in all) that fills the next VC 1 frame (ICD §2); FECF 0x8E67.
     */
    public static final String THREE_HOUSEKEEPING_SPLIT_IDLE_1 =
            "2c52090418000910c02b001f7fe8178440000101000123450001234000020003000501020304000100abcdef0910c02c"
            + "001f7fe8178840000101000123450001234000020003000501020304000100abcdef0910c02d001f7fe8178c40000101"
            + "000123450001234000020003000501020304000100abcdef07ffc00200778e67";

    /**
     * VC 1, MC 0x0A, VC count 0x05, FHP 0x7FF (no packet starts). Header {@code 2C 52 0A 05 1F FF}; 120 ×
     * 0x55, the rest of the idle packet begun in {@link #THREE_HOUSEKEEPING_SPLIT_IDLE_1}; FECF 0x7B89.
     */
    public static final String THREE_HOUSEKEEPING_SPLIT_IDLE_2 =
            "2c520a051fff555555555555555555555555555555555555555555555555555555555555555555555555555555555555"
            + "555555555555555555555555555555555555555555555555555555555555555555555555555555555555555555555555"
            + "5555555555555555555555555555555555555555555555555555555555557b89";

    /** All frames in stream order (MC 5..10). */
    public static final String[] STREAM = {HOUSEKEEPING_WITH_IDLE_TAIL, SPECTRUM_PART_1, SPECTRUM_PART_2,
        IDLE_FRAME, THREE_HOUSEKEEPING_SPLIT_IDLE_1, THREE_HOUSEKEEPING_SPLIT_IDLE_2};
}
