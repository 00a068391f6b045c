package dev.sweepline.fsw.exec;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sweepline.fsw.command.CommandCode;
import dev.sweepline.fsw.command.CommandReason;
import dev.sweepline.fsw.command.TableImage;
import dev.sweepline.fsw.command.TcBuilder;
import dev.sweepline.fsw.octets.BigEndian;
import dev.sweepline.fsw.science.SpectrumLayout;
import dev.sweepline.fsw.sweep.SweepListener;
import dev.sweepline.fsw.sweep.SyntheticInstrument;
import dev.sweepline.fsw.telemetry.Apid;
import dev.sweepline.fsw.telemetry.FaultyLink;
import dev.sweepline.fsw.telemetry.TransferFrameBuilder;
import java.io.ByteArrayOutputStream;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The spectrum packet's table id and table-changed flag (telemetry ICD §4: flags bit 6 on the first sweep
 * flown with a newly applied table) follow the scheduler's "configuration applied" notification: every
 * spectrum before the commit takes effect carries the start-up id 0 and no flag, the first one made with
 * the committed table carries its id and the flag, the later ones its id without the flag.
 */
class TableChangedFlagTest {
    /** Octets before a packet's user data: primary header 6 + CUC 6 (telemetry ICD §3). */
    private static final int USER_DATA_AT = 12;

    private final ByteArrayOutputStream science = new ByteArrayOutputStream();
    private final TcBuilder tc = TcBuilder.demo();

    /** One spectrum packet's table id, flags and window count. */
    record Seen(int tableId, int flags, int windows) {
    }

    @Test
    void shouldFlagOnlyTheFirstSweepOfACommittedTable() {
        // the synthetic instrument answers every step as commanded, whatever the table (canned replies hold
        // the default table's windows, whose HV codes a new table's steps would not match)
        FlightSoftware fsw = new FlightSoftware(FswRig.benchConfig(), FaultyLink.faultless(new SyntheticInstrument(91)),
                (f, off, len) -> keepScience(f, off, len), SweepListener.NONE);
        long now = run(fsw, 0, 2_000_000);
        byte[] image = TableCommandingTest.newImage(); // 64 windows: sweeps of the new table are visibly shorter
        int id = TableImage.tableId(image, image.length);
        for (int from = 0; from < image.length; from += CommandCode.MAX_LOAD_OCTETS) {
            int n = Math.min(CommandCode.MAX_LOAD_OCTETS, image.length - from);
            assertEquals(CommandReason.OK, send(fsw, tc.command(CommandCode.TABLE_LOAD, TcBuilder.load(image, from, n)), now));
        }
        assertEquals(CommandReason.OK, send(fsw, tc.command(CommandCode.TABLE_VERIFY, TcBuilder.u16(image.length)), now));
        assertEquals(CommandReason.OK, send(fsw, tc.command(CommandCode.TABLE_COMMIT, TcBuilder.u16(id)), now));
        now = run(fsw, now, 4_000_000);
        fsw.close(now);

        List<Seen> seen = spectra();
        int first = -1;
        for (int i = 0; i < seen.size() && first < 0; i++) {
            if (seen.get(i).tableId() == id) {
                first = i;
            }
        }
        assertTrue(first > 0, "spectra before and after the commit: " + seen);
        for (int i = 0; i < first; i++) {
            assertEquals(new Seen(0, 0, seen.get(i).windows()), new Seen(seen.get(i).tableId(),
                    seen.get(i).flags() & SpectrumLayout.FLAG_TABLE_CHANGED, seen.get(i).windows()), "before: " + i);
        }
        assertEquals(SpectrumLayout.FLAG_TABLE_CHANGED, seen.get(first).flags() & SpectrumLayout.FLAG_TABLE_CHANGED);
        assertEquals(64, seen.get(first).windows(), "the flagged sweep is one of the new table's 64 windows");
        assertTrue(seen.size() > first + 1, "spectra after the first of the new table");
        for (int i = first + 1; i < seen.size(); i++) {
            assertEquals(id, seen.get(i).tableId());
            assertEquals(0, seen.get(i).flags() & SpectrumLayout.FLAG_TABLE_CHANGED, "after: " + i);
        }
    }

    private static long run(FlightSoftware fsw, long from, long micros) {
        long now = from;
        while (now < from + micros) {
            fsw.doWork(now);
            now += 100;
        }
        return now;
    }

    private static int send(FlightSoftware fsw, byte[] packet, long now) {
        return fsw.acceptTelecommand(packet, 0, packet.length, now);
    }

    /** Keeps the data fields of the science VC's frames (telemetry ICD §2), in order. */
    private void keepScience(byte[] f, int off, int len) {
        int h = off + TransferFrameBuilder.ASM_LENGTH;
        if (((f[h + 1] >> 1) & 7) == Apid.VC_SCIENCE) {
            int from = h + TransferFrameBuilder.HEADER_LENGTH;
            science.write(f, from, off + len - TransferFrameBuilder.FECF_LENGTH - from);
        }
    }

    /** The spectrum packets of the science VC, back to back from its first frame (FHP 0 there). */
    private List<Seen> spectra() {
        byte[] s = science.toByteArray();
        List<Seen> seen = new ArrayList<>();
        int p = 0;
        while (p + USER_DATA_AT + SpectrumLayout.HEADER_LENGTH <= s.length) {
            int apid = BigEndian.get16(s, p) & 0x7FF;
            int total = 7 + BigEndian.get16(s, p + 4);
            if (apid == Apid.SURVEY_SPECTRUM || apid == Apid.FOCUS_SPECTRUM) {
                int u = p + USER_DATA_AT;
                seen.add(new Seen(BigEndian.get16(s, u + SpectrumLayout.TABLE_ID_OFFSET),
                        s[u + SpectrumLayout.FLAGS_OFFSET] & 0xFF, BigEndian.get16(s, u + SpectrumLayout.WINDOW_COUNT_OFFSET)));
            }
            p += total;
        }
        return seen;
    }
}
