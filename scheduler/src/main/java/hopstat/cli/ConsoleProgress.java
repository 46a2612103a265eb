package hopstat.cli;

import hopstat.pool.ProgressListener;
import hopstat.record.RealisationRecord;
import hopstat.task.Outcome;
import java.io.PrintStream;
import java.time.Duration;
import java.util.concurrent.atomic.AtomicLong;
import me.tongfei.progressbar.ConsoleProgressBarConsumer;
import me.tongfei.progressbar.DelegatingProgressBarConsumer;
import me.tongfei.progressbar.ProgressBar;
import me.tongfei.progressbar.ProgressBarBuilder;
import me.tongfei.progressbar.ProgressBarStyle;

/**
 * Progress on stderr: done/total, rate and ETA, plus a failure count. On a terminal the bar redraws
 * in place; otherwise it prints a line now and then, so batch logs stay short.
 */
final class ConsoleProgress implements ProgressListener {

  /** Without a terminal (batch logs, CI) one progress line every this many milliseconds. */
  static final int NON_INTERACTIVE_INTERVAL_MILLIS = 30_000;

  private final PrintStream err;
  private final boolean interactive = System.console() != null;
  private final AtomicLong failed = new AtomicLong();
  private ProgressBar bar;

  ConsoleProgress(PrintStream err) {
    this.err = err;
  }

  @Override
  public synchronized void started(long scheduled, long alreadyFinished) {
    bar =
        new ProgressBarBuilder()
            .setTaskName("realisations")
            .setInitialMax(scheduled)
            .startsFrom(alreadyFinished, Duration.ZERO)
            .setStyle(ProgressBarStyle.ASCII)
            .setUpdateIntervalMillis(interactive ? 500 : NON_INTERACTIVE_INTERVAL_MILLIS)
            .showSpeed()
            .setUnit(" real.", 1)
            .setConsumer(
                interactive
                    ? new ConsoleProgressBarConsumer(err)
                    : new DelegatingProgressBarConsumer(err::println))
            .build();
  }

  @Override
  public synchronized void rescheduled(long scheduled) {
    if (bar != null) {
      bar.maxHint(scheduled);
    }
  }

  @Override
  public synchronized void finished(RealisationRecord record) {
    if (record.result().outcome() == Outcome.FAILED) {
      bar.setExtraMessage(" failed: " + failed.incrementAndGet());
    }
    bar.step();
  }

  @Override
  public synchronized void ended() {
    if (bar != null) {
      bar.close();
    }
  }
}
