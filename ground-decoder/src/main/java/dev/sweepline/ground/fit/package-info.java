/**
 * From spectra to plasma: convected-Maxwellian fit of one spectrum (protons, alphas, flow angles).
 *
 * <h2>Design note</h2>
 * <p>Written from the telemetry ICD (§4, §8) and physics.md alone; every instrument fact (effective area,
 * aperture, collector and distance for the angles and the acceptance, gain ranges, ADC, temperature and
 * modulation period for the noise) is the description of the spectrum's instrument ({@link
 * dev.sweepline.ground.fit.CupGeometry}, {@link dev.sweepline.ground.fit.NoiseModel}), one
 * {@link dev.sweepline.ground.fit.SpectrumFitter} per instrument. The model ({@link
 * dev.sweepline.ground.fit.PlasmaModel}, {@link dev.sweepline.ground.fit.WindowCurrent}) is the closed
 * form of physics.md, I = q n A [(U/2)(erf x2 − erf x1) + (w/(2√π))(e1 − e2)], with its analytic
 * derivatives, thresholds v = √(2qV/m) at the calibrated window edges (ICD §8 HV calibration of the
 * instrument, applied by the spectrum package), alphas with charge 2e and m_α (CODATA 2018).
 *
 * <p>Design: a two-step fit. (1) Flow angles from the four quadrants ({@link
 * dev.sweepline.ground.fit.FlowAngleEstimator}): the current-weighted ratios D_x, D_y over the spectrum,
 * inverted with tan θ = (R/d)·D⁻¹(D). A half-plane split of a disc depends only on the shift across the
 * line, so D_x = D(u_x) exactly even for a 2-D shift, and the ICD's beam model (every window's image
 * shifted by d tan θ of the bulk flow) makes the ratio the same in every window. (2) The summed spectrum
 * by weighted Levenberg–Marquardt ({@link dev.sweepline.ground.fit.LevenbergMarquardt}: MINPACK's lmder,
 * Moré 1978 and the MINPACK-1 user guide of Moré, Garbow and Hillstrom 1980 [memory], step for step as
 * Hipparchus' LevenbergMarquardtOptimizer ports it, with its default tolerances 1e-10; the analytic Jacobian,
 * allocation-free on one workspace per thread; weights 1/σ² from the ICD §8 noise row), which sees only the normal speed U cos θ and the acceptance A(θ)/A(0) (exact
 * disc–disc overlap of the image and the collector, 1 up to the cup's full acceptance, 20.25° for the
 * demo cup): first protons alone from moments of the spectrum ({@link dev.sweepline.ground.fit.InitialGuess}, the half below the peak so that alphas do not
 * widen it), then, where the windows reach the alpha peak, protons and alphas jointly (n_α, U_α, w_α
 * free, so an alpha drift is allowed). The joint fit replaces the proton fit only when the χ² drop passes
 * the likelihood-ratio test of {@link dev.sweepline.ground.fit.AlphaSelection} (the χ²(k) quantile at the
 * nominal level 0.1 %, calibrated by Monte Carlo so that the false-alarm rate stays below 1 %) and the fit is physical
 * (0 < n_α/n_p < 0.5, 0.7 U_p < U_α < 1.5 U_p, alpha peak inside the windows). Where the windows hold part
 * of the alphas but not their peak ({@link dev.sweepline.ground.fit.AlphaCoverage}), or the free fit is not
 * physical, the alphas are a constrained component instead: the joint model with the prior rows of {@link
 * dev.sweepline.ground.fit.AlphaPrior} (drift 0 ± 0.1 U_p, T_α/T_p = 4 ± 2), tried only when the proton
 * fit's residuals lean toward such alphas by more than 1σ (a score test), and kept by the same
 * likelihood-ratio test with k the effective number of extra free parameters; a constrained fit that runs
 * past n_α/n_p = 0.5 is tried once more with an abundance row (He/H log-normal, median 4.06 %). (3) The proton angles again, from each species' share of
 * the quadrant differences ({@link dev.sweepline.ground.fit.SpeciesFlowAngles}), so that drifting alphas
 * do not pull them toward the field. The bulk speed is U_n / cos θ, its 1σ with the angles' 1σ
 * propagated ({@link dev.sweepline.ground.fit.FlowAngles#sigmaBulkSpeed}). Parameters are (ln n, U, ln w)
 * inside the optimiser; 1σ come from its covariance (JᵀWJ)⁻¹ mapped back; σ_T = 2 T σ_w / w. (2b) A spectrum
 * flagged interleaved (ICD §4 flags bit 5) is then fitted once more with the model chosen (protons, or
 * protons and alphas with the chosen fit's prior rows) and one parameter more, last: the normal speed's change
 * over the sweep ΔU, window j at U + ΔU (τ_j − ½) and U_α + ΔU (τ_j − ½), τ_j = step / (c − 1) from the ICD's
 * order rule ({@link dev.sweepline.ground.spectrum.SpectrumValues#stepOrder}); started from the chosen fit and
 * ΔU = 0, so it holds that fit, tried only when the windows leave it a degree of freedom (more windows than
 * its parameters, as for the protons) and kept when physical with finite errors and ΔU short of its iteration
 * guard (physics.md "Speed drift within an interleaved sweep"). U and U_α are then the mid-sweep speeds. Spectra without the flag are fitted as before,
 * bit for bit.
 *
 * <p>Limits: the thermal spread of the arrival angles is not modelled (each window's image is shifted by
 * the bulk angle, as ICD §8 describes a beam); past full acceptance the clipped part of the image is taken evenly
 * from the quadrants; the summed-spectrum fit sees each species' normal speed only; the drift fit takes the steps as equally
 * spaced in time and the speed as linear in time over the sweep (a curvature of the speed within the sweep
 * stays in the moments: the interleaved order reads it as a profile change), and it does not reopen the
 * alpha selection, which is made without ΔU. Where the data leave the
 * constrained alphas to their prior and the truth lies z prior-σ from the prior's mean, the proton moments
 * are pulled by up to z of their bound; near the Sun (U/w ≈ 3) with a band stopping below the alpha peak
 * the two species are nearly degenerate (bound 10–400 × the proton-only one) and a prior that misses the
 * truth by half a σ biases the protons by about 2 bounds.
 *
 * <p>Requirements and how each is verified:
 * <ol>
 *   <li>F1 the window current and its derivatives match physics.md's worked cases and a Gauss–Legendre
 *       quadrature ({@code WindowCurrentTest}).</li>
 *   <li>F2 over 500 noisy trials of the physics.md reference case the scatter of n, U, w is 0.85–1.2 × the
 *       Cramér–Rao bound and the bias below 0.3 × ({@code ReferenceTrialsTest}; measured 1.03, 1.03, 1.01 and
 *       −0.02, +0.08, +0.02).</li>
 *   <li>F3 the joint fit recovers the alpha density within its bound near the Sun, where the proton tail
 *       outshines the alpha peak ({@code NearSunAlphaTest}: rms 0.85 × bound, bias −0.04 ×).</li>
 *   <li>F4 flow angles up to 20° come back against an independent grid model of the split collector
 *       ({@code FlowAngleRecoveryTest}); the disc–quadrant overlap matches Monte Carlo ({@code CupGeometryTest}).</li>
 *   <li>F5 all-zero, saturated, one-window and uncalibrated spectra give a flagged fit with NaN moments,
 *       never an exception ({@link dev.sweepline.ground.fit.FitFlag}; {@code GroundProcessingTest}).</li>
 *   <li>F6 fit rate measured by {@code FitBenchmark} (JMH, src/jmh), which checks every fit
 *       ({@code FitBenchmarkCheckTest}).</li>
 *   <li>F13 the optimiser gives Hipparchus' {@code LevenbergMarquardtOptimizer}'s results (default
 *       tolerances, as the fit used it before): on every least-squares run of the fit tests' spectra (548) and
 *       of 60 narrow near-Sun focus bands (121, both joint minima reached) it fails exactly when Hipparchus
 *       fails, in as many iterations, the parameters and χ² within 1e-9 relative (measured: identical to the
 *       bit), the covariance within 1e-9 of Hipparchus' QR inverse, and the same flags
 *       ({@code LevenbergMarquardtAgreementTest}); on the two campaign spectra where earlier own optimisers
 *       took the other minimum it takes Hipparchus' ({@code TwoMinimaRegressionTest}). Neither stops exactly
 *       at the minimum: Hipparchus' point lies up to 3.8e-3 σ from a run to tolerances 1e-14 (within the
 *       bound 2 √(1e-10 χ²) σ of MINPACK's cost test, asserted);
 *       the per-edge model equals the per-window {@link dev.sweepline.ground.fit.WindowCurrent} bit for bit
 *       ({@code PlasmaModelEdgeTest}).</li>
 *   <li>F14 {@link dev.sweepline.ground.fit.SpectrumFitter#fitInto} fills a reusable
 *       {@link dev.sweepline.ground.fit.MutablePlasmaFit} with the values {@code fit} returns, bit for bit, and
 *       allocates nothing per fit after warm-up on the benchmark's summed spectra (14, 32 windows protons; 64,
 *       128 windows joint, free and constrained alphas): 0 bytes in 64 fits by the JVM's per-thread counter
 *       ({@code FitIntoTest}). Still allocating: the quadrant angles ({@code FlowAngles},
 *       {@code SpeciesFlowAngles}' current arrays), the angle from a carried density ({@code AcceptanceAngle}),
 *       the models when the windows change ({@code ModelCache}; a new area only rescales them), and the immutable
 *       {@link dev.sweepline.ground.fit.PlasmaFit} of {@code fit}. The opt-in warm start (the holder's last
 *       proton solution) agrees with the cold start within twice the optimiser's stopping distance (the cost
 *       test's 2 √(1e-10 χ²) σ) and needs
 *       fewer iterations on a time series ({@code FitIntoTest}).</li>
 *   <li>F7 a second cup's spectra (fine-cup.yaml: half the area, 256 windows, 20-bit ADC, other ranges and
 *       cadence) fit to the same truth with its own geometry and noise ({@code FineCupProcessingTest}).</li>
 *   <li>F8 on alpha-free spectra the joint fit is accepted in at most 1 % of trials, the binomial 95 % upper
 *       bound included ({@code AlphaSelectionTest}: 0.3 % near the Sun, 0 at 1 AU, of 1000; for the constrained
 *       component {@code PartialAlphaTest}); alphas at He/H 1 %, 2 %, 4 % are found in at least 95 % of
 *       spectra near the Sun and at 1 AU (measured 100 %). The test's χ²(k) quantile is taken at the calibrated
 *       level 0.1 % (a trials factor 10 for the alpha speed and width that exist only under the alternative,
 *       Davies 1987; Gross &amp; Vitells 2010 [memory]; physics.md "Alpha selection").</li>
 *   <li>F9 with part of the alphas in the band (fast wind with the alpha peak above the table; He/H 10 % and
 *       20 % ejecta on a band stopping between the peaks) the proton bias is below 0.3 of the constrained
 *       model's bound ({@code PartialAlphaTest}).</li>
 *   <li>F10 with alphas drifting along the field the proton angle's bias over 200 seeds is below 3 ×
 *       scatter/√200 and its reported 1σ is the scatter ({@code AlphaDriftAngleTest}).</li>
 *   <li>F11 beyond full acceptance the density's 1σ and bound carry the angle's part n·σ_lnA ({@link
 *       dev.sweepline.ground.fit.CupGeometry#sigmaLogTransmission}, physics.md "Density and speed beyond the
 *       split's reach"): the overlap's slope is minus the common chord, the propagation matches central
 *       differences, and on 25–35° flows on both axes n and U lie within 2σ of the truth in every case with
 *       finite errors ({@code BeyondReachErrorsTest}).</li>
 *   <li>F12 beyond the reach with a density carried from the last spectrum inside it ({@link
 *       dev.sweepline.ground.fit.DensityPrior}, {@code FitCollector} in time order) the angle comes from the total
 *       current's fall-off ({@link dev.sweepline.ground.fit.AcceptanceAngle}): the overlap's inverse is exact,
 *       and on 26–35° flows on both axes θ, n and U lie within 2σ in every clean case and ≥ 95 % of noisy ones
 *       ({@code AcceptanceAngleTest}).</li>
 *   <li>F15 an interleaved spectrum's drift fit: at ΔU = 0 the drift model's currents and (n, U, w) derivatives
 *       are the model's without drift bit for bit and ∂I/∂ΔU = (τ − ½) ∂I/∂U, which a central difference
 *       confirms; over 200 noisy near-Sun focus bands with ΔU = 1 km/s, n, U, w and ΔU are unbiased at the bound
 *       (the bound of the 4-parameter model) and the mean reduced χ² is 1 within 4 standard errors, where the fit
 *       without ΔU gives 53; the ICD's step rule matches a walk of the even offsets out and the odd ones back
 *       ({@code SpeedDriftFitTest}); on the narrow near-Sun bands of F13 read in the interleaved order with a
 *       ramp of 0–2 km/s the drift runs (60 of 183) agree with Hipparchus' optimiser to the bit, by F13's checks
 *       ({@code LevenbergMarquardtAgreementTest}). In closed loop (hw-sim {@code InterleavedDriftTest}) a linear ramp's ΔU is
 *       recovered and fast-wind held still gives ΔU consistent with 0. The fit reports ΔU along the flow with
 *       its 1σ from the covariance ({@link dev.sweepline.ground.fit.PlasmaFit#speedChangeMPerS}), which the
 *       products write (product P8).</li>
 * </ol>
 */
package dev.sweepline.ground.fit;
