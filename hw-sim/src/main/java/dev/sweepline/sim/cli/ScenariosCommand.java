package dev.sweepline.sim.cli;

import dev.sweepline.sim.scenario.Scenario;
import dev.sweepline.sim.scenario.ScenarioLoader;
import java.util.Locale;
import picocli.CommandLine.Command;

/** {@code scenarios}: lists the built-in scenarios. */
@Command(name = "scenarios", mixinStandardHelpOptions = true, description = "List the built-in scenarios.")
final class ScenariosCommand implements Runnable {
    @Override
    public void run() {
        for (String name : ScenarioLoader.builtInNames()) {
            Scenario s = ScenarioLoader.builtIn(name);
            System.out.printf(Locale.ROOT, "%-20s %6.0f s  %5.3f AU  %s%s%n", name, s.durationSeconds(),
                    s.distanceAu(), s.description(), name.equals(ScenarioLoader.defaultName()) ? "  [default]" : "");
        }
    }
}
