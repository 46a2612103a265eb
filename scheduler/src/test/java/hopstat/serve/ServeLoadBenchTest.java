package hopstat.serve;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ObjectNode;
import hopstat.linalg.LinalgFactory;
import hopstat.linalg.LinalgKind;
import hopstat.task.BuildInfo;
import java.net.InetAddress;
import java.net.http.HttpResponse;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.time.Duration;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.SplittableRandom;
import java.util.concurrent.ConcurrentLinkedQueue;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.atomic.AtomicLong;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Bounded load benchmark of the service on loopback (tag {@code bench}: never part of {@code mvn
 * test}). {@value #CLIENTS} clients first submit {@value #SUBMISSIONS} jobs concurrently, then poll
 * job status and the job list for {@code hopstat.bench.seconds} (default 30) seconds while the jobs
 * run. Checks that no job is lost or duplicated and writes request latency percentiles to {@code
 * target/serve-load-bench.json}.
 *
 * <pre>
 * mvn -B -o -pl scheduler surefire:test -Dtest=ServeLoadBenchTest -Dbench.excludedGroups= -Dsurefire.failIfNoSpecifiedTests=false
 * </pre>
 */
@Tag("bench")
class ServeLoadBenchTest {

  static final int CLIENTS = 20;
  static final int SUBMISSIONS = 40;

  /**
   * Realisations per point of each submitted job: enough that jobs keep running for the whole
   * benchmark.
   */
  static final int BENCH_REALISATIONS = 40;

  @TempDir Path root;

  @Test
  void statusPollingUnderLoad() throws Exception {
    long seconds = Long.getLong("hopstat.bench.seconds", 30);
    LinalgKind linalg = LinalgFactory.isNativeAvailable() ? LinalgKind.NATIVE : LinalgKind.JAVA;
    int threads = 1;
    ServiceSpec spec =
        new ServiceSpec(
            root,
            InetAddress.getLoopbackAddress(),
            0,
            threads,
            linalg,
            null,
            Duration.ZERO,
            Duration.ofMillis(500));
    ConcurrentLinkedQueue<Long> submitNanos = new ConcurrentLinkedQueue<>();
    ConcurrentLinkedQueue<Long> statusNanos = new ConcurrentLinkedQueue<>();
    ConcurrentLinkedQueue<Long> listNanos = new ConcurrentLinkedQueue<>();
    ConcurrentLinkedQueue<String> submitted = new ConcurrentLinkedQueue<>();
    AtomicLong errors = new AtomicLong();
    try (BatchService service = BatchService.start(spec, Clock.systemUTC())) {
      ExecutorService pool = Executors.newFixedThreadPool(CLIENTS);
      CountDownLatch go = new CountDownLatch(1);
      List<Future<?>> submits = new ArrayList<>();
      for (int i = 0; i < SUBMISSIONS; i++) {
        int k = i;
        submits.add(
            pool.submit(
                () -> {
                  ServeFixtures.Client c = new ServeFixtures.Client(service.uri(), null);
                  go.await();
                  long t0 = System.nanoTime();
                  HttpResponse<String> r =
                      c.post(
                          "api/jobs?priority=" + (k % 3),
                          ServeFixtures.smallQwz("load-" + k, BENCH_REALISATIONS));
                  submitNanos.add(System.nanoTime() - t0);
                  if (r.statusCode() != 201) {
                    errors.incrementAndGet();
                    return null;
                  }
                  submitted.add(c.json(r).path("job").path("id").asText());
                  return null;
                }));
      }
      go.countDown();
      for (Future<?> f : submits) {
        f.get();
      }
      List<String> ids = new ArrayList<>(submitted);
      long end = System.nanoTime() + Duration.ofSeconds(seconds).toNanos();
      List<Future<?>> pollers = new ArrayList<>();
      for (int i = 0; i < CLIENTS; i++) {
        long seed = i;
        pollers.add(
            pool.submit(
                () -> {
                  ServeFixtures.Client c = new ServeFixtures.Client(service.uri(), null);
                  SplittableRandom random = new SplittableRandom(seed);
                  int n = 0;
                  while (System.nanoTime() < end) {
                    boolean list = (n++ % 5) == 4;
                    long t0 = System.nanoTime();
                    HttpResponse<String> r =
                        list
                            ? c.get("api/jobs")
                            : c.get("api/jobs/" + ids.get(random.nextInt(ids.size())));
                    (list ? listNanos : statusNanos).add(System.nanoTime() - t0);
                    if (r.statusCode() != 200) {
                      errors.incrementAndGet();
                    }
                  }
                  return null;
                }));
      }
      for (Future<?> f : pollers) {
        f.get();
      }
      pool.shutdown();

      // no lost or duplicated job: every 201 has a distinct id, the store holds exactly those,
      // numbered 1..N
      assertThat(errors.get()).isZero();
      assertThat(new HashSet<>(ids)).hasSize(SUBMISSIONS);
      Set<String> stored = new HashSet<>();
      List<Long> sequences = new ArrayList<>();
      for (JobRecord j : service.jobs()) {
        stored.add(j.id());
        sequences.add(j.sequence());
      }
      assertThat(stored).isEqualTo(new HashSet<>(ids));
      assertThat(sequences)
          .containsExactlyElementsOf(
              java.util.stream.LongStream.rangeClosed(1, SUBMISSIONS).boxed().toList());
      long doneJobs = service.jobs().stream().filter(j -> j.state() == JobState.DONE).count();
      for (JobRecord j : service.jobs()) {
        if (j.state() == JobState.DONE) {
          long lines = 0;
          try (var files = Files.list(service.runDir(j.id()).resolve("journal"))) {
            for (Path p : files.toList()) {
              lines += Files.readAllLines(p).size();
            }
          }
          assertThat(lines).as(j.id() + " journal lines").isEqualTo(3L * BENCH_REALISATIONS);
        }
      }

      ObjectNode out = ServeFixtures.JSON.createObjectNode();
      out.put("benchmark", "ServeLoadBenchTest");
      out.put("commit", BuildInfo.toolVersion());
      out.put(
          "machine",
          System.getProperty("os.name")
              + " "
              + System.getProperty("os.arch")
              + ", "
              + Runtime.getRuntime().availableProcessors()
              + " cores, JVM "
              + System.getProperty("java.vm.version"));
      out.put("linalg", linalg.name());
      out.put("clients", CLIENTS);
      out.put("seconds", seconds);
      out.put("submissions", SUBMISSIONS);
      out.put("jobsDoneDuringBenchmark", doneJobs);
      out.put("errors", errors.get());
      out.set("submitMillis", percentiles(submitNanos));
      out.set("statusMillis", percentiles(statusNanos));
      out.set("listMillis", percentiles(listNanos));
      out.put("pollRequestsPerSecond", (statusNanos.size() + listNanos.size()) / (double) seconds);
      Files.createDirectories(Path.of("target"));
      Files.write(
          Path.of("target", "serve-load-bench.json"),
          ServeFixtures.JSON
              .copy()
              .enable(SerializationFeature.INDENT_OUTPUT)
              .writeValueAsBytes(out));
    }
  }

  private static JsonNode percentiles(ConcurrentLinkedQueue<Long> nanos) {
    long[] a = nanos.stream().mapToLong(Long::longValue).toArray();
    Arrays.sort(a);
    ObjectNode o = ServeFixtures.JSON.createObjectNode();
    o.put("n", a.length);
    if (a.length == 0) {
      return o;
    }
    for (double q : new double[] {0.50, 0.95, 0.99, 1.0}) {
      // nearest-rank percentile
      int rank = (int) Math.ceil(q * a.length);
      o.put(
          q == 1.0 ? "max" : String.format(Locale.ROOT, "p%.0f", q * 100),
          a[Math.max(0, rank - 1)] / 1e6);
    }
    return o;
  }
}
