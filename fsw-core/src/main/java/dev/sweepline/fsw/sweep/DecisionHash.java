package dev.sweepline.fsw.sweep;

/**
 * Running 64-bit FNV-1a hash over ints, each folded in as four octets, least significant first
 * (Fowler-Noll-Vo, offset basis 0xcbf29ce484222325, prime 0x100000001b3). Allocation-free.
 */
final class DecisionHash {
    /** FNV-1a 64-bit offset basis. */
    static final long OFFSET_BASIS = 0xcbf29ce484222325L;
    /** FNV-1a 64-bit prime. */
    static final long PRIME = 0x100000001b3L;

    private long hash = OFFSET_BASIS;

    /** Folds one int in. */
    void add(int value) {
        long h = hash;
        for (int shift = 0; shift < 32; shift += 8) {
            h ^= (value >>> shift) & 0xFF;
            h *= PRIME;
        }
        hash = h;
    }

    /** Folds in a step's fields: window, codes, range, settle, periods, HV flag (sweep design note R16). */
    void addStep(dev.sweepline.fsw.link.StepCommand s) {
        add(s.window);
        add(s.dacLow);
        add(s.dacHigh);
        add(s.gainRange);
        add(s.settleMicros);
        add(s.integrationPeriods);
        add(s.hvEnabled ? 1 : 0);
    }

    /** Folds in a band chosen: its first and last windows. */
    void addBand(int first, int last) {
        add(first);
        add(last);
    }

    /** The hash so far. */
    long value() {
        return hash;
    }
}
