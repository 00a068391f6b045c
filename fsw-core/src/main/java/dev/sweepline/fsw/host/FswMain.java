package dev.sweepline.fsw.host;

/** Command-line entry point (filled in by its module's work). */
public final class FswMain {
    private FswMain() {
    }

    public static void main(String[] args) {
        System.out.println("FswMain: not yet wired");
    }
}
