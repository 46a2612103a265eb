package hopstat.cluster;

import hopstat.expand.GridPoint;
import hopstat.expand.SamplingPlanner;
import hopstat.expand.StudyPlan;
import hopstat.pool.Shard;
import hopstat.queue.JournalReader;
import hopstat.queue.RunDirectory;
import hopstat.record.RealisationRecord;
import hopstat.task.Outcome;
import hopstat.task.RealisationTask;
import java.io.IOException;
import java.util.ArrayList;
import java.util.Collection;
import java.util.List;

/**
 * Per-shard progress of a sharded run, computed by replaying the sampling rule over the journal
 * exactly as a shard does when it starts: a shard is complete when no task of its points is left.
 */
public final class ShardProgressOps {

  private ShardProgressOps() {}

  /** Progress of every shard, in shard order. */
  public static List<ShardProgress> progress(StudyPlan plan, RunDirectory dir, int shardCount)
      throws IOException {
    return progress(plan, JournalReader.read(dir.journalDir()).records().values(), shardCount);
  }

  /** Progress of every shard given the journaled records. */
  public static List<ShardProgress> progress(
      StudyPlan plan, Collection<RealisationRecord> journaled, int shardCount) {
    SamplingPlanner planner = new SamplingPlanner(plan);
    List<RealisationTask> left = planner.start(journaled);
    List<ShardProgress> result = new ArrayList<>();
    for (int k = 0; k < shardCount; k++) {
      Shard shard = new Shard(k, shardCount);
      int points = 0;
      long scheduled = 0;
      for (GridPoint p : plan.points()) {
        if (shard.contains(p.index())) {
          points++;
          scheduled += planner.scheduled(p.index());
        }
      }
      long finished = 0;
      long failed = 0;
      for (RealisationRecord r : journaled) {
        if (shard.contains(r.result().pointIndex())) {
          finished++;
          if (r.result().outcome() == Outcome.FAILED) {
            failed++;
          }
        }
      }
      boolean complete = left.stream().noneMatch(t -> shard.contains(t.pointIndex()));
      result.add(new ShardProgress(k, points, finished, failed, scheduled, complete));
    }
    return result;
  }

  /** The indices of shards that still have work, ascending. */
  public static List<Integer> incomplete(List<ShardProgress> progress) {
    return progress.stream().filter(p -> !p.complete()).map(ShardProgress::shard).toList();
  }
}
