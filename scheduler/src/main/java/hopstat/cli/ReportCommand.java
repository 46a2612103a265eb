package hopstat.cli;

import hopstat.expand.StudyPlan;
import hopstat.queue.RunDirectory;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.ParentCommand;

/** {@code hopstat report DIR}: regenerates the summaries from the journal alone. */
@Command(name = "report", description = "Regenerate summary.csv and summary.json of a run directory from its spec and journal.")
final class ReportCommand implements Callable<Integer> {

  @ParentCommand HopstatCommand root;

  @Parameters(index = "0", paramLabel = "DIR", description = "Run directory.")
  Path dirPath;

  @Override
  public Integer call() throws Exception {
    RunDirectory dir = RunDirectory.open(dirPath);
    StudyPlan plan = RunSummaries.plan(dir);
    List<Path> written = RunSummaries.write(dir, plan);
    for (Path p : written) {
      root.out.println("wrote " + p);
    }
    return ExitCode.OK;
  }
}
