/**
 * Bandwidth budgets of an orbit plan: representative closed loops along each phase with the plasma
 * scaled by distance (n as r^-2, T as r^-0.92, physics.md), interpolated hour by hour, summed per
 * phase against the allocation, run through the onboard store with the downlink passes.
 *
 * <h2>Requirements</h2>
 * <ol>
 * <li>G1 The demo plan shows a margin per phase and fits. Verified: BudgetRunnerTest.</li>
 * <li>G2 A plan whose allocation is too small is flagged with the phase and the first hour over it.
 *     Verified: BudgetRunnerTest.</li>
 * <li>G3 A broken plan names file, line and field. Verified: BudgetRunnerTest.</li>
 * </ol>
 */
package dev.sweepline.sim.budget;
