/**
 * Bandwidth budgets of an orbit plan: representative closed loops along each phase with the plasma
 * scaled by distance (n as r^-2, T as r^-0.92, physics.md), interpolated hour by hour, summed per
 * phase against the allocation, run through the onboard store with the downlink passes. Each closed loop
 * is the flight software as it flies (HV interlock, command authentication), put into its phase's mode
 * by signed telecommands ({@code PhaseCommands}): survey by committing the start-up table with focus
 * disabled, safe by SET_MODE SAFE.
 *
 * <h2>Requirements</h2>
 * <ol>
 * <li>G1 The demo plan shows a margin per phase and fits. Verified: BudgetRunnerTest.</li>
 * <li>G2 A plan whose allocation is too small is flagged with the phase and the first hour over it.
 *     Verified: BudgetRunnerTest.</li>
 * <li>G3 A broken plan names file, line and field. Verified: BudgetRunnerTest.</li>
 * <li>G4 A phase's mode is reached by telecommand, every command accepted (a refusal fails the check):
 *     a survey phase flies no focus sweep, a safe phase none at all with the HV interlock off.
 *     Verified: BudgetRunnerTest (the commands, their reports and the frames counted by hand).</li>
 * </ol>
 */
package dev.sweepline.sim.budget;
