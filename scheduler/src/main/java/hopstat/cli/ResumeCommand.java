package hopstat.cli;

import hopstat.expand.StudyPlan;
import hopstat.queue.RunDirectory;
import hopstat.queue.RunDirectoryException;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.ParentCommand;

/** {@code hopstat resume DIR}: continues a run from its journal. */
@Command(name = "resume", description = "Continue a run from its journal: runs only what is not journaled yet, then writes the summary.")
final class ResumeCommand implements Callable<Integer> {

  @ParentCommand HopstatCommand root;

  @Parameters(index = "0", paramLabel = "DIR", description = "Run directory made by `hopstat run`.")
  Path dirPath;

  @Option(names = "--threads", paramLabel = "N", description = "Worker threads (default: all cores).")
  Integer threads;

  @Option(names = "--linalg", paramLabel = "KIND", defaultValue = LinalgChoice.DEFAULT, description = "Dense linear algebra: auto, native, java.")
  String linalg;

  @Option(names = "--quiet", description = "No progress bar or summary lines.")
  boolean quiet;

  @Override
  public Integer call() throws Exception {
    RunDirectory dir = RunDirectory.open(dirPath);
    StudyPlan plan = RunSummaries.plan(dir);
    String recorded = dir.runMetadata().path("specHash").asText();
    if (!recorded.equals(plan.spec().specHash())) {
      throw new RunDirectoryException(dir.specFile() + " no longer matches the spec this run started with (hash " + recorded
          + "); results would mix two studies. Start a new run directory instead.");
    }
    return RunSession.execute(root, dir, plan, RunCommand.threads(threads), LinalgChoice.resolve(linalg), quiet);
  }
}
