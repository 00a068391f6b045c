package dev.sweepline.sim.command;

import dev.sweepline.fsw.host.script.ScriptException;
import dev.sweepline.fsw.host.script.CommandScript;
import dev.sweepline.fsw.command.CommandCode;
import java.util.List;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Command script parsing (commands.md §7). */
class CommandScriptTest {
    @Test
    void shouldParseCommandsAndInjections() throws Exception {
        CommandScript s = CommandScript.parse(List.of("# comment", "", "1.5 SET_MODE safe", "2 HV_ARM  # arm",
                "2.1 INJECT STUCK 2 900", "3 TABLE_DUMP 1 0 10"));
        assertEquals(4, s.entries().size());
        assertEquals(1_500_000, s.entries().get(0).atMicros());
        assertEquals(CommandCode.SET_MODE, s.entries().get(0).code());
        assertEquals(0, s.entries().get(0).args()[0]);
        assertEquals("STUCK", s.entries().get(2).inject());
        assertEquals(900, s.entries().get(2).values()[1]);
    }

    @Test
    void shouldExpandTableIntoLoadsVerifyAndCommit() throws Exception {
        CommandScript s = CommandScript.parse(List.of("0 TABLE_LOGSPACED 128 50 6000"));
        // 138 + 4 * 128 = 650 octets in loads of 192: 4 loads, then verify and commit (commands.md §4.1)
        assertEquals(6, s.entries().size());
        assertEquals(CommandCode.TABLE_VERIFY, s.entries().get(4).code());
        assertEquals(CommandCode.TABLE_COMMIT, s.entries().get(5).code());
    }

    @Test
    void shouldNameTheLineOfABadScript() {
        ScriptException e = assertThrows(ScriptException.class,
                () -> CommandScript.parse(List.of("1 NO_OP", "2 SET_MODE SIDEWAYS")));
        assertTrue(e.getMessage().startsWith("line 2:"), e.getMessage());
        assertThrows(ScriptException.class, () -> CommandScript.parse(List.of("2 NO_OP", "1 NO_OP")));
        assertThrows(ScriptException.class, () -> CommandScript.parse(List.of("1 LAUNCH")));
        assertThrows(ScriptException.class, () -> CommandScript.parse(List.of("x NO_OP")));
    }

    @Test
    void shouldCountStuckQuadrantsOneToFourAndRefuseOthersWithTheLine() throws Exception {
        // commands.md §7: STUCK q code, q counted 1..4 as the STUCK_CHANNEL event reports it (§6)
        assertEquals(4, CommandScript.parse(List.of("1 INJECT STUCK 4 100")).entries().get(0).values()[0]);
        for (String bad : new String[] {"0", "5"}) {
            ScriptException e = assertThrows(ScriptException.class,
                    () -> CommandScript.parse(List.of("# c", "1 INJECT STUCK " + bad + " 100")));
            assertEquals("line 2: STUCK quadrant must be 1..4 (as the STUCK_CHANNEL event counts them), got " + bad,
                    e.getMessage());
        }
        // the demo cup's ADC is 16 bits (instruments/demo-cup.yaml): codes 0..65535
        ScriptException e = assertThrows(ScriptException.class,
                () -> CommandScript.parse(List.of("1 INJECT STUCK 1 65536")));
        assertEquals("line 1: STUCK code must be 0..65535 (a 16-bit ADC), got 65536", e.getMessage());
    }
}
