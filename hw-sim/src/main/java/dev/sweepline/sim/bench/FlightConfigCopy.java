package dev.sweepline.sim.bench;

import dev.sweepline.fsw.exec.FlightConfig;
import java.lang.reflect.Array;
import java.lang.reflect.Field;
import java.lang.reflect.InvocationTargetException;
import java.lang.reflect.Method;
import java.lang.reflect.Modifier;

/**
 * A copy of a {@link FlightConfig} over all its public instance fields, found by reflection, so that
 * an option the flight software gains reaches the bench without a line here or a field in
 * {@link BenchConfig}. Mutable members are copied as well: arrays (the command key) by value, an object
 * with a public {@code copy()} of its own type (SweepParameters) by it, an object with a public
 * no-argument constructor and a public {@code copyFrom} of its own type (FaultSettings) by those.
 * Anything else is shared: it is immutable (WindowTable, InstrumentLimits) or a service the copy must
 * share (the NonVolatileStore).
 */
final class FlightConfigCopy {
    private FlightConfigCopy() {
    }

    /** A copy of {@code source} that no change to it, or to the copy, can reach through the other. */
    static FlightConfig of(FlightConfig source) {
        FlightConfig copy = FlightConfig.of(source.instrument); // the description is immutable: shared
        try {
            for (Field f : FlightConfig.class.getFields()) {
                int m = f.getModifiers();
                if (!Modifier.isStatic(m) && !Modifier.isFinal(m)) {
                    f.set(copy, copyOf(f.get(source)));
                }
            }
        } catch (IllegalAccessException e) {
            throw new IllegalStateException("FlightConfig's public fields must be writable", e);
        }
        return copy;
    }

    private static Object copyOf(Object value) {
        if (value == null) {
            return null;
        }
        Class<?> type = value.getClass();
        if (type.isArray()) {
            int n = Array.getLength(value);
            Object array = Array.newInstance(type.getComponentType(), n);
            System.arraycopy(value, 0, array, 0, n);
            return array;
        }
        try {
            Method copy = type.getMethod("copy");
            if (copy.getReturnType() == type && !Modifier.isStatic(copy.getModifiers())) {
                return copy.invoke(value);
            }
        } catch (NoSuchMethodException e) {
            // no copy(): try copyFrom below
        } catch (IllegalAccessException | InvocationTargetException e) {
            throw new IllegalStateException("cannot copy " + type.getName(), e);
        }
        try {
            Method copyFrom = type.getMethod("copyFrom", type);
            Object fresh = type.getConstructor().newInstance();
            copyFrom.invoke(fresh, value);
            return fresh;
        } catch (NoSuchMethodException e) {
            return value; // immutable, or a service to share
        } catch (ReflectiveOperationException e) {
            throw new IllegalStateException("cannot copy " + type.getName(), e);
        }
    }
}
