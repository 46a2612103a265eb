package hopstat.cli;

import hopstat.cluster.ClusterException;
import hopstat.cluster.CommandRunner;
import hopstat.cluster.SystemCommandRunner;
import hopstat.queue.JournalCorruptException;
import hopstat.queue.RunDirectoryException;
import hopstat.task.BuildInfo;
import hopstat.task.InvalidInputException;
import java.io.IOException;
import java.io.PrintStream;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/**
 * The {@code hopstat} command line. The only code that calls {@link System#exit}; exit codes are in
 * {@link ExitCode}. Errors are one readable line on stderr; stack traces only with {@code
 * --verbose}.
 */
@Command(
    name = "hopstat",
    mixinStandardHelpOptions = true,
    versionProvider = HopstatCommand.Version.class,
    description = "Disorder-ensemble statistics of topological invariants, gaps and localisation.",
    subcommands = {
      CheckCommand.class,
      BenchCommand.class,
      RunCommand.class,
      ResumeCommand.class,
      StatusCommand.class,
      ReportCommand.class,
      ModelsCommand.class,
      SubmitCommand.class,
      ShardCommand.class,
      ServeCommand.class
    },
    exitCodeListHeading = "%nExit codes:%n",
    exitCodeList = {
      "0:done",
      "1:runtime failure (I/O, directory in use, corrupt journal, batch system refused)",
      "2:bad input (spec or options)",
      "3:finished, but some realisations FAILED",
      "4:stopped before complete (resume continues it)"
    })
public final class HopstatCommand implements Runnable {

  @Option(
      names = "--verbose",
      scope = CommandLine.ScopeType.INHERIT,
      description = "Log progress details and show stack traces.")
  boolean verbose;

  final PrintStream out;
  final PrintStream err;

  /** Runs the batch system's commands (sbatch, squeue, scontrol); tests pass a stand-in. */
  final CommandRunner clusterCommands;

  HopstatCommand(PrintStream out, PrintStream err, CommandRunner clusterCommands) {
    this.out = out;
    this.err = err;
    this.clusterCommands = clusterCommands;
  }

  @Override
  public void run() {
    throw new CommandLine.ParameterException(
        new CommandLine(this),
        "missing command: check, run, submit, resume, status, report or models");
  }

  public static void main(String[] args) {
    for (String a : args) {
      if (a.equals("--verbose")) {
        System.setProperty("hopstat.log.level", "INFO");
      }
    }
    System.exit(execute(args, System.out, System.err));
  }

  /** Runs the command line with the given streams; returns the exit code. */
  public static int execute(String[] args, PrintStream out, PrintStream err) {
    return execute(args, out, err, new SystemCommandRunner());
  }

  /**
   * Runs the command line with the given streams, running the batch system's commands through
   * {@code clusterCommands} (for tests of the cluster commands without a cluster); returns the exit
   * code.
   */
  public static int execute(
      String[] args, PrintStream out, PrintStream err, CommandRunner clusterCommands) {
    HopstatCommand root = new HopstatCommand(out, err, clusterCommands);
    CommandLine cl = new CommandLine(root);
    cl.setOut(new PrintWriter(out, true, StandardCharsets.UTF_8));
    cl.setErr(new PrintWriter(err, true, StandardCharsets.UTF_8));
    cl.setExitCodeExceptionMapper(HopstatCommand::exitCode);
    cl.setExecutionExceptionHandler(
        (e, commandLine, parseResult) -> {
          report(e, root.verbose, err);
          return exitCode(e);
        });
    cl.setParameterExceptionHandler(
        (e, args2) -> {
          err.println("hopstat: " + e.getMessage());
          err.println(
              "(see `hopstat "
                  + (e.getCommandLine().getCommandName().equals("hopstat")
                      ? ""
                      : e.getCommandLine().getCommandName() + " ")
                  + "--help`)");
          return ExitCode.BAD_INPUT;
        });
    return cl.execute(args);
  }

  static int exitCode(Throwable e) {
    if (e instanceof InvalidInputException || e instanceof CommandLine.ParameterException) {
      return ExitCode.BAD_INPUT;
    }
    return ExitCode.RUNTIME_FAILURE;
  }

  private static void report(Exception e, boolean verbose, PrintStream err) {
    if (e instanceof InvalidInputException bad) {
      err.println(
          "hopstat: invalid input ("
              + bad.violations().size()
              + " problem"
              + (bad.violations().size() == 1 ? "" : "s")
              + "):");
      for (InvalidInputException.Violation v : bad.violations()) {
        err.println("  " + v.describe());
      }
    } else if (e instanceof RunDirectoryException
        || e instanceof JournalCorruptException
        || e instanceof ClusterException) {
      err.println("hopstat: " + e.getMessage());
    } else if (e instanceof IOException) {
      err.println("hopstat: I/O error: " + e);
    } else {
      err.println("hopstat: failed: " + e + (verbose ? "" : " (run with --verbose for details)"));
    }
    if (verbose) {
      e.printStackTrace(err);
    }
  }

  /** Prints version and commit. */
  static final class Version implements CommandLine.IVersionProvider {
    @Override
    public String[] getVersion() {
      return new String[] {"hopstat " + BuildInfo.toolVersion()};
    }
  }
}
