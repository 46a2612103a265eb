package hopstat.cli;

import hopstat.expand.GridExpander;
import hopstat.expand.MemoryCheck;
import hopstat.expand.PlanValidation;
import hopstat.expand.StudyPlan;
import hopstat.linalg.LinalgKind;
import hopstat.pool.LocalSession;
import hopstat.queue.RunDirectory;
import hopstat.spec.JobSpec;
import hopstat.task.InvalidInputException;
import java.nio.file.Path;
import java.time.Instant;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.ParentCommand;

/** {@code hopstat run SPEC --out DIR}: runs every realisation on the local worker pool. */
@Command(
    mixinStandardHelpOptions = true,
    name = "run",
    description =
        "Run a job spec on this machine's worker pool, journaling every realisation, then write the summary.")
final class RunCommand implements Callable<Integer> {

  @ParentCommand HopstatCommand root;

  @Parameters(index = "0", paramLabel = "SPEC", description = "Job spec (JSON).")
  Path specFile;

  @Option(
      names = "--out",
      required = true,
      paramLabel = "DIR",
      description = "New run directory (journal, summaries).")
  Path out;

  @Option(
      names = "--threads",
      paramLabel = "N",
      description = "Worker threads (default: all cores).")
  Integer threads;

  @Option(
      names = "--linalg",
      paramLabel = "KIND",
      defaultValue = LinalgChoice.DEFAULT,
      description = "Dense linear algebra: auto (native where it loads), native, java.")
  String linalg;

  @Option(names = "--quiet", description = "No progress bar or summary lines.")
  boolean quiet;

  @Override
  public Integer call() throws Exception {
    String text = SpecFiles.read(specFile);
    JobSpec spec = SpecFiles.parse(text);
    StudyPlan plan = GridExpander.expand(spec);
    int n = threads(threads);
    LinalgKind kind = LinalgChoice.resolve(linalg);
    MemoryCheck.require(plan, n);
    PlanValidation.validate(plan);
    RunDirectory dir =
        RunDirectory.create(out, text, LocalSession.runMetadata(plan, n, kind, Instant.now()));
    return RunSession.execute(root, dir, plan, n, kind, quiet);
  }

  static int threads(Integer requested) {
    if (requested == null) {
      return Runtime.getRuntime().availableProcessors();
    }
    if (requested < 1 || requested > 4096) {
      throw new InvalidInputException("--threads", requested, "must be from 1 to 4096");
    }
    return requested;
  }
}
