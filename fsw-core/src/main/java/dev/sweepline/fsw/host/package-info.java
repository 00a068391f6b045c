/**
 * The host adapter: the flight software on a PC (the only fsw-core package with threads, clocks,
 * sockets, jSerialComm and picocli). {@link dev.sweepline.fsw.host.FswMain} {@code run} opens a
 * {@link dev.sweepline.fsw.host.SerialTransport} or {@link dev.sweepline.fsw.host.TcpTransport}, puts
 * an {@link dev.sweepline.fsw.host.HvGuardLink} (HV off unless armed then fired,
 * {@link dev.sweepline.fsw.host.HvArming}) in front of the
 * {@link dev.sweepline.fsw.link.FramedInstrumentLink}, and drives the flight software with a
 * {@link dev.sweepline.fsw.host.RealTimeLoop} (monotonic clock read once per cycle) or a
 * {@link dev.sweepline.fsw.host.LinkClockLoop} (simulated time driven by link events; hardware ICD §7).
 */
package dev.sweepline.fsw.host;
