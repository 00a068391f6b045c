package dev.sweepline.fsw.host.script;

import java.io.BufferedOutputStream;
import java.io.Closeable;
import java.io.DataInputStream;
import java.io.DataOutputStream;
import java.io.EOFException;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * The exact telecommand octets a run uplinked, with their time tags (commands.md §7.2): a file
 * {@code uplink.tc} of an 8-octet header {@code "SLTC" 00 01 00 00} (magic, version 1, reserved) and
 * then one record per packet: time tag (8 octets, microseconds of run time, big-endian), length (2
 * octets) and the packet. {@code bench run --uplink-replay} sends such a file again unchanged.
 */
public final class UplinkLog implements Closeable {
    /** File name in a run's output folder. */
    public static final String FILE = "uplink.tc";
    private static final byte[] HEADER = {'S', 'L', 'T', 'C', 0, 1, 0, 0};

    /** One recorded packet. */
    public record Recorded(long atMicros, byte[] packet) {
    }

    private final DataOutputStream out;

    private UplinkLog(DataOutputStream out) {
        this.out = out;
    }

    /** A log writing to {@code file} (replaced). */
    public static UplinkLog create(Path file) throws IOException {
        DataOutputStream out = new DataOutputStream(new BufferedOutputStream(Files.newOutputStream(file)));
        out.write(HEADER);
        return new UplinkLog(out);
    }

    /** Records {@code packet} sent at {@code atMicros}. */
    public void record(long atMicros, byte[] packet) {
        try {
            out.writeLong(atMicros);
            out.writeShort(packet.length);
            out.write(packet);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    @Override
    public void close() throws IOException {
        out.close();
    }

    /**
     * Reads an uplink file.
     *
     * @throws ScriptException naming the record when the file is not an uplink log or is cut short
     */
    public static List<Recorded> read(Path file) throws IOException, ScriptException {
        List<Recorded> records = new ArrayList<>();
        try (InputStream raw = Files.newInputStream(file); DataInputStream in = new DataInputStream(raw)) {
            byte[] header = new byte[HEADER.length];
            if (in.readNBytes(header, 0, header.length) != header.length || !Arrays.equals(header, HEADER)) {
                throw new ScriptException(0, file + " is not an uplink log (header 'SLTC' version 1)");
            }
            long last = Long.MIN_VALUE;
            while (true) {
                long at;
                try {
                    at = in.readLong();
                } catch (EOFException end) {
                    return records;
                }
                try {
                    int length = in.readUnsignedShort();
                    byte[] packet = in.readNBytes(length);
                    if (packet.length != length || at < 0 || at < last) {
                        throw new EOFException();
                    }
                    last = at;
                    records.add(new Recorded(at, packet));
                } catch (EOFException cut) {
                    throw new ScriptException(records.size() + 1, file + ": record " + (records.size() + 1)
                            + " is cut short or out of time order");
                }
            }
        }
    }
}
