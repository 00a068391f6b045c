/**
 * The seed tree: every random stream of the simulator derived from one seed by name and index
 * ({@link dev.sweepline.sim.seed.SeedTree}, whose class comment lists them). Depends on the JDK alone,
 * so every other package may use it.
 *
 * <h2>Requirements and how each is verified</h2>
 * <ol>
 * <li><b>SD1</b> Every stream keeps the value it had before the tree gathered them, so recorded runs
 *     keep their bytes. <i>SeedTreeTest (each stream against the old formula written out);
 *     ClosedLoopDeterminismTest, CampaignDeterminismTest.</i></li>
 * <li><b>SD2</b> The streams of one seed differ from each other, and one stream differs between seeds and
 *     between indices. <i>SeedTreeTest.</i></li>
 * <li><b>SD3</b> The counter-based keys are SplittableRandom's: mix64(s + kγ) is the k-th nextLong of
 *     SplittableRandom(s). <i>SeedTreeTest.</i></li>
 * </ol>
 */
package dev.sweepline.sim.seed;
