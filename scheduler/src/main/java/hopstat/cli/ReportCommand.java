package hopstat.cli;

import hopstat.expand.StudyPlan;
import hopstat.queue.RunDirectory;
import java.nio.file.Path;
import java.time.Instant;
import java.util.List;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.ParentCommand;

/**
 * {@code hopstat report DIR}: regenerates every output (summaries, figures, HTML, HDF5) from the
 * journal alone.
 */
@Command(
    mixinStandardHelpOptions = true,
    name = "report",
    description =
        "Write summary.csv, summary.json, boundaries.csv, figures/, report.html and results.h5 of a run directory from its spec and journal.")
final class ReportCommand implements Callable<Integer> {

  @ParentCommand HopstatCommand root;

  @Parameters(index = "0", paramLabel = "DIR", description = "Run directory.")
  Path dirPath;

  @Override
  public Integer call() throws Exception {
    // Figures are drawn off-screen; never try to open a display.
    System.setProperty("java.awt.headless", "true");
    RunDirectory dir = RunDirectory.open(dirPath);
    StudyPlan plan = RunSummaries.plan(dir);
    List<Path> written = RunSummaries.report(dir, plan, Instant.now());
    for (Path p : written) {
      root.out.println("wrote " + p);
    }
    return ExitCode.OK;
  }
}
