package dev.sweepline.ground.product;

import dev.sweepline.ground.decode.DecodeListener;
import dev.sweepline.ground.spectrum.DecodedSpectrum;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.io.Writer;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;

/**
 * Writes one CSV row per window per decoded spectrum. Columns: see {@link #HEADER}; currents in
 * amperes, edges in volts (empty when the window table is not known).
 */
public final class SpectraCsvWriter implements DecodeListener, AutoCloseable {
    /** Column names, in order. */
    public static final String[] HEADER = {"time_tai", "time_utc", "apid", "instrument", "mode", "sweep",
        "sequence_count", "window",
        "low_volts", "high_volts", "gain_range", "saturated", "q1_amps", "q2_amps", "q3_amps", "q4_amps",
        "total_amps"};

    private final CSVPrinter csv;

    public SpectraCsvWriter(Writer out) throws IOException {
        this.csv = new CSVPrinter(out, CSVFormat.DEFAULT.builder().setHeader(HEADER).get());
    }

    private static String volts(double v) {
        return Double.isNaN(v) ? "" : Double.toString(v);
    }

    @Override
    public void onSpectrum(DecodedSpectrum s) {
        String tai = s.time().isoTai();
        String utc = s.time().isoUtc();
        String apid = String.format("0x%03X", s.apid());
        try {
            for (int i = 0; i < s.windowCount(); i++) {
                double[][] a = s.currentAmps();
                csv.printRecord(tai, utc, apid, s.instrument().name(), s.modeName(), s.sweep(), s.sequenceCount(),
                        s.firstWindow() + i,
                        volts(s.lowVolts()[i]), volts(s.highVolts()[i]), s.gainRange()[i], s.saturated()[i] ? 1 : 0,
                        a[0][i], a[1][i], a[2][i], a[3][i], s.totalAmps()[i]);
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    @Override
    public void close() throws IOException {
        csv.close();
    }
}
