package dev.sweepline.fsw.telemetry;

/**
 * Bandwidth accounting (telemetry ICD §7): packet octets generated per APID (the spectrum
 * octets per sweep mode are the science package's), and
 * frame octets emitted (ASM included) per virtual channel. Plain counters, updated in place.
 */
public final class TelemetryCounters {
    private final long[] packetOctetsByApid = new long[SpacePacket.MAX_APID + 1];
    private final long[] packetsByApid = new long[SpacePacket.MAX_APID + 1];
    private final long[] frameOctetsByVc = new long[TransferFrameBuilder.VIRTUAL_CHANNELS];
    private long packetOctets;

    void countPacket(int apid, int octets) {
        packetOctetsByApid[apid] += octets;
        packetsByApid[apid]++;
        packetOctets += octets;
    }

    void countFrame(int vc, int octets) {
        frameOctetsByVc[vc] += octets;
    }

    /** Packet octets generated on {@code apid}. */
    public long packetOctets(int apid) {
        return packetOctetsByApid[apid];
    }

    /** Packets generated on {@code apid}. */
    public long packets(int apid) {
        return packetsByApid[apid];
    }

    /** Packet octets generated on every APID (idle fill excluded). */
    public long packetOctets() {
        return packetOctets;
    }

    /** Frame octets (ASM included) emitted on {@code vc}. */
    public long frameOctets(int vc) {
        return frameOctetsByVc[vc];
    }

    /** Frame octets (ASM included) emitted on all virtual channels: what the downlink carries. */
    public long frameOctets() {
        long sum = 0;
        for (long n : frameOctetsByVc) {
            sum += n;
        }
        return sum;
    }
}
