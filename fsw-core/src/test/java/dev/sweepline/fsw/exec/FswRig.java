package dev.sweepline.fsw.exec;

import dev.sweepline.fsw.DemoCup;
import dev.sweepline.fsw.command.NonVolatileStore;
import dev.sweepline.fsw.sweep.CannedReplies;
import dev.sweepline.fsw.sweep.SweepListener;
import dev.sweepline.fsw.sweep.SyntheticInstrument;
import dev.sweepline.fsw.table.WindowTable;
import java.util.Arrays;

/** Flight software on a {@link FakeLink} with canned 1 AU replies, stepped like the bench loop. */
final class FswRig {
    static final WindowTable TABLE = DemoCup.table();
    final FakeLink link;
    final FlightSoftware fsw;
    long nowMicros;

    FswRig(FlightConfig config) {
        link = new FakeLink(new CannedReplies(TABLE, new SyntheticInstrument(91)));
        fsw = new FlightSoftware(config, link, (f, off, len) -> { }, SweepListener.NONE);
    }

    FswRig() {
        this(benchConfig());
    }

    /**
     * The flight defaults with the core HV interlock enabled at start, as the simulator bench
     * configures it explicitly (the flight default is OFF, commands.md §2.3).
     */
    static FlightConfig benchConfig() {
        FlightConfig c = DemoCup.config();
        c.hvEnabledAtStart = true;
        return c;
    }

    /** A bench config keeping its table in {@code store}. */
    static FlightConfig withStore(NonVolatileStore store) {
        FlightConfig c = benchConfig();
        c.nonVolatileStore = store;
        return c;
    }

    /** Runs the loop for {@code micros}: a cycle every 100 us of simulated time. */
    void run(long micros) {
        long end = nowMicros + micros;
        while (nowMicros < end) {
            fsw.doWork(nowMicros);
            nowMicros += 100;
        }
    }

    int send(byte[] packet) {
        return fsw.acceptTelecommand(packet, 0, packet.length, nowMicros);
    }

    /** An in-memory non-volatile store: the table record in {@code content}, the auth record in {@code auth}. */
    static final class MemoryStore implements NonVolatileStore {
        /** The table record (null: never written). */
        byte[] content;
        /** The authentication record (null: never written). */
        byte[] auth;
        /** Table writes fail. */
        boolean failWrites;
        /** Authentication-record writes fail. */
        boolean failAuthWrites;

        @Override
        public int read(int record, byte[] into) {
            byte[] r = record == RECORD_TABLE ? content : auth;
            if (r == null) {
                return ABSENT;
            }
            if (r.length == 0) {
                return EMPTY;
            }
            System.arraycopy(r, 0, into, 0, r.length);
            return r.length;
        }

        @Override
        public int write(int record, byte[] from, int length) {
            if (record == RECORD_TABLE ? failWrites : failAuthWrites) {
                return IO_ERROR;
            }
            if (record == RECORD_TABLE) {
                content = Arrays.copyOf(from, length);
            } else {
                auth = Arrays.copyOf(from, length);
            }
            return OK;
        }
    }
}
