package hopstat.serve;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.time.Duration;
import java.time.Instant;
import java.time.ZoneId;
import java.time.ZoneOffset;
import java.util.Map;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class JobStoreTest {

  /** A clock that moves one second per reading, so every event has a distinct, known time. */
  static final class StepClock extends Clock {
    private Instant now = Instant.parse("2026-03-01T12:00:00Z");

    @Override
    public ZoneId getZone() {
      return ZoneOffset.UTC;
    }

    @Override
    public Clock withZone(ZoneId zone) {
      return this;
    }

    @Override
    public synchronized Instant instant() {
      Instant t = now;
      now = now.plus(Duration.ofSeconds(1));
      return t;
    }
  }

  @TempDir Path root;

  private static final Map<String, Object> META = Map.of("specHash", "x");

  @Test
  void recordsSurviveReopeningWithTheirHistoryAndClockTimes() throws IOException {
    JobStore store = JobStore.open(root, new StepClock());
    JobRecord a = store.create(ServeFixtures.smallQwz("alpha", 2), "alpha", 0, "api", META, null);
    store.transition(a.id(), JobState.RUNNING, "started", null);
    store.transition(a.id(), JobState.FAILED, "could not run", "IOException: disk full");

    JobStore again = JobStore.open(root, new StepClock());
    JobRecord back = again.find(a.id()).orElseThrow();
    assertThat(back.state()).isEqualTo(JobState.FAILED);
    assertThat(back.message()).isEqualTo("IOException: disk full");
    assertThat(back.history())
        .extracting(JobEvent::at)
        .containsExactly(
            Instant.parse("2026-03-01T12:00:00Z"),
            Instant.parse("2026-03-01T12:00:01Z"),
            Instant.parse("2026-03-01T12:00:02Z"));
    JsonNode onDisk =
        ServeFixtures.JSON.readTree(
            root.resolve("jobs").resolve(a.id()).resolve("job.json").toFile());
    assertThat(onDisk.path("format").asInt()).isEqualTo(JobRecord.FORMAT);
    assertThat(
            Files.readString(
                root.resolve("jobs").resolve(a.id()).resolve("run").resolve("spec.json")))
        .isEqualTo(ServeFixtures.smallQwz("alpha", 2));
    // no temp files are left behind by the atomic writes
    try (Stream<Path> all = Files.walk(root)) {
      assertThat(all.map(p -> p.getFileName().toString())).noneMatch(n -> n.endsWith(".tmp"));
    }
    // the next submission continues the numbering
    assertThat(again.create(ServeFixtures.smallQwz("beta", 2), "beta", 0, "api", META, null).id())
        .isEqualTo("000002-beta");
  }

  @Test
  void nextQueuedIsHighestPriorityThenFirstSubmitted() throws IOException {
    JobStore store = JobStore.open(root, new StepClock());
    JobRecord low = store.create(ServeFixtures.smallQwz("low", 2), "low", -1, "api", META, null);
    JobRecord first =
        store.create(ServeFixtures.smallQwz("first", 2), "first", 3, "api", META, null);
    JobRecord second =
        store.create(ServeFixtures.smallQwz("second", 2), "second", 3, "api", META, null);
    assertThat(store.nextQueued().orElseThrow().id()).isEqualTo(first.id());
    store.transition(first.id(), JobState.PAUSED, "held", null);
    assertThat(store.nextQueued().orElseThrow().id()).isEqualTo(second.id());
    store.transition(second.id(), JobState.CANCELLED, "no", null);
    assertThat(store.nextQueued().orElseThrow().id()).isEqualTo(low.id());
  }

  @Test
  void aStagedSubmissionIsCommittedOnlyIfItConsumedItsInboxFile() throws IOException {
    JobStore store = JobStore.open(root, new StepClock());
    Path inboxFile =
        Files.writeString(root.resolve("in.json"), ServeFixtures.smallQwz("staged", 2));
    JobRecord done =
        store.create(
            ServeFixtures.smallQwz("staged", 2), "staged", 0, "inbox:in.json", META, inboxFile);
    assertThat(inboxFile).doesNotExist();
    Path jobs = root.resolve("jobs");
    assertThat(jobs.resolve(done.id()).resolve("source.json")).exists();
    // simulate crashes: one staging dir after the inbox file was consumed, one before
    Path committedLater = jobs.resolve(".new-000002-late");
    copyTree(jobs.resolve(done.id()), committedLater);
    rewriteId(committedLater, "000002-late");
    Path abandoned = jobs.resolve(".new-000003-early");
    copyTree(jobs.resolve(done.id()), abandoned);
    Files.delete(abandoned.resolve("source.json"));

    JobStore reopened = JobStore.open(root, new StepClock());
    assertThat(reopened.list()).extracting(JobRecord::id).containsExactly(done.id(), "000002-late");
    assertThat(abandoned).doesNotExist();
    assertThat(committedLater).doesNotExist();
  }

  @Test
  void jobPathsNeverLeaveTheJobsDirectory() throws IOException {
    JobStore store = JobStore.open(root, new StepClock());
    for (String bad :
        new String[] {"..", "../x", "000001-../../etc", "/etc/passwd", "000001-a/../../b"}) {
      assertThatThrownBy(() -> store.jobDir(bad))
          .as(bad)
          .isInstanceOf(IllegalArgumentException.class);
      assertThat(store.find(bad)).isEmpty();
    }
    assertThat(store.jobDir("000001-ok").getParent())
        .isEqualTo(root.toAbsolutePath().normalize().resolve("jobs"));
  }

  @Test
  void aRecordOfAnotherFormatIsRefused() {
    assertThatThrownBy(
            () ->
                new JobRecord(
                    2,
                    "000001-a",
                    "a",
                    0,
                    1,
                    "api",
                    JobState.QUEUED,
                    java.util.List.of(new JobEvent(Instant.EPOCH, null, JobState.QUEUED, "x")),
                    null))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessageContaining("format 2");
  }

  private static void rewriteId(Path dir, String id) throws IOException {
    Path f = dir.resolve("job.json");
    JsonNode n = ServeFixtures.JSON.readTree(f.toFile());
    ((com.fasterxml.jackson.databind.node.ObjectNode) n)
        .put("id", id)
        .put("sequence", JobIds.sequence(id));
    Files.writeString(f, n.toString(), StandardCharsets.UTF_8);
  }

  private static void copyTree(Path from, Path to) throws IOException {
    try (Stream<Path> s = Files.walk(from)) {
      for (Path p : s.toList()) {
        Path q = to.resolve(from.relativize(p).toString());
        if (Files.isDirectory(p)) {
          Files.createDirectories(q);
        } else {
          Files.copy(p, q);
        }
      }
    }
  }
}
