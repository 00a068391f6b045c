package dev.sweepline.ground.decode;

import dev.sweepline.ground.frame.FrameReason;
import dev.sweepline.ground.packet.FrameDrop;
import dev.sweepline.ground.packet.PacketAnomaly;
import dev.sweepline.ground.spectrum.DecodedSpectrum;
import dev.sweepline.ground.spectrum.SpectrumError;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/** Records everything a decoder reports, copying buffers, for tests. */
public final class RecordingListener implements DecodeListener {
    /** A rejected frame or skipped run. */
    public record Bad(FrameReason reason, long offset, int octets) {
    }

    /** A packet-layer anomaly. */
    public record Anomaly(int vcid, PacketAnomaly anomaly, int octets) {
    }

    /** A good frame dropped by its VC count. */
    public record Drop(int vcid, int vcCount, FrameDrop why) {
    }

    /** A VC count sequence that started again. */
    public record Restart(int vcid, int lastVcCount, int newVcCount) {
    }

    public final List<Long> frameOffsets = new ArrayList<>();
    public final List<byte[]> frames = new ArrayList<>();
    public final List<Bad> bad = new ArrayList<>();
    public final List<byte[]> packets = new ArrayList<>();
    public final List<Anomaly> anomalies = new ArrayList<>();
    public final List<FrameGap> frameGaps = new ArrayList<>();
    public final List<SequenceGap> sequenceGaps = new ArrayList<>();
    public final List<int[]> mcGaps = new ArrayList<>();
    public final List<Drop> drops = new ArrayList<>();
    public final List<Restart> restarts = new ArrayList<>();
    /** The detail text of each spectrum error, in order. */
    public final List<String> spectrumErrorDetails = new ArrayList<>();
    public final List<DecodedSpectrum> spectra = new ArrayList<>();
    public final List<SpectrumError> spectrumErrors = new ArrayList<>();
    public final List<HousekeepingReport> housekeeping = new ArrayList<>();
    public final List<EventReport> events = new ArrayList<>();
    private final boolean keepFrames;

    /** @param keepFrames copy every good frame too */
    public RecordingListener(boolean keepFrames) {
        this.keepFrames = keepFrames;
    }

    /** Copies nothing but offsets of frames. */
    public RecordingListener() {
        this(false);
    }

    @Override
    public void onFrame(byte[] buf, int off, int frameOctets, long streamOffset) {
        frameOffsets.add(streamOffset);
        if (keepFrames) {
            frames.add(Arrays.copyOfRange(buf, off, off + frameOctets));
        }
    }

    @Override
    public void onBadFrame(FrameReason reason, long streamOffset, int octets) {
        bad.add(new Bad(reason, streamOffset, octets));
    }

    @Override
    public void onPacket(int vcid, byte[] buf, int off, int octets) {
        packets.add(Arrays.copyOfRange(buf, off, off + octets));
    }

    @Override
    public void onPacketAnomaly(int vcid, PacketAnomaly anomaly, int octetsDropped) {
        anomalies.add(new Anomaly(vcid, anomaly, octetsDropped));
    }

    @Override
    public void onFrameGap(int vcid, int expected, int actual, int missing) {
        frameGaps.add(new FrameGap(vcid, expected, actual, missing));
    }

    @Override
    public void onMasterChannelGap(int expected, int actual, int missing) {
        mcGaps.add(new int[] {expected, actual, missing});
    }

    @Override
    public void onFrameDropped(int vcid, int vcCount, FrameDrop why) {
        drops.add(new Drop(vcid, vcCount, why));
    }

    @Override
    public void onVcRestart(int vcid, int lastVcCount, int newVcCount) {
        restarts.add(new Restart(vcid, lastVcCount, newVcCount));
    }

    @Override
    public void onSequenceGap(int apid, int expected, int actual, int missing) {
        sequenceGaps.add(new SequenceGap(apid, expected, actual, missing));
    }

    @Override
    public void onSpectrum(DecodedSpectrum s) {
        spectra.add(s);
    }

    @Override
    public void onSpectrumError(int apid, int seq, SpectrumError error, String detail) {
        spectrumErrors.add(error);
        spectrumErrorDetails.add(detail);
    }

    @Override
    public void onHousekeeping(HousekeepingReport r) {
        housekeeping.add(r);
    }

    @Override
    public void onEvent(EventReport r) {
        events.add(r);
    }

    /** Decodes {@code stream} in one call with the given frame length and returns the decoder. */
    public TelemetryDecoder decode(byte[] stream, int frameOctets) {
        TelemetryDecoder d = new TelemetryDecoder(DecoderConfig.icdDefaults().withFrameOctets(frameOctets),
                dev.sweepline.ground.spectrum.QuadrantDecompressor.UNAVAILABLE, this);
        d.accept(stream, 0, stream.length);
        d.finish();
        return d;
    }
}
