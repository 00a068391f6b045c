package dev.sweepline.fsw.telemetry;

import dev.sweepline.fsw.sweep.Spectrum;

/**
 * The flight software's telemetry output: builds each packet (primary header, CUC secondary header,
 * user data) in one buffer allocated at start-up, counts it, and hands it to the frame builder of its
 * virtual channel (telemetry ICD). Threading: one thread, the executive's.
 */
public final class TelemetryWriter {
    /** The demo probe's spacecraft id (telemetry ICD §1, invented). */
    public static final int SPACECRAFT_ID = 0x2C5;
    /** Default frame length, octets (telemetry ICD §1). */
    public static final int DEFAULT_FRAME_LENGTH = 1024;
    /** Default flush interval of a partly filled frame (telemetry ICD §2). */
    public static final long DEFAULT_FLUSH_INTERVAL_MICROS = 10_000_000L;

    private static final int SECONDARY_HEADER = CucTime.LENGTH;
    private static final int DATA_AT = SpacePacket.PRIMARY_HEADER_LENGTH + SECONDARY_HEADER;

    private final CucTime time;
    private final TransferFrameBuilder frames;
    private final SpectrumPacker packer;
    private final TelemetryCounters counters = new TelemetryCounters();
    private final int[] sequenceByApid = new int[SpacePacket.MAX_APID + 1];
    private final byte[] packet;

    /**
     * @param frameLength         octets per transfer frame
     * @param flushIntervalMicros longest time a partly filled frame waits
     * @param time                converts ticks to CUC time
     * @param compress            CCSDS 121 coding of spectra (true) or raw samples
     * @param sink                receives every frame with its ASM
     */
    public TelemetryWriter(int frameLength, long flushIntervalMicros, CucTime time, boolean compress,
                           dev.sweepline.fsw.instrument.InstrumentDescription instrument, FrameSink sink) {
        this.time = time;
        this.packer = new SpectrumPacker(compress, instrument);
        this.packet = new byte[DATA_AT + packer.maxUserDataLength()];
        this.frames = new TransferFrameBuilder(SPACECRAFT_ID, frameLength, flushIntervalMicros, (f, off, len) -> {
            counters.countFrame((f[off + TransferFrameBuilder.ASM_LENGTH + 1] >> 1) & 7, len);
            sink.accept(f, off, len);
        });
    }

    /** Writes a spectrum packet for a completed sweep (APID by its mode), stamped with its start time. */
    public void writeSpectrum(Spectrum s, int integrationPeriods, int tableId, int flags, long nowMicros) {
        int apid = s.mode() == dev.sweepline.fsw.sweep.SweepMode.FOCUS ? Apid.FOCUS_SPECTRUM : Apid.SURVEY_SPECTRUM;
        int n = packer.write(s, integrationPeriods, tableId, flags, packet, DATA_AT);
        int total = finish(apid, s.startMicros(), n);
        counters.countSpectrum(s.mode(), total);
        frames.writePacket(Apid.VC_SCIENCE, packet, 0, total, nowMicros);
    }

    /**
     * The user-data area of the packet buffer, for engineering packets written in place: fill
     * {@code length} octets from {@link #userDataOffset()} then call {@link #sendEngineering}.
     */
    public byte[] buffer() {
        return packet;
    }

    /** Where user data starts in {@link #buffer()}. */
    public int userDataOffset() {
        return DATA_AT;
    }

    /** Sends the engineering packet whose user data is in the buffer (VC 1), stamped {@code atMicros}. */
    public void sendEngineering(int apid, int userDataLength, long atMicros, long nowMicros) {
        int total = finish(apid, atMicros, userDataLength);
        frames.writePacket(Apid.VC_ENGINEERING, packet, 0, total, nowMicros);
    }

    /** Flushes frames that have waited longer than the flush interval; returns how many. */
    public int doWork(long nowMicros) {
        return frames.flushStale(nowMicros);
    }

    /** Completes every open frame with idle data (end of a run). */
    public void flush(long nowMicros) {
        frames.flushAll(nowMicros);
    }

    /** The bandwidth counters. */
    public TelemetryCounters counters() {
        return counters;
    }

    /** Frames emitted so far. */
    public long framesEmitted() {
        return frames.framesEmitted();
    }

    private int finish(int apid, long atMicros, int userDataLength) {
        int dataField = SECONDARY_HEADER + userDataLength;
        SpacePacket.writePrimaryHeader(packet, 0, SpacePacket.TYPE_TM, true, apid, SpacePacket.UNSEGMENTED,
                sequenceByApid[apid], dataField);
        sequenceByApid[apid] = (sequenceByApid[apid] + 1) & (SpacePacket.SEQUENCE_MODULUS - 1);
        time.write(packet, SpacePacket.PRIMARY_HEADER_LENGTH, atMicros);
        int total = SpacePacket.PRIMARY_HEADER_LENGTH + dataField;
        counters.countPacket(apid, total);
        return total;
    }
}
