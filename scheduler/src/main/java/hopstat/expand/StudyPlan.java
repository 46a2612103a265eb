package hopstat.expand;

import hopstat.spec.JobSpec;
import hopstat.task.RealisationTask;
import hopstat.task.SeedOps;
import java.util.ArrayList;
import java.util.List;

/**
 * A job spec expanded into grid points. Tasks are derived on demand: realisation r at point p has
 * id {@code p<p>-r<r>} and seed {@link SeedOps#realisationSeed}(spec seed, p, r).
 *
 * @param spec the validated spec
 * @param gridNames names of the grid axes, spec order ({@code L} included)
 * @param points the grid points in index order
 */
public record StudyPlan(JobSpec spec, List<String> gridNames, List<GridPoint> points) {

  public StudyPlan {
    gridNames = List.copyOf(gridNames);
    points = List.copyOf(points);
  }

  /** The task for realisation {@code realisation} at point {@code pointIndex}. */
  public RealisationTask task(int pointIndex, int realisation) {
    GridPoint p = points.get(pointIndex);
    return new RealisationTask(
        RealisationTask.idOf(pointIndex, realisation),
        pointIndex,
        realisation,
        SeedOps.realisationSeed(spec.seed(), pointIndex, realisation),
        p.point());
  }

  /**
   * Tasks for realisations {@code from..to−1} at every point, realisation-major (all points'
   * realisation r before any point's r + 1), so an interrupted run has spread its samples evenly.
   */
  public List<RealisationTask> tasks(int from, int to) {
    List<RealisationTask> tasks = new ArrayList<>(Math.max(0, to - from) * points.size());
    for (int r = from; r < to; r++) {
      for (int p = 0; p < points.size(); p++) {
        tasks.add(task(p, r));
      }
    }
    return tasks;
  }

  /** Planned task count with the spec's (maximum) realisations. */
  public long plannedTasks() {
    return (long) spec.realisations() * points.size();
  }
}
