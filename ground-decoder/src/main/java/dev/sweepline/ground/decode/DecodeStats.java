package dev.sweepline.ground.decode;

import dev.sweepline.ground.frame.FrameReason;
import dev.sweepline.ground.packet.CucTime;
import dev.sweepline.ground.packet.FrameDrop;
import dev.sweepline.ground.packet.PacketAnomaly;
import dev.sweepline.ground.spectrum.SpectrumError;
import java.util.ArrayList;
import java.util.Collections;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;

/**
 * Counts kept by the {@link TelemetryDecoder} over a stream. Gap lists keep the first
 * {@value #MAX_LISTED_GAPS} gaps; the totals count all. Read after the decoder has finished, or from its
 * feeding thread.
 */
public final class DecodeStats {
    /** Gaps listed at most per list, so that a hopeless stream cannot fill memory. */
    public static final int MAX_LISTED_GAPS = 1000;
    private static final int APIDS = 2048;

    long framesGood;
    long framesIdle;
    final long[] framesByVc = new long[8];
    final EnumMap<FrameReason, Long> framesBad = new EnumMap<>(FrameReason.class);
    long garbageOctets;
    final EnumMap<FrameDrop, Long> framesDropped = new EnumMap<>(FrameDrop.class);
    long vcRestarts;
    final EnumMap<PacketAnomaly, Long> packetAnomalies = new EnumMap<>(PacketAnomaly.class);
    long anomalyOctets;
    final long[] packetsByApid = new long[APIDS];
    final long[] octetsByApid = new long[APIDS];
    final List<FrameGap> frameGaps = new ArrayList<>();
    long vcFramesMissing;
    long frameGapCount;
    long mcFramesMissing;
    final List<SequenceGap> sequenceGaps = new ArrayList<>();
    long packetsMissing;
    long sequenceGapCount;
    long spectraSurvey;
    long spectraFocus;
    final EnumMap<SpectrumError, Long> spectrumErrors = new EnumMap<>(SpectrumError.class);
    /** Spectra per instrument name, one mutable counter each (no boxing per spectrum). */
    private final Map<String, long[]> spectraByInstrument = new java.util.TreeMap<>();
    long housekeeping;
    long events;
    final Map<String, Long> eventsByKind = new java.util.TreeMap<>();
    final Map<String, Long> commandReports = new java.util.TreeMap<>();
    long recordErrors;
    /** Earliest and latest packet time, CUC coarse and fine; valid when {@link #timed}. */
    private boolean timed;
    private long firstCoarse;
    private int firstFine;
    private long lastCoarse;
    private int lastFine;

    DecodeStats() {
    }

    void badFrame(FrameReason r, int octets) {
        framesBad.merge(r, 1L, Long::sum);
        if (r == FrameReason.GARBAGE_BEFORE_SYNC) {
            garbageOctets += octets;
        }
    }

    void frameGap(FrameGap g) {
        frameGapCount++;
        vcFramesMissing += g.missing();
        if (frameGaps.size() < MAX_LISTED_GAPS) {
            frameGaps.add(g);
        }
    }

    void sequenceGap(SequenceGap g) {
        sequenceGapCount++;
        packetsMissing += g.missing();
        if (sequenceGaps.size() < MAX_LISTED_GAPS) {
            sequenceGaps.add(g);
        }
    }

    void time(CucTime t) {
        time(t.coarseSeconds(), t.fine());
    }

    void time(long coarse, int fine) {
        if (!timed || coarse < firstCoarse || (coarse == firstCoarse && fine < firstFine)) {
            firstCoarse = coarse;
            firstFine = fine;
        }
        if (!timed || coarse > lastCoarse || (coarse == lastCoarse && fine > lastFine)) {
            lastCoarse = coarse;
            lastFine = fine;
        }
        timed = true;
    }

    void countSpectrum(String instrument) {
        long[] n = spectraByInstrument.get(instrument);
        if (n == null) {
            n = new long[1];
            spectraByInstrument.put(instrument, n);
        }
        n[0]++;
    }

    /**
     * Frames that passed the synchroniser's checks, idle frames included, and so also those the packet
     * layer then dropped as repeated or stale ({@link #framesDropped()}).
     */
    public long framesGood() {
        return framesGood;
    }

    /** Good idle frames (FHP 0x7FE). */
    public long framesIdle() {
        return framesIdle;
    }

    /** Good frames of VC {@code vcid}. */
    public long framesOfVc(int vcid) {
        return framesByVc[vcid];
    }

    /** Rejects by reason (GARBAGE_BEFORE_SYNC counts runs of skipped octets). */
    public Map<FrameReason, Long> framesBad() {
        return Collections.unmodifiableMap(framesBad);
    }

    /** Rejected frames of one reason. */
    public long framesBad(FrameReason r) {
        return framesBad.getOrDefault(r, 0L);
    }

    /** Good frames dropped by their VC count (ICD §10), by reason; they fed no packet and no gap. */
    public Map<FrameDrop, Long> framesDropped() {
        return Collections.unmodifiableMap(framesDropped);
    }

    /** Good frames dropped for one reason. */
    public long framesDropped(FrameDrop why) {
        return framesDropped.getOrDefault(why, 0L);
    }

    /** Times a VC's count sequence started again (ICD §10: a restart, or an outage of over 127 frames). */
    public long vcRestarts() {
        return vcRestarts;
    }

    /** Octets skipped while searching for sync. */
    public long garbageOctets() {
        return garbageOctets;
    }

    /** Packet-layer anomalies by kind. */
    public Map<PacketAnomaly, Long> packetAnomalies() {
        return Collections.unmodifiableMap(packetAnomalies);
    }

    /** Anomalies of one kind. */
    public long packetAnomalies(PacketAnomaly a) {
        return packetAnomalies.getOrDefault(a, 0L);
    }

    /** Octets the packet layer dropped. */
    public long anomalyOctets() {
        return anomalyOctets;
    }

    /** Packets of {@code apid} (idle included under 0x7FF). */
    public long packets(int apid) {
        return packetsByApid[apid];
    }

    /** Packet octets of {@code apid}. */
    public long packetOctets(int apid) {
        return octetsByApid[apid];
    }

    /** The first {@value #MAX_LISTED_GAPS} VC frame gaps. */
    public List<FrameGap> frameGaps() {
        return Collections.unmodifiableList(frameGaps);
    }

    /** VC frame gaps in all. */
    public long frameGapCount() {
        return frameGapCount;
    }

    /** Frames missing in all VC gaps. */
    public long vcFramesMissing() {
        return vcFramesMissing;
    }

    /** Frames missing by the master channel count (bad frames of any VC included). */
    public long mcFramesMissing() {
        return mcFramesMissing;
    }

    /** The first {@value #MAX_LISTED_GAPS} sequence gaps. */
    public List<SequenceGap> sequenceGaps() {
        return Collections.unmodifiableList(sequenceGaps);
    }

    /** Sequence gaps in all. */
    public long sequenceGapCount() {
        return sequenceGapCount;
    }

    /** Packets missing in all sequence gaps. */
    public long packetsMissing() {
        return packetsMissing;
    }

    /** Survey spectra decoded. */
    public long spectraSurvey() {
        return spectraSurvey;
    }

    /** Focus spectra decoded. */
    public long spectraFocus() {
        return spectraFocus;
    }

    /** Spectra decoded, by instrument name (sorted). */
    public Map<String, Long> spectraByInstrument() {
        Map<String, Long> counts = new java.util.TreeMap<>();
        spectraByInstrument.forEach((name, n) -> counts.put(name, n[0]));
        return Collections.unmodifiableMap(counts);
    }

    /** Spectrum packets rejected, by error. */
    public Map<SpectrumError, Long> spectrumErrors() {
        return Collections.unmodifiableMap(spectrumErrors);
    }

    /** Housekeeping packets decoded. */
    public long housekeeping() {
        return housekeeping;
    }

    /** Event packets decoded. */
    public long events() {
        return events;
    }

    /** Housekeeping or event packets of the wrong shape. */
    public long recordErrors() {
        return recordErrors;
    }

    /** Earliest time of a decoded packet, or null. */
    public CucTime firstTime() {
        return timed ? new CucTime(firstCoarse, firstFine) : null;
    }

    /** Latest time of a decoded packet, or null. */
    public CucTime lastTime() {
        return timed ? new CucTime(lastCoarse, lastFine) : null;
    }

    /** Counts an event under its kind (mode change, or fault monitor and response taken). */
    void countEvent(EventReport e) {
        String kind = switch (e.eventId()) {
            case EventReport.MODE_CHANGE -> "MODE_CHANGE";
            case EventReport.FAULT -> "FAULT " + EventReport.monitorName(e.argumentA()) + " "
                    + EventReport.responseName(e.argumentB());
            case EventReport.TABLE_COMMITTED -> "TABLE_COMMITTED";
            case EventReport.TABLE_RESTORED -> "TABLE_RESTORED";
            case EventReport.AUTH_RESTORED -> "AUTH_RESTORED " + EventReport.authResultName(e.argumentA());
            case EventReport.AUTH_CHALLENGE -> "AUTH_LOCKED";
            default -> "EVENT_" + e.eventId();
        };
        eventsByKind.merge(kind, 1L, Long::sum);
    }

    /** Counts a command report under its type and status. */
    void countCommandReport(CommandReport c) {
        String kind = (c.type() == CommandReport.ACCEPTANCE ? "acceptance " : "execution ")
                + CommandReport.reasonName(c.status()) + (c.detailName().isEmpty() ? "" : " " + c.detailName());
        commandReports.merge(kind, 1L, Long::sum);
    }

    /** Events by kind: "MODE_CHANGE", "FAULT monitor response", "TABLE_COMMITTED", ... (sorted). */
    public Map<String, Long> eventsByKind() {
        return Collections.unmodifiableMap(eventsByKind);
    }

    /** Command reports by type and status: "acceptance OK", "acceptance BAD_MAC", "execution OK", ... (sorted). */
    public Map<String, Long> commandReports() {
        return Collections.unmodifiableMap(commandReports);
    }
}
