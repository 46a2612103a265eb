package hopstat.queue;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import hopstat.disorder.DisorderTerm;
import hopstat.lattice.Boundary;
import hopstat.model.ParameterValues;
import hopstat.record.RealisationRecord;
import hopstat.task.Outcome;
import hopstat.task.PointSpec;
import hopstat.task.RealisationResult;
import hopstat.task.RealisationTask;
import java.io.IOException;
import java.time.Clock;
import java.time.Duration;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.atomic.AtomicReference;
import org.junit.jupiter.api.Test;

/** The contract every {@link TaskStore} keeps. Each implementation has a small subclass. */
abstract class TaskStoreContractTest {

  /** A clock the test moves by hand. */
  static final class ManualClock extends Clock {
    final AtomicReference<Instant> now =
        new AtomicReference<>(Instant.parse("2026-01-01T00:00:00Z"));

    void advance(Duration d) {
      now.updateAndGet(t -> t.plus(d));
    }

    @Override
    public Instant instant() {
      return now.get();
    }

    @Override
    public java.time.ZoneId getZone() {
      return ZoneOffset.UTC;
    }

    @Override
    public Clock withZone(java.time.ZoneId zone) {
      return this;
    }
  }

  final ManualClock clock = new ManualClock();

  /** A fresh store; {@code preloaded} are records finished in an earlier session. */
  abstract TaskStore newStore(Map<String, RealisationRecord> preloaded) throws IOException;

  static final PointSpec POINT =
      new PointSpec(
          "qwz",
          new ParameterValues(Map.of("m", 1.0, "L", 4.0)),
          4,
          Boundary.PERIODIC,
          0.0,
          List.<DisorderTerm>of(),
          List.of("gap"));

  static RealisationTask aTask(int realisation) {
    return new RealisationTask(
        RealisationTask.idOf(0, realisation), 0, realisation, 1000L + realisation, POINT);
  }

  static RealisationRecord aRecord(RealisationTask t, Outcome outcome) {
    RealisationResult r =
        new RealisationResult(
            t.taskId(),
            t.pointIndex(),
            t.realisationIndex(),
            t.seed(),
            outcome,
            outcome == Outcome.DONE ? Map.of("gap", 0.5 + t.realisationIndex()) : Map.of(),
            outcome == Outcome.DONE ? null : "boom",
            0.01);
    return new RealisationRecord(r, Map.of("L", 4.0), Map.of("m", 1.0, "L", 4.0), "test", "none");
  }

  static List<RealisationTask> tasks(int n) {
    List<RealisationTask> list = new ArrayList<>();
    for (int i = 0; i < n; i++) {
      list.add(aTask(i));
    }
    return list;
  }

  @Test
  void claimsInInsertionOrderAndFinishes() throws IOException {
    try (TaskStore store = newStore(Map.of())) {
      assertThat(store.add(tasks(3))).isEqualTo(3);
      Claim c0 = store.claim("w0").orElseThrow();
      Claim c1 = store.claim("w1").orElseThrow();
      assertThat(c0.task().taskId()).isEqualTo("p0-r0");
      assertThat(c1.task().taskId()).isEqualTo("p0-r1");
      assertThat(store.complete(c0, aRecord(c0.task(), Outcome.DONE))).isTrue();
      assertThat(store.complete(c1, aRecord(c1.task(), Outcome.FAILED))).isTrue();
      assertThat(store.counts())
          .containsEntry(TaskState.DONE, 1)
          .containsEntry(TaskState.FAILED, 1)
          .containsEntry(TaskState.PENDING, 1);
      assertThat(store.finished()).hasSize(2);
      assertThat(store.view("p0-r0").orElseThrow().history())
          .extracting(TaskView.Transition::state)
          .containsExactly(TaskState.PENDING, TaskState.RUNNING, TaskState.DONE);
    }
  }

  @Test
  void addingAKnownTaskChangesNothing() throws IOException {
    try (TaskStore store = newStore(Map.of())) {
      store.add(tasks(2));
      assertThat(store.add(tasks(3))).isEqualTo(1);
      assertThat(store.counts().get(TaskState.PENDING)).isEqualTo(3);
    }
  }

  @Test
  void preloadedTasksEnterFinishedAndAreNotClaimed() throws IOException {
    RealisationTask t0 = aTask(0);
    try (TaskStore store = newStore(Map.of(t0.taskId(), aRecord(t0, Outcome.DONE)))) {
      assertThat(store.add(tasks(2))).isEqualTo(1);
      assertThat(store.claim("w").orElseThrow().task().taskId()).isEqualTo("p0-r1");
      assertThat(store.claim("w")).isEmpty();
      assertThat(store.view("p0-r0").orElseThrow().state()).isEqualTo(TaskState.DONE);
    }
  }

  @Test
  void staleClaimLosesTheRaceQuietly() throws IOException {
    try (TaskStore store = newStore(Map.of())) {
      store.add(tasks(1));
      Claim first = store.claim("w0").orElseThrow();
      clock.advance(Duration.ofMinutes(30));
      assertThat(store.sweep(clock.instant().minus(Duration.ofMinutes(10)), 3)).isEqualTo(1);
      Claim second = store.claim("w1").orElseThrow();
      assertThat(second.version()).isGreaterThan(first.version());
      assertThat(store.heartbeat(first)).isFalse();
      assertThat(store.complete(first, aRecord(first.task(), Outcome.DONE))).isFalse();
      assertThat(store.complete(second, aRecord(second.task(), Outcome.DONE))).isTrue();
      assertThat(store.view("p0-r0").orElseThrow().attempts()).isEqualTo(2);
    }
  }

  @Test
  void heartbeatKeepsATaskFromBeingSwept() throws IOException {
    try (TaskStore store = newStore(Map.of())) {
      store.add(tasks(1));
      Claim c = store.claim("w0").orElseThrow();
      clock.advance(Duration.ofMinutes(30));
      assertThat(store.heartbeat(c)).isTrue();
      assertThat(store.sweep(clock.instant().minus(Duration.ofMinutes(10)), 3)).isZero();
      assertThat(store.view("p0-r0").orElseThrow().state()).isEqualTo(TaskState.RUNNING);
    }
  }

  @Test
  void taskLostTooOftenIsGivenUpAsFailed() throws IOException {
    try (TaskStore store = newStore(Map.of())) {
      store.add(tasks(1));
      for (int attempt = 1; attempt <= 2; attempt++) {
        store.claim("w").orElseThrow();
        clock.advance(Duration.ofMinutes(30));
        store.sweep(clock.instant().minus(Duration.ofMinutes(10)), 2);
      }
      assertThat(store.view("p0-r0").orElseThrow().state()).isEqualTo(TaskState.FAILED);
      assertThat(store.finished())
          .singleElement()
          .satisfies(r -> assertThat(r.result().failure()).contains("worker lost 2 time(s)"));
    }
  }

  @Test
  void recordForAnotherTaskIsAProgrammingError() throws IOException {
    try (TaskStore store = newStore(Map.of())) {
      store.add(tasks(2));
      Claim c = store.claim("w").orElseThrow();
      assertThatThrownBy(() -> store.complete(c, aRecord(aTask(1), Outcome.DONE)))
          .isInstanceOf(IllegalArgumentException.class);
    }
  }

  @Test
  void concurrentClaimsNeverHandOutATaskTwice() throws Exception {
    try (TaskStore store = newStore(Map.of())) {
      store.add(tasks(400));
      Map<String, String> claimedBy = new ConcurrentHashMap<>();
      List<Thread> threads = new ArrayList<>();
      List<String> duplicates = java.util.Collections.synchronizedList(new ArrayList<>());
      for (int w = 0; w < 4; w++) {
        String id = "w" + w;
        Thread t =
            new Thread(
                () -> {
                  Optional<Claim> c;
                  while ((c = store.claim(id)).isPresent()) {
                    if (claimedBy.putIfAbsent(c.get().task().taskId(), id) != null) {
                      duplicates.add(c.get().task().taskId());
                    }
                    try {
                      store.complete(c.get(), aRecord(c.get().task(), Outcome.DONE));
                    } catch (IOException e) {
                      throw new java.io.UncheckedIOException(e);
                    }
                  }
                });
        threads.add(t);
        t.start();
      }
      for (Thread t : threads) {
        t.join();
      }
      assertThat(duplicates).isEmpty();
      assertThat(claimedBy).hasSize(400);
      assertThat(store.counts().get(TaskState.DONE)).isEqualTo(400);
    }
  }

  @Test
  void transitionTableRejectsIllegalMoves() {
    assertThatThrownBy(() -> TaskState.DONE.checkMoveTo(TaskState.RUNNING))
        .isInstanceOf(IllegalStateException.class);
    assertThatThrownBy(() -> TaskState.PENDING.checkMoveTo(TaskState.DONE))
        .isInstanceOf(IllegalStateException.class);
    assertThat(TaskState.RUNNING.canMoveTo(TaskState.PENDING)).isTrue();
  }
}
