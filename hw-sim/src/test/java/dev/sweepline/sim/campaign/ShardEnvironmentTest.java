package dev.sweepline.sim.campaign;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.HashMap;
import java.util.Map;
import org.junit.jupiter.api.Test;

/**
 * {@code tune --shard auto}: the shard from a job array's environment. The variables and their meaning:
 * Slurm "Job Array Support" (https://slurm.schedmd.com/job_array.html: SLURM_ARRAY_TASK_ID is the task's
 * array index; _MIN, _MAX, _STEP, _COUNT describe the array); Kubernetes "Indexed Job for Parallel
 * Processing with Static Work Assignment" (JOB_COMPLETION_INDEX, 0 to completions - 1).
 */
class ShardEnvironmentTest {
    private static Map<String, String> env(String... pairs) {
        Map<String, String> m = new HashMap<>();
        for (int i = 0; i < pairs.length; i += 2) {
            m.put(pairs[i], pairs[i + 1]);
        }
        return m;
    }

    private static String refused(Map<String, String> env, Integer shards) {
        return assertThrows(IllegalArgumentException.class, () -> ShardEnvironment.of(env, shards)).getMessage();
    }

    @Test
    void shouldNumberASlurmRangeFromOne() {
        // sbatch --array=0-7: task 3 is the fourth of eight
        assertEquals(new Shard(4, 8), ShardEnvironment.of(env("SLURM_ARRAY_TASK_ID", "3", "SLURM_ARRAY_TASK_MIN", "0",
                "SLURM_ARRAY_TASK_MAX", "7", "SLURM_ARRAY_TASK_COUNT", "8", "SLURM_ARRAY_TASK_STEP", "1"), null));
        // sbatch --array=1-16 without COUNT in the environment: the size from MIN and MAX
        assertEquals(new Shard(16, 16), ShardEnvironment.of(env("SLURM_ARRAY_TASK_ID", "16", "SLURM_ARRAY_TASK_MIN", "1",
                "SLURM_ARRAY_TASK_MAX", "16"), null));
        // only COUNT: the size from it
        assertEquals(new Shard(1, 5), ShardEnvironment.of(env("SLURM_ARRAY_TASK_ID", "10", "SLURM_ARRAY_TASK_MIN", "10",
                "SLURM_ARRAY_TASK_COUNT", "5"), null));
    }

    @Test
    void shouldCountAStepInTheSlurmRange() {
        // sbatch --array=1-7:2 is 1, 3, 5, 7 (job_array.html's own example): 5 is the third of four
        assertEquals(new Shard(3, 4), ShardEnvironment.of(env("SLURM_ARRAY_TASK_ID", "5", "SLURM_ARRAY_TASK_MIN", "1",
                "SLURM_ARRAY_TASK_MAX", "7", "SLURM_ARRAY_TASK_STEP", "2", "SLURM_ARRAY_TASK_COUNT", "4"), null));
    }

    @Test
    void shouldRefuseASlurmIndexListThatIsNoRange() {
        // sbatch --array=1,3,8: MIN 1, MAX 8, COUNT 3 (no step fits)
        String m = refused(env("SLURM_ARRAY_TASK_ID", "3", "SLURM_ARRAY_TASK_MIN", "1", "SLURM_ARRAY_TASK_MAX", "8",
                "SLURM_ARRAY_TASK_COUNT", "3"), null);
        assertTrue(m.contains("SLURM_ARRAY_TASK_COUNT=3") && m.contains("not one range"), m);
    }

    @Test
    void shouldRefuseBrokenSlurmValues() {
        assertTrue(refused(env("SLURM_ARRAY_TASK_ID", "x3", "SLURM_ARRAY_TASK_MIN", "0", "SLURM_ARRAY_TASK_MAX", "7"),
                null).contains("SLURM_ARRAY_TASK_ID='x3' is not a whole number"));
        assertTrue(refused(env("SLURM_ARRAY_TASK_ID", "9", "SLURM_ARRAY_TASK_MIN", "0", "SLURM_ARRAY_TASK_MAX", "7"),
                null).contains("SLURM_ARRAY_TASK_ID=9 is not an index of the array 0-7"));
        assertTrue(refused(env("SLURM_ARRAY_TASK_ID", "4", "SLURM_ARRAY_TASK_MIN", "1", "SLURM_ARRAY_TASK_MAX", "7",
                "SLURM_ARRAY_TASK_STEP", "2"), null).contains("not an index of the array 1-7:2"));
        assertTrue(refused(env("SLURM_ARRAY_TASK_ID", "4", "SLURM_ARRAY_TASK_MAX", "7"), null)
                .contains("SLURM_ARRAY_TASK_MIN is not"));
        assertTrue(refused(env("SLURM_ARRAY_TASK_ID", "4", "SLURM_ARRAY_TASK_MIN", "0"), null)
                .contains("neither SLURM_ARRAY_TASK_MAX nor SLURM_ARRAY_TASK_COUNT"));
        assertTrue(refused(env("SLURM_ARRAY_TASK_ID", "-1", "SLURM_ARRAY_TASK_MIN", "0", "SLURM_ARRAY_TASK_MAX", "3"),
                null).contains("SLURM_ARRAY_TASK_ID=-1 is below 0"));
        assertTrue(refused(env("SLURM_ARRAY_TASK_ID", "1", "SLURM_ARRAY_TASK_MIN", "0", "SLURM_ARRAY_TASK_MAX", "3"),
                3).contains("--shards 3 disagrees with the environment: the Slurm array has 4 tasks"));
    }

    @Test
    void shouldTakeTheKubernetesCountFromTheOptionOrTheVariable() {
        assertEquals(new Shard(1, 5), ShardEnvironment.of(env("JOB_COMPLETION_INDEX", "0"), 5));
        assertEquals(new Shard(5, 5), ShardEnvironment.of(env("JOB_COMPLETION_INDEX", "4", "SWEEPLINE_SHARDS", "5"), null));
        assertEquals(new Shard(2, 5), ShardEnvironment.of(env("JOB_COMPLETION_INDEX", "1", "SWEEPLINE_SHARDS", "5"), 5));
    }

    @Test
    void shouldRefuseBrokenKubernetesValues() {
        // completions 5: the indexes are 0..4
        assertTrue(refused(env("JOB_COMPLETION_INDEX", "5", "SWEEPLINE_SHARDS", "5"), null)
                .contains("JOB_COMPLETION_INDEX=5 is outside 0..4 (5 shards)"));
        assertTrue(refused(env("JOB_COMPLETION_INDEX", "2"), null).contains("give --shards N or set SWEEPLINE_SHARDS"));
        assertTrue(refused(env("JOB_COMPLETION_INDEX", "2", "SWEEPLINE_SHARDS", "zero"), null)
                .contains("SWEEPLINE_SHARDS='zero' is not a whole number"));
        assertTrue(refused(env("JOB_COMPLETION_INDEX", "0", "SWEEPLINE_SHARDS", "0"), null)
                .contains("SWEEPLINE_SHARDS=0 is below 1"));
        assertTrue(refused(env("JOB_COMPLETION_INDEX", "0", "SWEEPLINE_SHARDS", "4"), 5).contains("--shards 5 disagrees"));
    }

    @Test
    void shouldSayWhenNoJobArrayIsThere() {
        String m = refused(env("HOME", "/root", "SLURM_JOB_ID", "17"), null);
        assertTrue(m.contains("no job array in the environment") && m.contains("give --shard i/N"), m);
        assertTrue(refused(env("SLURM_ARRAY_TASK_ID", "1", "JOB_COMPLETION_INDEX", "1"), 4).contains("both"));
    }
}
