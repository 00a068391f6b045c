package dev.sweepline.sim.budget;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;

import org.junit.jupiter.api.Test;

class BudgetMessageTest {
    @Test
    void shouldNeverPrintARateOverItsAllocationAsTheSameNumber() {
        // 7262.4 over 7262: whole bit/s would read "7262 exceeds 7262"; one decimal keeps them apart
        assertArrayEquals(new String[] {"7262.4", "7262.0"}, BudgetRunner.distinct(7262.4, 7262));
        // apart already in whole bit/s: no decimals
        assertArrayEquals(new String[] {"7300", "7262"}, BudgetRunner.distinct(7300.2, 7262));
        // apart only in the third decimal: three decimals
        assertArrayEquals(new String[] {"7262.004", "7262.000"}, BudgetRunner.distinct(7262.004, 7262));
        // closer than a thousandth: every digit, still apart
        assertArrayEquals(new String[] {"7262.0001", "7262.0"}, BudgetRunner.distinct(7262.0001, 7262));
    }
}
