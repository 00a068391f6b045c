/**
 * Fault protection: design note (table of monitors and responses: fsw-core/docs/commands.md §6).
 *
 * <h2>What it does</h2>
 * {@link dev.sweepline.fsw.fault.FaultProtection} runs six monitors: HV readback, ADC saturation and stuck
 * channel on every sample, peak lost on every completed sweep, link time-out on the executive's SAFE
 * entries, cycle overrun on the work the host measured per cycle. Detection happens inside the scheduler's
 * callbacks; responses (none, retry, gain change, survey, safe) are taken in {@code respond}, once per
 * cycle and outside every scheduler call, and each trip is reported as event 2 with the response actually
 * taken. Settings ({@link dev.sweepline.fsw.fault.FaultSettings}) come from the parameter table.
 *
 * <h2>Requirements and how each is verified</h2>
 * <ol>
 * <li><b>F1</b> Each monitor trips on its fault injected in hw-sim, and its event and response are in the
 *     telemetry the ground decodes. <i>hw-sim FaultInjectionRunTest (one test per monitor).</i></li>
 * <li><b>F2</b> RETRY costs one retry of the monitor's budget, then SAFE; a clean sweep restores the budget.
 *     <i>FaultInjectionRunTest: HV readback (retry, retry, safe), link (3 retries then safe), overrun.</i></li>
 * <li><b>F3</b> The defaults trip on no built-in scenario. <i>FaultInjectionRunTest.shouldTripNoMonitorOnAnyBuiltInScenario.</i></li>
 * <li><b>F4</b> Nothing is allocated after construction. <i>FlightSoftwareAllocationTest.</i></li>
 * <li><b>F5</b> Every counting monitor trips on the N-th consecutive offence and not on the (N−1)-th; a
 *     value at its limit L does not offend and L + 1 does; saturation is the description's ADC top code.
 *     <i>StepMonitorsTest (HV readback, saturation, stuck channel), FaultProtectionThresholdTest (peak
 *     lost, cycle overrun, link time-out).</i></li>
 * <li><b>F6</b> A GAIN response halves the thresholds of the parameters that fly from the next sweep
 *     boundary: those of a table committed in the same sweep when one waits, which keeps every other
 *     value of that table. <i>GainResponseKeepsPendingTableTest.</i></li>
 * </ol>
 */
package dev.sweepline.fsw.fault;
