/**
 * Special functions the ground's physics needs, written here so that the ground depends on no project
 * module and no allocation happens per evaluation.
 *
 * <h2>What it does</h2>
 * {@link dev.sweepline.ground.special.ErrorFunction}: erf, erfc and the erf difference of the window
 * current (physics.md "Window current of a convected Maxwellian"), by Cody's rational Chebyshev
 * approximations (Math. Comp. 23, 1969).
 *
 * <h2>Requirements</h2>
 * <ol>
 *   <li>SPF-1: erf and erfc within 1e-15 relative of a high-precision reference on every argument the
 *       fit meets, −40 ≤ x ≤ 26.5 (erfc a normal double), and 0 where erfc is below half the smallest
 *       subnormal.</li>
 *   <li>SPF-2: the erf difference of a window far in either tail keeps that precision times the
 *       condition number of the subtraction.</li>
 *   <li>SPF-3: the values of Abramowitz &amp; Stegun Table 7.1.</li>
 *   <li>SPF-4: no allocation per call.</li>
 * </ol>
 *
 * <h2>How verified</h2>
 * All four by {@code ErrorFunctionTest}: against {@code ReferenceErf} (BigDecimal: the series of A&amp;S
 * 7.1.5 below 2, the continued fraction of A&amp;S 7.1.14 above), against the table, and with the
 * thread's allocation counter.
 */
package dev.sweepline.ground.special;
