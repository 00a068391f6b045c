package dev.sweepline.fsw.host.script;

import dev.sweepline.fsw.instrument.InstrumentDescription;
import dev.sweepline.fsw.host.instrument.Instruments;
import dev.sweepline.fsw.command.CommandCode;
import dev.sweepline.fsw.command.ParameterTable;
import dev.sweepline.fsw.command.TableImage;
import dev.sweepline.fsw.instrument.InstrumentLimits;
import dev.sweepline.fsw.sweep.SweepMode;
import dev.sweepline.fsw.table.WindowTable;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;

/**
 * A command script: time-tagged telecommands and fault injections, one per line, sorted by time
 * (commands.md §7). Format: {@code <seconds> <VERB> [args...]}, {@code #} starts a comment.
 *
 * <pre>
 *   2.0  NO_OP
 *   3.0  TABLE_LOGSPACED 64 100 3000 4     # windows, low V, high V, [integration periods]: load+verify+commit
 *   3.5  TABLE_IMAGE recommended.table     # a table image file (bench tune writes one): load+verify+commit
 *   5.0  SET_MODE SAFE                     # SAFE | SURVEY | FOCUS
 *   5.1  HV_ARM
 *   5.2  HV_ENABLE
 *   6.0  RESET_COUNTERS 7
 *   7.0  TABLE_DUMP 0 0 64                 # copy (0 active, 1 pending), offset, length
 *   8.0  INJECT HV_READBACK 500            # also SATURATE on|off, STUCK q(1..4) code, DEAD on|off,
 *                                          #      SEQUENCE on|off, OVERRUN ticks, CLEAR
 *   9.0  AUTH_RECOVER                      # names this boot's challenge (commands.md §1.4)
 * </pre>
 *
 * A table above the instrument's limits is still sent (the flight software must refuse it, and the
 * run shows that it does); the script notes it in {@link #warnings()}.
 */
public final class CommandScript {
    private final List<ScriptEntry> entries;
    private final List<byte[]> images;
    private final List<String> warnings;

    private CommandScript(List<ScriptEntry> entries, List<byte[]> images, List<String> warnings) {
        this.entries = List.copyOf(entries);
        this.images = List.copyOf(images);
        this.warnings = List.copyOf(warnings);
    }

    /** What the script sends that the flight software is expected to refuse (one line each, with the script line). */
    public List<String> warnings() {
        return warnings;
    }

    /** The packets of an uplink log, to be sent unchanged at their time tags (an uplink replay). */
    public static CommandScript ofUplink(List<UplinkLog.Recorded> records) {
        List<ScriptEntry> out = new ArrayList<>();
        for (int i = 0; i < records.size(); i++) {
            out.add(ScriptEntry.recorded(records.get(i).atMicros(), i + 1, records.get(i).packet()));
        }
        return new CommandScript(out, List.of(), List.of());
    }

    /**
     * The uplink of {@code table} at {@code atMicros}: its image in loads of up to 192 octets, a verify
     * and a commit (commands.md §4.2), as {@code TABLE_LOGSPACED} and {@code TABLE_IMAGE} send theirs.
     */
    public static CommandScript tableUplink(long atMicros, ParameterTable table) {
        byte[] image = new byte[TableImage.MAX_OCTETS];
        int n = TableImage.encode(table, image);
        List<ScriptEntry> out = new ArrayList<>();
        loadImage(atMicros, 0, image, n, out);
        return new CommandScript(out, images(out), List.of());
    }

    /** The table images the script uplinks, in order (the ground needs their windows). */
    public List<byte[]> images() {
        return images;
    }

    /** The entries in time order. */
    public List<ScriptEntry> entries() {
        return entries;
    }

    /** Reads a script file for the default instrument (instruments/FORMAT.md: the demo cup). */
    public static CommandScript read(Path file) throws IOException, ScriptException {
        return read(file, Instruments.defaultSpec().flight());
    }

    /**
     * Reads a script file for {@code instrument} (its tables and their limits); a {@code TABLE_IMAGE}
     * path is relative to the script's folder.
     */
    public static CommandScript read(Path file, InstrumentDescription instrument) throws IOException, ScriptException {
        Path folder = file.toAbsolutePath().getParent();
        return parse(Files.readAllLines(file), instrument, folder != null ? folder : Path.of(""));
    }

    /** Parses script lines for the default instrument. */
    public static CommandScript parse(List<String> lines) throws ScriptException {
        return parse(lines, Instruments.defaultSpec().flight());
    }

    /**
     * Parses script lines for {@code instrument}: its DAC scale and default parameters, its voltage
     * limit; a {@code TABLE_IMAGE} path is relative to the working directory.
     */
    public static CommandScript parse(List<String> lines, InstrumentDescription instrument) throws ScriptException {
        return parse(lines, instrument, Path.of(""));
    }

    /** As {@link #parse(List, InstrumentDescription)}, a {@code TABLE_IMAGE} path relative to {@code folder}. */
    public static CommandScript parse(List<String> lines, InstrumentDescription instrument, Path folder)
            throws ScriptException {
        List<ScriptEntry> out = new ArrayList<>();
        List<String> warnings = new ArrayList<>();
        long last = Long.MIN_VALUE;
        for (int i = 0; i < lines.size(); i++) {
            int lineNo = i + 1;
            String text = lines.get(i);
            int hash = text.indexOf('#');
            String[] t = (hash >= 0 ? text.substring(0, hash) : text).trim().split("\\s+");
            if (t.length == 0 || t[0].isEmpty()) {
                continue;
            }
            if (t.length < 2) {
                throw new ScriptException(lineNo, "expected '<seconds> <VERB> [args]'");
            }
            long at;
            try {
                double seconds = Double.parseDouble(t[0]);
                if (!(seconds >= 0)) {
                    throw new NumberFormatException();
                }
                at = Math.round(seconds * 1e6);
            } catch (NumberFormatException e) {
                throw new ScriptException(lineNo, "bad time '" + t[0] + "'");
            }
            if (at < last) {
                throw new ScriptException(lineNo, "time goes backwards");
            }
            last = at;
            parseLine(at, lineNo, t, out, instrument, folder);
            if ("TABLE_LOGSPACED".equalsIgnoreCase(t[1])) {
                warnAboveLimit(lineNo, t, warnings, instrument.limits());
            }
        }
        return new CommandScript(out, images(out), warnings);
    }

    private static void parseLine(long at, int line, String[] t, List<ScriptEntry> out, InstrumentDescription instrument,
            Path folder) throws ScriptException {
        String verb = t[1].toUpperCase(Locale.ROOT);
        switch (verb) {
            case "NO_OP" -> out.add(command(at, line, CommandCode.NO_OP, t, 0));
            case "HV_ARM" -> out.add(command(at, line, CommandCode.HV_ARM, t, 0));
            case "HV_ENABLE" -> out.add(command(at, line, CommandCode.HV_ENABLE, t, 0));
            case "AUTH_RECOVER" -> out.add(command(at, line, CommandCode.AUTH_RECOVER, t, 0));
            case "SET_MODE" -> {
                need(t, 1, line);
                out.add(new ScriptEntry(at, line, CommandCode.SET_MODE, new byte[] {(byte) mode(t[2], line).icdCode()},
                        null, null));
            }
            case "RESET_COUNTERS" -> out.add(new ScriptEntry(at, line, CommandCode.RESET_COUNTERS,
                    new byte[] {(byte) number(t, 2, line)}, null, null));
            case "TABLE_DUMP" -> {
                int off = number(t, 3, line);
                int len = number(t, 4, line);
                out.add(new ScriptEntry(at, line, CommandCode.TABLE_DUMP, new byte[] {(byte) number(t, 2, line),
                    (byte) (off >>> 8), (byte) off, (byte) (len >>> 8), (byte) len}, null, null));
            }
            case "TABLE_LOGSPACED" -> table(at, line, t, out, instrument);
            case "TABLE_IMAGE" -> tableFile(at, line, t, out, folder);
            case "INJECT" -> {
                need(t, 1, line);
                String what = t[2].toUpperCase(Locale.ROOT);
                int[] values = new int[t.length - 3];
                for (int k = 0; k < values.length; k++) {
                    String v = t[k + 3].toLowerCase(Locale.ROOT);
                    values[k] = v.equals("on") ? 1 : v.equals("off") ? 0 : number(t, k + 3, line);
                }
                switch (what) {
                    case "HV_READBACK", "SATURATE", "DEAD", "SEQUENCE", "OVERRUN" -> {
                        if (values.length != 1) {
                            throw new ScriptException(line, what + " takes one value");
                        }
                    }
                    case "STUCK" -> stuck(values, line, instrument);
                    case "CLEAR" -> {
                    }
                    default -> throw new ScriptException(line, "unknown injection '" + t[2] + "'");
                }
                out.add(new ScriptEntry(at, line, -1, new byte[0], what, values));
            }
            default -> throw new ScriptException(line, "unknown verb '" + t[1] + "'");
        }
    }

    /**
     * Checks {@code STUCK q code}: the quadrant counted 1..4, as the STUCK_CHANNEL event reports it
     * (commands.md §6), and a code the instrument's ADC can give.
     */
    private static void stuck(int[] values, int line, InstrumentDescription instrument) throws ScriptException {
        if (values.length != 2) {
            throw new ScriptException(line, "STUCK takes a quadrant 1.." + InstrumentDescription.QUADRANTS + " and a code");
        }
        if (values[0] < 1 || values[0] > InstrumentDescription.QUADRANTS) {
            throw new ScriptException(line, "STUCK quadrant must be 1.." + InstrumentDescription.QUADRANTS
                    + " (as the STUCK_CHANNEL event counts them), got " + values[0]);
        }
        long top = (1L << instrument.adcBits()) - 1;
        if (values[1] < 0 || values[1] > top) {
            throw new ScriptException(line, "STUCK code must be 0.." + top + " (a " + instrument.adcBits()
                    + "-bit ADC), got " + values[1]);
        }
    }

    /** The mode a script names (its ICD code is the mode's own, {@code SweepMode.icdCode()}). */
    private static SweepMode mode(String word, int line) throws ScriptException {
        for (SweepMode m : SweepMode.values()) {
            if (m.name().equalsIgnoreCase(word)) {
                return m;
            }
        }
        throw new ScriptException(line, "mode must be SAFE, SURVEY or FOCUS");
    }

    /** Notes a log-spaced table whose top edge lies above the flown instrument's voltage limit. */
    private static void warnAboveLimit(int line, String[] t, List<String> warnings, InstrumentLimits limits)
            throws ScriptException {
        long highMillivolts = number(t, 4, line) * 1000L;
        if (highMillivolts > limits.maxModulatorMillivolts) {
            warnings.add("line " + line + ": TABLE_LOGSPACED reaches " + number(t, 4, line) + " V, above the instrument's "
                    + limits.maxModulatorMillivolts / 1000 + " V limit: the flight software must refuse it"
                    + " (TABLE_INVALID ABOVE_VOLTAGE_LIMIT)");
        }
    }

    /** A log-spaced table as an image, then loads of 192 octets, a verify and a commit, all at {@code at}. */
    private static void table(long at, int line, String[] t, List<ScriptEntry> out, InstrumentDescription instrument)
            throws ScriptException {
        int windows = number(t, 2, line);
        int lowVolts = number(t, 3, line);
        int highVolts = number(t, 4, line);
        ParameterTable p;
        try {
            p = ParameterTable.of(WindowTable.logSpaced(windows, lowVolts * 1000, highVolts * 1000,
                    instrument.millivoltsPerCode()), instrument.defaultParameters());
        } catch (IllegalArgumentException e) {
            throw new ScriptException(line, e.getMessage());
        }
        if (t.length > 5) {
            p.sweep.integrationPeriods = number(t, 5, line);
        }
        byte[] image = new byte[TableImage.MAX_OCTETS];
        int n = TableImage.encode(p, image);
        loadImage(at, line, image, n, out);
    }

    /**
     * An image file (as {@code bench tune} writes recommended.table), relative to {@code folder}: its
     * loads, verify and commit.
     */
    private static void tableFile(long at, int line, String[] t, List<ScriptEntry> out, Path folder)
            throws ScriptException {
        need(t, 1, line);
        byte[] image;
        Path file = folder.resolve(t[2]);
        try {
            image = Files.readAllBytes(file);
        } catch (java.nio.file.NoSuchFileException e) {
            throw new ScriptException(line, "TABLE_IMAGE " + file + ": no such file");
        } catch (IOException e) {
            throw new ScriptException(line, "TABLE_IMAGE " + file + ": cannot read it (" + e.getMessage() + ")");
        }
        if (!TableImage.intact(image, image.length)) {
            throw new ScriptException(line, t[2] + " is not an intact table image (CRC or length)");
        }
        loadImage(at, line, image, image.length, out);
    }

    /** The images the table loads write, each cut at the length its verify names. */
    private static List<byte[]> images(List<ScriptEntry> entries) {
        List<byte[]> images = new ArrayList<>();
        byte[] pending = new byte[TableImage.MAX_OCTETS];
        for (ScriptEntry e : entries) {
            if (e.code() == CommandCode.TABLE_LOAD) {
                int offset = ((e.args()[0] & 0xFF) << 8) | (e.args()[1] & 0xFF);
                System.arraycopy(e.args(), 2, pending, offset, e.args().length - 2);
            } else if (e.code() == CommandCode.TABLE_VERIFY) {
                images.add(Arrays.copyOf(pending, ((e.args()[0] & 0xFF) << 8) | (e.args()[1] & 0xFF)));
            }
        }
        return images;
    }

    /** The loads of {@code n} image octets in pieces, a verify and a commit, all at {@code at}. */
    private static void loadImage(long at, int line, byte[] image, int n, List<ScriptEntry> out) {
        for (int from = 0; from < n; from += CommandCode.MAX_LOAD_OCTETS) {
            int k = Math.min(CommandCode.MAX_LOAD_OCTETS, n - from);
            byte[] a = new byte[2 + k];
            a[0] = (byte) (from >>> 8);
            a[1] = (byte) from;
            System.arraycopy(image, from, a, 2, k);
            out.add(new ScriptEntry(at, line, CommandCode.TABLE_LOAD, a, null, null));
        }
        out.add(new ScriptEntry(at, line, CommandCode.TABLE_VERIFY, new byte[] {(byte) (n >>> 8), (byte) n}, null, null));
        int id = TableImage.tableId(image, n);
        out.add(new ScriptEntry(at, line, CommandCode.TABLE_COMMIT, new byte[] {(byte) (id >>> 8), (byte) id}, null, null));
    }

    private static ScriptEntry command(long at, int line, int code, String[] t, int args) throws ScriptException {
        if (t.length != 2 + args) {
            throw new ScriptException(line, t[1] + " takes " + args + " arguments");
        }
        return new ScriptEntry(at, line, code, new byte[0], null, null);
    }

    private static void need(String[] t, int args, int line) throws ScriptException {
        if (t.length < 2 + args) {
            throw new ScriptException(line, t[1] + " needs " + args + " argument(s)");
        }
    }

    private static int number(String[] t, int index, int line) throws ScriptException {
        if (index >= t.length) {
            throw new ScriptException(line, "missing argument " + (index - 1) + " of " + t[1]);
        }
        try {
            return Integer.decode(t[index]);
        } catch (NumberFormatException e) {
            throw new ScriptException(line, "bad number '" + t[index] + "' in " + Arrays.toString(t));
        }
    }
}
