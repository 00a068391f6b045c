package dev.sweepline.sim.campaign;

import java.util.Map;

/**
 * The shard of {@code tune --shard auto}: taken from a batch scheduler's job-array environment.
 *
 * <ul>
 * <li><b>Slurm</b> job arrays ({@code sbatch --array}; Slurm "Job Array Support",
 *     https://slurm.schedmd.com/job_array.html): every task has {@code SLURM_ARRAY_TASK_ID} (its array
 *     index), {@code SLURM_ARRAY_TASK_MIN} and {@code _MAX} (the lowest and highest index of the array),
 *     {@code SLURM_ARRAY_TASK_COUNT} (the number of tasks) and {@code SLURM_ARRAY_TASK_STEP} (the step of
 *     {@code --array=A-B:S}; the four also in the sbatch manual's output environment variables,
 *     https://slurm.schedmd.com/sbatch.html [memory]). The shard is the task's
 *     place in the range MIN..MAX by STEP (1 when unset), counted from 1; the count is COUNT, or
 *     (MAX - MIN) / STEP + 1 without it. An index list that is no such range ({@code --array=1,3,8}) is
 *     refused: its COUNT disagrees with MIN, MAX and STEP.</li>
 * <li><b>Kubernetes</b> Indexed Jobs ({@code completionMode: Indexed}; "Indexed Job for Parallel Processing
 *     with Static Work Assignment", https://kubernetes.io/docs/tasks/job/indexed-parallel-processing-static):
 *     the control plane sets {@code JOB_COMPLETION_INDEX}, 0 .. {@code spec.completions} - 1. The
 *     completion count is not in the pod's environment: it comes from {@code --shards N} or from
 *     {@link #SHARD_COUNT} (the example Job sets it beside {@code completions}).</li>
 * </ul>
 * The environment is passed in as a map, so tests never touch the process's own.
 */
public final class ShardEnvironment {
    /** The variable giving the shard count where the scheduler does not (a Kubernetes Indexed Job). */
    public static final String SHARD_COUNT = "SWEEPLINE_SHARDS";
    static final String SLURM_ID = "SLURM_ARRAY_TASK_ID";
    static final String SLURM_MIN = "SLURM_ARRAY_TASK_MIN";
    static final String SLURM_MAX = "SLURM_ARRAY_TASK_MAX";
    static final String SLURM_STEP = "SLURM_ARRAY_TASK_STEP";
    static final String SLURM_COUNT = "SLURM_ARRAY_TASK_COUNT";
    static final String K8S_INDEX = "JOB_COMPLETION_INDEX";

    private ShardEnvironment() {
    }

    /**
     * The shard this job-array task runs.
     *
     * @param env    the environment (variable name to value)
     * @param shards the shard count given on the command line ({@code --shards}), or null
     * @throws IllegalArgumentException one line naming the variable and what is wrong: neither scheduler's
     *                                  variables set, both set, a value not a whole number, out of range
     */
    public static Shard of(Map<String, String> env, Integer shards) {
        boolean slurm = env.containsKey(SLURM_ID);
        boolean kubernetes = env.containsKey(K8S_INDEX);
        if (slurm && kubernetes) {
            throw new IllegalArgumentException("both " + SLURM_ID + " (Slurm) and " + K8S_INDEX
                    + " (Kubernetes) are set: give --shard i/N");
        }
        if (slurm) {
            return slurm(env, shards);
        }
        if (kubernetes) {
            return kubernetes(env, shards);
        }
        throw new IllegalArgumentException("no job array in the environment: neither " + SLURM_ID + " (Slurm sbatch --array) "
                + "nor " + K8S_INDEX + " (Kubernetes Indexed Job) is set; give --shard i/N");
    }

    private static Shard slurm(Map<String, String> env, Integer shards) {
        long id = number(env, SLURM_ID, 0);
        if (!env.containsKey(SLURM_MIN)) {
            throw new IllegalArgumentException(SLURM_ID + " is set but " + SLURM_MIN + " is not: not a Slurm job array task");
        }
        long min = number(env, SLURM_MIN, 0);
        long step = env.containsKey(SLURM_STEP) ? number(env, SLURM_STEP, 1) : 1;
        Long count = env.containsKey(SLURM_COUNT) ? number(env, SLURM_COUNT, 1) : null;
        Long max = env.containsKey(SLURM_MAX) ? number(env, SLURM_MAX, 0) : null;
        if (count == null && max == null) {
            throw new IllegalArgumentException(SLURM_ID + " is set but neither " + SLURM_MAX + " nor " + SLURM_COUNT
                    + " is: the array's size is unknown");
        }
        if (max != null && max < min) {
            throw new IllegalArgumentException(SLURM_MAX + "=" + max + " is below " + SLURM_MIN + "=" + min);
        }
        long ranged = max == null ? count : (max - min) / step + 1;
        if (count != null && count != ranged) {
            throw new IllegalArgumentException(SLURM_COUNT + "=" + count + " but " + SLURM_MIN + ".." + SLURM_MAX + " by "
                    + step + " holds " + ranged + " indexes: the array is not one range (--array=A-B[:S])");
        }
        if (id < min || (id - min) % step != 0 || (id - min) / step >= ranged) {
            throw new IllegalArgumentException(SLURM_ID + "=" + id + " is not an index of the array " + min + "-"
                    + (min + (ranged - 1) * step) + (step == 1 ? "" : ":" + step));
        }
        checkGiven(shards, ranged, "the Slurm array has " + ranged + " tasks");
        return shard((id - min) / step + 1, ranged, SLURM_COUNT);
    }

    private static Shard kubernetes(Map<String, String> env, Integer shards) {
        long index = number(env, K8S_INDEX, 0);
        long count;
        if (shards != null) {
            count = shards;
            if (env.containsKey(SHARD_COUNT)) {
                checkGiven(shards, number(env, SHARD_COUNT, 1), SHARD_COUNT + "=" + env.get(SHARD_COUNT));
            }
        } else if (env.containsKey(SHARD_COUNT)) {
            count = number(env, SHARD_COUNT, 1);
        } else {
            throw new IllegalArgumentException(K8S_INDEX + " is set but the shard count is not: give --shards N "
                    + "or set " + SHARD_COUNT + " (the Job's completions)");
        }
        if (index >= count) {
            throw new IllegalArgumentException(K8S_INDEX + "=" + index + " is outside 0.." + (count - 1)
                    + " (" + count + " shards)");
        }
        return shard(index + 1, count, SHARD_COUNT);
    }

    private static void checkGiven(Integer shards, long count, String what) {
        if (shards != null && shards != count) {
            throw new IllegalArgumentException("--shards " + shards + " disagrees with the environment: " + what);
        }
    }

    private static Shard shard(long index, long count, String name) {
        if (count > Integer.MAX_VALUE) {
            throw new IllegalArgumentException(name + ": " + count + " shards is more than " + Integer.MAX_VALUE);
        }
        return new Shard((int) index, (int) count);
    }

    /** The whole number in {@code name}, at least {@code least}. */
    private static long number(Map<String, String> env, String name, long least) {
        String text = env.get(name);
        long value;
        try {
            value = Long.parseLong(text.trim());
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException(name + "='" + text + "' is not a whole number");
        }
        if (value < least) {
            throw new IllegalArgumentException(name + "=" + value + " is below " + least);
        }
        return value;
    }
}
