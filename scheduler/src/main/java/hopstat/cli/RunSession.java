package hopstat.cli;

import hopstat.expand.MemoryCheck;
import hopstat.expand.StudyPlan;
import hopstat.linalg.LinalgKind;
import hopstat.pool.LocalPoolBackend;
import hopstat.pool.LocalSession;
import hopstat.pool.ProgressListener;
import hopstat.pool.RunOptions;
import hopstat.pool.RunResult;
import hopstat.pool.SessionResult;
import hopstat.pool.Shard;
import hopstat.queue.JournalWriter;
import hopstat.queue.RunDirectory;
import hopstat.statistics.Summary;
import java.io.IOException;
import java.nio.file.Path;
import java.time.Clock;
import java.time.Duration;
import java.util.List;

/**
 * One local session over a run directory: lock, run what the journal lacks, summarise. Shared by
 * run and resume.
 */
final class RunSession {

  /** How long Ctrl-C waits for in-flight realisations before abandoning them. */
  static final Duration STOP_GRACE = Duration.ofSeconds(20);

  private RunSession() {}

  static int execute(
      HopstatCommand root,
      RunDirectory dir,
      StudyPlan plan,
      int threads,
      LinalgKind linalg,
      boolean quiet)
      throws IOException, InterruptedException {
    MemoryCheck.require(plan, threads);
    LocalPoolBackend backend = new LocalPoolBackend(Clock.systemUTC());
    Thread hook =
        new Thread(
            () -> {
              backend.requestStop();
              try {
                if (!backend.awaitEnded(STOP_GRACE)) {
                  backend.abandon();
                }
              } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
              }
            },
            "hopstat-stop");
    Runtime.getRuntime().addShutdownHook(hook);
    SessionResult session;
    try {
      ProgressListener progress = quiet ? ProgressListener.NONE : new ConsoleProgress(root.err);
      session =
          LocalSession.execute(
              dir,
              plan,
              backend,
              new RunOptions(
                  threads, linalg, "part", Shard.ALL, JournalWriter.DEFAULT_SYNC_INTERVAL_NANOS),
              progress);
    } finally {
      try {
        Runtime.getRuntime().removeShutdownHook(hook);
      } catch (IllegalStateException shuttingDown) {
        // the JVM is already exiting: the hook is running and finishes the journal
      }
    }
    RunResult result = session.run();
    List<Path> written = session.written();
    Summary summary = session.summary();
    if (!quiet) {
      root.out.printf(
          java.util.Locale.ROOT,
          "%d realisation(s) this session; %d journaled in all, %d failed%n",
          result.finishedThisSession(),
          summary.done() + summary.failed(),
          summary.failed());
      for (Path p : written) {
        root.out.println("wrote " + p);
      }
    }
    if (result.stoppedEarly()) {
      root.err.println(
          "hopstat: stopped before the run was complete; continue with `hopstat resume "
              + dir.path()
              + "`");
      return ExitCode.INCOMPLETE;
    }
    if (summary.failed() > 0) {
      root.err.println(
          "hopstat: "
              + summary.failed()
              + " realisation(s) FAILED; reasons per point are in summary.json");
      return ExitCode.SOME_FAILED;
    }
    return ExitCode.OK;
  }
}
