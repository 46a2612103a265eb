package hopstat.queue;

import hopstat.record.RealisationRecord;
import hopstat.task.Outcome;
import java.util.Map;

class InMemoryTaskStoreTest extends TaskStoreContractTest {
  @Override
  TaskStore newStore(Map<String, RealisationRecord> preloaded) {
    return new InMemoryTaskStore(clock, (task, reason) -> failed(task, reason), preloaded);
  }

  static RealisationRecord failed(hopstat.task.RealisationTask task, String reason) {
    return new RealisationRecord(
        new hopstat.task.RealisationResult(
            task.taskId(),
            task.pointIndex(),
            task.realisationIndex(),
            task.seed(),
            Outcome.FAILED,
            Map.of(),
            reason,
            0),
        Map.of(),
        Map.of(),
        "test",
        "none");
  }
}
