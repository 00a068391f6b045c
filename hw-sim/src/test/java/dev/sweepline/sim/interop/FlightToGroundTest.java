package dev.sweepline.sim.interop;

import dev.sweepline.sim.instrument.TestInstruments;
import dev.sweepline.sim.instrument.InstrumentModel;
import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sweepline.fsw.exec.Executive;
import dev.sweepline.fsw.exec.FlightConfig;
import dev.sweepline.fsw.exec.FlightSoftware;
import dev.sweepline.fsw.sweep.SweepMode;
import dev.sweepline.fsw.telemetry.Apid;
import dev.sweepline.ground.decode.DecodeListener;
import dev.sweepline.ground.decode.DecodeStats;
import dev.sweepline.ground.decode.DecoderConfig;
import dev.sweepline.ground.decode.HousekeepingReport;
import dev.sweepline.ground.decode.TelemetryDecoder;
import dev.sweepline.ground.spectrum.Ccsds121QuadrantDecoder;
import dev.sweepline.ground.spectrum.DecodedSpectrum;
import dev.sweepline.sim.scenario.ScenarioLoader;
import java.io.ByteArrayOutputStream;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * The flight software's telemetry, decoded by the independent ground decoder, gives back exactly what
 * the flight software measured: every spectrum's header fields, gain tags, saturation flags and ADC
 * samples (CCSDS 121 coded, compression 0x01, and raw, 0x00), and housekeeping equal to the executive's
 * counters. Both sides are written from the telemetry ICD alone, so agreement is the ICD's check.
 */
class FlightToGroundTest {
    /** shock-sheath.yaml has its shock jump at 40 s: 50 s covers survey, focus, the jump and reacquisition. */
    private static final double SECONDS = 50;
    /** Recorded seed of the scenario fluctuations and the instrument noise. */
    private static final long SEED = 11;

    private final List<DecodedSpectrum> ground = new ArrayList<>();
    private final List<HousekeepingReport> housekeeping = new ArrayList<>();

    @ParameterizedTest(name = "compress={0}")
    @ValueSource(booleans = {true, false})
    void shouldDecodeWhatTheFlightSoftwareMeasured(boolean compress) {
        FlightConfig config = FlightConfig.of(TestInstruments.DEMO_CUP.flight());
        config.compressSpectra = compress;
        ByteArrayOutputStream wire = new ByteArrayOutputStream();
        FlightLoop loop = new FlightLoop(ScenarioLoader.builtIn("shock-sheath"), SEED, SECONDS, config,
                wire::write).run();
        DecodeStats stats = decode(wire.toByteArray(), config.frameLength);

        // a clean stream: no bad frames, gaps or undecodable packets (ICD §2-§4 on both sides)
        assertTrue(stats.framesBad().isEmpty(), "bad frames " + stats.framesBad());
        assertEquals(0, stats.frameGapCount() + stats.sequenceGapCount() + stats.mcFramesMissing());
        assertTrue(stats.spectrumErrors().isEmpty(), "spectrum errors " + stats.spectrumErrors());
        assertEquals(0, stats.recordErrors());

        List<RecordedSpectrum> flight = loop.spectra();
        assertTrue(flight.stream().anyMatch(s -> s.mode() == SweepMode.FOCUS), "no focus sweep to check");
        assertEquals(flight.size(), ground.size());
        for (int k = 0; k < flight.size(); k++) {
            assertSpectrum(flight.get(k), ground.get(k), compress, config.coarseTimeAtTickZero, "spectrum " + k);
        }
        FlightSoftware fsw = loop.flightSoftware();
        assertEquals(fsw.telemetry().counters().packets(Apid.HOUSEKEEPING), housekeeping.size());
        assertHousekeeping(fsw, housekeeping.get(housekeeping.size() - 1));
    }

    private DecodeStats decode(byte[] wire, int frameLength) {
        TelemetryDecoder decoder = new TelemetryDecoder(DecoderConfig.icdDefaults().withFrameOctets(frameLength),
                new Ccsds121QuadrantDecoder(), new DecodeListener() {
                    @Override
                    public void onSpectrum(DecodedSpectrum s) {
                        ground.add(s);
                    }

                    @Override
                    public void onHousekeeping(HousekeepingReport r) {
                        housekeeping.add(r);
                    }
                });
        decoder.accept(wire, 0, wire.length);
        decoder.finish();
        return decoder.stats();
    }

    /** Every field of ICD §3.2 and §4 against the flight software's own spectrum. */
    private static void assertSpectrum(RecordedSpectrum f, DecodedSpectrum g, boolean compress, long coarseAtZero,
            String what) {
        boolean focus = f.mode() == SweepMode.FOCUS;
        assertEquals(focus ? Apid.FOCUS_SPECTRUM : Apid.SURVEY_SPECTRUM, g.apid(), what);        // ICD §3.3
        assertEquals(focus ? DecodedSpectrum.MODE_FOCUS : DecodedSpectrum.MODE_SURVEY, g.mode(), what); // ICD §4 offset 0
        assertEquals(!f.ascending(), g.steppedDown(), what);                                    // flags bit 7
        assertEquals(f.sweepNumber() & 0xFFFF, g.sweep(), what);                                // 16 bits, wraps
        assertEquals(0, g.tableId(), what);                                                     // built-in default table
        assertEquals(f.firstWindow(), g.firstWindow(), what);
        assertEquals(f.count(), g.windowCount(), what);
        assertEquals(f.peakValid() ? Math.min(f.peakQ8(), 0xFFFE) : DecodedSpectrum.NO_PEAK, g.peakQ8(), what);
        assertEquals(TestInstruments.DEMO_CUP.flight().defaultParameters().integrationPeriods, g.integrationPeriods(), what);
        assertEquals(compress ? 0x01 : 0x00, g.compression(), what);
        assertArrayEquals(f.gainRange(), g.gainRange(), what);
        assertArrayEquals(f.saturated(), g.saturated(), what);
        for (int q = 0; q < 4; q++) {
            assertArrayEquals(f.adc()[q], g.adcCounts()[q], what + " quadrant " + (q + 1)); // lossless: exact
        }
        // ICD §3.2: coarse = seconds since tick zero + its CUC; fine = (micros mod 10^6) x 65536 / 10^6, truncated
        assertEquals(coarseAtZero + f.startMicros() / 1_000_000, g.time().coarseSeconds(), what);
        assertEquals((int) (f.startMicros() % 1_000_000 * 65536 / 1_000_000), g.time().fine(), what);
    }

    /** ICD §5 fields of the last housekeeping packet (written by close()) against the executive's counters. */
    private static void assertHousekeeping(FlightSoftware fsw, HousekeepingReport h) {
        Executive e = fsw.executive();
        SweepMode mode = fsw.scheduler().mode();
        assertEquals(mode == SweepMode.SAFE ? 0 : mode == SweepMode.SURVEY ? 1 : 2, h.mode());
        assertEquals(mode != SweepMode.SAFE, h.hvEnabled());
        assertEquals(e.stepsSent() & 0xFFFF_FFFFL, h.stepsSent());
        assertEquals(e.repliesAccepted() & 0xFFFF_FFFFL, h.repliesAccepted());
        assertEquals(e.sequenceErrors(), h.sequenceErrors());
        assertEquals(e.timeouts(), h.replyTimeouts());
        assertEquals(e.retries(), h.retries());
        assertEquals(fsw.telemetry().counters().packets(Apid.SURVEY_SPECTRUM), h.surveySweeps());
        assertEquals(fsw.telemetry().counters().packets(Apid.FOCUS_SPECTRUM), h.focusSweeps());
        assertEquals(fsw.lockLosses(), h.lockLosses());
        assertTrue(e.stepsSent() > 0xFF, "steps sent " + e.stepsSent()); // both low octets of the 32-bit field used
        assertTrue(fsw.lockLosses() > 0, "no lock loss: the shock at 40 s should break the lock");
        // ICD §5 offset 22: packet octets generated before this housekeeping packet (6 + 6 + 38 octets)
        assertEquals(fsw.telemetry().counters().packetOctets() - (12 + dev.sweepline.fsw.report.HousekeepingWriter.LENGTH),
                h.telemetryOctets());
    }
}
