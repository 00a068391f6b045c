package dev.sweepline.sim.campaign;

/**
 * One deterministic slice of a campaign for a cluster job array: shard {@code index} of
 * {@code count} (1-based) owns the jobs whose number is {@code index - 1} modulo {@code count}.
 * Merging the shards' run files gives exactly the unsharded result.
 *
 * @param index 1..count
 * @param count number of shards
 */
public record Shard(int index, int count) {
    /** The whole campaign. */
    public static final Shard ALL = new Shard(1, 1);

    /** Checks the range. */
    public Shard {
        if (count < 1 || index < 1 || index > count) {
            throw new IllegalArgumentException("shard " + index + "/" + count + ": need 1 <= i <= N");
        }
    }

    /** Parses {@code i/N}. */
    public static Shard parse(String text) {
        String[] parts = text.split("/", -1);
        if (parts.length != 2) {
            throw new IllegalArgumentException("shard '" + text + "': expected i/N, e.g. 3/8");
        }
        try {
            return new Shard(Integer.parseInt(parts[0].trim()), Integer.parseInt(parts[1].trim()));
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException("shard '" + text + "': expected i/N, e.g. 3/8", e);
        }
    }

    /** True when this shard runs job {@code job}. */
    public boolean owns(long job) {
        return job % count == index - 1;
    }

    /** True for the unsharded campaign. */
    public boolean whole() {
        return count == 1;
    }

    @Override
    public String toString() {
        return index + "/" + count;
    }
}
