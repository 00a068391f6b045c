package dev.sweepline.fsw.host.yaml;

/**
 * An input file (scenario, campaign, orbit plan) that cannot be used, with where the problem is: the file, the 1-based line (0 when the
 * problem has no line, such as a missing file) and the dotted path of the field (empty when the
 * problem concerns the whole file). The message names all three, as
 * {@code shock.yaml:14: events[2].set.protonDensity: must be positive, got -3}.
 */
public class FileFormatException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    private final String file;
    private final int line;
    private final String field;
    private final String problem;

    /** A problem at {@code file:line} in {@code field}. */
    public FileFormatException(String file, int line, String field, String problem) {
        this(file, line, field, problem, null);
    }

    /** A problem at {@code file:line} in {@code field}, caused by {@code cause}. */
    public FileFormatException(String file, int line, String field, String problem, Throwable cause) {
        super(format(file, line, field, problem), cause);
        this.file = file;
        this.line = line;
        this.field = field;
        this.problem = problem;
    }

    /** The file as the caller named it (a path, or {@code scenarios/NAME.yaml} for a built-in). */
    public String file() {
        return file;
    }

    /** The 1-based line of the problem, or 0 when it has none. */
    public int line() {
        return line;
    }

    /** The dotted path of the field, e.g. {@code events[2].set.protonDensity}; empty for the whole file. */
    public String field() {
        return field;
    }

    /** The problem alone, without file, line and field. */
    public String problem() {
        return problem;
    }

    /** A number as a person writes it: {@code 3} rather than {@code 3.0}, {@code 0.5}, {@code 4.0E5}. */
    public static String number(double v) {
        if (v == Math.rint(v) && Math.abs(v) < 1e15) {
            return Long.toString((long) v);
        }
        return Double.toString(v);
    }

    private static String format(String file, int line, String field, String problem) {
        StringBuilder sb = new StringBuilder(file);
        if (line > 0) {
            sb.append(':').append(line);
        }
        sb.append(": ");
        if (!field.isEmpty()) {
            sb.append(field).append(": ");
        }
        return sb.append(problem).toString();
    }
}
