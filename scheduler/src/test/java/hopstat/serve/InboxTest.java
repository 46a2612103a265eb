package hopstat.serve;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class InboxTest {

  @TempDir Path root;
  @TempDir Path scratch;

  @Test
  void goodSpecsBecomeJobsAndBadOnesAreRejectedWithTheCliMessages() throws Exception {
    try (BatchService service = ServeFixtures.start(root, null, Duration.ZERO)) {
      Path inbox = root.resolve("inbox");
      // the documented rule: write a dot-file, then rename; dot-files and other names are ignored
      Path partial =
          Files.writeString(
              inbox.resolve(".good.json.part"), ServeFixtures.smallQwz("from-inbox", 2));
      Files.writeString(inbox.resolve("notes.txt"), "not a spec");
      Files.writeString(inbox.resolve(".hidden.json"), "{ half a spec");
      Thread.sleep(300); // three poll intervals: nothing must be taken yet
      assertThat(service.jobs()).isEmpty();
      Files.move(
          partial, inbox.resolve("good@7.json"), java.nio.file.StandardCopyOption.ATOMIC_MOVE);
      Files.writeString(inbox.resolve("bad.json"), ServeFixtures.badSpec());
      Files.write(inbox.resolve("latin1.json"), new byte[] {'{', (byte) 0xE9, '}'});

      ServeFixtures.await(
          "the inbox to be processed",
          Duration.ofSeconds(20),
          () ->
              service.jobs().size() == 1
                  && Files.exists(root.resolve("rejected").resolve("bad.json"))
                  && Files.exists(root.resolve("rejected").resolve("latin1.json")));
      JobRecord job = service.jobs().get(0);
      assertThat(job.id()).isEqualTo("000001-from-inbox");
      assertThat(job.priority()).isEqualTo(7);
      assertThat(job.source()).isEqualTo("inbox:good@7.json");
      assertThat(Files.readString(root.resolve("jobs").resolve(job.id()).resolve("source.json")))
          .isEqualTo(ServeFixtures.smallQwz("from-inbox", 2));

      List<String> cli = CliErrors.runErrorLines(scratch, ServeFixtures.badSpec());
      List<String> served =
          Files.readAllLines(
              root.resolve("rejected").resolve("bad.json.error.txt"), StandardCharsets.UTF_8);
      assertThat(served).isEqualTo(cli);
      assertThat(served.get(0)).startsWith("hopstat: invalid input (");
      assertThat(String.join("\n", served)).contains("parameters.L").contains("observables[1]");
      assertThat(Files.readString(root.resolve("rejected").resolve("latin1.json.error.txt")))
          .contains("not UTF-8");
      // untouched: the ignored files stay where they are
      try (Stream<Path> left = Files.list(inbox)) {
        assertThat(left.map(p -> p.getFileName().toString()))
            .containsExactlyInAnyOrder("notes.txt", ".hidden.json");
      }
      ServeFixtures.await(
          "the job to finish",
          Duration.ofSeconds(30),
          () -> service.job(job.id()).orElseThrow().state() == JobState.DONE);
      assertThat(root.resolve("jobs").resolve(job.id()).resolve("run").resolve("summary.csv"))
          .exists();
    }
  }

  @Test
  void aSecondRejectionOfTheSameNameDoesNotOverwriteTheFirst() throws Exception {
    try (BatchService service = ServeFixtures.start(root, null, Duration.ZERO)) {
      Path inbox = root.resolve("inbox");
      Files.writeString(inbox.resolve("bad.json"), ServeFixtures.badSpec());
      ServeFixtures.await(
          "first rejection",
          Duration.ofSeconds(10),
          () -> Files.exists(root.resolve("rejected").resolve("bad.json")));
      Files.writeString(inbox.resolve("bad.json"), "{}");
      ServeFixtures.await(
          "second rejection",
          Duration.ofSeconds(10),
          () -> Files.exists(root.resolve("rejected").resolve("bad-2.json")));
      assertThat(Files.readString(root.resolve("rejected").resolve("bad.json")))
          .isEqualTo(ServeFixtures.badSpec());
      assertThat(Files.readString(root.resolve("rejected").resolve("bad-2.json"))).isEqualTo("{}");
      assertThat(root.resolve("rejected").resolve("bad-2.json.error.txt")).exists();
      assertThat(service.jobs()).isEmpty();
    }
  }
}
