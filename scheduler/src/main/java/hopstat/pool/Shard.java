package hopstat.pool;

/**
 * A slice of a study's tasks for one of several processes (cluster array elements). Shards split by
 * grid point ({@code pointIndex mod count == index}), so adaptive sampling, which decides per
 * point, stays inside one shard and needs no coordination.
 *
 * @param index 0-based shard index
 * @param count number of shards, ≥ 1
 */
public record Shard(int index, int count) {

  /** The whole study in one process. */
  public static final Shard ALL = new Shard(0, 1);

  public Shard {
    if (count < 1 || index < 0 || index >= count) {
      throw new IllegalArgumentException("need 0 <= index < count: " + index + "/" + count);
    }
  }

  public boolean contains(int pointIndex) {
    return pointIndex % count == index;
  }
}
