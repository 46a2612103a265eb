package hopstat.cli;

import hopstat.expand.StudyPlan;
import hopstat.pool.RunSummaryOps;
import hopstat.queue.RunDirectory;
import hopstat.statistics.Summary;
import java.io.IOException;
import java.nio.file.Path;
import java.util.List;

/** Summaries of a run directory for the commands; the work is in {@link RunSummaryOps}. */
final class RunSummaries {

  private RunSummaries() {}

  /** The run's plan, re-expanded from its stored spec. */
  static StudyPlan plan(RunDirectory dir) throws IOException {
    return RunSummaryOps.plan(dir);
  }

  /** The summary of everything journaled so far. */
  static Summary summarise(RunDirectory dir, StudyPlan plan) throws IOException {
    return RunSummaryOps.summarise(dir, plan);
  }

  /** Writes summary.csv and summary.json into the run directory. */
  static List<Path> write(RunDirectory dir, StudyPlan plan) throws IOException {
    return RunSummaryOps.write(dir, plan);
  }
}
