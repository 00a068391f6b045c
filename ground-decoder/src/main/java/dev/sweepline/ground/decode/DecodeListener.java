package dev.sweepline.ground.decode;

import dev.sweepline.ground.frame.FrameReason;
import dev.sweepline.ground.packet.FrameDrop;
import dev.sweepline.ground.packet.PacketAnomaly;
import dev.sweepline.ground.spectrum.DecodedSpectrum;
import dev.sweepline.ground.spectrum.SpectrumError;
import dev.sweepline.ground.spectrum.SpectrumView;

/**
 * Everything the {@link TelemetryDecoder} finds, in stream order, on the feeding thread. Every method
 * does nothing by default; buffers are only valid during the call.
 */
public interface DecodeListener {
    /** A good frame (idle frames included). */
    default void onFrame(byte[] buf, int off, int frameOctets, long streamOffset) {
    }

    /** A rejected frame or skipped octets. */
    default void onBadFrame(FrameReason reason, long streamOffset, int octets) {
    }

    /** A complete non-idle packet. */
    default void onPacket(int vcid, byte[] buf, int off, int octets) {
    }

    /** Octets dropped by the packet layer. */
    default void onPacketAnomaly(int vcid, PacketAnomaly anomaly, int octetsDropped) {
    }

    /** Frames of a VC lost (VC count jump). */
    default void onFrameGap(int vcid, int expectedVcCount, int actualVcCount, int missing) {
    }

    /** Frames of the master channel lost (MC count jump). */
    default void onMasterChannelGap(int expectedMcCount, int actualMcCount, int missing) {
    }

    /** A good frame dropped by its VC count, repeated or stale (ICD §10); it fed no packet. */
    default void onFrameDropped(int vcid, int vcCount, FrameDrop why) {
    }

    /** The count sequence of a VC started again (ICD §10); its partial packet was dropped. */
    default void onVcRestart(int vcid, int lastVcCount, int newVcCount) {
    }

    /** Packets of an APID lost (sequence count jump). */
    default void onSequenceGap(int apid, int expectedCount, int actualCount, int missing) {
    }

    /** A decoded spectrum. */
    default void onSpectrum(DecodedSpectrum spectrum) {
    }

    /**
     * A spectrum decoded into the decoder's reused buffers, valid during the call only: override this to
     * read spectra without the decoder allocating anything per spectrum. By default it hands an owned copy
     * to {@link #onSpectrum(DecodedSpectrum)}.
     */
    default void onSpectrumView(SpectrumView view) {
        onSpectrum(view.toDecoded());
    }

    /** A spectrum packet that could not be decoded. */
    default void onSpectrumError(int apid, int sequenceCount, SpectrumError error, String detail) {
    }

    /** A housekeeping packet. */
    default void onHousekeeping(HousekeepingReport report) {
    }

    /** An event packet. */
    default void onEvent(EventReport report) {
    }

    /** A command report packet. */
    default void onCommandReport(CommandReport report) {
    }

    /** A housekeeping, event or command report packet of the wrong shape. */
    default void onRecordError(int apid, int sequenceCount, int octets) {
    }
}
