package dev.sweepline.sim.bench;

import dev.sweepline.fsw.exec.FlightSoftware;
import dev.sweepline.fsw.sweep.SweepMode;
import dev.sweepline.fsw.telemetry.Apid;
import dev.sweepline.fsw.telemetry.TelemetryCounters;
import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.Map;

/**
 * The telemetry a run generated, in bits per second of simulated time: the frames the downlink
 * carries (ASM included) against the allocation, and the packets by APID and by sweep mode.
 *
 * @param frameBitsPerSecond      frames, ASM included: what the downlink must carry
 * @param packetBitsPerSecond     packet bits per second by APID name
 * @param spectrumBitsPerSecond   spectrum packet bits per second by mode
 * @param allocationBitsPerSecond the allocation; NaN when none was given
 * @param frames                  frames emitted
 * @param virtualChannels         per virtual channel by name (science, engineering; telemetry ICD §3.3): the
 *                                frames it sent against the packets they carried
 * @param flushIntervalSeconds    the engineering channel's flush interval in force at the end of the run (the
 *                                table's engineeringFlushSeconds, else the build's): a frame holding data
 *                                longer than this is sent part-filled (idle fill)
 */
public record TelemetryFigures(double frameBitsPerSecond, Map<String, Double> packetBitsPerSecond,
        Map<SweepMode, Double> spectrumBitsPerSecond, double allocationBitsPerSecond, long frames,
        Map<String, VcFill> virtualChannels, double flushIntervalSeconds) {

    /**
     * How full one virtual channel's frames are.
     *
     * @param frameBitsPerSecond  frames of the channel, ASM included: what it costs the downlink
     * @param packetBitsPerSecond space packets it carried: what it delivers
     */
    public record VcFill(double frameBitsPerSecond, double packetBitsPerSecond) {
        /** Packets over frames: 1 for frames full of packets; NaN without frames. */
        public double fill() {
            return frameBitsPerSecond > 0 ? packetBitsPerSecond / frameBitsPerSecond : Double.NaN;
        }
    }

    /** Allocation minus use, as a fraction of the allocation (negative: over budget); NaN without one. */
    public double margin() {
        return (allocationBitsPerSecond - frameBitsPerSecond) / allocationBitsPerSecond;
    }

    /** The figures of a finished run. */
    static TelemetryFigures of(FlightSoftware fsw, BenchConfig config) {
        TelemetryCounters c = fsw.telemetry().counters();
        double seconds = config.durationSeconds();
        Map<String, Double> byApid = new LinkedHashMap<>();
        byApid.put("surveySpectrum", 8.0 * c.packetOctets(Apid.SURVEY_SPECTRUM) / seconds);
        byApid.put("focusSpectrum", 8.0 * c.packetOctets(Apid.FOCUS_SPECTRUM) / seconds);
        byApid.put("housekeeping", 8.0 * c.packetOctets(Apid.HOUSEKEEPING) / seconds);
        byApid.put("event", 8.0 * c.packetOctets(Apid.EVENT) / seconds);
        byApid.put("commandReport", 8.0 * c.packetOctets(Apid.COMMAND_REPORT) / seconds);
        Map<SweepMode, Double> byMode = new EnumMap<>(SweepMode.class);
        for (SweepMode m : SweepMode.values()) {
            byMode.put(m, 8.0 * fsw.spectra().octets(m) / seconds);
        }
        Map<String, VcFill> vcs = new LinkedHashMap<>();
        vcs.put("science", new VcFill(8.0 * c.frameOctets(Apid.VC_SCIENCE) / seconds,
                8.0 * (c.packetOctets(Apid.SURVEY_SPECTRUM) + c.packetOctets(Apid.FOCUS_SPECTRUM)) / seconds));
        vcs.put("engineering", new VcFill(8.0 * c.frameOctets(Apid.VC_ENGINEERING) / seconds,
                8.0 * (c.packetOctets(Apid.HOUSEKEEPING) + c.packetOctets(Apid.EVENT)
                        + c.packetOctets(Apid.COMMAND_REPORT)) / seconds));
        return new TelemetryFigures(8.0 * c.frameOctets() / seconds, byApid, byMode,
                config.allocationBitsPerSecond(), fsw.telemetry().framesEmitted(), vcs,
                fsw.telemetry().flushInterval(Apid.VC_ENGINEERING) / 1e6);
    }
}
