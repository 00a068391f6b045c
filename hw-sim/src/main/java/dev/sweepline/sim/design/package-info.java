/**
 * The yardstick of a sweep: Fisher information about the protons' (n, U, w) and the D-optimal
 * experimental design over the same windows and integration time.
 *
 * <h2>Requirements</h2>
 * <ol>
 * <li>D1 The information of a window is F = g gᵀ / σ² with g the relative sensitivities of the
 *     physics.md closed form and σ² the noise of the summed quadrant channels (shot, feedback
 *     resistor, LSB²/12). Verified: DOptimalDesignTest (information adds with time: det x8 for twice
 *     the time).</li>
 * <li>D2 The D-optimal design is never beaten by another allocation of the same time (Kiefer and
 *     Wolfowitz 1960); verified against 2000 seeded random allocations.</li>
 * <li>D3 Each bench run reports its D-efficiency (det F_measured / det F_optimal)^(1/3), the
 *     measured information accumulated step by step at the plasma each step saw; campaigns report the
 *     mean per parameter set.</li>
 * </ol>
 */
package dev.sweepline.sim.design;
