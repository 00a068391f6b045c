package dev.sweepline.ground.product;

import dev.sweepline.ground.decode.DecodeListener;
import dev.sweepline.ground.packet.CucTime;
import dev.sweepline.ground.spectrum.DecodedSpectrum;
import dev.sweepline.ground.spectrum.SpectrumView;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.io.Writer;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;

/**
 * Writes one CSV row per window per decoded spectrum. Columns: see {@link #HEADER}; currents in
 * amperes, edges in volts (empty when the window table is not known). Reads each spectrum from the
 * decoder's reused {@link SpectrumView}, so writing copies no spectrum: numbers go to the CSV printer
 * as the text {@code Double.toString} / {@code Integer.toString} give, built in one reused buffer (the
 * printer quotes by the text alone, so the file is the one printing the boxed numbers gives).
 */
public final class SpectraCsvWriter implements DecodeListener, AutoCloseable {
    /** Column names, in order. */
    public static final String[] HEADER = {"time_tai", "time_utc", "apid", "instrument", "mode", "sweep",
        "sequence_count", "window",
        "low_volts", "high_volts", "gain_range", "saturated", "q1_amps", "q2_amps", "q3_amps", "q4_amps",
        "total_amps"};

    private final CSVPrinter csv;
    /** The text of the number being printed, reused field after field. */
    private final StringBuilder number = new StringBuilder(32);

    public SpectraCsvWriter(Writer out) throws IOException {
        this.csv = new CSVPrinter(out, CSVFormat.DEFAULT.builder().setHeader(HEADER).get());
    }

    @Override
    public void onSpectrumView(SpectrumView s) {
        CucTime time = s.time();
        String tai = time.isoTai();
        String utc = time.isoUtc();
        String apid = String.format("0x%03X", s.apid());
        String instrument = s.instrument().name();
        String mode = s.modeName();
        try {
            for (int i = 0; i < s.windowCount(); i++) {
                csv.print(tai);
                csv.print(utc);
                csv.print(apid);
                csv.print(instrument);
                csv.print(mode);
                print(s.sweep());
                print(s.sequenceCount());
                print(s.firstWindow() + i);
                printVolts(s.lowVolts(i));
                printVolts(s.highVolts(i));
                print(s.gainRange(i));
                print(s.saturated(i) ? 1 : 0);
                for (int q = 0; q < DecodedSpectrum.QUADRANTS; q++) {
                    print(s.currentAmps(q, i));
                }
                print(s.totalAmps(i));
                csv.println();
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private void print(int v) throws IOException {
        number.setLength(0);
        csv.print(number.append(v));
    }

    private void print(double v) throws IOException {
        number.setLength(0);
        csv.print(number.append(v));
    }

    /** An edge in volts, empty when the table is not known (NaN). */
    private void printVolts(double v) throws IOException {
        number.setLength(0);
        csv.print(Double.isNaN(v) ? number : number.append(v));
    }

    @Override
    public void close() throws IOException {
        csv.close();
    }
}
