package dev.sweepline.ground.instrument;

/**
 * An instrument description the ground cannot use, with where the problem is: the file as the caller
 * named it, the 1-based line (0 when there is none, as for a missing file), the dotted field (empty
 * for the whole file) and what was expected. The message reads
 * {@code my-cup.yaml:12: modulator.maxVolts: above the DAC's reach of 6553.5 V, got 7000}.
 * A configuration error of the ground's start-up, so it is thrown, not counted.
 */
public final class InstrumentFileException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    private final String file;
    private final int line;
    private final String field;
    private final String problem;

    /** A problem in {@code field} at {@code file:line}. */
    public InstrumentFileException(String file, int line, String field, String problem) {
        this(file, line, field, problem, null);
    }

    /** The same, caused by {@code cause} (an I/O or YAML syntax error). */
    public InstrumentFileException(String file, int line, String field, String problem, Throwable cause) {
        super(file + (line > 0 ? ":" + line : "") + ": " + (field.isEmpty() ? "" : field + ": ") + problem, cause);
        this.file = file;
        this.line = line;
        this.field = field;
        this.problem = problem;
    }

    /** The file, as named by the caller ({@code instruments/demo-cup.yaml} for a built-in). */
    public String file() {
        return file;
    }

    /** The 1-based line, 0 when the problem has none. */
    public int line() {
        return line;
    }

    /** The dotted field, e.g. {@code windows.count}; empty for the whole file. */
    public String field() {
        return field;
    }

    /** What is wrong, without the location. */
    public String problem() {
        return problem;
    }
}
