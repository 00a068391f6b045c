package dev.sweepline.fsw.fault;

import dev.sweepline.fsw.link.SampleReply;
import dev.sweepline.fsw.link.StepCommand;
import dev.sweepline.fsw.report.EventWriter;
import dev.sweepline.fsw.sweep.Spectrum;
import dev.sweepline.fsw.sweep.SweepMode;
import dev.sweepline.fsw.sweep.SweepScheduler;
import dev.sweepline.fsw.table.SweepParameters;
import dev.sweepline.fsw.table.TableStatus;

/**
 * Fault protection (fault design note): the monitors detect during the scheduler's callbacks, the
 * responses are taken afterwards in {@link #respond}, once per executive cycle, outside every
 * scheduler call (a mode change from inside a callback would cut a sweep the scheduler is still
 * completing). Each response is reported as an event (telemetry ICD §6, event 2).
 *
 * <p>RETRY resets the monitor (the link monitor also resumes SURVEY) and costs one of the monitor's
 * retries; with none left the response is SAFE. A completed sweep in which a monitor did not trip
 * gives it its retries back. Allocation-free after construction; one thread, the executive's.
 */
public final class FaultProtection {
    /** Event id of a fault response (telemetry ICD §6). */
    public static final int EVENT_FAULT = EventWriter.FAULT_RESPONSE;
    /** {@link #respond} result bit: a SAFE response was taken (the caller switches the HV off). */
    public static final int SAFE_TAKEN = 1;

    private final SweepScheduler scheduler;
    private final EventWriter events;
    private final FaultSettings settings = new FaultSettings();
    private final StepMonitors steps;
    private final SweepParameters work = new SweepParameters();
    private final int[] retriesUsed = new int[FaultMonitorId.COUNT + 1];
    private final long[] trips = new long[FaultMonitorId.COUNT + 1];
    private final int[] detail;
    private int pending;
    private int trippedThisSweep;
    private int peakLostSweeps;
    private int overrunCycles;
    private long lastSafeEntries;
    private long totalTrips;

    /**
     * @throws IllegalArgumentException if {@code initial} does not validate (programmer misuse)
     */
    public FaultProtection(FaultSettings initial, SweepScheduler scheduler, EventWriter events) {
        this.scheduler = scheduler;
        this.events = events;
        this.steps = new StepMonitors(settings, scheduler.instrument().adcTopCode());
        this.detail = steps.detail;
        if (configure(initial) != 0) {
            throw new IllegalArgumentException("fault settings refused");
        }
    }

    /**
     * Puts new settings in force (copied), resetting every streak and retry budget.
     *
     * @return 0, or the id of the monitor whose entry is out of range (then nothing changes)
     */
    public int configure(FaultSettings s) {
        int bad = s.validate();
        if (bad != 0) {
            return bad;
        }
        settings.copyFrom(s);
        steps.reset();
        peakLostSweeps = 0;
        overrunCycles = 0;
        for (int m = 0; m < retriesUsed.length; m++) {
            retriesUsed[m] = 0;
        }
        return 0;
    }

    /** Copies the settings in force into {@code into}. */
    public void settings(FaultSettings into) {
        into.copyFrom(settings);
    }

    // ------------------------------------------------------------ detection (inside callbacks)

    /** Looks at one sample (scheduler callback): detection only. */
    public void onSample(StepCommand step, SampleReply reply) {
        trip(steps.onSample(step, reply));
    }

    /** Looks at one completed sweep (scheduler callback): peak-lost detection, retry budgets. */
    public void onSweepComplete(Spectrum s) {
        int n = settings.threshold[FaultMonitorId.PEAK_LOST];
        if (n == 0 || s.peakValid()) {
            peakLostSweeps = 0;
        } else if (++peakLostSweeps >= n) {
            detail[FaultMonitorId.PEAK_LOST] = Math.min(peakLostSweeps, 0xFFFF);
            peakLostSweeps = 0;
            trip(1 << FaultMonitorId.PEAK_LOST);
        }
        for (int m = 1; m <= FaultMonitorId.COUNT; m++) {
            if ((trippedThisSweep & (1 << m)) == 0) {
                retriesUsed[m] = 0;
            }
        }
        trippedThisSweep = 0;
    }

    /**
     * The work of the last executive cycle, in ticks (microseconds), as the host measured it: the
     * flight software has no clock, so the host passes the time. Not monitored in SAFE: nothing is
     * stepped there, and a SAFE response must not repeat every N cycles.
     */
    public void onCycleWork(long workTicks) {
        int n = settings.threshold[FaultMonitorId.CYCLE_OVERRUN];
        if (n == 0 || workTicks <= settings.limit[FaultMonitorId.CYCLE_OVERRUN] || scheduler.mode() == SweepMode.SAFE) {
            overrunCycles = 0;
            return;
        }
        if (++overrunCycles >= n) {
            overrunCycles = 0;
            detail[FaultMonitorId.CYCLE_OVERRUN] = (int) Math.min(workTicks, 0xFFFF);
            trip(1 << FaultMonitorId.CYCLE_OVERRUN);
        }
    }

    private void trip(int mask) {
        pending |= mask;
        trippedThisSweep |= mask;
    }

    // ------------------------------------------------------------ responses (once per cycle)

    /**
     * Takes the responses of every monitor that tripped since the last call, in monitor id order,
     * and checks the link monitor against the executive's SAFE entries.
     *
     * @param executiveSafeEntries the executive's count of SAFE entries for a link time-out
     * @param hvEnabled            whether the HV may be on (a link retry resumes SURVEY only then)
     * @return {@link #SAFE_TAKEN} when a SAFE response was taken, else 0
     */
    public int respond(long executiveSafeEntries, boolean hvEnabled, long nowMicros) {
        if (executiveSafeEntries != lastSafeEntries) {
            lastSafeEntries = executiveSafeEntries;
            if (settings.threshold[FaultMonitorId.LINK_TIMEOUT] != 0) {
                detail[FaultMonitorId.LINK_TIMEOUT] = (int) Math.min(executiveSafeEntries, 0xFFFF);
                trip(1 << FaultMonitorId.LINK_TIMEOUT);
            }
        }
        if (pending == 0) {
            return 0;
        }
        int result = 0;
        for (int m = 1; m <= FaultMonitorId.COUNT; m++) {
            if ((pending & (1 << m)) != 0) {
                int taken = take(m, hvEnabled, nowMicros);
                trips[m]++;
                totalTrips++;
                writeEvent(m, taken, detail[m], nowMicros);
                if (taken == FaultResponse.SAFE) {
                    result = SAFE_TAKEN;
                }
            }
        }
        pending = 0;
        return result;
    }

    private int take(int monitor, boolean hvEnabled, long nowMicros) {
        int response = settings.response[monitor];
        switch (response) {
            case FaultResponse.NONE:
                return FaultResponse.NONE;
            case FaultResponse.RETRY:
                if (retriesUsed[monitor] >= settings.retries[monitor]) {
                    return safe(nowMicros);
                }
                retriesUsed[monitor]++;
                steps.reset();
                if (monitor == FaultMonitorId.LINK_TIMEOUT && hvEnabled && scheduler.mode() == SweepMode.SAFE) {
                    scheduler.requestMode(SweepMode.SURVEY, FaultResponse.MODE_CHANGE_REASON, nowMicros);
                }
                return FaultResponse.RETRY;
            case FaultResponse.GAIN:
                return lowerGain(nowMicros);
            case FaultResponse.SURVEY:
                if (scheduler.mode() == SweepMode.FOCUS) {
                    scheduler.requestMode(SweepMode.SURVEY, FaultResponse.MODE_CHANGE_REASON, nowMicros);
                }
                return FaultResponse.SURVEY;
            case FaultResponse.SAFE:
                return safe(nowMicros);
            default:
                throw new IllegalStateException("unknown fault response " + response);
        }
    }

    /**
     * Halves both gain-switch thresholds of the parameters that fly from the next sweep boundary (a committed
     * table's, when one waits for it); SAFE when the result would not validate (the floor).
     */
    private int lowerGain(long nowMicros) {
        scheduler.nextParameters(work);
        work.gainUpFractionQ16 >>= 1;
        work.gainDownFractionQ16 >>= 1;
        if (scheduler.loadParameters(work) != TableStatus.OK) {
            return safe(nowMicros);
        }
        steps.reset();
        return FaultResponse.GAIN;
    }

    private int safe(long nowMicros) {
        scheduler.requestMode(SweepMode.SAFE, FaultResponse.MODE_CHANGE_REASON, nowMicros);
        return FaultResponse.SAFE;
    }

    private void writeEvent(int monitor, int response, int eventDetail, long nowMicros) {
        events.write(EventWriter.FAULT_RESPONSE, monitor, response, eventDetail, nowMicros);
    }

    // ------------------------------------------------------------ counters

    /** Trips of {@code monitor} since start (or the last counter reset). */
    public long trips(int monitor) {
        return trips[monitor];
    }

    /** Trips of every monitor since start (or the last counter reset). */
    public long totalTrips() {
        return totalTrips;
    }

    /** Clears the trip counters (a ground command). */
    public void resetCounters() {
        for (int m = 0; m < trips.length; m++) {
            trips[m] = 0;
        }
        totalTrips = 0;
    }
}
