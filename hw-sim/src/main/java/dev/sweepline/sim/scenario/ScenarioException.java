package dev.sweepline.sim.scenario;

import dev.sweepline.fsw.host.yaml.FileFormatException;

/**
 * A scenario that cannot be used, with where the problem is: the file, the 1-based line (0 when the
 * problem has no line, such as a missing file) and the dotted path of the field (empty when the
 * problem concerns the whole file). The message names all three, as
 * {@code shock.yaml:14: events[2].set.protonDensity: must be positive, got -3}.
 */
public final class ScenarioException extends FileFormatException {
    private static final long serialVersionUID = 1L;

    /** A problem at {@code file:line} in {@code field}. */
    public ScenarioException(String file, int line, String field, String problem) {
        super(file, line, field, problem);
    }

    /** A problem at {@code file:line} in {@code field}, caused by {@code cause}. */
    public ScenarioException(String file, int line, String field, String problem, Throwable cause) {
        super(file, line, field, problem, cause);
    }

    /** The same problem, as a scenario problem. */
    static ScenarioException of(FileFormatException e) {
        return e instanceof ScenarioException s ? s
                : new ScenarioException(e.file(), e.line(), e.field(), e.problem(), e.getCause());
    }
}
