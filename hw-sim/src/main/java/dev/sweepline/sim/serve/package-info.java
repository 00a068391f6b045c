/**
 * The simulated instrument as a server on a real link, and the link's fault injection: design note.
 *
 * <h2>What it does</h2>
 * {@link dev.sweepline.sim.serve.InstrumentServer} speaks the hardware ICD on any
 * {@link dev.sweepline.fsw.link.ByteTransport} (serial, TCP, in-process pipe): it deframes step
 * commands, executes each with a {@link dev.sweepline.sim.serve.StepExecutor} (normally
 * {@link dev.sweepline.sim.serve.ScenarioInstrument}) and replies, paced in real time, at a speed-up,
 * or at once. {@link dev.sweepline.sim.serve.FaultyTransport} damages the traffic (bit flips, lost
 * and duplicated octets, stalls, seeded) and keeps a {@link dev.sweepline.sim.serve.FaultLedger} of
 * what the receivers must see. The serial link's load is sized in the link package
 * ({@code dev.sweepline.sim.link.LinkBudget}).
 *
 * <h2>Requirements and how each is verified</h2>
 * <ol>
 * <li><b>S1</b> Same seed, same samples as the in-process bench: the instrument's clock is the sum of
 *     the executed steps' durations, the noise seed is the run seed tree's {@code instrument()}, the plasma
 *     is taken at mid-integration. <i>LinkClockEquivalenceTest, SerialHilTest.</i></li>
 * <li><b>S2</b> A repeat of the last executed sequence number gets the stored reply without a second
 *     execution; a step with low &ge; high runs with the HV off. <i>InstrumentServerTest.</i></li>
 * <li><b>S3</b> Every damaged frame is discarded and counted on both sides; the counts add up exactly
 *     to the ledger; no wrong sample is accepted. <i>LinkFaultTest.</i></li>
 * <li><b>S4</b> (the link budget) is the link package's L2.</li>
 * <li><b>S5</b> The link watchdog of the hardware ICD §4.1: with the HV on, no valid step frame for
 *     2000 ms of wall time after the last reply (not at exactly 2000 ms), or the end of the stream,
 *     switches the HV off and is reported in housekeeping (status bit 1, trip count).
 *     <i>InstrumentServerTest (T - 1 ms, T, T + 1 ms on an injected clock), RunHvShutdownHilTest.</i></li>
 * <li><b>S6</b> Bounded work per cycle: one 256-octet receive buffer, at most 8 reads per
 *     {@code doWork}, so a peer flooding the line cannot hold a cycle; what a cycle leaves is read by the
 *     next. <i>InstrumentServerTest.</i></li>
 * </ol>
 * Threading: each server and injector on one thread.
 */
package dev.sweepline.sim.serve;
