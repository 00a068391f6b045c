package dev.sweepline.ground.decode;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sweepline.ground.spectrum.Ccsds121QuadrantDecoder;
import dev.sweepline.ground.spectrum.DecodedSpectrum;
import dev.sweepline.ground.spectrum.SpectrumError;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

/** The golden layout-2 frame stream of {@link GoldenSpectraV2}, through the whole chain with every built-in. */
class GoldenSpectraV2DecodeTest {
    @Test
    void shouldCountRefusedInstrumentsAndDecodeTheSpectraAfterThem() {
        RecordingListener r = new RecordingListener();
        byte[] stream = Hex.stream(GoldenSpectraV2.STREAM);
        TelemetryDecoder d = new TelemetryDecoder(DecoderConfig.autoLength(), new Ccsds121QuadrantDecoder(), r);
        d.accept(stream, 0, stream.length);
        d.finish();
        DecodeStats s = d.stats();
        // GoldenSpectraV2.STREAM: three 256-octet frames, in sequence, no anomaly
        assertEquals(256, d.frameOctets());
        assertEquals(3, s.framesGood());
        assertTrue(s.framesBad().isEmpty() && s.packetAnomalies().isEmpty());
        assertEquals(0, s.sequenceGapCount());
        // the unknown id 7 and fine-cup's id with 16-bit samples are refused, each with its own reason
        assertEquals(Map.of(SpectrumError.UNKNOWN_INSTRUMENT, 1L, SpectrumError.SAMPLE_WIDTH_MISMATCH, 1L),
                s.spectrumErrors());
        assertEquals(List.of(SpectrumError.UNKNOWN_INSTRUMENT, SpectrumError.SAMPLE_WIDTH_MISMATCH), r.spectrumErrors);
        assertTrue(r.spectrumErrorDetails.get(0).contains("instrument id 7"), r.spectrumErrorDetails.get(0));
        // and the three good spectra after them decode: FINE_RAW, DEMO_V2, FINE_RICE
        assertEquals(3, r.spectra.size());
        assertEquals(List.of(3, 11, 4), r.spectra.stream().map(DecodedSpectrum::sequenceCount).toList());
        assertEquals(List.of("fine-cup", "demo-cup", "fine-cup"), r.spectra.stream().map(x -> x.instrument().name()).toList());
        assertEquals(2, s.spectraSurvey());
        assertEquals(1, s.spectraFocus());
        assertEquals(Map.of("demo-cup", 1L, "fine-cup", 2L), s.spectraByInstrument());
    }
}
