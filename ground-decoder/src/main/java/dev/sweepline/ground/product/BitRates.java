package dev.sweepline.ground.product;

import dev.sweepline.ground.decode.DecodeStats;
import java.util.Map;
import java.util.TreeMap;

/**
 * Bits per second of a run over its time span (first to last packet time): per APID from the packet
 * octets, and of the frames on the link (frame octets plus the 4-octet ASM, ICD §1 and §7). NaN when the
 * span is zero.
 *
 * @param spanSeconds   time span, s
 * @param byApid        packet bits per second by APID ("0x100" ...)
 * @param packets       all packets (idle included), bits per second
 * @param frames        frames with ASM, bits per second
 * @param allocation    the allocation given, bits per second; NaN when none
 */
public record BitRates(double spanSeconds, Map<String, Double> byApid, double packets, double frames,
        double allocation) {
    /** ASM octets before every frame (ICD §1). */
    public static final int ASM_OCTETS = 4;

    /** Rates from the decoder's counts. */
    public static BitRates of(DecodeStats s, int frameOctets, double allocation) {
        double span = s.firstTime() == null ? 0 : s.lastTime().taiSeconds() - s.firstTime().taiSeconds();
        double inv = span > 0 ? 1 / span : Double.NaN;
        Map<String, Double> by = new TreeMap<>();
        long total = 0;
        for (int apid = 0; apid < 2048; apid++) {
            if (s.packets(apid) > 0) {
                by.put(String.format("0x%03X", apid), s.packetOctets(apid) * 8 * inv);
                total += s.packetOctets(apid) * 8;
            }
        }
        double frames = s.framesGood() * (double) (frameOctets + ASM_OCTETS) * 8 * inv;
        return new BitRates(span, by, total * inv, frames, allocation);
    }

    /** True when an allocation was given and the frames fit within it. */
    public boolean withinAllocation() {
        return Double.isFinite(allocation) && frames <= allocation;
    }
}
