package dev.sweepline.ground.cli;

import dev.sweepline.ground.decode.FrameStreamBuilder;
import dev.sweepline.ground.decode.Hex;
import dev.sweepline.ground.decode.TestPackets;
import java.io.ByteArrayOutputStream;
import java.util.HashSet;
import java.util.List;
import java.util.Set;

/**
 * A 1024-octet-frame stream (ICD §1 default) with one of each fault of the issue 3, and what a
 * correct decoder must make of it, derived from the construction.
 */
final class BadInputStream {
    static final int L = 1024;
    static final long T0 = 0x7FE81780L;
    /** Garbage octets put before one frame. */
    static final int GARBAGE = 17;
    /** Octets cut off the last frame. */
    static final int CUT = 100;

    final byte[] bytes;
    final FrameStreamBuilder builder = new FrameStreamBuilder(L);
    final int flipped;
    final int removed;
    final int last;
    /** Survey spectra whose every carrying frame survives. */
    final int survivingSpectra;
    /** Spectra lost before the last surviving one: what sequence counts can reveal (ICD §3.1). */
    final int spectraLostBeforeLastSurvivor;
    /** Housekeeping packets whose every carrying frame survives. */
    final int survivingHousekeeping;
    /** VCs of the flipped and removed frames. */
    final int flippedVc;
    final int removedVc;

    BadInputStream() {
        int c = 128;
        for (int s = 0; s < 24; s++) {
            int[][] adc = new int[4][c];
            for (int q = 0; q < 4; q++) {
                for (int i = 0; i < c; i++) {
                    adc[q][i] = 256 + 37 * i + 5 * q + s;
                }
            }
            int[] gains = new int[c];
            gains[7] = 2;
            builder.add(0, TestPackets.spectrum(0x100, s, T0 + 10L * s, 0, s, 0, gains, new boolean[c], adc));
            if (s % 4 == 0) {
                builder.add(1, TestPackets.housekeeping(s / 4, T0 + 10L * s, 0));
            }
            if (s == 12) {
                // a command report whose length field claims 1000 octets more than it carries
                byte[] b = TestPackets.packet(0x130, 0, true, new byte[50]);
                b[4] = (byte) ((49 + 1000) >>> 8);
                b[5] = (byte) (49 + 1000);
                builder.flush(1).add(1, b).flush(1);
            }
        }
        builder.flush(1).flush(0); // VC 0 last, so that the truncated last frame is a spectrum frame
        List<byte[]> frames = builder.frames();
        last = frames.size() - 1;
        flipped = 3;
        removed = 8;
        flippedVc = (frames.get(flipped)[1] >>> 1) & 7;
        removedVc = (frames.get(removed)[1] >>> 1) & 7;
        Set<Integer> lost = new HashSet<>(List.of(flipped, removed, last));
        int spectra = 0;
        int hk = 0;
        int lostSpectra = 0;
        int revealed = 0;
        for (FrameStreamBuilder.Carried p : builder.packets()) {
            int apid = ((p.packet()[0] & 7) << 8) | (p.packet()[1] & 0xFF);
            if (p.frames().stream().noneMatch(lost::contains)) {
                spectra += apid == 0x100 ? 1 : 0;
                hk += apid == 0x110 ? 1 : 0;
                revealed = apid == 0x100 ? lostSpectra : revealed;
            } else {
                lostSpectra += apid == 0x100 ? 1 : 0;
            }
        }
        spectraLostBeforeLastSurvivor = revealed;
        survivingSpectra = spectra;
        survivingHousekeeping = hk;
        ByteArrayOutputStream o = new ByteArrayOutputStream();
        for (int i = 0; i < frames.size(); i++) {
            if (i == removed) {
                continue;
            }
            if (i == 12) {
                o.writeBytes(new byte[GARBAGE]);
            }
            byte[] f = frames.get(i).clone();
            if (i == flipped) {
                f[500] ^= 0x01;
            }
            o.writeBytes(Hex.ASM);
            o.write(f, 0, i == last ? L - CUT : L);
        }
        bytes = o.toByteArray();
    }

    int frameCount() {
        return builder.frames().size();
    }
}
