package hopstat.task;

import java.util.Objects;

/**
 * One unit of work: one disorder realisation at one grid point. Pure data, so any worker on any
 * host reproduces it.
 *
 * @param taskId stable id {@code p<point>-r<realisation>}, 0-based indices
 * @param pointIndex 0-based index of the grid point in the expanded grid
 * @param realisationIndex 0-based index of the realisation at that point
 * @param seed the realisation's seed, from {@link SeedOps#realisationSeed}
 * @param point the grid point's resolved specification
 */
public record RealisationTask(
    String taskId, int pointIndex, int realisationIndex, long seed, PointSpec point) {

  public RealisationTask {
    Objects.requireNonNull(taskId, "taskId");
    Objects.requireNonNull(point, "point");
    if (pointIndex < 0 || realisationIndex < 0) {
      throw new IllegalArgumentException("indices must be non-negative");
    }
  }

  /** The canonical task id of (point, realisation). */
  public static String idOf(int pointIndex, int realisationIndex) {
    return "p" + pointIndex + "-r" + realisationIndex;
  }
}
