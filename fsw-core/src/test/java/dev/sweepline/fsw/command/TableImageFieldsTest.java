package dev.sweepline.fsw.command;

import dev.sweepline.fsw.DemoCup;
import dev.sweepline.fsw.table.SweepParameters;
import java.lang.reflect.Field;
import java.lang.reflect.Modifier;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;

/** Every sweep parameter survives the table image (commands.md §4.1), so a new field cannot be forgotten. */
class TableImageFieldsTest {
    @Test
    void shouldCarryEverySweepParameterThroughTheImage() throws IllegalAccessException {
        ParameterTable t = ParameterTable.of(DemoCup.table(), DemoCup.parameters());
        int k = 0;
        for (Field f : SweepParameters.class.getFields()) {
            if (!Modifier.isStatic(f.getModifiers())) {
                f.setInt(t.sweep, 1000 + 17 * k++); // distinct values: a swapped pair of fields shows
            }
        }
        byte[] image = new byte[TableImage.MAX_OCTETS];
        int n = TableImage.encode(t, image);
        ParameterTable back = new ParameterTable();
        TableImage.decode(image, n, back, DemoCup.INSTRUMENT.limits());
        for (Field f : SweepParameters.class.getFields()) {
            if (!Modifier.isStatic(f.getModifiers())) {
                assertEquals(f.getInt(t.sweep), f.getInt(back.sweep), f.getName());
            }
        }
    }
}
