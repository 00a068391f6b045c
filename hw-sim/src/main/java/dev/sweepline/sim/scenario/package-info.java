/**
 * Scenarios for the closed-loop bench: invented plasma histories around the invented probe Cinder
 * (perihelion 0.046 AU, aphelion 0.73 AU), read from YAML files of our own format
 * (hw-sim/src/main/resources/scenarios/FORMAT.md).
 *
 * <h2>What it does</h2>
 * {@link dev.sweepline.sim.scenario.ScenarioLoader} reads a file (or a built-in listed in
 * {@code scenarios/index.txt}) into a checked {@link dev.sweepline.sim.scenario.Scenario};
 * {@link dev.sweepline.sim.scenario.Scenario#timeline(long)} gives, for one run seed, the
 * {@link dev.sweepline.sim.scenario.PlasmaConditions} at any time: the event-driven course of each
 * parameter ({@code ParameterTrack}, piecewise linear) times or plus the seeded fluctuations
 * ({@code OrnsteinUhlenbeckSeries}). {@link dev.sweepline.sim.scenario.PlasmaStates} turns those conditions
 * (trade units) into the simulator's plasma state (SI, instrument frame): the form in which the bench
 * and the instrument server hand the plasma to the instrument.
 *
 * <h2>Requirements and how each is verified</h2>
 * <ol>
 * <li>SC-1 Every built-in loads and says what its file says; its plasma values keep to the physics.md rows
 *     it cites. BuiltInScenariosTest (file read independently with Jackson's tree model).</li>
 * <li>SC-2 A timeline is a pure function of (scenario, seed, time): equal for one seed whatever the call
 *     order, different between seeds. ScenarioTimelineTest.</li>
 * <li>SC-3 Fluctuations have the configured rms and an exp(-lag/tau) autocorrelation, stationary from t = 0.
 *     FluctuationStatisticsTest (time averages, Bartlett tolerances), OrnsteinUhlenbeckSeriesTest (ensemble).</li>
 * <li>SC-4 An event ramp is linear from the value at its start and reaches its target at at + ramp; a ramp
 *     of 0 is a step; factors compose with the base and earlier events. EventRampTest.</li>
 * <li>SC-5 Every bad file fails with its file, 1-based line and dotted field named.
 *     ScenarioLoaderBadFilesTest, one file per kind in src/test/resources/scenarios-bad/.</li>
 * <li>SC-6 resolve() takes a built-in name or a path; an unknown name lists the built-ins. ScenarioLoaderTest.</li>
 * <li>SC-7 at() is cheap: tens of nanoseconds per call in time order (measured, not a test: 50-130 ns
 *     on the 2-core development machine, record allocation included).</li>
 * </ol>
 *
 * <h2>Design choices</h2>
 * <ul>
 * <li>Line numbers: Jackson's tree drops token locations, so {@code YamlTreeReader} builds its own small
 *     tree from the streaming YAML parser; every node keeps its dotted path and line.</li>
 * <li>Fluctuations without state that depends on the call order: the Gaussian increments are a pure
 *     function of (seed, stream, grid index) (the stream's key from the run's
 *     {@link dev.sweepline.sim.seed.SeedTree}, counter-based SplitMix64 + Box-Muller), the exact OU update
 *     runs on a grid of tau/64, one checkpoint per 1024 grid points lets any block be rebuilt, and values
 *     between grid points are interpolated linearly. Memory grows by one double per 1024 grid points.</li>
 * <li>Fluctuations are multiplicative on density, speed and temperature (so a relative rms stays a
 *     relative rms across a shock) and additive on the flow angles.</li>
 * <li>Ramps of one parameter may not overlap: the result of overlapping ramps would need a rule nobody
 *     would remember when reading a file.</li>
 * </ul>
 * Not thread-safe: a timeline caches one block per series; use one timeline per thread.
 */
package dev.sweepline.sim.scenario;
