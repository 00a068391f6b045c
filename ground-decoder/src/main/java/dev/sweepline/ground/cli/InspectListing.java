package dev.sweepline.ground.cli;

import dev.sweepline.ground.decode.CommandReport;
import dev.sweepline.ground.decode.DecodeListener;
import dev.sweepline.ground.decode.EventReport;
import dev.sweepline.ground.decode.HousekeepingReport;
import dev.sweepline.ground.decode.ModeNames;
import dev.sweepline.ground.frame.FrameReason;
import dev.sweepline.ground.frame.TmFrameHeader;
import dev.sweepline.ground.packet.CucTime;
import dev.sweepline.ground.packet.FrameDrop;
import dev.sweepline.ground.packet.PacketAnomaly;
import dev.sweepline.ground.packet.SpacePacketHeader;
import dev.sweepline.ground.spectrum.DecodedSpectrum;
import dev.sweepline.ground.spectrum.SpectrumError;
import java.io.PrintWriter;

/** Prints one line per frame, reject, packet, record and anomaly, in stream order. */
final class InspectListing implements DecodeListener {
    private final PrintWriter out;

    InspectListing(PrintWriter out) {
        this.out = out;
    }

    @Override
    public void onFrame(byte[] b, int off, int frameOctets, long streamOffset) {
        int fhp = TmFrameHeader.firstHeaderPointer(b, off);
        out.printf("frame  @%-10d vc=%d mc=%3d vcc=%3d fhp=%s%n", streamOffset, TmFrameHeader.vcid(b, off),
                TmFrameHeader.mcCount(b, off), TmFrameHeader.vcCount(b, off),
                fhp == 0x7FE ? "0x7FE (idle)" : fhp == 0x7FF ? "0x7FF (no start)" : Integer.toString(fhp));
    }

    @Override
    public void onBadFrame(FrameReason reason, long streamOffset, int octets) {
        out.printf("BAD    @%-10d %s (%d octets)%n", streamOffset, reason, octets);
    }

    @Override
    public void onPacket(int vcid, byte[] b, int off, int octets) {
        String t = SpacePacketHeader.secondaryHeaderFlag(b, off) && octets >= 12
                ? CucTime.read(b, off + 6).isoTai() + " TAI" : "";
        out.printf("  packet vc=%d apid=0x%03X seq=%5d octets=%d %s%n", vcid, SpacePacketHeader.apid(b, off),
                SpacePacketHeader.sequenceCount(b, off), octets, t);
    }

    @Override
    public void onPacketAnomaly(int vcid, PacketAnomaly anomaly, int octetsDropped) {
        out.printf("  ANOMALY vc=%d %s (%d octets dropped)%n", vcid, anomaly, octetsDropped);
    }

    @Override
    public void onFrameGap(int vcid, int expected, int actual, int missing) {
        out.printf("  GAP vc=%d vcc expected %d got %d: %d frames missing%n", vcid, expected, actual, missing);
    }

    @Override
    public void onMasterChannelGap(int expected, int actual, int missing) {
        out.printf("  GAP mc expected %d got %d: %d frames missing%n", expected, actual, missing);
    }

    @Override
    public void onFrameDropped(int vcid, int vcCount, FrameDrop why) {
        out.printf("  DROPPED vc=%d vcc=%d %s frame (fed nothing)%n", vcid, vcCount, why);
    }

    @Override
    public void onVcRestart(int vcid, int lastVcCount, int newVcCount) {
        out.printf("  RESTART vc=%d vcc %d -> %d: the count sequence started again%n", vcid, lastVcCount, newVcCount);
    }

    @Override
    public void onSequenceGap(int apid, int expected, int actual, int missing) {
        out.printf("  GAP apid=0x%03X seq expected %d got %d: %d packets missing%n", apid, expected, actual, missing);
    }

    @Override
    public void onSpectrum(DecodedSpectrum s) {
        out.printf("    spectrum %s sweep=%d windows %d..%d peak=%s compression=%d instrument=%d (%s) w=%d layout=%d "
                        + "table=0x%04X%s%n", s.modeName(), s.sweep(), s.firstWindow(),
                s.firstWindow() + s.windowCount() - 1, s.hasPeak() ? String.format("%.3f", s.peakWindow()) : "none",
                s.compression(), s.instrumentId(), s.instrument().name(), s.sampleBits(), s.layoutVersion(),
                s.tableId(), s.tableChanged() ? " changed" : "");
    }

    @Override
    public void onSpectrumError(int apid, int seq, SpectrumError error, String detail) {
        out.printf("    SPECTRUM ERROR apid=0x%03X seq=%d %s %s%n", apid, seq, error, detail);
    }

    @Override
    public void onHousekeeping(HousekeepingReport h) {
        out.printf("    housekeeping mode=%s hv=%s interlock=%s table=0x%04X steps=%d replies=%d seqErr=%d timeouts=%d "
                + "retries=%d commands accepted=%d rejected=%d failed=%d lastRejection=%s faultTrips=%d%n",
                ModeNames.of(h.mode()), h.hvEnabled() ? "on" : "off", ModeNames.interlock(h.hvState()), h.tableId(),
                h.stepsSent(), h.repliesAccepted(), h.sequenceErrors(), h.replyTimeouts(), h.retries(),
                h.commandsAccepted(), h.commandsRejected(), h.commandFailures(),
                h.lastRejection() == 0 ? "none" : CommandReport.reasonName(h.lastRejection()), h.faultTrips());
    }

    @Override
    public void onEvent(EventReport e) {
        out.printf("    event %s%n", e.describe());
    }

    @Override
    public void onRecordError(int apid, int seq, int octets) {
        out.printf("    RECORD ERROR apid=0x%03X seq=%d octets=%d%n", apid, seq, octets);
    }
}
