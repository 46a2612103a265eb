package hopstat.serve;

import hopstat.pool.ProgressListener;
import hopstat.record.RealisationRecord;
import java.time.Clock;
import java.time.Duration;
import java.util.OptionalDouble;

/**
 * Live progress of the session running a job, for the status API's rate and ETA. The counts are
 * this session's view; per-point numbers in the status come from the journal itself.
 */
public final class JobProgress implements ProgressListener {

  private final Clock clock;
  private final Duration pace;
  private final long startedMillis;
  private volatile long scheduled;
  private volatile long alreadyFinished;
  private long finishedThisSession;

  JobProgress(Clock clock, Duration pace) {
    this.clock = clock;
    this.pace = pace;
    this.startedMillis = clock.millis();
  }

  @Override
  public void started(long scheduled, long alreadyFinished) {
    this.scheduled = scheduled;
    this.alreadyFinished = alreadyFinished;
  }

  @Override
  public void rescheduled(long scheduled) {
    this.scheduled = scheduled;
  }

  @Override
  public void finished(RealisationRecord record) {
    synchronized (this) {
      finishedThisSession++;
    }
    if (!pace.isZero()) {
      try {
        Thread.sleep(pace.toMillis());
      } catch (InterruptedException e) {
        Thread.currentThread().interrupt();
      }
    }
  }

  /** Realisations scheduled in all (grows under adaptive sampling). */
  public long scheduled() {
    return scheduled;
  }

  /** Realisations journaled, this session and earlier ones. */
  public synchronized long finished() {
    return alreadyFinished + finishedThisSession;
  }

  /** Realisations per second this session, if any finished yet. */
  public synchronized OptionalDouble ratePerSecond() {
    double seconds = (clock.millis() - startedMillis) / 1000.0;
    if (finishedThisSession == 0 || seconds <= 0) {
      return OptionalDouble.empty();
    }
    return OptionalDouble.of(finishedThisSession / seconds);
  }

  /** Seconds until the scheduled realisations are done at this session's rate, if measurable. */
  public OptionalDouble etaSeconds() {
    OptionalDouble rate = ratePerSecond();
    if (rate.isEmpty()) {
      return OptionalDouble.empty();
    }
    return OptionalDouble.of(Math.max(0, scheduled() - finished()) / rate.getAsDouble());
  }
}
