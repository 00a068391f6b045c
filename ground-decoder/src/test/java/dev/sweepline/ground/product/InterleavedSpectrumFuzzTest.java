package dev.sweepline.ground.product;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.ObjectMapper;
import dev.sweepline.ground.decode.TestPackets;
import dev.sweepline.ground.fit.CupGeometry;
import dev.sweepline.ground.fit.NoiseModel;
import dev.sweepline.ground.fit.PlasmaFit;
import dev.sweepline.ground.fit.PlasmaModel;
import dev.sweepline.ground.fit.Species;
import dev.sweepline.ground.fit.SpectrumInput;
import dev.sweepline.ground.instrument.BuiltInInstruments;
import dev.sweepline.ground.instrument.GroundInstrument;
import dev.sweepline.ground.spectrum.Ccsds121QuadrantDecoder;
import dev.sweepline.ground.spectrum.SpectrumError;
import dev.sweepline.ground.spectrum.SpectrumPacketDecoder;
import dev.sweepline.ground.spectrum.SpectrumResult;
import dev.sweepline.ground.spectrum.SpectrumValues;
import java.io.StringReader;
import java.io.StringWriter;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.Test;

/**
 * Mutation fuzzing of interleaved focus spectra (telemetry ICD §4 flags bit 5) from decode to the products, from a
 * recorded seed: layout-2 demo-cup spectra of 1..64 windows around the near-Sun proton peak (physics.md: n 3600
 * cm⁻³, U 300 km/s, T_p 6e5 K) read in the interleaved order with a change of the speed of up to ±200 km/s over
 * the sweep, ICD §8 noise, each then damaged in one field (flags, c, f, dwell, gain tags, saturation flags,
 * samples, bits anywhere, length) and followed by one good spectrum. Properties: nothing is thrown; a refused
 * spectrum has its reason; every spectrum fitted with ΔU is an interleaved focus spectrum with more windows than
 * the drift model's parameters and ΔU short of its guard; the good spectrum after each decodes and fits to the
 * same bits every time; moments.csv and moments.json carry no NaN or Infinity, ΔU is empty / null exactly when
 * it was not fitted, and a spectrum with ΔU has its reduced χ².
 */
class InterleavedSpectrumFuzzTest {
    /** Recorded seed; change it only together with a note of the run that motivated it. */
    static final long SEED = 0x5EED_D21F_2026L;
    static final int SPECTRA = 600;
    private static final GroundInstrument CUP = BuiltInInstruments.demoCup();
    /** User data of a packet: after the 6-octet primary header and the 6-octet CUC time (ICD §3). */
    private static final int USER_DATA = 12;
    /** Layout 2's fixed octets, before the gain tags (ICD §4). */
    private static final int FIXED = 18;

    private enum Mutation { NONE, FLAGS, COUNT, FIRST, DWELL, TAGS, SATURATION, SAMPLES, BITS, LENGTH }

    private final Random rnd = new Random(SEED);

    /** A layout-2 spectrum of c windows around the proton peak, flags {@code flags}, ΔU {@code du} over the sweep. */
    private byte[] spectrum(int apid, int flags, int c, double du, int seq) {
        var table = CUP.windows();
        int first = Math.max(0, table.windowOf(Species.PROTON.voltsAtSpeed(300e3)) - c / 2);
        double[] lo = new double[c];
        double[] hi = new double[c];
        double[] tau = new double[c];
        for (int j = 0; j < c; j++) {
            lo[j] = table.lowVolts(first + j);
            hi[j] = table.highVolts(first + j);
            tau[j] = c > 1 ? SpectrumValues.stepOf(j, c, (flags & 0x80) != 0, true) / (double) (c - 1) : 0.5;
        }
        NoiseModel noise = new NoiseModel(CUP);
        double[] total = new double[c];
        new PlasmaModel(lo, hi, CupGeometry.of(CUP).effectiveAreaM2(), false, tau)
                .evaluate(new double[] {3600e6, 300e3, Species.PROTON.thermalSpeed(6e5), du}, total, null);
        int[] gains = new int[c];
        int[][] adc = new int[4][c];
        for (int w = 0; w < c; w++) {
            double q = total[w] / 4; // normal incidence: a quarter of the current on each quadrant
            int r = 0;
            while (r < 2 && Math.abs(q) * 1.25 >= noise.fullScaleAmps(r)) { // physics.md gain ranging: up above ~80 %
                r++;
            }
            gains[w] = r;
            for (int k = 0; k < 4; k++) {
                double sd = Math.sqrt(noise.quadrantVariance(q, r, 4));
                long counts = Math.round((q + sd * rnd.nextGaussian()) / noise.lsbAmps(r)) + CUP.adc().pedestalCounts();
                adc[k][w] = (int) Math.max(0, Math.min(CUP.adc().topCode(), counts));
            }
        }
        return TestPackets.spectrumV2(CUP.id(), CUP.sampleBits(), flags, apid, seq, 0x87A12340L + seq, 0, seq, first, gains,
                new boolean[c], adc);
    }

    private byte[] mutate(byte[] p, Mutation m) {
        int c = ((p[USER_DATA + 12] & 0xFF) << 8) | (p[USER_DATA + 13] & 0xFF);
        int tags = USER_DATA + FIXED;
        int sat = tags + (c + 3) / 4;
        int samples = sat + (c + 7) / 8 + 1;
        switch (m) {
            case NONE -> { }
            case FLAGS -> p[USER_DATA + 5] = (byte) rnd.nextInt(256);
            case COUNT -> put16(p, USER_DATA + 12, rnd.nextInt(4) == 0 ? rnd.nextInt(65536) : rnd.nextInt(300));
            case FIRST -> put16(p, USER_DATA + 10, rnd.nextBoolean() ? 65535 - rnd.nextInt(300) : rnd.nextInt(65536));
            case DWELL -> put16(p, USER_DATA + 16, new int[] {0, 1, 1000, 1001, 65535, rnd.nextInt(65536)}[rnd.nextInt(6)]);
            case TAGS -> p[tags + rnd.nextInt((c + 3) / 4)] = (byte) rnd.nextInt(256);
            case SATURATION -> {
                for (int i = 0; i < (c + 7) / 8; i++) {
                    p[sat + i] = (byte) (rnd.nextBoolean() ? 0xFF : rnd.nextInt(256));
                }
            }
            case SAMPLES -> {
                // raw 16-bit samples after each quadrant's Lq: at 0, the ADC top or at random
                int v = new int[] {0, CUP.adc().topCode(), rnd.nextInt(65536)}[rnd.nextInt(3)];
                for (int k = 0, n = 1 + rnd.nextInt(8); k < n; k++) {
                    int at = samples + 2 + rnd.nextInt(p.length - samples - 3) & ~1;
                    put16(p, Math.max(samples + 2, at), v);
                }
            }
            case BITS -> {
                for (int k = 0, n = 1 + rnd.nextInt(8); k < n; k++) {
                    int at = USER_DATA + rnd.nextInt(p.length - USER_DATA);
                    p[at] ^= (byte) (1 << rnd.nextInt(8));
                }
            }
            case LENGTH -> {
                int n = Math.max(7, p.length + rnd.nextInt(9) - 4);
                byte[] q = java.util.Arrays.copyOf(p, n);
                put16(q, 4, n - 7); // CCSDS 133.0-B-2 §4.1.3.5: data length = octets − 1 after the 6 of the header
                return q;
            }
            default -> throw new IllegalStateException(m.name());
        }
        return p;
    }

    private static void put16(byte[] p, int at, int v) {
        p[at] = (byte) (v >>> 8);
        p[at + 1] = (byte) v;
    }

    @Test
    void shouldRefuseOrFitEveryDamagedInterleavedSpectrumAndLoseNothingElse() throws Exception {
        SpectrumPacketDecoder decoder = new SpectrumPacketDecoder(new Ccsds121QuadrantDecoder());
        FitCollector collector = new FitCollector();
        byte[] good = spectrum(SpectrumPacketDecoder.APID_FOCUS, 0x20, 32, 1e3, 0);
        collector.onSpectrum(decoder.decode(good, 0, good.length).spectrum());
        PlasmaFit reference = collector.records().get(0).fit();
        assertTrue(reference.ok() && reference.driftFitted(), reference.flagText());
        Map<SpectrumError, Integer> refused = new EnumMap<>(SpectrumError.class);
        int fitted = 0;
        int drift = 0;
        for (int s = 1; s <= SPECTRA; s++) {
            Mutation m = Mutation.values()[rnd.nextInt(Mutation.values().length)];
            int apid = rnd.nextInt(8) == 0 ? SpectrumPacketDecoder.APID_SURVEY : SpectrumPacketDecoder.APID_FOCUS;
            int flags = 0x20 | (rnd.nextBoolean() ? 0x80 : 0);
            double du = (rnd.nextDouble() * 2 - 1) * (rnd.nextInt(4) == 0 ? 2e5 : 2e3);
            byte[] p = mutate(spectrum(apid, flags, 1 + rnd.nextInt(64), du, s), m);
            String where = "spectrum " + s + " (" + m + ")";
            SpectrumResult r = decoder.decode(p, 0, p.length);
            if (!r.isOk()) {
                assertNotNull(r.error(), where);
                refused.merge(r.error(), 1, Integer::sum);
            } else {
                collector.onSpectrum(r.spectrum());
                List<MomentRecord> all = collector.records();
                PlasmaFit f = all.get(all.size() - 1).fit();
                fitted += f.ok() ? 1 : 0;
                if (f.driftFitted()) {
                    drift++;
                    assertTrue(r.spectrum().interleaved() && r.spectrum().mode() == 2, where + ": ΔU of a " + r.spectrum());
                    int np = f.normalParameters().length;
                    assertTrue(SpectrumInput.of(r.spectrum()).windows() > np, where + ": no degree of freedom");
                    // PlasmaModel.MAX_SPEED_CHANGE, the optimiser's guard of |ΔU|: 100 km/s
                    assertTrue(Math.abs(f.normalParameters()[np - 1]) < 1e5, where + ": ΔU at the guard "
                            + f.speedChangeMPerS());
                    assertTrue(Double.isFinite(f.speedChangeMPerS()) && Double.isFinite(f.sigmaSpeedChangeMPerS())
                            && Double.isFinite(f.reducedChiSquare()), where + ": " + f.speedChangeMPerS());
                } else {
                    assertTrue(Double.isNaN(f.speedChangeMPerS()) && Double.isNaN(f.sigmaSpeedChangeMPerS()), where);
                }
            }
            // the good spectrum after it: decoded and fitted to the same bits
            SpectrumResult next = decoder.decode(good, 0, good.length);
            assertTrue(next.isOk(), where + ": the next spectrum " + next.detail());
            collector.onSpectrum(next.spectrum());
            List<MomentRecord> all = collector.records();
            PlasmaFit again = all.get(all.size() - 1).fit();
            assertArrayEquals(reference.normalParameters(), again.normalParameters(), where + ": the next spectrum's fit");
            assertEquals(reference.flags(), again.flags(), where);
        }
        System.out.printf("interleaved fuzz seed %x: %d spectra, refused %s, %d fitted, %d with ΔU%n", SEED, SPECTRA,
                refused, fitted, drift);
        // every kind of outcome was exercised: refusals, fits with ΔU and without
        assertTrue(refused.size() >= 5 && fitted > 100 && drift > 50, refused + " " + fitted + " " + drift);

        List<MomentRecord> records = collector.records();
        StringWriter csv = new StringWriter();
        MomentsCsv.write(csv, records);
        String json = MomentsJson.build(new ObjectMapper(), FitSummary.of(records, 0), records).toString();
        for (String text : new String[] {csv.toString(), json, QuickLook.driftFits(records)}) {
            assertFalse(text.contains("NaN") || text.contains("Infinity"), text);
        }
        List<CSVRecord> rows = CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true).get()
                .parse(new StringReader(csv.toString())).getRecords();
        assertEquals(records.size(), rows.size());
        for (int i = 0; i < rows.size(); i++) {
            boolean withDu = records.get(i).fit().driftFitted() && records.get(i).ok();
            assertEquals(withDu, !rows.get(i).get("du_kms").isEmpty(), "row " + i);
            assertEquals(withDu, !rows.get(i).get("sigma_du_kms").isEmpty(), "row " + i);
            if (withDu) {
                assertFalse(rows.get(i).get("chi2_reduced").isEmpty(), "row " + i);
            }
        }
    }
}
