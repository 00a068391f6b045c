/**
 * The adaptive sweep scheduler: design note.
 *
 * <h2>What it does</h2>
 * {@link dev.sweepline.fsw.sweep.SweepScheduler} chooses every step of the energy-per-charge sweep
 * (window, modulator levels, gain range, settle time, dwell), ingests every sample, analyses each
 * completed sweep and moves between three modes:
 * <pre>
 *            START                    LOCK_ACQUIRED
 *   (SAFE) ---------&gt; SURVEY ---------------------------&gt; FOCUS
 *                      ^  ^   PEAK_ON_EDGE, CURRENT_COLLAPSE,  |
 *                      |  +-- PEAK_JUMP, NO_PEAK, RESURVEY, ---+
 *                      |      TABLE_LOADED
 *        COMMANDED     |                    COMMANDED / LINK_TIMEOUT
 *   SAFE --------------+   any mode ------------------------------&gt; SAFE
 * </pre>
 * Per step: {@code nextStep} picks the next window of the sweep plan, predicts its gain range,
 * computes the settle time from the HV rail change and hands out the step; {@code ingest} stores
 * the reply in range-0 units. When the last reply of a sweep arrives, the sweep is analysed:
 * <ol>
 * <li>integer argmax of the total current;</li>
 * <li>alpha discrimination: a significant local maximum (prominence over noise and over a fraction of
 *     its height) whose window centre code lies at code(argmax) / 1.9863 (+/- tolerance), computed
 *     from the active table's codes in Q16, is the proton peak; a monotonic flank there (U/w ~ 3 near
 *     the Sun) is not a local maximum and is ignored;</li>
 * <li>significance: the peak must exceed significanceSigmas * 2 * noiseCountsPerQuadrant counts in the
 *     range it was read (factor 2: rms sum of four quadrants);</li>
 * <li>3-point parabola refinement in Q8, clamped to +/- half a window; FWHM from the linearly
 *     interpolated half-maximum crossings in Q8 (one missing side mirrors the other);</li>
 * <li>mode decision: after a survey with a valid peak, FOCUS on band = peak +/- max(minHalfWidth,
 *     FWHM * halfWidthPerFwhm), at most maxBandWindows, clipped (not shifted) to the table; after a
 *     focus sweep, loss of lock (in this order: no peak, peak current below collapseFraction of the
 *     reference, peak window within edgeWindows of an unclipped band edge, refined peak moved more
 *     than jumpWindows or to about the alpha ratio of the reference) gives SURVEY with the reason;
 *     else, after K focus sweeps, SURVEY (RESURVEY); else the band is re-centred on this sweep's peak,
 *     which becomes the reference.</li>
 * </ol>
 *
 * <h2>Requirements and how each is verified</h2>
 * <ol>
 * <li><b>R1 Modes.</b> SURVEY, FOCUS, SAFE, each with its ICD code ({@code SweepMode.icdCode()}, the one place
 *     the codes are written); every switch over a mode is an exhaustive switch expression without a
 *     default, so a new mode fails to compile where it matters; the scheduler starts in SURVEY and
 *     reports START at its first step.
 *     <i>AcquisitionTest.shouldStartInSurveyAndReportStart.</i></li>
 * <li><b>R2 Steps stay legal.</b> Every step lies in the active table with that window's codes; a survey
 *     covers every window once; focus steps lie in the band; no window repeats within a sweep; mode
 *     changes form a chain of legal transitions. <i>SchedulerModelTest (rule-based random actions,
 *     five recorded seeds, 20k steps each).</i></li>
 * <li><b>R3 Comparable units.</b> Spectrum current = sum over quadrants of (counts - pedestal) &lt;&lt;
 *     (rangeRatioShift * range), in a long (pedestal and range ratio from the instrument description; a
 *     24-bit ADC's top range overflows an int); entries in ascending window order whatever the step direction; a step with no reply
 *     is marked {@code STATUS_MISSING}. <i>StepOrderingTest.shouldStoreSpectrumAscendingWhenSteppedDown,
 *     CommandTest.shouldRecordMissingReplyAndCarryOn, science WideSampleTest (24-bit full scale).</i></li>
 * <li><b>R4 Noise floor.</b> No lock on noise; the threshold scales with the range read.
 *     <i>PeakFinderTest.shouldRefuseNoiseOnlySpectrum, shouldScaleNoiseThresholdWithRange;
 *     AcquisitionTest.shouldStaySurveyWithoutSignificantPeak.</i></li>
 * <li><b>R5 Peak position.</b> Integer argmax refined to Q8 within 0.03 window on sampled Gaussians and
 *     within 0.05 window of a floating-point reference on the physics.md window-current spectrum.
 *     <i>PeakFinderTest.shouldRefinePeakToSubWindow, AcquisitionTest.shouldCentreBandOnRefinedProtonPeak.</i></li>
 * <li><b>R6 Band width.</b> FWHM within 0.1 window on Gaussians and within 5 % of the thermal width
 *     (physics.md) on the synthetic spectrum; band = 2 * max(min, round(1.5 FWHM)) + 1, capped, clipped.
 *     <i>PeakFinderTest.shouldMeasureFwhm, shouldMirrorFwhmWhenOneSideIsCut; AcquisitionTest
 *     (size, cap near the Sun, minimum, clip at the table end).</i></li>
 * <li><b>R7 Never the alpha peak.</b> Lock on protons at He/H 1, 4, 8.5, 15 % at 1 AU (fast wind) and
 *     near the Sun (U/w = 3); a lower peak at the alpha ratio is the proton peak; a monotonic flank or a
 *     small bump there is not; in focus a peak at ~1.99x the reference is a jump.
 *     <i>AlphaDiscriminationTest.</i></li>
 * <li><b>R8 Acquisition.</b> A survey with a valid peak gives FOCUS (LOCK_ACQUIRED). Cold start reads
 *     every window in the top range (never measured), so a weak 1 AU peak locks after the second survey,
 *     a strong near-Sun peak after the first. <i>AcquisitionTest.shouldAcquireLockOnceGainsAreRanged,
 *     shouldAcquireLockAfterOneSurveyWhenSignalIsStrong.</i></li>
 * <li><b>R9 Gain ranging.</b> Predicted per-quadrant current = max over the window and its two neighbours
 *     at their last reading; up above 80 %, down below 2 % of the full scale of the range this window was
 *     last read in (hysteresis); saturated windows use the top range; a never-read window (first survey)
 *     follows its neighbour read before it, that reading x 8, from the top range down (the top range when
 *     no neighbour is read, or one saturated), so a weak or cold plasma is seen in the first survey; one
 *     range per step. <i>GainPredictorTest (thresholds at +/- 2 units, hysteresis, neighbours, reset, an
 *     unread window's thresholds at +/- 1 unit, a weak and a cold plasma's peak in the first survey, no
 *     saturation after the first survey near the Sun).</i></li>
 * <li><b>R10 Loss of lock.</b> Each reason (NO_PEAK, CURRENT_COLLAPSE, PEAK_ON_EDGE, PEAK_JUMP) is raised
 *     by the condition it names and not by steady plasma or slow drift; after a x1.82 E/q shock the band
 *     holds the new peak within two complete sweeps after the sweep the front fell in.
 *     <i>LockLossTest.</i></li>
 * <li><b>R11 Re-survey.</b> Exactly K focus sweeps between surveys on steady plasma; with focusEnabled 0
 *     every sweep is a survey (LockLossTest.shouldStayInSurveyWhenFocusIsDisabled).
 *     <i>LockLossTest.shouldResurveyEveryKFocusSweeps.</i></li>
 * <li><b>R12 Step order.</b> Each sweep starts at the end nearer the present HV level and steps through
 *     neighbours; so consecutive surveys alternate direction (up from HV off, then down, ...), and a
 *     focus sweep starts at the band end nearer the HV. <i>StepOrderingTest.</i></li>
 * <li><b>R13 Settle.</b> settleMicros = fixedSettleMicros + (max rail change in codes *
 *     settleMicrosPerCodeQ8 &gt;&gt; 8), the rail change being the largest from anywhere the rails may stand:
 *     a rail moves continuously towards its target and the HV off puts it at 0 V (hw-sim HvRail, HvSupply), so
 *     it lies between the levels it may have been sent since it was last known and 0 if the HV may have gone
 *     off, and the largest change is from one end. After a step: its levels (0 when it asked for the HV off).
 *     After SAFE: the larger of the change from the last commanded levels and from 0, because SAFE sends no
 *     step and the rails hold their levels until the electronics' link watchdog switches the HV off (hardware
 *     ICD §4.1, 2 s; the in-process bench has none), so a short SAFE, e.g. a link time-out whose RETRY
 *     response resumes SURVEY at once, finds them near the last levels. A step a mode change abandons in flight
 *     may have flown or not: the levels before it count too, unless the executive reports that the link never
 *     took it ({@code stepNotSent}), when only those before it count. The formula's one home is
 *     {@code table.SettleTime}, which hw-sim's link budget calls too.
 *     <i>StepOrderingTest.shouldAccountSettleForRailChange,
 *     CommandTest.shouldLeaveSafeOnlyByCommandAndSettleFromTheFartherOfHvOffAndLastLevels,
 *     shouldSettleAfterShortSafeForTheRailsStillAtTheLastLevels, shouldSettleFromHvOffAfterStepsWithoutHv;
 *     exec ExecutiveTest.shouldSettleFromTheLastSentLevelsWhenAnUnsentStepIsAbandoned; SchedulerModelTest.</i></li>
 * <li><b>R14 Loads.</b> A table or parameter set is validated (a table by every path, the start-up one too,
 *     against the DAC and the instrument's voltage limit, ABOVE_VOLTAGE_LIMIT); a refusal returns the reason code and the
 *     old one stays; an accepted one is copied (no allocation) and applied at the next sweep boundary; a
 *     new table invalidates the band (FOCUS gives SURVEY, TABLE_LOADED) and the gain memory. What takes
 *     effect there is announced once, before the first step that flies it:
 *     {@code SweepListener.onConfigurationApplied(applied, generation, now)}; the flight software stamps the
 *     table id and the table-changed flag from it, the bench's recorder moves its window volts with it
 *     (nobody compares window edges to guess). <i>CommandTest, WindowTableTest, SweepParametersTest,
 *     exec TableChangedFlagTest; hw-sim CommandedRunTest.</i></li>
 * <li><b>R15 SAFE.</b> nextStep returns false; replies are ignored; only requestMode leaves SAFE (FOCUS
 *     without a band gives SURVEY, NO_BAND; while surveying that changes nothing, the survey in progress
 *     goes on). <i>CommandTest, FocusWithoutBandTest.</i></li>
 * <li><b>R16 Determinism.</b> No clock: time is the argument. decisionHash is FNV-1a 64 over every step's
 *     fields (window, codes, range, settle, periods, HV flag), every band and every mode change;
 *     same inputs give the same hash. <i>CommandTest.shouldGiveSameHashForSameInputs.</i></li>
 * <li><b>R17 Resources.</b> Everything allocated in the constructor (arrays of WindowTable.CAPACITY windows
 *     of the description's 4 quadrants, gain thresholds of its ranges); no instrument fact is a constant;
 *     the step path allocates nothing, uses no floating point, collections, boxing, threads or clocks;
 *     one step costs at most 1 us. <i>AllocationTest and ExecutiveTest.shouldAllocateNothingPerCycle
 *     (0 bytes in at least 8 of 10 windows of 10k steps, none over 1 kB: the test-side AllocationMeter
 *     says why windows), NoFloatingPointTest
 *     (bytecode scan), ArchitectureTest, SchedulerStepBenchmark (JMH, -prof gc).</i></li>
 * <li><b>R18 Edge search.</b> A focus peak on an unclipped band edge does not drop to survey at once:
 *     the next focus band keeps the inner half-width and reaches edgeSearchWindows beyond that edge
 *     (no jump or alpha-ratio check against the old peak on that sweep: the search band starts at the old
 *     peak, so the peak finder's in-spectrum alpha test still applies); a second edge, a collapse or
 *     no peak gives SURVEY. This holds a shock's new peak within 2 sweeps even when the front lands at
 *     the end of a survey. <i>LockLossTest.shouldSearchBeyondTheEdgeAndHoldTheMovedPeak,
 *     shouldSurveyWhenTheEdgeSearchFindsTheEdgeAgain; hw-sim SweepPropertiesTest (1000 shocked winds).</i></li>
 * <li><b>R21 Design style (opt-in).</b> With {@code focusStyle} bit 0 (1 or 3: design) a focus band reaches
 *     2.0 times the peak's measured low half-width at half maximum below the refined peak and above it the
 *     farther of 1.75 times the high one and 1.0 times it beyond the alphas' expected window (alphaRatio
 *     times the peak's code), each plus {@code robustnessMarginWindows}, within minHalfWidthWindows and maxBandWindows
 *     (docs/focus-design.md; {@link FocusDesign}, a few multiplications and a table search per band; the
 *     peak finder keeps the low half-width with the FWHM); every step of a focus
 *     sweep dwells the most whole periods that fit {@code focusBudgetMicros} after the settles, never fewer
 *     than integrationPeriods nor more than its limit; a survey dwells {@code surveyIntegrationPeriods}
 *     when not 0. Every spectrum carries its own dwell. Alpha discrimination, edge search, collapse and
 *     jump checks and gain ranging are those of the band style, but a peak that jumped inside the band and
 *     not by about the alpha ratio is followed at once (the band chosen around it) instead of surveying
 *     (LockLossTest.shouldFollowAJumpInsideTheBandInDesignStyle). The default (band, 0, 0, 0) flies
 *     exactly as before (hw-sim GoldenRunTest). <i>FocusDesignTest, DesignStyleTest, AllocationTest
 *     (both styles); hw-sim FocusDesignReachTest (the reach factors against the D-optimal yardstick over
 *     the built-in scenarios' plasmas); SchedulerStepBenchmark, SweepBoundaryBenchmark.</i></li>
 * <li><b>R22 Interleaved focus order (opt-in).</b> With {@code focusStyle} bit 1 set (2: band, 3: design)
 *     a focus sweep of n windows steps the even offsets from its starting end outward and then the odd
 *     ones back ({@code SweepScheduler.interleavedOffset}): neighbouring windows 2i and 2i + 1 are read at
 *     steps i and n − 1 − i, so a wind drifting during the sweep reads, to first order, as the wind at
 *     mid-sweep, and no rail change exceeds two windows (each step's settle is its own, R4). Surveys stay
 *     monotonic. The spectrum packet is in window order either way, flagged interleaved (telemetry ICD §4
 *     flags bit 5) so that the ground can fit the speed's change over the sweep. <i>InterleavedOrderTest; hw-sim
 *     DesignStyleRunTest (the ground's errors), InterleavedDriftTest (the ground's drift fit).</i></li>
 * <li><b>R23 Support dwell (opt-in).</b> With {@code focusStyle} bit 2 set (4..7, with either band and
 *     either order) every window of a focus sweep dwells {@code focusFloorPeriods}, and three support
 *     windows (the low flank, the refined peak and the high flank of the peak the band was chosen from,
 *     at factors of the low and high half-widths at half maximum looked up by the half-width in windows,
 *     {@link FocusDesign#supportWindows}; a flank moves out to the first window within 3 read last in a
 *     more sensitive gain range, whose read noise is lower) dwell the floor plus an equal third of what the sweep's
 *     integration leaves after the floors: {@code integrationPeriods} times the band's windows when
 *     {@code focusBudgetMicros} is 0, else the budget after the settles; at most the dwell limit. Each
 *     step's dwell travels in its step command (hardware ICD §3.1) and its settle is its own (R4). An edge
 *     search sweep dwells the table's dwell everywhere. The spectrum of a sweep with support windows is
 *     packet layout 3 (telemetry ICD §4), which lists them with their dwell; every other stays layout 2.
 *     With {@code focusStyle} bit 3 as well (12..15, paired support) each support window is paired with
 *     a neighbour (a flank with the next window outward, inward at the band's edge; the peak with the
 *     window on the side of its refined position, {@link FocusDesign#pairedSupport}) and the six (fewer
 *     where pairs meet) share the rest equally: in the interleaved order two neighbours are read in
 *     opposite halves of the sweep, so no support point is one long step at one moment of a changing wind.
 *     <i>SupportDwellTest, AllocationTest; hw-sim SupportDwellReachTest, SupportDwellRunTest.</i></li>
 * <li><b>R24 Alpha-clear band (opt-in).</b> With {@code focusStyle} bit 4 (16) on a design style (17, 19, 21,
 *     23, 29, 31; the table is refused without the design bit, as the band style has no alpha reach to leave
 *     out) the design band of R21 does not stretch to the alphas when their expected window lies at least
 *     2.5 high half-widths at half maximum above the refined peak ({@link FocusDesign#ALPHA_CLEAR_PER_HWHM_Q8},
 *     whole windows from the peak window against the Q8 half-width, integer; at exactly 2.5 the alphas are
 *     clear), by the high half-width of the spectrum the band is chosen from and by that of the spectrum the
 *     previous band was chosen from (a spectrum that mixes two winds, a front arriving during the sweep, reads
 *     narrow and would cut the band short of a peak that moved up: the strong shock then took 3 sweeps on 6 of
 *     10 seeds): the reach above is then 1.75 high half-widths plus {@code robustnessMarginWindows}. Closer
 *     alphas ride on the protons' flank and the band is R21's, reaching 1.0 half-width beyond them. The
 *     ground fits a band without the alpha peak with its constrained alpha component (ground-decoder
 *     fit AlphaCoverage PART and NONE). Everything else (dwell, order, support windows, lock) is unchanged;
 *     styles without the bit band exactly as before. <i>AlphaClearBandTest, AllocationTest (19, 31); hw-sim
 *     DesignStyleRunTest, SweepPropertiesTest (FocusTables.ALPHA_CLEAR); SchedulerStepBenchmark,
 *     SweepBoundaryBenchmark (19, 31).</i></li>
 * </ol>
 *
 * <h2>Choices worth knowing</h2>
 * <ul>
 * <li>Collapse and jump compare with the peak of the previous accepted focus (or survey) sweep, so slow
 *     trends are tracked, not flagged.</li>
 * <li>The parabola is fitted to the linear current, not its logarithm (no integer log on the step
 *     path); on the 1 AU spectrum it agrees with a floating-point parabola to about 0.01 window.</li>
 * <li>A step the executive abandons (SAFE, or a new nextStep before its reply) is left missing; a
 *     sweep whose last reply never came is closed at the next nextStep.</li>
 * </ul>
 * Threading: one thread, the executive's. The classes hold no static mutable state.
 */
package dev.sweepline.fsw.sweep;
