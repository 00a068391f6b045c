package dev.sweepline.sim.bench;

import dev.sweepline.sim.plasma.PlasmaState;
import java.io.Closeable;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.io.Writer;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Formatter;
import java.util.Locale;
import java.util.function.LongFunction;

/**
 * The sweep-by-sweep decision log, {@code decisions.csv}: one row per sweep with the truth beside it.
 * Written as the run goes (a {@link SweepLog}) or from kept records, the same bytes either way.
 *
 * <p>Columns: sweep, mode, startSeconds and endSeconds ({@code %.6f} of the microseconds), firstWindow,
 * lastWindow, peakWindow and bandCentre ({@code %.3f}; empty when NaN), trueProtonWindow, trueAlphaWindow,
 * locked, alphaLock, saturatedSamples, truthChangeN, truthChangeU, truthChangeT ({@code %.6g}; empty when
 * undefined). The fixed-point cells are written digit by digit, as {@code String.format(Locale.ROOT, ...)}
 * would write them (checked exhaustively over the Q8 windows and on the microseconds by
 * {@code DecisionsCsvTest}, against {@code String.format(Locale.ROOT, ...)}); the {@code %.6g} cells go through
 * one reused {@link Formatter}.
 */
public final class DecisionsCsv implements SweepLog, Closeable {
    /** The header line. */
    public static final String HEADER = "sweep,mode,startSeconds,endSeconds,firstWindow,lastWindow,peakWindow,bandCentre,"
            + "trueProtonWindow,trueAlphaWindow,locked,alphaLock,saturatedSamples,"
            + "truthChangeN,truthChangeU,truthChangeT\n";
    /** Microseconds below this are written digit by digit: up to 15 digits, the double's decimal is exact. */
    private static final long EXACT_MICROS = 1_000_000_000_000_000L;
    /** Q8 values below this (windows below 65536) are written digit by digit. */
    private static final double EXACT_Q8 = 1 << 24;
    private static final String NEWLINE = System.lineSeparator();

    private final Writer out;
    private final StringBuilder line = new StringBuilder(160);
    /**
     * The cells' formatter: Locale.US writes the same digits, point and signs as Locale.ROOT for these
     * conversions (no grouping), and is the locale for which the JDK's formatter looks up no
     * DecimalFormatSymbols per number.
     */
    private final Formatter cells = new Formatter(line, Locale.US);

    /** A log writing to {@code out} (the header first); closing it closes {@code out}. */
    public DecisionsCsv(Writer out) throws IOException {
        this.out = out;
        out.write(HEADER);
    }

    /** A log writing {@code file}, replacing it. */
    public static DecisionsCsv create(Path file) throws IOException {
        return new DecisionsCsv(Files.newBufferedWriter(file));
    }

    @Override
    public void add(SweepRecord r, double[] change) {
        line.setLength(0);
        appendRow(r, change);
        try {
            out.append(line);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    @Override
    public void close() throws IOException {
        out.close();
    }

    private void appendRow(SweepRecord r, double[] change) {
        line.append(r.sweep()).append(',').append(r.mode().name().toLowerCase(Locale.ROOT)).append(',');
        seconds(r.startMicros());
        line.append(',');
        seconds(r.endMicros());
        line.append(',').append(r.firstWindow()).append(',').append(r.lastWindow()).append(',');
        window(r.peakWindow());
        line.append(',');
        window(r.bandCentre());
        line.append(',').append(r.trueProtonWindow()).append(',').append(r.trueAlphaWindow()).append(',')
                .append(r.locked()).append(',').append(r.alphaLock()).append(',').append(r.saturatedSamples());
        for (int k = 0; k < 3; k++) {
            line.append(',');
            if (Double.isFinite(change[k])) {
                cells.format("%.6g", change[k]);
            }
        }
        line.append(NEWLINE);
    }

    /** {@code %.6f} of micros / 1e6: the whole seconds, a point and six digits. */
    private void seconds(long micros) {
        if (micros < 0 || micros >= EXACT_MICROS) {
            cells.format("%.6f", micros / 1e6);
            return;
        }
        line.append(micros / 1_000_000).append('.');
        digits(micros % 1_000_000, 6);
    }

    /**
     * {@code %.3f} of a window in Q8 (k / 256, exact in binary and with eight decimals): rounded half up
     * to thousandths, as the formatter rounds its decimal digits; empty for NaN.
     */
    private void window(double windows) {
        if (Double.isNaN(windows)) {
            return;
        }
        double q8 = windows * 256;
        if (!(q8 >= 0 && q8 < EXACT_Q8) || q8 != Math.rint(q8)) {
            cells.format("%.3f", windows);
            return;
        }
        long thousandthsTimes32 = (long) q8 * 125; // windows x 1000 = k x 125 / 32
        long thousandths = thousandthsTimes32 / 32 + (thousandthsTimes32 % 32 >= 16 ? 1 : 0);
        line.append(thousandths / 1000).append('.');
        digits(thousandths % 1000, 3);
    }

    /** {@code value} (0 &lt;= value &lt; 10^width) in {@code width} digits with leading zeros. */
    private void digits(long value, int width) {
        int at = line.length();
        line.append(value);
        for (int pad = width - (line.length() - at); pad > 0; pad--) {
            line.insert(at, '0');
        }
    }

    /** Writes the rows of {@code sweeps} with their truth change from {@code truthAt}. */
    static void writeAll(Writer out, Iterable<SweepRecord> sweeps, LongFunction<PlasmaState> truthAt)
            throws IOException {
        DecisionsCsv csv = new DecisionsCsv(out);
        try {
            for (SweepRecord r : sweeps) {
                csv.add(r, TruthChange.of(r, truthAt));
            }
        } catch (UncheckedIOException e) {
            throw e.getCause();
        }
    }
}
