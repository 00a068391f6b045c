/**
 * Physical constants for the simulator.
 *
 * <h2>What it does</h2>
 * Holds the CODATA 2018 and IAU values listed in physics.md "Constants", each with its unit in the
 * name and its source in the doc comment. Nothing else lives here.
 *
 * <h2>Requirements</h2>
 * <ol>
 *   <li>PHY-1: every constant equals the physics.md table value digit for digit.</li>
 *   <li>PHY-2: derived check values of physics.md (thermal speed, proton speed at 1 kV, alpha/proton
 *       voltage ratio) follow from these constants.</li>
 * </ol>
 *
 * <h2>How verified</h2>
 * PHY-1 by {@code PhysicalConstantsTest} against the table; PHY-2 by the same test and by
 * {@code ConvectedMaxwellianTest} (worked cases of physics.md computed from these constants).
 */
package dev.sweepline.sim.physics;
