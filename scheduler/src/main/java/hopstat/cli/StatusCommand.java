package hopstat.cli;

import hopstat.cluster.ClusterRun;
import hopstat.cluster.ClusterRunStore;
import hopstat.cluster.ShardLock;
import hopstat.cluster.ShardProgressOps;
import hopstat.cluster.SlurmBackend;
import hopstat.cluster.SlurmClient;
import hopstat.cluster.SlurmJobState;
import hopstat.expand.StudyPlan;
import hopstat.queue.RunDirectory;
import hopstat.statistics.PointSummary;
import hopstat.statistics.QuantitySummary;
import hopstat.statistics.Summary;
import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.Callable;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import picocli.CommandLine.Command;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.ParentCommand;

/** {@code hopstat status DIR}: progress and current estimates, readable while a run is going. */
@Command(
    mixinStandardHelpOptions = true,
    name = "status",
    description =
        "Show a run's progress per grid point, failures, current mean ± stderr and an ETA; for a cluster run also each shard's progress and Slurm job state.")
final class StatusCommand implements Callable<Integer> {

  private static final Pattern SINCE = Pattern.compile("since (\\S+)");

  @ParentCommand HopstatCommand root;

  @Parameters(index = "0", paramLabel = "DIR", description = "Run directory.")
  Path dirPath;

  @Override
  public Integer call() throws IOException, InterruptedException {
    RunDirectory dir = RunDirectory.open(dirPath);
    StudyPlan plan = RunSummaries.plan(dir);
    Summary s = RunSummaries.summarise(dir, plan);
    PrintStream out = root.out;
    long finished = s.done() + s.failed();
    long planned = plan.plannedTasks();
    ClusterRun cluster = ClusterRunStore.read(dir).orElse(null);
    List<Integer> heldShards =
        cluster == null ? List.of() : ShardLock.held(dir.path(), cluster.shardCount());
    String owner =
        heldShards.isEmpty()
            ? owner(dir.path())
            : "cluster shard(s) " + heldShards + " are working on it";
    out.printf(
        Locale.ROOT,
        "run %s: %d of %s%d realisations journaled (%d failed); %s%n",
        s.name(),
        finished,
        plan.spec().adaptiveSampling().isPresent() ? "at most " : "",
        planned,
        s.failed(),
        owner == null ? "no process is working on it" : "in progress: " + owner);
    if (owner != null && heldShards.isEmpty()) {
      eta(dir, owner, planned - finished).ifPresent(out::println);
    }
    // Planned per point: the spec's count, or under adaptive sampling what the stopping rule has
    // scheduled so far given the journal (a point still sampling may get more, up to the maximum).
    hopstat.expand.SamplingPlanner planner = new hopstat.expand.SamplingPlanner(plan);
    planner.start(hopstat.queue.JournalReader.read(dir.journalDir()).records().values());
    List<String> header = new ArrayList<>(s.gridNames());
    header.add("done/planned");
    header.add("failed");
    for (String q : s.quantityNames()) {
      header.add(q + " (mean ± stderr)");
    }
    out.println(String.join("  ", header));
    for (PointSummary p : s.points()) {
      List<String> row = new ArrayList<>();
      for (String g : s.gridNames()) {
        row.add(
            java.math.BigDecimal.valueOf(p.coordinates().get(g))
                .stripTrailingZeros()
                .toPlainString());
      }
      boolean open = plan.spec().adaptiveSampling().isPresent() && !planner.isStopped(p.index());
      row.add((p.done() + p.failed()) + "/" + planner.scheduled(p.index()) + (open ? "+" : ""));
      row.add(Integer.toString(p.failed()));
      for (String q : s.quantityNames()) {
        QuantitySummary qs =
            p.quantities().stream().filter(x -> x.name().equals(q)).findFirst().orElse(null);
        row.add(
            qs == null
                ? "-"
                : String.format(
                    Locale.ROOT, "%.5g ± %.2g", qs.mean().mean(), qs.mean().standardError()));
      }
      out.println(String.join("  ", row));
      for (Map.Entry<String, Integer> e : p.failureReasons().entrySet()) {
        out.printf(Locale.ROOT, "    failed %dx: %s%n", e.getValue(), e.getKey());
      }
    }
    if (cluster != null) {
      SlurmBackend backend =
          new SlurmBackend(new SlurmClient(root.clusterCommands), Clock.systemUTC());
      List<SlurmJobState> states = ClusterView.states(backend, cluster, out);
      ClusterView.print(
          out,
          cluster,
          ShardProgressOps.progress(plan, dir, cluster.shardCount()),
          states,
          heldShards);
    }
    return ExitCode.OK;
  }

  /** Who holds the directory's lock, or null if nobody does (tested by trying it). */
  private static String owner(Path dir) throws IOException {
    Path lockFile = dir.resolve("lock");
    if (!Files.exists(lockFile)) {
      return null;
    }
    try (var channel =
        java.nio.channels.FileChannel.open(lockFile, java.nio.file.StandardOpenOption.WRITE)) {
      var lock = channel.tryLock();
      if (lock != null) {
        lock.release();
        return null;
      }
    } catch (java.nio.channels.OverlappingFileLockException e) {
      // held inside this very JVM: in progress
    }
    return new String(Files.readAllBytes(lockFile), StandardCharsets.UTF_8).trim();
  }

  /** ETA from the rate of the newest journal file since its writer's start. */
  private static java.util.Optional<String> eta(RunDirectory dir, String owner, long remaining)
      throws IOException {
    Matcher m = SINCE.matcher(owner);
    if (!m.find()) {
      return java.util.Optional.empty();
    }
    Instant since = Instant.parse(m.group(1));
    Path newest;
    try (Stream<Path> files = Files.list(dir.journalDir())) {
      newest = files.filter(p -> p.toString().endsWith(".jsonl")).max(Path::compareTo).orElse(null);
    }
    if (newest == null) {
      return java.util.Optional.empty();
    }
    long lines;
    try (Stream<String> l = Files.lines(newest)) {
      lines = l.count();
    }
    double elapsed = Duration.between(since, Instant.now()).toMillis() / 1000.0;
    if (lines == 0 || elapsed <= 0) {
      return java.util.Optional.of("rate: not measurable yet");
    }
    double rate = lines / elapsed;
    return java.util.Optional.of(
        String.format(
            Locale.ROOT,
            "rate %.2f realisations/s this session; ETA %s",
            rate,
            CheckCommand.duration(remaining / rate)));
  }
}
