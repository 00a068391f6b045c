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

    /** The hash so far. */
    long value() {
        return hash;
    }
}
