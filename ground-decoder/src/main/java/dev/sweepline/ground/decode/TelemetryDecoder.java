package dev.sweepline.ground.decode;

import dev.sweepline.ground.frame.FrameConstants;
import dev.sweepline.ground.frame.FrameListener;
import dev.sweepline.ground.frame.FrameReason;
import dev.sweepline.ground.frame.FrameSynchroniser;
import dev.sweepline.ground.frame.TmFrameHeader;
import dev.sweepline.ground.instrument.InstrumentSet;
import dev.sweepline.ground.packet.FrameDrop;
import dev.sweepline.ground.packet.PacketAnomaly;
import dev.sweepline.ground.packet.PacketListener;
import dev.sweepline.ground.packet.SequenceCountTracker;
import dev.sweepline.ground.packet.SpacePacketHeader;
import dev.sweepline.ground.packet.VirtualChannelDemux;
import dev.sweepline.ground.spectrum.DecodedSpectrum;
import dev.sweepline.ground.spectrum.QuadrantDecompressor;
import dev.sweepline.ground.spectrum.SpectrumPacketDecoder;
import dev.sweepline.ground.spectrum.SpectrumError;
import dev.sweepline.ground.spectrum.SpectrumView;
import dev.sweepline.ground.spectrum.WindowCatalogue;

/**
 * The whole ground chain of the telemetry ICD: bytes → frames → packets → spectra, housekeeping and
 * events, with counts in {@link DecodeStats}. Feed octets in any chunking with {@link #accept}, then call
 * {@link #finish}. Bad input is counted and reported to the listener, never thrown. Not thread-safe.
 */
public final class TelemetryDecoder {
    private final DecodeListener listener;
    private final DecodeStats stats = new DecodeStats();
    private final FrameSynchroniser sync;
    private final VirtualChannelDemux demux;
    private final SequenceCountTracker sequences = new SequenceCountTracker();
    /** VC of each APID's last packet, -1 before its first: a VC restart restarts its APIDs' counts. */
    private final int[] vcOfApid = new int[SpacePacketHeader.IDLE_APID + 1];
    private final SpectrumPacketDecoder spectra;
    /** The one spectrum the decoder fills and hands to the listener, packet after packet. */
    private final SpectrumView view = new SpectrumView();
    private final InstrumentSet instruments;

    /**
     * @param config   frame length, SCID and the instrument descriptions
     * @param ccsds121 decoder for compression 0x01 ({@link QuadrantDecompressor#UNAVAILABLE} if none)
     * @param listener receives everything found
     */
    public TelemetryDecoder(DecoderConfig config, QuadrantDecompressor ccsds121, DecodeListener listener) {
        this(config, ccsds121, new WindowCatalogue(), listener);
    }

    /** As above, with the window tables of {@code windows} (uplinked tables by id). */
    public TelemetryDecoder(DecoderConfig config, QuadrantDecompressor ccsds121, WindowCatalogue windows,
            DecodeListener listener) {
        this.listener = listener;
        this.instruments = config.instruments();
        this.spectra = new SpectrumPacketDecoder(ccsds121, windows, instruments);
        this.demux = new VirtualChannelDemux(new Packets());
        this.sync = new FrameSynchroniser(config.frameOctets(), config.scid(), new Frames());
        java.util.Arrays.fill(vcOfApid, -1);
    }

    /** Feeds octets; everything complete in them is reported before this returns. */
    public void accept(byte[] buf, int off, int len) {
        sync.accept(buf, off, len);
    }

    /** Ends the stream: partial frames and packets are reported. */
    public void finish() {
        sync.finish();
        demux.finish();
    }

    /** The instrument descriptions spectra are decoded with. */
    public InstrumentSet instruments() {
        return instruments;
    }

    /** The counts so far. */
    public DecodeStats stats() {
        return stats;
    }

    /** Frame length in use (0 while detecting). */
    public int frameOctets() {
        return sync.frameOctets();
    }

    /** True when the frame length came from detection. */
    public boolean frameLengthDetected() {
        return sync.lengthDetected();
    }

    private final class Frames implements FrameListener {
        @Override
        public void onFrame(byte[] buf, int off, int frameOctets, long streamOffset) {
            stats.framesGood++;
            stats.framesByVc[TmFrameHeader.vcid(buf, off)]++;
            if (TmFrameHeader.firstHeaderPointer(buf, off) == FrameConstants.FHP_IDLE_ONLY) {
                stats.framesIdle++;
            }
            listener.onFrame(buf, off, frameOctets, streamOffset);
            demux.onFrame(buf, off, frameOctets);
        }

        @Override
        public void onBadFrame(FrameReason reason, long streamOffset, int octets) {
            stats.badFrame(reason, octets);
            listener.onBadFrame(reason, streamOffset, octets);
        }
    }

    private final class Packets implements PacketListener {
        @Override
        public void onPacket(int vcid, byte[] buf, int off, int octets) {
            int apid = SpacePacketHeader.apid(buf, off);
            stats.packetsByApid[apid]++;
            stats.octetsByApid[apid] += octets;
            if (apid == SpacePacketHeader.IDLE_APID) {
                return;
            }
            vcOfApid[apid] = vcid;
            int seq = SpacePacketHeader.sequenceCount(buf, off);
            int expected = sequences.expected(apid);
            int missing = sequences.observe(apid, seq);
            if (missing > 0) {
                stats.sequenceGap(new SequenceGap(apid, expected, seq, missing));
                listener.onSequenceGap(apid, expected, seq, missing);
            }
            listener.onPacket(vcid, buf, off, octets);
            dispatch(apid, seq, buf, off, octets);
        }

        @Override
        public void onPacketAnomaly(int vcid, PacketAnomaly anomaly, int octetsDropped) {
            stats.packetAnomalies.merge(anomaly, 1L, Long::sum);
            stats.anomalyOctets += octetsDropped;
            listener.onPacketAnomaly(vcid, anomaly, octetsDropped);
        }

        @Override
        public void onFrameGap(int vcid, int expectedVcCount, int actualVcCount, int missing) {
            stats.frameGap(new FrameGap(vcid, expectedVcCount, actualVcCount, missing));
            listener.onFrameGap(vcid, expectedVcCount, actualVcCount, missing);
        }

        @Override
        public void onMasterChannelGap(int expectedMcCount, int actualMcCount, int missing) {
            stats.mcFramesMissing += missing;
            listener.onMasterChannelGap(expectedMcCount, actualMcCount, missing);
        }

        @Override
        public void onFrameDropped(int vcid, int vcCount, FrameDrop why) {
            stats.framesDropped.merge(why, 1L, Long::sum);
            listener.onFrameDropped(vcid, vcCount, why);
        }

        @Override
        public void onVcRestart(int vcid, int lastVcCount, int newVcCount) {
            stats.vcRestarts++;
            for (int apid = 0; apid < vcOfApid.length; apid++) {
                if (vcOfApid[apid] == vcid) {
                    sequences.expectRestart(apid);
                }
            }
            listener.onVcRestart(vcid, lastVcCount, newVcCount);
        }
    }

    private void dispatch(int apid, int seq, byte[] buf, int off, int octets) {
        if (SpectrumPacketDecoder.isSpectrumApid(apid)) {
            SpectrumError error = spectra.decodeInto(buf, off, octets, view);
            if (error == null) {
                if (view.mode() == DecodedSpectrum.MODE_SURVEY) {
                    stats.spectraSurvey++;
                } else {
                    stats.spectraFocus++;
                }
                stats.countSpectrum(view.instrument().name());
                stats.time(view.coarseSeconds(), view.fine());
                listener.onSpectrumView(view);
            } else {
                stats.spectrumErrors.merge(error, 1L, Long::sum);
                listener.onSpectrumError(apid, seq, error, spectra.lastDetail());
            }
        } else if (apid == HousekeepingReport.APID) {
            HousekeepingReport h = RecordPacketDecoder.housekeeping(buf, off, octets);
            if (h == null) {
                stats.recordErrors++;
                listener.onRecordError(apid, seq, octets);
            } else {
                stats.housekeeping++;
                stats.time(h.time());
                listener.onHousekeeping(h);
            }
        } else if (apid == EventReport.APID) {
            EventReport e = RecordPacketDecoder.event(buf, off, octets);
            if (e == null) {
                stats.recordErrors++;
                listener.onRecordError(apid, seq, octets);
            } else {
                stats.events++;
                stats.countEvent(e);
                stats.time(e.time());
                listener.onEvent(e);
            }
        } else if (apid == CommandReport.APID) {
            CommandReport c = RecordPacketDecoder.commandReport(buf, off, octets);
            if (c == null) {
                stats.recordErrors++;
                listener.onRecordError(apid, seq, octets);
            } else {
                stats.countCommandReport(c);
                stats.time(c.time());
                listener.onCommandReport(c);
            }
        }
    }
}
