package dev.sweepline.fsw.fault;

import dev.sweepline.fsw.instrument.InstrumentDescription;
import dev.sweepline.fsw.link.SampleReply;
import dev.sweepline.fsw.link.StepCommand;

/**
 * The monitors that look at every sample: HV readback, ADC saturation and stuck channel
 * (commands.md §6). Each keeps a streak of consecutive offending steps and trips when the streak
 * reaches its threshold (the streak then starts again). Integer arithmetic, no allocation.
 */
final class StepMonitors {
    private final FaultSettings settings;
    private final int adcTopCode;
    private final int[] lastCode = new int[InstrumentDescription.QUADRANTS];
    private final int[] sameRun = new int[InstrumentDescription.QUADRANTS];
    private boolean haveLast;
    private int hvStreak;
    private int saturationStreak;
    /** Detail of the last trip of each monitor (telemetry ICD §6 event 2 reason field). */
    final int[] detail = new int[FaultMonitorId.COUNT + 1];

    /** Monitors reading {@code settings} (shared, kept current by the caller) for an ADC whose top is {@code adcTopCode}. */
    StepMonitors(FaultSettings settings, int adcTopCode) {
        this.settings = settings;
        this.adcTopCode = adcTopCode;
    }

    /** Forgets every streak (after a configuration change or a response). */
    void reset() {
        hvStreak = 0;
        saturationStreak = 0;
        haveLast = false;
        for (int q = 0; q < sameRun.length; q++) {
            sameRun[q] = 0;
        }
    }

    /**
     * Looks at one sample.
     *
     * @return a bit mask of tripped monitors, bit {@code 1 << id}
     */
    int onSample(StepCommand step, SampleReply reply) {
        int tripped = 0;
        tripped |= hvReadback(step, reply);
        tripped |= saturation(step, reply);
        tripped |= stuckChannel(reply);
        return tripped;
    }

    private int hvReadback(StepCommand step, SampleReply reply) {
        int n = settings.threshold[FaultMonitorId.HV_READBACK];
        if (n == 0 || !step.hvEnabled) {
            hvStreak = 0;
            return 0;
        }
        int difference = Math.abs(reply.hvMonitorCode - step.dacHigh);
        if (difference <= settings.limit[FaultMonitorId.HV_READBACK]) {
            hvStreak = 0;
            return 0;
        }
        if (++hvStreak < n) {
            return 0;
        }
        hvStreak = 0;
        detail[FaultMonitorId.HV_READBACK] = Math.min(difference, 0xFFFF);
        return 1 << FaultMonitorId.HV_READBACK;
    }

    private int saturation(StepCommand step, SampleReply reply) {
        int n = settings.threshold[FaultMonitorId.ADC_SATURATION];
        boolean top = (reply.status & SampleReply.STATUS_SATURATED) != 0;
        for (int q = 0; q < InstrumentDescription.QUADRANTS && !top; q++) {
            top = reply.quadrant[q] >= adcTopCode;
        }
        if (n == 0 || !top) {
            saturationStreak = 0;
            return 0;
        }
        if (++saturationStreak < n) {
            return 0;
        }
        saturationStreak = 0;
        detail[FaultMonitorId.ADC_SATURATION] = step.window & 0xFFFF;
        return 1 << FaultMonitorId.ADC_SATURATION;
    }

    private int stuckChannel(SampleReply reply) {
        int n = settings.threshold[FaultMonitorId.STUCK_CHANNEL];
        int[] code = reply.quadrant;
        if (n == 0 || !haveLast) {
            copyLast(code);
            return 0;
        }
        int limit = settings.limit[FaultMonitorId.STUCK_CHANNEL];
        int tripped = 0;
        for (int q = 0; q < InstrumentDescription.QUADRANTS; q++) {
            if (code[q] != lastCode[q] || code[q] >= adcTopCode) {
                sameRun[q] = 0;
            } else if (otherMoved(q, code, limit)) {
                if (++sameRun[q] >= n) {
                    sameRun[q] = 0;
                    detail[FaultMonitorId.STUCK_CHANNEL] = q + 1;
                    tripped = 1 << FaultMonitorId.STUCK_CHANNEL;
                }
            }
        }
        copyLast(code);
        return tripped;
    }

    private boolean otherMoved(int stuck, int[] code, int limit) {
        for (int q = 0; q < InstrumentDescription.QUADRANTS; q++) {
            if (q != stuck && Math.abs(code[q] - lastCode[q]) > limit) {
                return true;
            }
        }
        return false;
    }

    private void copyLast(int[] code) {
        System.arraycopy(code, 0, lastCode, 0, lastCode.length);
        haveLast = true;
    }
}
