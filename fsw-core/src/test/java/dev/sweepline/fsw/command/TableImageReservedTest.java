package dev.sweepline.fsw.command;

import dev.sweepline.fsw.DemoCup;
import dev.sweepline.fsw.octets.BigEndian;
import dev.sweepline.fsw.octets.Crc16;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Octet 3 of the table image is reserved and 0 (commands.md §4.1): any other value is not this format. */
class TableImageReservedTest {
    @Test
    void shouldRefuseNonZeroReservedOctetAsCorrupt() {
        ParameterTable t = ParameterTable.of(DemoCup.table(), DemoCup.parameters());
        byte[] image = new byte[TableImage.MAX_OCTETS];
        int n = TableImage.encode(t, image);
        ParameterTable back = new ParameterTable();
        assertEquals(0, image[3]);
        assertTrue(TableImage.intact(image, n));
        assertEquals(0, TableImage.decode(image, n, back, DemoCup.INSTRUMENT.limits()));
        for (int reserved : new int[] {0x01, 0x80, 0xFF}) {
            image[3] = (byte) reserved;
            // a fresh CRC over the changed octet (CRC-16/IBM-3740, commands.md §4.1): only the reserved octet is wrong
            BigEndian.put16(image, n - 2, Crc16.of(image, 0, n - 2));
            assertFalse(TableImage.intact(image, n), "reserved " + reserved);
            assertEquals(TableImage.CORRUPT, TableImage.decode(image, n, back, DemoCup.INSTRUMENT.limits()),
                    "reserved " + reserved);
        }
    }
}
