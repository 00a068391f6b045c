package dev.sweepline.fsw.telemetry;

/**
 * The flight software's telemetry output, CCSDS only: the caller writes a packet's user data in place
 * into one buffer allocated at start-up ({@link #buffer()} from {@link #userDataOffset()}), then this
 * writer completes it (primary header, CUC secondary header), counts it, and hands it to the frame
 * builder of its virtual channel (telemetry ICD §1-§3, §7). What the user data say is the science and
 * report packages'. Threading: one thread, the executive's.
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
    private final TelemetryCounters counters = new TelemetryCounters();
    private final int[] sequenceByApid = new int[SpacePacket.MAX_APID + 1];
    private final byte[] packet;
    /** The build's flush interval, microseconds: what a table's engineering flush of 0 stands for. */
    private final long buildFlushMicros;

    /**
     * @param frameLength         octets per transfer frame
     * @param flushIntervalMicros longest time a partly filled frame waits
     * @param time                converts ticks to CUC time
     * @param maxUserDataOctets   the longest user data any packet will have (sizes the packet buffer)
     * @param sink                receives every frame with its ASM
     */
    public TelemetryWriter(int frameLength, long flushIntervalMicros, CucTime time, int maxUserDataOctets,
                           FrameSink sink) {
        this.time = time;
        this.buildFlushMicros = flushIntervalMicros;
        this.packet = new byte[DATA_AT + maxUserDataOctets];
        this.frames = new TransferFrameBuilder(SPACECRAFT_ID, frameLength, flushIntervalMicros, (f, off, len) -> {
            counters.countFrame((f[off + TransferFrameBuilder.ASM_LENGTH + 1] >> 1) & 7, len);
            sink.accept(f, off, len);
        });
    }

    /**
     * The packet buffer, for user data written in place: fill {@code length} octets from
     * {@link #userDataOffset()}, then call {@link #send} or {@link #sendEngineering}.
     */
    public byte[] buffer() {
        return packet;
    }

    /** Where user data starts in {@link #buffer()}. */
    public int userDataOffset() {
        return DATA_AT;
    }

    /** Octets of user data the buffer holds. */
    public int maxUserDataLength() {
        return packet.length - DATA_AT;
    }

    /**
     * Sends the packet whose user data is in the buffer on {@code apid} and virtual channel {@code vc},
     * stamped {@code atMicros}.
     *
     * @return the packet's octets (headers included)
     */
    public int send(int apid, int vc, int userDataLength, long atMicros, long nowMicros) {
        int total = finish(apid, atMicros, userDataLength);
        frames.writePacket(vc, packet, 0, total, nowMicros);
        return total;
    }

    /** Sends the engineering packet whose user data is in the buffer (VC 1), stamped {@code atMicros}. */
    public void sendEngineering(int apid, int userDataLength, long atMicros, long nowMicros) {
        send(apid, Apid.VC_ENGINEERING, userDataLength, atMicros, nowMicros);
    }

    /**
     * Sets the flush interval of the engineering virtual channel (VC 1) to {@code seconds}, or back to
     * the build's (the constructor's) when {@code seconds} is 0 (SweepParameters#engineeringFlushSeconds).
     */
    public void engineeringFlush(int seconds) {
        frames.flushInterval(Apid.VC_ENGINEERING, seconds == 0 ? buildFlushMicros : seconds * 1_000_000L);
    }

    /** The flush interval of virtual channel {@code vc} in force, microseconds. */
    public long flushInterval(int vc) {
        return frames.flushInterval(vc);
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
