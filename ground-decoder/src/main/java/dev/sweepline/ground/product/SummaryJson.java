package dev.sweepline.ground.product;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.sweepline.ground.decode.DecodeStats;
import dev.sweepline.ground.decode.FrameGap;
import dev.sweepline.ground.decode.SequenceGap;
import dev.sweepline.ground.decode.TelemetryDecoder;
import dev.sweepline.ground.frame.FrameReason;
import dev.sweepline.ground.instrument.GroundInstrument;
import dev.sweepline.ground.packet.FrameDrop;
import dev.sweepline.ground.packet.PacketAnomaly;
import dev.sweepline.ground.spectrum.SpectrumError;
import java.util.Map;

/**
 * Builds summary.json from a finished decoder. Keys: {@code input}, {@code inputOctets},
 * {@code frameLength}, {@code frameLengthDetected}, {@code instruments} (the descriptions configured: name,
 * id, sampleBits, source), {@code framesGood}, {@code framesIdle}, {@code framesByVc},
 * {@code framesBad} (by reason, UNKNOWN_VCID among them), {@code framesDropped} (good frames dropped by
 * their VC count: DUPLICATE, STALE; ICD §10), {@code vcRestarts}, {@code garbageOctets}, {@code gaps}
 * (frame gaps, master-channel frames missing, packet sequence gaps), {@code packetAnomalies},
 * {@code packets} and {@code bits} (by APID, hex),
 * {@code spectra} (by mode), {@code spectraByInstrument}, {@code spectrumErrors} (UNKNOWN_INSTRUMENT and
 * SAMPLE_WIDTH_MISMATCH among them), {@code housekeeping}, {@code events},
 * {@code recordErrors}, {@code timeSpan}.
 */
public final class SummaryJson {
    private SummaryJson() {
    }

    /** The summary of a finished decoder: {@code input} names the file, {@code inputOctets} its size. */
    public static ObjectNode build(ObjectMapper m, String input, long inputOctets, TelemetryDecoder d) {
        DecodeStats s = d.stats();
        ObjectNode root = m.createObjectNode();
        root.put("input", input);
        root.put("inputOctets", inputOctets);
        root.put("frameLength", d.frameOctets());
        root.put("frameLengthDetected", d.frameLengthDetected());
        ArrayNode instruments = root.putArray("instruments");
        for (GroundInstrument i : d.instruments().all()) {
            instruments.addObject().put("name", i.name()).put("id", i.id()).put("sampleBits", i.sampleBits())
                    .put("source", i.source());
        }
        root.put("framesGood", s.framesGood());
        root.put("framesIdle", s.framesIdle());
        ObjectNode byVc = root.putObject("framesByVc");
        for (int v = 0; v < 8; v++) {
            if (s.framesOfVc(v) > 0) {
                byVc.put(Integer.toString(v), s.framesOfVc(v));
            }
        }
        ObjectNode bad = root.putObject("framesBad");
        for (FrameReason r : FrameReason.values()) {
            bad.put(r.name(), s.framesBad(r));
        }
        ObjectNode dropped = root.putObject("framesDropped");
        for (FrameDrop r : FrameDrop.values()) {
            dropped.put(r.name(), s.framesDropped(r));
        }
        root.put("vcRestarts", s.vcRestarts());
        root.put("garbageOctets", s.garbageOctets());
        root.set("gaps", gaps(m, s));
        ObjectNode anomalies = root.putObject("packetAnomalies");
        for (PacketAnomaly a : PacketAnomaly.values()) {
            anomalies.put(a.name(), s.packetAnomalies(a));
        }
        root.put("packetAnomalyOctets", s.anomalyOctets());
        ObjectNode packets = root.putObject("packets");
        ObjectNode bits = root.putObject("bits");
        for (int apid = 0; apid < 2048; apid++) {
            if (s.packets(apid) > 0) {
                String key = String.format("0x%03X", apid);
                packets.put(key, s.packets(apid));
                bits.put(key, s.packetOctets(apid) * 8);
            }
        }
        ObjectNode spectra = root.putObject("spectra");
        spectra.put("survey", s.spectraSurvey());
        spectra.put("focus", s.spectraFocus());
        ObjectNode si = root.putObject("spectraByInstrument");
        s.spectraByInstrument().forEach(si::put);
        ObjectNode se = root.putObject("spectrumErrors");
        for (Map.Entry<SpectrumError, Long> e : s.spectrumErrors().entrySet()) {
            se.put(e.getKey().name(), e.getValue());
        }
        root.put("housekeeping", s.housekeeping());
        root.put("events", s.events());
        ObjectNode ek = root.putObject("eventsByKind");
        s.eventsByKind().forEach(ek::put);
        ObjectNode cr = root.putObject("commandReports");
        s.commandReports().forEach(cr::put);
        root.put("recordErrors", s.recordErrors());
        ObjectNode span = root.putObject("timeSpan");
        if (s.firstTime() != null) {
            span.put("firstTai", s.firstTime().isoTai());
            span.put("lastTai", s.lastTime().isoTai());
            span.put("firstUtc", s.firstTime().isoUtc());
            span.put("lastUtc", s.lastTime().isoUtc());
            span.put("seconds", s.lastTime().taiSeconds() - s.firstTime().taiSeconds());
        }
        return root;
    }

    private static ObjectNode gaps(ObjectMapper m, DecodeStats s) {
        ObjectNode g = m.createObjectNode();
        g.put("frameGapCount", s.frameGapCount());
        g.put("framesMissing", s.vcFramesMissing());
        g.put("masterChannelFramesMissing", s.mcFramesMissing());
        ArrayNode fg = g.putArray("frameGaps");
        for (FrameGap x : s.frameGaps()) {
            fg.addObject().put("vc", x.vcid()).put("expectedVcCount", x.expectedCount())
                    .put("actualVcCount", x.actualCount()).put("missing", x.missing());
        }
        g.put("packetSequenceGapCount", s.sequenceGapCount());
        g.put("packetsMissing", s.packetsMissing());
        ArrayNode sg = g.putArray("packetSequenceGaps");
        for (SequenceGap x : s.sequenceGaps()) {
            sg.addObject().put("apid", String.format("0x%03X", x.apid())).put("expectedCount", x.expectedCount())
                    .put("actualCount", x.actualCount()).put("missing", x.missing());
        }
        return g;
    }
}
