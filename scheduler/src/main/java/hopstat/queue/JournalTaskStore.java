package hopstat.queue;

import hopstat.record.RealisationRecord;
import hopstat.task.RealisationTask;
import java.io.IOException;
import java.time.Clock;
import java.util.Map;
import java.util.function.BiFunction;

/**
 * The file-backed task store: the journal is the source of truth. Tasks the journal already holds
 * enter as finished; every completion is appended to this session's own journal file before the
 * task's state changes. RUNNING and PENDING live in memory only: after a crash they are simply the
 * tasks the journal lacks, which the next session runs again.
 */
public final class JournalTaskStore extends InMemoryTaskStore {

  private final JournalWriter writer;

  /**
   * @param clock timestamps
   * @param failureRecords builds the record of a task given up by the sweeper
   * @param journaled records from earlier sessions ({@link JournalReader})
   * @param writer this session's journal file
   */
  public JournalTaskStore(
      Clock clock,
      BiFunction<RealisationTask, String, RealisationRecord> failureRecords,
      Map<String, RealisationRecord> journaled,
      JournalWriter writer) {
    super(clock, failureRecords, journaled);
    this.writer = writer;
  }

  @Override
  protected void persist(RealisationRecord record) throws IOException {
    writer.append(record);
  }

  @Override
  public void close() throws IOException {
    writer.close();
  }
}
