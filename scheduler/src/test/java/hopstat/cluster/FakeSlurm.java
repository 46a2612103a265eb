package hopstat.cluster;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.List;
import java.util.function.Function;

/**
 * A stand-in for Slurm's commands: records every command line and answers from a queue of scripted
 * outputs (or a function of the command line), so tests check exactly what hopstat asks Slurm
 * without a cluster.
 */
final class FakeSlurm implements CommandRunner {

  final List<List<String>> calls = new ArrayList<>();
  private final Deque<CommandOutput> scripted = new ArrayDeque<>();
  private Function<List<String>, CommandOutput> fallback =
      argv -> {
        throw new AssertionError("unexpected command " + argv);
      };

  static FakeSlurm create() {
    return new FakeSlurm();
  }

  /** Answers the next command with exit 0 and this stdout. */
  FakeSlurm thenOk(String stdout) {
    scripted.add(new CommandOutput(0, stdout, ""));
    return this;
  }

  /** Answers the next command with this exit status and stderr. */
  FakeSlurm thenFail(int exit, String stderr) {
    scripted.add(new CommandOutput(exit, "", stderr));
    return this;
  }

  /** Answers commands without a scripted output through {@code f}. */
  FakeSlurm otherwise(Function<List<String>, CommandOutput> f) {
    this.fallback = f;
    return this;
  }

  /** An sbatch that accepts everything and hands out ascending job ids from {@code first}. */
  static Function<List<String>, CommandOutput> acceptingSbatch(int first) {
    int[] next = {first};
    return argv -> {
      if (!argv.get(0).equals("sbatch")) {
        throw new AssertionError("unexpected command " + argv);
      }
      return new CommandOutput(0, (next[0]++) + "\n", "");
    };
  }

  @Override
  public CommandOutput run(List<String> argv) {
    calls.add(List.copyOf(argv));
    CommandOutput out = scripted.poll();
    return out != null ? out : fallback.apply(argv);
  }

  List<List<String>> callsOf(String program) {
    return calls.stream().filter(c -> c.get(0).equals(program)).toList();
  }
}
