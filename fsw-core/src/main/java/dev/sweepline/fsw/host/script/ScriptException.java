package dev.sweepline.fsw.host.script;

/** A command script that cannot be read, with the line named. */
public final class ScriptException extends Exception {
    private static final long serialVersionUID = 1L;

    /** A problem on script line {@code line}. */
    public ScriptException(int line, String message) {
        super("line " + line + ": " + message);
    }
}
