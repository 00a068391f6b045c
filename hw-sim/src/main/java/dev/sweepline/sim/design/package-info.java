/**
 * The yardstick of a sweep: Fisher information about the protons' (n, U, w) and the D-optimal
 * experimental design over the same windows, integration time and plasmas.
 *
 * <h2>Requirements</h2>
 * <ol>
 * <li>D1 The information of a window is F = g gᵀ / σ² with g the relative sensitivities of the
 *     physics.md closed form and σ² the noise of the summed quadrant channels (shot, feedback
 *     resistor, LSB²/12). Verified: DOptimalDesignTest (information adds with time: det x8 for twice
 *     the time).</li>
 * <li>D2 The D-optimal design is never beaten by another allocation of the same time (Kiefer and
 *     Wolfowitz 1960); verified against 2000 seeded random allocations (DOptimalDesignTest).</li>
 * <li>D2a It is found to max_j d_j ≤ p (1 + 1e-6), checked on every candidate: 40 updates of the
 *     multiplicative algorithm (Silvey, Titterington and Torsney 1978) with the support-point deletion
 *     of Harman and Pronzato (2007) locate the support; Newton's method for the shares on the
 *     candidates holding at least a fifth of the largest share, with a Fedorov-Wynn vertex step onto
 *     any candidate that still has d_j &gt; p (1 + 1e-6) (the scheme of Yu's cocktail algorithm,
 *     2011), finishes (DesignSolver, SupportNewton); the multiplicative algorithm alone is the
 *     fallback. On the built-in scenarios' runs that is about 50 updates and steps instead of
 *     2 000-27 000 multiplicative updates, the D-efficiencies within 3e-7 of the old ones. Verified:
 *     DesignSolverTest (the textbook quadratic-regression design and its d(x) in closed form, also
 *     from a start that misses a support point; the general equivalence theorem on the cup's
 *     windows: max d = p at the optimum, d = p on its support, max d &gt; p and efficiency ≥
 *     exp(−(max d − p)/p) for 500 other designs; the same optimum as the multiplicative algorithm
 *     alone, in a tenth of the iterations or fewer).</li>
 * <li>D3 Each bench run reports its D-efficiency (det F_measured / det F_optimal)^(1/3), the
 *     measured information accumulated step by step at the plasma each step saw, the optimum over the
 *     same plasmas: each window's information averaged over the run sampled once a second; campaigns
 *     report the mean per parameter set. Verified: ClosedLoopYardstickTest (an eight times finer
 *     sampling gives the same efficiency to 0.002, with and without a shock).</li>
 * </ol>
 */
package dev.sweepline.sim.design;
