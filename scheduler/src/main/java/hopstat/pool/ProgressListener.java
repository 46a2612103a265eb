package hopstat.pool;

import hopstat.record.RealisationRecord;

/** Receives run progress; called from worker threads, implementations must be thread-safe. */
public interface ProgressListener {

  /**
   * The run starts: {@code scheduled} tasks in view, {@code alreadyFinished} of them journaled
   * earlier.
   */
  default void started(long scheduled, long alreadyFinished) {}

  /**
   * The number of scheduled tasks changed (adaptive sampling added a batch, or stopped a point).
   */
  default void rescheduled(long scheduled) {}

  /** One realisation finished and was journaled. */
  default void finished(RealisationRecord record) {}

  /** The run ended (completed or stopped). */
  default void ended() {}

  /** A listener that ignores everything. */
  ProgressListener NONE = new ProgressListener() {};
}
