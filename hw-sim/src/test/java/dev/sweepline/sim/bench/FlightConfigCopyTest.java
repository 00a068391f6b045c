package dev.sweepline.sim.bench;

import dev.sweepline.sim.instrument.TestInstruments;
import dev.sweepline.sim.instrument.InstrumentModel;
import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotSame;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sweepline.fsw.command.NonVolatileStore;
import dev.sweepline.fsw.exec.FlightConfig;
import dev.sweepline.fsw.table.WindowTable;
import dev.sweepline.sim.scenario.ScenarioLoader;
import java.lang.reflect.Field;
import java.lang.reflect.Modifier;
import org.junit.jupiter.api.Test;

/** A bench config carries the whole flight configuration as a value (bench design note B6). */
class FlightConfigCopyTest {
    @Test
    void shouldCarryEveryPrimitiveOptionOfTheFlightConfiguration() throws IllegalAccessException {
        FlightConfig source = FlightConfig.of(TestInstruments.DEMO_CUP.flight());
        int changed = 0;
        for (Field f : FlightConfig.class.getFields()) {
            if (Modifier.isStatic(f.getModifiers())) {
                continue;
            }
            Class<?> t = f.getType();
            if (t == int.class) {
                f.setInt(source, f.getInt(source) + 7);
            } else if (t == long.class) {
                f.setLong(source, f.getLong(source) + 7);
            } else if (t == boolean.class) {
                f.setBoolean(source, !f.getBoolean(source));
            } else {
                continue;
            }
            changed++;
        }
        // FlightConfig has a dozen primitive options (frame length, periods, switches, the epoch, ...)
        assertTrue(changed >= 10, "primitive options found: " + changed);
        FlightConfig copy = source.copy();
        for (Field f : FlightConfig.class.getFields()) {
            if (!Modifier.isStatic(f.getModifiers()) && f.getType().isPrimitive()) {
                assertEquals(f.get(source), f.get(copy), f.getName());
            }
        }
    }

    @Test
    void shouldCopyTheMutableMembersAndShareTheImmutableOnes() {
        FlightConfig source = FlightConfig.of(TestInstruments.DEMO_CUP.flight());
        source.table = WindowTable.logSpaced(64, 100_000, 3_000_000, TestInstruments.DEMO_CUP.flight().millivoltsPerCode());
        source.parameters.integrationPeriods = 5;
        source.faults.threshold[1] = 9;
        source.commandKey[0] = 42;
        NonVolatileStore store = source.nonVolatileStore;
        FlightConfig copy = source.copy();

        assertSame(source.table, copy.table); // WindowTable is immutable
        assertSame(store, copy.nonVolatileStore); // a service: the copy must reach the same memory
        assertNotSame(source.parameters, copy.parameters);
        assertEquals(5, copy.parameters.integrationPeriods);
        assertNotSame(source.faults, copy.faults);
        assertArrayEquals(source.faults.threshold, copy.faults.threshold);
        assertNotSame(source.commandKey, copy.commandKey);
        assertArrayEquals(source.commandKey, copy.commandKey);

        copy.parameters.integrationPeriods = 6;
        copy.faults.threshold[1] = 10;
        copy.commandKey[0] = 43;
        assertEquals(5, source.parameters.integrationPeriods);
        assertEquals(9, source.faults.threshold[1]);
        assertEquals(42, source.commandKey[0]);
    }

    @Test
    void shouldKeepABenchConfigUnchangedByItsUsers() {
        BenchConfig config = BenchConfig.defaults(ScenarioLoader.builtIn("quiet-perihelion"), 1, 1)
                .withFlight(f -> f.parameters.focusEnabled = 0);
        config.flight().parameters.focusEnabled = 1; // a caller changing the copy it was given
        ClosedLoopBench.flightConfig(config).authenticateCommands = false; // a hook completing one run
        assertEquals(0, config.flight().parameters.focusEnabled);
        assertTrue(config.flight().authenticateCommands);
        // the bench's own two settings are added to each run's copy, not to the config
        assertTrue(ClosedLoopBench.flightConfig(config).hvEnabledAtStart);
        assertFalse(config.flight().hvEnabledAtStart);
    }
}
