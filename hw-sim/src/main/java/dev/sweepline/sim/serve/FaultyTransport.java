package dev.sweepline.sim.serve;

import dev.sweepline.fsw.link.ByteTransport;
import dev.sweepline.sim.seed.SeedTree;
import java.util.function.LongSupplier;

/**
 * A {@link ByteTransport} that damages what passes through it in both directions (bit flips, lost
 * and duplicated octets, stalls), seeded by a {@link FaultPlan}, with a {@link FaultLedger} per
 * direction. Put it around the instrument server's transport: {@link #inbound()} is what the server
 * reads (the flight software's steps), {@link #outbound()} what it writes (the replies).
 *
 * <p>A stall holds the rest of that direction back for {@link FaultPlan#stallMicros()} of the given
 * clock. Staged octets also leave on {@link #read} calls, so a writer that goes quiet still gets its
 * last frame out. Threading: one thread (the server's).
 */
public final class FaultyTransport implements ByteTransport {
    private static final int STAGE_OCTETS = 512;

    private final ByteTransport inner;
    private final FaultPlan plan;
    private final LongSupplier clockMicros;
    private final FaultInjector in;
    private final FaultInjector out;
    private final byte[] raw = new byte[STAGE_OCTETS / 2];
    private final byte[] inStage = new byte[STAGE_OCTETS];
    private final byte[] outStage = new byte[STAGE_OCTETS];
    private int rawPos;
    private int rawLength;
    private int inPos;
    private int inLength;
    private int outPos;
    private int outLength;
    private long inStallUntil;
    private long outStallUntil;
    private boolean outEnded;

    /** Damages the traffic of {@code inner} as {@code plan} says, stalls timed on {@code clockMicros}. */
    public FaultyTransport(ByteTransport inner, FaultPlan plan, LongSupplier clockMicros) {
        this.inner = inner;
        this.plan = plan;
        this.clockMicros = clockMicros;
        SeedTree seeds = SeedTree.of(plan.seed());
        this.in = new FaultInjector(plan, seeds, SeedTree.LinkDirection.INBOUND);
        this.out = new FaultInjector(plan, seeds, SeedTree.LinkDirection.OUTBOUND);
        long now = clockMicros.getAsLong();
        this.inStallUntil = now;
        this.outStallUntil = now;
    }

    @Override
    public int read(byte[] buffer, int offset, int length) {
        flushOut();
        if (inPos == inLength) {
            if (clockMicros.getAsLong() - inStallUntil < 0) {
                return 0;
            }
            if (rawPos == rawLength) {
                int n = inner.read(raw, 0, raw.length);
                if (n <= 0) {
                    return n;
                }
                rawPos = 0;
                rawLength = n;
            }
            inPos = 0;
            inLength = 0;
            while (rawPos < rawLength && inLength + 2 <= inStage.length) {
                int r = in.apply(raw[rawPos++]);
                inLength = stage(r, inStage, inLength);
                if ((r & FaultInjector.STALL) != 0) {
                    inStallUntil = clockMicros.getAsLong() + plan.stallMicros();
                    break;
                }
            }
        }
        int n = Math.min(length, inLength - inPos);
        System.arraycopy(inStage, inPos, buffer, offset, n);
        inPos += n;
        return n;
    }

    @Override
    public int write(byte[] buffer, int offset, int length) {
        if (outEnded) {
            return -1;
        }
        if (!flushOut()) {
            return 0;
        }
        outPos = 0;
        outLength = 0;
        int consumed = 0;
        while (consumed < length && outLength + 2 <= outStage.length) {
            int r = out.apply(buffer[offset + consumed++]);
            outLength = stage(r, outStage, outLength);
            if ((r & FaultInjector.STALL) != 0) {
                flushOut(); // what came before the stall still leaves
                outStallUntil = clockMicros.getAsLong() + plan.stallMicros();
                break;
            }
        }
        flushOut();
        return consumed;
    }

    private static int stage(int r, byte[] stage, int at) {
        if ((r & FaultInjector.DROP) != 0) {
            return at;
        }
        stage[at++] = (byte) r;
        if ((r & FaultInjector.DUPLICATE) != 0) {
            stage[at++] = (byte) r;
        }
        return at;
    }

    /** Pushes staged outbound octets unless stalled; returns true when none are left. */
    private boolean flushOut() {
        if (outPos < outLength && clockMicros.getAsLong() - outStallUntil >= 0) {
            int n = inner.write(outStage, outPos, outLength - outPos);
            if (n < 0) {
                outEnded = true;
                return false;
            }
            outPos += n;
        }
        return outPos == outLength;
    }

    /** True when nothing is staged in either direction (everything damaged so far has been passed on). */
    public boolean drained() {
        flushOut();
        return outPos == outLength && inPos == inLength && rawPos == rawLength;
    }

    /** The ledger of what the server reads (flight software to electronics). */
    public FaultLedger inbound() {
        return in.ledger();
    }

    /** The ledger of what the server writes (electronics to flight software). */
    public FaultLedger outbound() {
        return out.ledger();
    }
}
