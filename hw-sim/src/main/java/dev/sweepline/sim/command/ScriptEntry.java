package dev.sweepline.sim.command;

/**
 * One time-tagged line of a command script, resolved: either a telecommand (code and arguments) or a
 * fault injection into the simulated instrument or host.
 *
 * @param atMicros  when it is due, microseconds of simulated time
 * @param line      the script line it came from (1-based), for reports
 * @param code      telecommand code, or -1 for an injection
 * @param args      telecommand arguments (empty for an injection)
 * @param inject    injection verb (HV_READBACK, SATURATE, STUCK, DEAD, SEQUENCE, OVERRUN, CLEAR), or null
 * @param values    injection values
 */
public record ScriptEntry(long atMicros, int line, int code, byte[] args, String inject, int[] values) {
    /** True for a telecommand. */
    public boolean isCommand() {
        return code >= 0;
    }
}
