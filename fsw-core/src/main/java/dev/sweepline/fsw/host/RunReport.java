package dev.sweepline.fsw.host;

import dev.sweepline.fsw.exec.Executive;
import dev.sweepline.fsw.exec.FlightSoftware;
import dev.sweepline.fsw.link.FramedInstrumentLink;
import dev.sweepline.fsw.link.HousekeepingCodec;
import dev.sweepline.fsw.link.HousekeepingReply;
import dev.sweepline.fsw.link.LinkCounters;
import dev.sweepline.fsw.link.SampleReply;
import java.io.PrintStream;

/** What {@code sweepline-fsw.jar run} prints at the end: the flight software's counters and the electronics' housekeeping. */
final class RunReport {
    /** Housekeeping polls at most, 10 ms apart: about half a second for the electronics to answer. */
    private static final int HOUSEKEEPING_POLLS = 50;

    private RunReport() {
    }

    /** The executive's, the link's, the guard's and the telemetry's counters. */
    static void print(FlightSoftware fsw, FramedInstrumentLink framed, HvGuardLink guard, StreamFrameSink sink,
            PrintStream out) {
        Executive e = fsw.executive();
        LinkCounters c = framed.counters();
        out.printf("mode %s; steps sent %d, replies %d, sequence errors %d, time-outs %d, retries %d, safe entries %d%n",
                fsw.scheduler().mode(), e.stepsSent(), e.repliesAccepted(), e.sequenceErrors(), e.timeouts(),
                e.retries(), e.safeEntries());
        out.printf("link frames good %d, bad %d (CRC %d, COBS %d, length %d, type %d, wrong length %d), empty %d%n",
                c.framesGood, c.framesBad(), c.badCrc, c.badCobs, c.badLength, c.unknownType, c.wrongLength,
                c.emptyChunks);
        out.printf("steps sent with HV cleared (not fired): %d; telemetry frames written: %d%n",
                guard.stepsWithHvCleared(), sink.frames());
    }

    /**
     * Asks the electronics for their housekeeping (hardware ICD §3.3) and prints their side of the link:
     * what they received good and bad, their last step, HV monitors, status and temperature. Waits at
     * most about half a second; electronics that do not answer are reported as such.
     */
    static void printElectronics(FramedInstrumentLink framed, PrintStream out) {
        long before = framed.housekeepingReplies();
        boolean sent = false;
        SampleReply late = new SampleReply();
        for (int i = 0; i < HOUSEKEEPING_POLLS && framed.housekeepingReplies() == before && !framed.ended(); i++) {
            sent = sent || framed.requestHousekeeping(0xFFFF);
            framed.pump();
            framed.poll(late, Long.MAX_VALUE); // a sample reply still held would stop the reading
            try {
                Thread.sleep(10);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                return;
            }
        }
        if (framed.housekeepingReplies() == before) {
            out.println("electronics: no housekeeping reply");
            return;
        }
        HousekeepingReply h = framed.housekeeping();
        out.printf("electronics: frames good %d, bad %d; last step %d; HV monitors %d / %d codes, HV output %s%s, "
                + "link watchdog trips %d; %.2f degC%n",
                h.framesGood, h.framesBad, h.lastStepSequence, h.hvMonitorLowCode, h.hvMonitorHighCode,
                (h.status & HousekeepingCodec.STATUS_HV_ON) != 0 ? "on" : "off",
                (h.status & HousekeepingCodec.STATUS_WATCHDOG_OFF) != 0 ? " (switched off by the link watchdog)" : "",
                h.watchdogTrips, h.temperatureCentiCelsius / 100.0);
    }
}
