package dev.sweepline.fsw.link;

/** Big-endian field access for the link codecs. */
final class Octets {
    private Octets() {
    }

    static void put16(byte[] b, int p, int v) {
        b[p] = (byte) (v >>> 8);
        b[p + 1] = (byte) v;
    }

    static void put32(byte[] b, int p, long v) {
        b[p] = (byte) (v >>> 24);
        b[p + 1] = (byte) (v >>> 16);
        b[p + 2] = (byte) (v >>> 8);
        b[p + 3] = (byte) v;
    }

    static int get16(byte[] b, int p) {
        return ((b[p] & 0xFF) << 8) | (b[p + 1] & 0xFF);
    }

    static int get32(byte[] b, int p) {
        return ((b[p] & 0xFF) << 24) | ((b[p + 1] & 0xFF) << 16) | ((b[p + 2] & 0xFF) << 8) | (b[p + 3] & 0xFF);
    }

    static long getUnsigned32(byte[] b, int p) {
        return get32(b, p) & 0xFFFF_FFFFL;
    }
}
