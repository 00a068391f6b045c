package dev.sweepline.ground.decode;

/**
 * Golden layout-2 spectrum packets and frames (telemetry ICD §4 layout 2: 0x82, instrument id, sample
 * width w; w-bit samples, raw in ⌈w/8⌉ octets or CCSDS 121 with n = w), for the built-in instruments
 * demo-cup (id 1, 16-bit ADC, 3 gain ranges) and fine-cup (id 2, 20-bit ADC, pedestal 1024, 2 ranges).
 *
 * <p>How they were made: by hand from the ICD with python3 struct packing, independently of the Java code,
 * by {@code src/test/resources/golden/make_golden_spectra_v2.py}, whose output is pasted here; its CCSDS 121
 * streams are coded from standards.md and decoded again to the samples by libaec's {@code aec -d -n 20 -j 8
 * -r 32 -m -3}. T0 = 2026-01-01T00:00:00 TAI = 0x7FE81780 coarse seconds since 1958.
 */
public final class GoldenSpectraV2 {
    private GoldenSpectraV2() {
    }

    /**
     * fine-cup (id 2, w = 20), survey, APID 0x100 seq 3, CUC T0 + 20.25 s; mode 1, flags 0x40 (table changed),
     * sweep 0x0042, table 0, windows 100..109, peak 0x6A80, 16 periods; gains 0,0,1,1,1,1,1,0,0,0; window
     * index 4 saturated; raw, 3 octets a sample: q1 = 1024 + 5000 i but q1[4] = 2^20 − 1, q2 = 1024 + 3 i,
     * q3 = 2000 + 77777 i, q4 = 1000 + i. 164 octets.
     */
    public static final String FINE_RAW =
            "0900c003009d7fe817944000820002140140004200000064000a6a800010055400080000001e000400001788002b1000"
            + "3e980fffff0065a8007930008cb800a04000b3c8001e00040000040300040600040900040c00040f0004120004150004"
            + "1800041b001e0007d00137a102677203974304c71405f6e50726b60856870986580ab629001e0003e80003e90003ea00"
            + "03eb0003ec0003ed0003ee0003ef0003f00003f1";

    /** The samples of {@link #FINE_RAW} coded CCSDS 121 with n = 20 (compression 0x01); seq 4, T0 + 30.5 s. 135 octets. */
    public static final String FINE_RICE =
            "0900c00400807fe8179e8000820002140140004200000064000a6a8000100554000800010023980200711c178809c402"
            + "710fffff9a5709c4027106043ff10e20000000000000000000000a1802002aab55504081fc00268803e8249249bd0afd"
            + "12fd12fd12fd12fd12fd14021fefd15fa200000000000000000000000000080801f412492424fe";

    /**
     * demo-cup in layout 2 (id 1, w = 16), focus, APID 0x101 seq 11, T0 + 40 s; mode 2, flags 0x80 (stepped
     * down), sweep 0x0100, windows 60..63, no peak, 8 periods; gains 0,1,2,2; window 63 saturated; raw:
     * q1 = 256 + 1000 i, q2 = 300 + i, q3 = 256, q4 = 65535, 40000, 30000, 20000. 73 octets.
     */
    public static final String DEMO_V2 =
            "0901c00b00427fe817a8000082000110028001000000003c0004ffff00081a10000008010004e808d00cb80008012c01"
            + "2d012e012f000801000100010001000008ffff9c4075304e20";

    /** {@link #DEMO_V2} but instrument id 7 (no description) and seq 9. */
    public static final String UNKNOWN_ID =
            "0901c00900427fe817a9000082000710028001000000003c0004ffff00081a10000008010004e808d00cb80008012c01"
            + "2d012e012f000801000100010001000008ffff9c4075304e20";

    /** {@link #DEMO_V2} but instrument id 2 (fine-cup, 20-bit ADC) with w = 16, and seq 10. */
    public static final String WRONG_WIDTH =
            "0901c00a00427fe817aa000082000210028001000000003c0004ffff00081a10000008010004e808d00cb80008012c01"
            + "2d012e012f000801000100010001000008ffff9c4075304e20";

    /**
     * Three 256-octet frames (no ASM) of VC 0, MC and VC counts 0, 1, 2, SCID 0x2C5, carrying {@link #UNKNOWN_ID},
     * {@link #WRONG_WIDTH}, {@link #FINE_RAW}, {@link #DEMO_V2}, {@link #FINE_RICE} back to back, then an idle
     * packet (APID 0x7FF) to the end of the third frame; FECFs 0xE817, 0xDABB, 0x46F3.
     */
    public static final String[] STREAM = {

        "2c50000018000901c00900427fe817a9000082000710028001000000003c0004ffff00081a10000008010004e808d00c"
            + "b80008012c012d012e012f000801000100010001000008ffff9c4075304e200901c00a00427fe817aa00008200021002"
            + "8001000000003c0004ffff00081a10000008010004e808d00cb80008012c012d012e012f000801000100010001000008"
            + "ffff9c4075304e200900c003009d7fe817944000820002140140004200000064000a6a800010055400080000001e0004"
            + "00001788002b10003e980fffff0065a8007930008cb800a04000b3c8001e00040000040300040600040900040c00040f"
            + "00041200041500041800041b001ee817",
        "2c500101183e0007d00137a102677203974304c71405f6e50726b60856870986580ab629001e0003e80003e90003ea00"
            + "03eb0003ec0003ed0003ee0003ef0003f00003f10901c00b00427fe817a8000082000110028001000000003c0004ffff"
            + "00081a10000008010004e808d00cb80008012c012d012e012f000801000100010001000008ffff9c4075304e200900c0"
            + "0400807fe8179e8000820002140140004200000064000a6a8000100554000800010023980200711c178809c402710fff"
            + "ff9a5709c4027106043ff10e20000000000000000000000a1802002aab55504081fc00268803e8249249bd0afd12fd12"
            + "fd12fd12fd12fd14021fefd15fa2dabb",
        "2c500202181600000000000000000000000000080801f412492424fe07ffc00000db5555555555555555555555555555"
            + "555555555555555555555555555555555555555555555555555555555555555555555555555555555555555555555555"
            + "555555555555555555555555555555555555555555555555555555555555555555555555555555555555555555555555"
            + "555555555555555555555555555555555555555555555555555555555555555555555555555555555555555555555555"
            + "555555555555555555555555555555555555555555555555555555555555555555555555555555555555555555555555"
            + "555555555555555555555555555546f3"
    };
}
