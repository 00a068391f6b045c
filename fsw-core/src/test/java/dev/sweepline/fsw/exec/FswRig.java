package dev.sweepline.fsw.exec;

import dev.sweepline.fsw.command.NonVolatileStore;
import dev.sweepline.fsw.sweep.CannedReplies;
import dev.sweepline.fsw.sweep.SweepListener;
import dev.sweepline.fsw.sweep.SyntheticInstrument;
import dev.sweepline.fsw.table.WindowTable;

import java.util.Arrays;

/** Flight software on a {@link FakeLink} with canned 1 AU replies, stepped like the bench loop. */
final class FswRig {
    static final WindowTable TABLE = WindowTable.defaultTable();
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
        FlightConfig c = new FlightConfig();
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

    /** An in-memory non-volatile store. */
    static final class MemoryStore implements NonVolatileStore {
        byte[] content = new byte[0];
        boolean failWrites;

        @Override
        public int read(byte[] into) {
            System.arraycopy(content, 0, into, 0, content.length);
            return content.length;
        }

        @Override
        public int write(byte[] from, int length) {
            if (failWrites) {
                return -1;
            }
            content = Arrays.copyOf(from, length);
            return OK;
        }
    }
}
