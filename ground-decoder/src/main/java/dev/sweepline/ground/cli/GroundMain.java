package dev.sweepline.ground.cli;

/** Command-line entry point (filled in by its module's work). */
public final class GroundMain {
    private GroundMain() {
    }

    public static void main(String[] args) {
        System.out.println("GroundMain: not yet wired");
    }
}
