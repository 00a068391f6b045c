package dev.sweepline.fsw.telemetry;

import dev.sweepline.fsw.sweep.SweepMode;

/**
 * Bandwidth accounting (telemetry ICD §7): packet octets generated per APID and per sweep mode, and
 * frame octets emitted (ASM included) per virtual channel. Plain counters, updated in place.
 */
public final class TelemetryCounters {
    private final long[] packetOctetsByApid = new long[SpacePacket.MAX_APID + 1];
    private final long[] packetsByApid = new long[SpacePacket.MAX_APID + 1];
    private final long[] spectrumOctetsByMode = new long[SweepMode.values().length];
    private final long[] frameOctetsByVc = new long[TransferFrameBuilder.VIRTUAL_CHANNELS];
    private long packetOctets;

    void countPacket(int apid, int octets) {
        packetOctetsByApid[apid] += octets;
        packetsByApid[apid]++;
        packetOctets += octets;
    }

    void countSpectrum(SweepMode mode, int octets) {
        spectrumOctetsByMode[mode.ordinal()] += octets;
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

    /** Spectrum packet octets generated in {@code mode}. */
    public long spectrumOctets(SweepMode mode) {
        return spectrumOctetsByMode[mode.ordinal()];
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
