package hopstat.pool;

/**
 * How a run session ended.
 *
 * @param finishedThisSession realisations journaled by this session
 * @param finishedTotal realisations journaled in all sessions (of this shard)
 * @param failedTotal of those, FAILED
 * @param stoppedEarly true when the session was asked to stop before the study was complete
 * @param journalFile this session's journal file
 */
public record RunResult(
    long finishedThisSession,
    long finishedTotal,
    long failedTotal,
    boolean stoppedEarly,
    java.nio.file.Path journalFile) {}
