package dev.sweepline.fsw.host;

import dev.sweepline.fsw.DemoCup;
import dev.sweepline.fsw.link.ByteTransport;
import dev.sweepline.fsw.link.FrameReceiver;
import dev.sweepline.fsw.link.FrameSender;
import dev.sweepline.fsw.link.HousekeepingCodec;
import dev.sweepline.fsw.link.HousekeepingReply;
import dev.sweepline.fsw.link.LinkCounters;
import dev.sweepline.fsw.link.MessageType;
import dev.sweepline.fsw.link.SampleReply;
import dev.sweepline.fsw.link.StepCommand;
import dev.sweepline.fsw.link.StepCommandCodec;

/**
 * The least electronics the host tests need (hardware ICD §3): answers every step at once with a
 * sample whose HV monitor is the commanded high code while the HV is enabled and {@link #offMonitorCode}
 * otherwise, with status bit 2 for a step with the HV off; answers housekeeping requests. Counts the
 * steps. The quadrants carry a constant current, so the flight software's decisions, and with the
 * link-event clock its whole time line, are the same on every run.
 *
 * <p>Threading: one thread at a time; the counters are volatile for a test thread that waits on them.
 */
final class FakeElectronics {
    /**
     * HV monitor with the HV off, DAC codes: 8, the simulated electronics' reading of 0 V (their
     * monitor offset of -0.8 V at 0.1 V per code, hw-sim HvCalibration.demo).
     */
    static final int OFF_READING_CODES = 8;

    private final ByteTransport transport;
    private final LinkCounters counters = new LinkCounters();
    private final FrameReceiver receiver = new FrameReceiver(counters, DemoCup.REPLIES);
    private final FrameSender sender;
    private final StepCommand step = new StepCommand();
    private final SampleReply reply = new SampleReply();
    private final HousekeepingReply hk = new HousekeepingReply();
    private final byte[] out = new byte[64];
    private final byte[] in = new byte[256];
    /** HV monitor the electronics report with the HV off (an electronics whose HV does not fall reports more). */
    volatile int offMonitorCode = OFF_READING_CODES;
    /** While true, frames are read and counted but nothing is answered. */
    volatile boolean silent;
    volatile long steps;
    volatile long stepsWithHv;
    volatile long hvOffSteps;
    /** The last step executed (its fields as decoded). */
    final StepCommand last = new StepCommand();
    private boolean ended;

    FakeElectronics(ByteTransport transport) {
        this.transport = transport;
        this.sender = new FrameSender(transport, counters);
    }

    /** Reads what has arrived and answers it; returns false once the stream has ended. */
    boolean doWork() {
        sender.flush();
        int n;
        while (!ended && (n = transport.read(in, 0, in.length)) != 0) {
            if (n < 0) {
                ended = true;
                break;
            }
            for (int i = 0; i < n; i++) {
                int type = receiver.accept(in[i]);
                if (type != FrameReceiver.NONE) {
                    answer(type);
                }
            }
        }
        return !ended && !sender.ended();
    }

    private void answer(int type) {
        byte[] p = receiver.payload();
        if (type == MessageType.STEP_COMMAND) {
            StepCommandCodec.decode(p, 0, receiver.payloadLength(), step);
            last.copyFrom(step);
            steps++;
            boolean hv = step.hvEnabled && step.dacLow < step.dacHigh;
            if (hv) {
                stepsWithHv++;
            } else if (step.dacLow == 0 && step.dacHigh == 0) {
                hvOffSteps++;
            }
            reply.sequence = step.sequence;
            reply.status = hv ? 0 : SampleReply.STATUS_HV_OFF;
            reply.gainRange = Math.min(2, step.gainRange);
            for (int q = 0; q < reply.quadrant.length; q++) {
                reply.quadrant[q] = 1_000;
            }
            reply.hvMonitorCode = hv ? step.dacHigh : offMonitorCode;
            if (!silent) {
                sender.send(out, 0, DemoCup.REPLIES.encode(reply, out, 0));
            }
        } else if (type == MessageType.HOUSEKEEPING_REQUEST && !silent) {
            hk.sequence = HousekeepingCodec.decodeRequest(p, 0, receiver.payloadLength());
            hk.hvMonitorHighCode = offMonitorCode;
            sender.send(out, 0, HousekeepingCodec.encodeReply(hk, out, 0));
        }
    }
}
