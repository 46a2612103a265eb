package hopstat.queue;

import hopstat.task.RealisationTask;

/**
 * A worker's hold on a RUNNING task. Every later write names the version it saw; a write whose
 * version is stale (the sweeper re-queued the task meanwhile) is refused.
 *
 * @param task the task
 * @param workerId who holds it
 * @param version the entry's version right after the claim
 */
public record Claim(RealisationTask task, String workerId, long version) {}
