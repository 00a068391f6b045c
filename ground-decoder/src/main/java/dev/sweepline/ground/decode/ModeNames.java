package dev.sweepline.ground.decode;

/** Names of the instrument modes of ICD §5–§6: 0 safe, 1 survey, 2 focus. */
public final class ModeNames {
    private ModeNames() {
    }

    /** "safe", "survey", "focus" or "mode N". */
    public static String of(int mode) {
        switch (mode) {
            case 0:
                return "safe";
            case 1:
                return "survey";
            case 2:
                return "focus";
            default:
                return "mode " + mode;
        }
    }
}
