package dev.sweepline.fsw.science;

import dev.sweepline.fsw.DemoCup;
import dev.sweepline.fsw.link.SampleReply;
import dev.sweepline.fsw.link.StepCommand;
import dev.sweepline.fsw.sweep.CannedReplies;
import dev.sweepline.fsw.sweep.Spectrum;
import dev.sweepline.fsw.sweep.SpectrumFill;
import dev.sweepline.fsw.sweep.SweepListener;
import dev.sweepline.fsw.sweep.SweepMode;
import dev.sweepline.fsw.sweep.SweepScheduler;
import dev.sweepline.fsw.sweep.SyntheticInstrument;
import dev.sweepline.fsw.table.WindowTable;
import dev.sweepline.fsw.telemetry.CucTime;
import dev.sweepline.fsw.telemetry.TelemetryWriter;
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.TearDown;

/**
 * Packing one realistic 128-window survey spectrum through {@link SpectrumTelemetry#write}: user data
 * (header, gain tags, saturation flags, four quadrant streams CCSDS 121 coded or raw), primary and CUC
 * headers, counters, and transfer framing into a sink that discards the frames. The spectrum is the first
 * survey sweep the real scheduler makes of a 1 AU slow wind (physics.md worked case P1 plasma, canned
 * replies with 2 counts of noise, recorded seed), copied out of the scheduler.
 * The score is spectra per second. Each iteration is checked ({@link #check}): every write one packet
 * of the same size, CCSDS 121 smaller than raw. Target (issue 3): 0 B/op under {@code -prof gc}.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.Throughput)
@OutputTimeUnit(TimeUnit.SECONDS)
public class SpectrumPackingBenchmark {
    /** Recorded seed of the synthetic instrument's noise. */
    private static final long SEED = 20261201L;
    /** Time between packed spectra, microseconds (a survey sweep of 128 windows takes about 1.2 s). */
    private static final long SWEEP_MICROS = 1_200_000L;

    /** CCSDS 121 coding (compression 0x01) or raw samples (0x00). */
    @Param({"true", "false"})
    public boolean compress;

    private final Spectrum spectrum = new Spectrum(DemoCup.INSTRUMENT);
    private TelemetryWriter writer;
    private SpectrumTelemetry spectra;
    private int integrationPeriods;
    private long nowMicros;
    private long writes;
    private long packetOctets;
    private int userOctets;
    private int rawUserOctets;

    /** Captures the first survey spectrum of the scheduler and builds the writer. */
    @Setup(Level.Trial)
    public void setUp() {
        WindowTable table = DemoCup.table();
        CannedReplies canned = new CannedReplies(table, new SyntheticInstrument(SEED));
        SweepScheduler scheduler = new SweepScheduler(DemoCup.INSTRUMENT, table, DemoCup.parameters(), new SweepListener() {
            @Override
            public void onSweepComplete(Spectrum s, long now) {
                if (spectrum.count() == 0 && s.mode() == SweepMode.SURVEY && s.peakValid()) {
                    SpectrumFill.copy(s, spectrum);
                }
            }
        });
        StepCommand step = new StepCommand();
        SampleReply reply = new SampleReply();
        long now = 0;
        for (int i = 0; i < 100 * table.count() && spectrum.count() == 0; i++) {
            scheduler.nextStep(step, now);
            now += step.durationMicros(DemoCup.MODULATION_PERIOD_MICROS);
            canned.answer(step, reply);
            scheduler.ingest(reply, now);
        }
        if (spectrum.count() != table.count() || !spectrum.peakValid()) {
            throw new IllegalStateException("no full survey spectrum with a peak: " + spectrum.count());
        }
        integrationPeriods = DemoCup.parameters().integrationPeriods;
        SpectrumPacker packer = new SpectrumPacker(compress, DemoCup.INSTRUMENT);
        writer = new TelemetryWriter(TelemetryWriter.DEFAULT_FRAME_LENGTH, Long.MAX_VALUE, new CucTime(0, 0),
                packer.maxUserDataLength(), (frame, offset, length) -> { });
        spectra = new SpectrumTelemetry(packer, writer);
        spectra.write(spectrum, integrationPeriods, 0, 0, nowMicros);
        packetOctets = spectra.octets(SweepMode.SURVEY);
        SpectrumPacker raw = new SpectrumPacker(false, DemoCup.INSTRUMENT);
        rawUserOctets = raw.write(spectrum, integrationPeriods, 0, 0, new byte[raw.maxUserDataLength()], 0);
        userOctets = packer.write(spectrum, integrationPeriods, 0, 0, new byte[packer.maxUserDataLength()], 0);
        writes = 1;
    }

    /**
     * Fails the run unless every write produced one packet of the first write's size (the same spectrum
     * packs to the same octets) and CCSDS 121 coding made it smaller than raw samples would.
     */
    @TearDown(Level.Iteration)
    public void check() {
        long octets = spectra.octets(SweepMode.SURVEY);
        if (packetOctets <= userOctets || octets != writes * packetOctets || (compress && userOctets >= rawUserOctets)) {
            throw new IllegalStateException(writes + " writes gave " + octets + " octets, " + packetOctets
                    + " per packet; user data " + userOctets + ", raw " + rawUserOctets);
        }
    }

    /** Packs the spectrum once; returns the frames emitted so far so the work stays observable. */
    @Benchmark
    public long writeSpectrum() {
        nowMicros += SWEEP_MICROS;
        writes++;
        spectra.write(spectrum, integrationPeriods, 0, 0, nowMicros);
        return writer.framesEmitted();
    }
}
