package hopstat.queue;

import static org.assertj.core.api.Assertions.assertThat;

import hopstat.record.RealisationRecord;
import hopstat.task.Outcome;
import java.io.IOException;
import java.nio.file.Path;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class JournalTaskStoreTest extends TaskStoreContractTest {

  @TempDir Path dir;
  private int files;

  @Override
  TaskStore newStore(Map<String, RealisationRecord> preloaded) throws IOException {
    return new JournalTaskStore(
        clock,
        InMemoryTaskStoreTest::failed,
        preloaded,
        new JournalWriter(dir.resolve("part-" + (++files) + ".jsonl"), 0));
  }

  /** What the file-backed store finished is on disk: a new session sees it as finished. */
  @Test
  void completionsSurviveInTheJournal() throws IOException {
    try (TaskStore store = newStore(Map.of())) {
      store.add(tasks(3));
      for (int i = 0; i < 2; i++) {
        Claim c = store.claim("w").orElseThrow();
        store.complete(c, aRecord(c.task(), i == 0 ? Outcome.DONE : Outcome.FAILED));
      }
    }
    JournalReader.Contents contents = JournalReader.read(dir);
    assertThat(contents.records()).containsOnlyKeys("p0-r0", "p0-r1");
    try (TaskStore again = newStore(contents.records())) {
      assertThat(again.add(tasks(3))).isEqualTo(1);
      assertThat(again.claim("w").orElseThrow().task().taskId()).isEqualTo("p0-r2");
    }
  }
}
