package dev.sweepline.fsw.host;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class LinkAddressTest {
    @Test
    void shouldParseTcpAndSerialAddresses() {
        LinkAddress t = LinkAddress.parse("tcp:localhost:5000");
        assertTrue(t.tcp());
        assertEquals("localhost", t.host());
        assertEquals(5000, t.port());
        assertEquals(LinkAddress.LOOPBACK, LinkAddress.parse("tcp::7").host()); // hardware ICD §1: loopback default
        LinkAddress s = LinkAddress.parse("/dev/ttyUSB0");
        assertFalse(s.tcp());
        assertEquals("/dev/ttyUSB0", s.device());
        assertThrows(IllegalArgumentException.class, () -> LinkAddress.parse("tcp:nohost"));
        assertThrows(IllegalArgumentException.class, () -> LinkAddress.parse("tcp:h:99999"));
    }

    @Test
    void shouldShowTheHighVoltageCautionInTheHelp() {
        String help = FswMain.commandLine().getSubcommands().get("run").getUsageMessage().replaceAll("\\s+", " ");
        assertTrue(help.contains("HIGH VOLTAGE") && help.contains("interlock") && help.contains("--hv"));
    }
}
