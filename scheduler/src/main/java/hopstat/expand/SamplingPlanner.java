package hopstat.expand;

import hopstat.record.RealisationRecord;
import hopstat.spec.SamplingSpec;
import hopstat.statistics.MeanEstimate;
import hopstat.statistics.SampleStatisticsOps;
import hopstat.task.Outcome;
import hopstat.task.RealisationTask;
import java.util.ArrayList;
import java.util.BitSet;
import java.util.Collection;
import java.util.List;

/**
 * Decides which realisations a run needs.
 *
 * <p>Fixed sampling: realisations 0..R−1 at every point. Adaptive sampling (spec {@code sampling}):
 * every point first gets realisations 0..minimum−1; whenever all realisations 0..k·batch−1 of a
 * point are finished, the targets are evaluated on exactly those realisations (DONE ones) and the
 * point either stops or gets the next batch, up to {@code maximum}. The decision for a point
 * depends only on realisations with fixed indices, whose results are fixed by their seeds, so the
 * set of realisations run is the same for any thread count, completion order or interruption.
 *
 * <p>Not thread-safe; the run coordinator calls it under its own lock.
 */
public final class SamplingPlanner {

  private final StudyPlan plan;
  private final SamplingSpec sampling;
  private final BitSet[] finished;
  private final List<List<RealisationRecord>> records = new ArrayList<>();
  private final int[] scheduled;
  private final boolean[] stopped;

  public SamplingPlanner(StudyPlan plan) {
    this.plan = plan;
    this.sampling = plan.spec().sampling();
    int points = plan.points().size();
    this.finished = new BitSet[points];
    this.scheduled = new int[points];
    this.stopped = new boolean[points];
    for (int p = 0; p < points; p++) {
      finished[p] = new BitSet();
      records.add(new ArrayList<>());
      scheduled[p] = sampling == null ? plan.spec().realisations() : sampling.minimum();
    }
  }

  /**
   * The tasks to queue at the start of a session, given records journaled earlier. Replays the
   * stopping rule over those records, so a resumed run continues exactly where the rule was.
   */
  public List<RealisationTask> start(Collection<RealisationRecord> journaled) {
    for (RealisationRecord r : journaled) {
      note(r);
    }
    List<RealisationTask> tasks = new ArrayList<>();
    int maxScheduled = 0;
    for (int p = 0; p < scheduled.length; p++) {
      advance(p);
      maxScheduled = Math.max(maxScheduled, scheduled[p]);
    }
    // Realisation-major order across points, so an interrupted run has spread its samples.
    for (int r = 0; r < maxScheduled; r++) {
      for (int p = 0; p < scheduled.length; p++) {
        if (r < scheduled[p] && !finished[p].get(r)) {
          tasks.add(plan.task(p, r));
        }
      }
    }
    return tasks;
  }

  /**
   * Notes a finished record; returns the tasks of the point's next batch if the rule asks for one.
   */
  public List<RealisationTask> onFinished(RealisationRecord record) {
    note(record);
    int p = record.result().pointIndex();
    int before = scheduled[p];
    advance(p);
    List<RealisationTask> next = new ArrayList<>();
    for (int r = before; r < scheduled[p]; r++) {
      if (!finished[p].get(r)) {
        next.add(plan.task(p, r));
      }
    }
    return next;
  }

  /** Realisations currently scheduled at point p (final once the point stopped). */
  public int scheduled(int point) {
    return scheduled[point];
  }

  /** True once no more realisations will be scheduled at point p. */
  public boolean isStopped(int point) {
    return stopped[point] || sampling == null;
  }

  /** Total tasks currently scheduled. */
  public long totalScheduled() {
    long t = 0;
    for (int s : scheduled) {
      t += s;
    }
    return t;
  }

  private void note(RealisationRecord r) {
    int p = r.result().pointIndex();
    int i = r.result().realisationIndex();
    if (p < finished.length && !finished[p].get(i)) {
      finished[p].set(i);
      records.get(p).add(r);
    }
  }

  /** Applies the stopping rule as long as the scheduled batches are complete. */
  private void advance(int p) {
    if (sampling == null) {
      return;
    }
    while (!stopped[p] && finished[p].nextClearBit(0) >= scheduled[p]) {
      if (scheduled[p] >= sampling.maximum() || targetsMet(p, scheduled[p])) {
        stopped[p] = true;
      } else {
        scheduled[p] = Math.min(sampling.maximum(), scheduled[p] + sampling.batch());
      }
    }
  }

  private boolean targetsMet(int p, int upTo) {
    for (SamplingSpec.Target t : sampling.targets()) {
      double[] x =
          records.get(p).stream()
              .filter(
                  r ->
                      r.result().realisationIndex() < upTo
                          && r.result().outcome() == Outcome.DONE
                          && r.result().values().containsKey(t.quantity()))
              .sorted(java.util.Comparator.comparingInt(r -> r.result().realisationIndex()))
              .mapToDouble(r -> r.result().values().get(t.quantity()))
              .toArray();
      double measured =
          switch (t.kind()) {
            case STDERR -> {
              MeanEstimate m = SampleStatisticsOps.mean(x);
              yield m.standardError();
            }
            case MODAL_FRACTION_HALF_WIDTH -> {
              var d = SampleStatisticsOps.integerDistribution(x);
              yield 0.5 * (d.modalWilsonHigh() - d.modalWilsonLow());
            }
          };
      if (!(measured <= t.threshold())) {
        return false;
      }
    }
    return true;
  }
}
