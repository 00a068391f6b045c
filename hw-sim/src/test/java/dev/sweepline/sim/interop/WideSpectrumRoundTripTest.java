package dev.sweepline.sim.interop;

import dev.sweepline.sim.instrument.TestInstruments;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sweepline.fsw.instrument.InstrumentDescription;
import dev.sweepline.fsw.link.SampleReply;
import dev.sweepline.fsw.link.StepCommand;
import dev.sweepline.fsw.science.SpectrumPacker;
import dev.sweepline.fsw.sweep.Spectrum;
import dev.sweepline.fsw.sweep.SweepListener;
import dev.sweepline.fsw.sweep.SweepScheduler;
import dev.sweepline.ground.rice.DecodeResult;
import dev.sweepline.ground.rice.RiceDecoder;
import dev.sweepline.ground.rice.RiceSettings;
import dev.sweepline.sim.instrument.InstrumentModel;
import org.junit.jupiter.api.Test;

/**
 * A 24-bit ADC at full scale on every window and quadrant, through the flight software's scheduler, its
 * spectrum packer and CCSDS 121 coder with n = 24 (telemetry ICD §4: n = w, x_max = 2^w − 1), decoded
 * by the ground's CCSDS 121 decoder: every sample comes back as the top code. The user data are read
 * at the offsets of the ICD §4 table (layout 2), written out here, not taken from the packer.
 */
class WideSpectrumRoundTripTest {
    /** Top code of a 24-bit ADC, 2^24 − 1 (instruments/FORMAT.md derived values). */
    private static final int TOP = (1 << 24) - 1;
    /** ICD §4 layout 2: the fixed header is 18 octets; the window count is at 12. */
    private static final int HEADER = 18;
    private static final int COUNT_AT = 12;
    private static final int WIDTH_AT = 3;
    /** CCSDS 121 settings of the ICD §4: J = 8, r = 32 blocks, preprocessor on, basic set, no interval padding. */
    private static final RiceSettings N24 = new RiceSettings(24, 8, 32, true, false, false);

    /** An invented cup with a 24-bit ADC and three ranges 32 apart, the demo cup's HV side and defaults. */
    private static InstrumentDescription wideCup() {
        return InstrumentDescription.builder()
                .identity("wide-cup", 3)
                .preamp(3, 5, 40_000L)
                .adc(24, 4096)
                .modulator(16, 100, 50_000, 6_000_000, 1000)
                .settleLimits(750, 256)
                .windows(256, 50_000, 6_000_000)
                .defaultParameters(TestInstruments.DEMO_CUP.flight().defaultParameters())
                .build();
    }

    @Test
    void shouldBringBackEveryFullScaleSampleOfATwentyFourBitSweep() {
        InstrumentDescription cup = wideCup();
        Spectrum[] done = new Spectrum[1];
        SweepScheduler scheduler = new SweepScheduler(cup, cup.defaultTable(), cup.defaultParameters(),
                new SweepListener() {
                    @Override
                    public void onSweepComplete(Spectrum s, long nowMicros) {
                        done[0] = s;
                    }
                });
        StepCommand step = new StepCommand();
        SampleReply reply = new SampleReply();
        long now = 0;
        while (done[0] == null) {
            assertTrue(scheduler.nextStep(step, now));
            now += step.durationMicros(cup.modulationPeriodMicros());
            reply.sequence = step.sequence;
            reply.gainRange = step.gainRange;
            reply.hvMonitorCode = step.dacHigh;
            reply.status = SampleReply.STATUS_SATURATED;
            java.util.Arrays.fill(reply.quadrant, TOP);
            scheduler.ingest(reply, now);
        }
        assertEquals(256, done[0].count());
        // 4 × (2^24 − 1 − 4096) × 32^2: the long sum of a full-scale window in the top range
        assertEquals(4L * (TOP - 4096) << 10, done[0].currentUnits(0));

        SpectrumPacker packer = new SpectrumPacker(true, cup);
        byte[] user = new byte[packer.maxUserDataLength()];
        int n = packer.write(done[0], 8, 0, 0, user, 0);
        assertEquals(24, user[WIDTH_AT]);
        int c = ((user[COUNT_AT] & 0xFF) << 8) | (user[COUNT_AT + 1] & 0xFF);
        assertEquals(256, c);
        int p = HEADER + (c + 3) / 4 + (c + 7) / 8;
        assertEquals(0x01, user[p++]); // compression: CCSDS 121
        int[] samples = new int[c];
        for (int q = 0; q < 4; q++) {
            int lq = ((user[p] & 0xFF) << 8) | (user[p + 1] & 0xFF);
            byte[] stream = java.util.Arrays.copyOfRange(user, p + 2, p + 2 + lq);
            DecodeResult r = new RiceDecoder(N24).decode(stream, 0, stream.length, c, samples);
            assertTrue(r.ok(), r.describe());
            for (int i = 0; i < c; i++) {
                assertEquals(TOP, samples[i], "quadrant " + (q + 1) + " window " + i);
            }
            p += 2 + lq;
        }
        assertEquals(n, p);
    }
}
