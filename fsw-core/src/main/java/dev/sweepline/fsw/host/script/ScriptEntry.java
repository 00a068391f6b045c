package dev.sweepline.fsw.host.script;

/**
 * One time-tagged line of a command script, resolved: a telecommand (code and arguments, signed
 * when sent), a recorded telecommand packet sent unchanged (an uplink replay), or a fault injection
 * into the simulated instrument or host.
 *
 * @param atMicros  when it is due, microseconds of simulated time
 * @param line      the script line it came from (1-based; the record number of a replay), for reports
 * @param code      telecommand code, or -1 for an injection
 * @param args      telecommand arguments (empty for an injection)
 * @param inject    injection verb (HV_READBACK, SATURATE, STUCK, DEAD, SEQUENCE, OVERRUN, CLEAR), or null
 * @param values    injection values
 * @param packet    a recorded packet to send as it is, or null
 */
public record ScriptEntry(long atMicros, int line, int code, byte[] args, String inject, int[] values,
        byte[] packet) {
    /** A telecommand or an injection. */
    public ScriptEntry(long atMicros, int line, int code, byte[] args, String inject, int[] values) {
        this(atMicros, line, code, args, inject, values, null);
    }

    /** Record {@code index} of an uplink log, sent unchanged at {@code atMicros}. */
    public static ScriptEntry recorded(long atMicros, int index, byte[] packet) {
        int code = packet.length > dev.sweepline.fsw.command.Telecommand.CODE_AT
                ? packet[dev.sweepline.fsw.command.Telecommand.CODE_AT] & 0xFF : 0;
        return new ScriptEntry(atMicros, index, code, new byte[0], null, null, packet);
    }

    /** True for a telecommand (signed here, or recorded). */
    public boolean isCommand() {
        return code >= 0;
    }

    /** True for a recorded packet sent unchanged. */
    public boolean isRecorded() {
        return packet != null;
    }
}
