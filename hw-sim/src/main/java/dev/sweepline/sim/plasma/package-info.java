/**
 * The plasma the cup looks at, and the closed-form response of a Faraday cup window to it.
 *
 * <h2>What it does</h2>
 * {@link dev.sweepline.sim.plasma.IonSpecies} (protons, alphas), drifting bi-Maxwellian
 * {@link dev.sweepline.sim.plasma.IonPopulation}s in the instrument frame (+z the cup normal, into the
 * cup), a {@link dev.sweepline.sim.plasma.PlasmaState} that adds the field direction, and
 * {@link dev.sweepline.sim.plasma.ConvectedMaxwellian}: the window current
 * I = qnA[(U/2)(erf x2 - erf x1) + (w/(2 sqrt pi))(e1 - e2)] and its derivatives in n, U, w
 * (physics.md "Window current", "Alpha particles", anisotropy).
 *
 * <h2>Requirements</h2>
 * <ol>
 *   <li>PLA-1: the closed form equals the quadrature of q n A v f(v) over [v1, v2] to 1e-9 relative,
 *       including windows far in the upper tail (no cancellation to 0 or a negative value).</li>
 *   <li>PLA-2: the worked cases P1, P2, P3, A1 and the totals n q U A of physics.md are reproduced to
 *       the digits given; the proton peak E/q at 400 km/s is 835.175 V.</li>
 *   <li>PLA-3: the derivatives agree with central finite differences.</li>
 *   <li>PLA-4: the thermal speed w = sqrt(2kT/m) and the bi-Maxwellian normal projection
 *       w_n^2 = w_par^2 cos^2 psi + w_perp^2 sin^2 psi.</li>
 *   <li>PLA-5: v = sqrt(2qV/m) and its inverse; alphas (charge 2e) sit at V_alpha/V_p = 1.986300.</li>
 *   <li>PLA-6: stateless closed forms, cheap enough to call per simulated step, allocating nothing.</li>
 *   <li>PLA-7: {@link dev.sweepline.sim.plasma.ErrorFunction} (Cody's rational Chebyshev
 *       approximations, Math. Comp. 23, 1969) gives erf and erfc within 1e-15 relative on the whole
 *       range the model uses, −40 ≤ x ≤ 26.5, and erf differences far in a tail from erfc.</li>
 *   <li>PLA-8: {@link dev.sweepline.sim.plasma.ExpMinusOne} gives e^x − 1 equal to the bit to
 *       {@code StrictMath.expm1} (fdlibm's routine followed operation for operation, in Java so that
 *       it is inlined: on Java 17 {@code Math.expm1} is a native call), so the currents are unchanged.</li>
 *   <li>PLA-9: {@link dev.sweepline.sim.plasma.InverseTrigonometry} gives asin and acos equal to the bit
 *       to {@code StrictMath}'s (fdlibm's e_asin.c and e_acos.c followed operation for operation, in
 *       Java so that they are inlined), for the split collector's arc breaks.</li>
 *   <li>PLA-10: what the closed form evaluates once may serve again without changing a bit:
 *       {@link dev.sweepline.sim.plasma.MaxwellianEdges} evaluates the error function and exp(-x²) once
 *       per window edge (adjacent windows share theirs) and gives the same current and sensitivities as
 *       the closed form window by window; a {@link dev.sweepline.sim.plasma.MaxwellianWindow} kept by a
 *       current's evaluation serves the sensitivities of exactly that window (the same four speeds).</li>
 * </ol>
 *
 * <h2>How verified</h2>
 * PLA-1 by {@code ConvectedMaxwellianTest} against Hipparchus {@code IterativeLegendreGaussIntegrator}
 * over a grid of (n, U, w, window) cases; PLA-2, PLA-5 by the same test (physics.md rows, Abramowitz
 * &amp; Stegun Table 7.1 for erf); PLA-3 by central differences; PLA-4 by {@code PlasmaStateTest};
 * PLA-6 by {@code SimulatedInstrumentBenchmark} (time and gc profile); PLA-7 by {@code ErrorFunctionTest}
 * against a BigDecimal series reference (A&amp;S 7.1.6) and A&amp;S Table 7.1, with the thread's
 * allocation counter; PLA-8 by {@code ExpMinusOneTest} (a million seeded arguments over the whole
 * double range and the special values, compared bit for bit); PLA-9 by {@code InverseTrigonometryTest}
 * (two million seeded arguments over the domain, near ±1, near 0 and over every exponent, and the special
 * values, bit for bit); PLA-10 by {@code MaxwellianEdgesTest} and {@code RelativeSensitivitiesTest}
 * (seeded tables, plasmas and windows, bit for bit against the closed form).
 *
 * <h2>Limits</h2>
 * In the far lower tail (v much below U) about log10(U/v) digits are lost to cancellation between the
 * two terms; the simulator never needs more there.
 */
package dev.sweepline.sim.plasma;
