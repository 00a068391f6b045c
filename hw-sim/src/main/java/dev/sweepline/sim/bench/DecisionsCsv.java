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
 * undefined). Every cell is written digit by digit, as {@code String.format(Locale.ROOT, ...)} would write
 * it (checked exhaustively over the Q8 windows, on the microseconds and on three million seeded
 * {@code %.6g} values, ties included, by {@code DecisionsCsvTest}, against {@code String.format(Locale.ROOT,
 * ...)}); only values outside those ranges go through one reused {@link Formatter}.
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
    /** The significant digits of a %.6g cell (Double.toString gives at most 17, plus the rounding digit). */
    private final byte[] sig = new byte[7];
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
                general6(change[k]);
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

    /**
     * {@code %.6g} of a finite value, as the JDK's formatter writes it: the shortest decimal of the double
     * ({@link Double#toString}, the digits the formatter starts from) rounded half up to six significant
     * digits; then, for a rounded magnitude in [1e-4, 1e6), fixed notation with six significant digits,
     * otherwise d.ddddde±XX (java.util.Formatter, "General scientific").
     */
    void general6(double value) {
        if (value == 0) {
            line.append(Double.doubleToRawLongBits(value) < 0 ? "-0.00000" : "0.00000");
            return;
        }
        String shortest = Double.toString(Math.abs(value));
        // the significant digits and the decimal exponent of the first of them
        int count = 0;
        int exponent = 0;
        int point = -1;
        boolean leading = true;
        int leadingZeros = 0;
        int i = 0;
        for (; i < shortest.length(); i++) {
            char c = shortest.charAt(i);
            if (c == '.') {
                point = i;
            } else if (c == 'E') {
                break;
            } else if (leading && c == '0') {
                leadingZeros++;
            } else {
                leading = false;
                if (count < sig.length) {
                    sig[count] = (byte) (c - '0');
                }
                count++;
            }
        }
        int exp = i < shortest.length() ? Integer.parseInt(shortest, i + 1, shortest.length(), 10) : 0;
        int intDigits = (point < 0 ? i : point) - leadingZeros; // digits before the point, past leading zeros
        exponent = intDigits - 1 + exp;
        if (point >= 0 && intDigits <= 0) {
            exponent = exp - 1 - (leadingZeros - point); // 0.000ddd: zeros after the point
        }
        // round half up to six digits
        int kept = Math.min(count, 6);
        for (int k = kept; k < 6; k++) {
            sig[k] = 0;
        }
        if (count > 6 && sig[6] >= 5) {
            int k = 5;
            while (k >= 0 && sig[k] == 9) {
                sig[k--] = 0;
            }
            if (k >= 0) {
                sig[k]++;
            } else {
                sig[0] = 1;
                exponent++;
            }
        }
        if (value < 0) {
            line.append('-');
        }
        if (exponent >= -4 && exponent < 6) {
            if (exponent >= 0) {
                for (int k = 0; k <= exponent; k++) {
                    line.append((char) ('0' + sig[k]));
                }
                if (exponent < 5) {
                    line.append('.');
                    for (int k = exponent + 1; k < 6; k++) {
                        line.append((char) ('0' + sig[k]));
                    }
                }
            } else {
                line.append("0.");
                for (int k = exponent; k < -1; k++) {
                    line.append('0');
                }
                for (int k = 0; k < 6; k++) {
                    line.append((char) ('0' + sig[k]));
                }
            }
            return;
        }
        line.append((char) ('0' + sig[0])).append('.');
        for (int k = 1; k < 6; k++) {
            line.append((char) ('0' + sig[k]));
        }
        int e = Math.abs(exponent);
        line.append(exponent < 0 ? "e-" : "e+");
        if (e < 10) {
            line.append('0');
        }
        line.append(e);
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
