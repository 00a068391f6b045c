package dev.sweepline.ground.product;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sweepline.ground.decode.DecodeListener;
import dev.sweepline.ground.decode.DecoderConfig;
import dev.sweepline.ground.decode.FrameStreamBuilder;
import dev.sweepline.ground.decode.TelemetryDecoder;
import dev.sweepline.ground.decode.TestPackets;
import dev.sweepline.ground.spectrum.DecodedSpectrum;
import dev.sweepline.ground.spectrum.QuadrantDecompressor;
import java.io.IOException;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.util.Random;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;
import org.junit.jupiter.api.Test;

/**
 * spectra.csv written from the decoder's reused view is the file commons-csv prints from the owned
 * spectra with boxed numbers ({@code CSVPrinter.printRecord}, the reference library's own formatting).
 */
class SpectraCsvWriterTest {
    /** Seed of the spectra, recorded so a failure can be replayed. */
    private static final long SEED = 0xC5F_2026L;
    /** Offset of the table id in a layout-1 spectrum packet: header 6, CUC 6, mode, flags, sweep 2 (ICD §4). */
    private static final int TABLE_ID_OFFSET = 16;

    /** The writer as it was before the view: one printRecord of boxed values per window. */
    private static final class BoxedReference implements DecodeListener {
        final CSVPrinter csv;

        BoxedReference(StringWriter out) throws IOException {
            csv = new CSVPrinter(out, CSVFormat.DEFAULT.builder().setHeader(SpectraCsvWriter.HEADER).get());
        }

        @Override
        public void onSpectrum(DecodedSpectrum s) {
            try {
                for (int i = 0; i < s.windowCount(); i++) {
                    double[][] a = s.currentAmps();
                    csv.printRecord(s.time().isoTai(), s.time().isoUtc(), String.format("0x%03X", s.apid()),
                            s.instrument().name(), s.modeName(), s.sweep(), s.sequenceCount(), s.firstWindow() + i,
                            volts(s.lowVolts()[i]), volts(s.highVolts()[i]), s.gainRange()[i],
                            s.saturated()[i] ? 1 : 0, a[0][i], a[1][i], a[2][i], a[3][i], s.totalAmps()[i]);
                }
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
        }

        private static String volts(double v) {
            return Double.isNaN(v) ? "" : Double.toString(v);
        }
    }

    /** Survey and focus spectra, samples either side of the pedestal, some saturated, some of an unknown table. */
    private static byte[] stream() {
        Random rnd = new Random(SEED);
        FrameStreamBuilder b = new FrameStreamBuilder(1024);
        for (int seq = 0; seq < 60; seq++) {
            int c = 1 + rnd.nextInt(128);
            int[] gains = new int[c];
            boolean[] sat = new boolean[c];
            int[][] adc = new int[4][c];
            for (int i = 0; i < c; i++) {
                gains[i] = rnd.nextInt(3);
                sat[i] = rnd.nextInt(10) == 0;
                for (int q = 0; q < 4; q++) {
                    adc[q][i] = rnd.nextInt(65536);
                }
            }
            int apid = seq % 3 == 0 ? 0x100 : 0x101;
            byte[] p = TestPackets.spectrum(apid, seq, 0x7FE81780L + 17L * seq, rnd.nextInt(65536), 40000 + seq,
                    rnd.nextInt(64), gains, sat, adc);
            if (seq % 4 == 1) {
                p[TABLE_ID_OFFSET + 1] = 9; // a table the ground does not know: empty edges
            }
            b.add(0, p);
        }
        return b.stream();
    }

    private static long decode(byte[] stream, DecodeListener listener) {
        TelemetryDecoder d = new TelemetryDecoder(DecoderConfig.icdDefaults(), QuadrantDecompressor.UNAVAILABLE,
                listener);
        d.accept(stream, 0, stream.length);
        d.finish();
        return d.stats().spectraSurvey() + d.stats().spectraFocus();
    }

    @Test
    void shouldWriteTheFileTheBoxedRowsGive() throws IOException {
        byte[] stream = stream();
        StringWriter fromView = new StringWriter();
        StringWriter boxed = new StringWriter();
        try (SpectraCsvWriter w = new SpectraCsvWriter(fromView)) {
            long spectra = decode(stream, w);
            // 60 sent; the builder's open last frame may hold the end of the last one
            assertTrue(spectra >= 59, spectra + " spectra");
        }
        BoxedReference reference = new BoxedReference(boxed);
        decode(stream, reference);
        reference.csv.close();
        String csv = fromView.toString();
        assertTrue(csv.contains(",,,"), "a row of unknown edges: " + csv.substring(0, 400)); // window, empty edges
        assertTrue(csv.contains("E-"), "currents in exponent form");
        assertEquals(boxed.toString(), csv);
    }
}
