/**
 * The Faraday cup: aperture, grids and a four-quadrant split collector.
 *
 * <h2>What it does</h2>
 * {@link dev.sweepline.sim.cup.CupGeometry} holds the aperture, grid stack and collector (the demo
 * cup has an effective area of exactly 1 cm^2 behind four grids of 0.90, so physics.md's worked cases
 * apply to it directly). {@link dev.sweepline.sim.cup.SplitCollector} computes, in closed form, how the
 * aperture image shifted by d tan theta falls on the four quadrants and on the collector as a whole,
 * and inverts the difference ratio to a flow angle. {@link dev.sweepline.sim.cup.FaradayCup} combines
 * them with the window current of each ion population (physics.md "Oblique flow and a split
 * collector").
 *
 * <h2>Requirements</h2>
 * <ol>
 *   <li>CUP-1: the quadrant fractions are exact to 1e-9 of the image area for any shift, including
 *       an image partly off the collector, and sum to the closed-form acceptance (disc overlap / image).</li>
 *   <li>CUP-2: with the whole image on the collector the difference ratio equals
 *       D = 1 - (2/pi)[acos u - u sqrt(1-u^2)] (~ 4u/pi for small u), and the inverse recovers the
 *       flow angle to at least 20 deg for the demo cup.</li>
 *   <li>CUP-3: the cup current equals the closed form with U cos theta while the image is wholly on
 *       the collector (physics.md P1 at 10 and 20 deg), falls with the acceptance beyond, and is zero
 *       past the cutoff angle; alphas respond with charge 2e.</li>
 *   <li>CUP-4: symmetric flows give symmetric quadrant currents.</li>
 *   <li>CUP-5: cheap per call; the split collector allocates nothing and caches the last shift. An image
 *       well inside the collector is split without evaluating a sine or cosine (the axis crossings' are
 *       known), within 1e-14 of the image area of the general path.</li>
 * </ol>
 *
 * <h2>How verified</h2>
 * CUP-1, CUP-2, CUP-4 by {@code SplitCollectorTest} (against an independent Hipparchus Gauss-Legendre
 * integration of chord lengths, and the physics.md formula); CUP-3, CUP-4 by {@code FaradayCupTest};
 * CUP-5 by the gc profile of {@code SimulatedInstrumentBenchmark} (a step with the flow turning from step
 * to step, {@code executeStepTurningFlow}, computes the split afresh) and by {@code SplitCollectorTest}
 * (the well-inside path against the general one).
 *
 * <h2>Limits</h2>
 * The image is placed by the bulk flow direction: the thermal angular spread is not followed ion by
 * ion, so the split of a hot, wide beam is that of its bulk direction. Populations with vz &lt;= 0 give
 * no current.
 */
package dev.sweepline.sim.cup;
