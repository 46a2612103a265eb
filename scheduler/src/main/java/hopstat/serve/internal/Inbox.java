package hopstat.serve.internal;

import hopstat.queue.RunDirectory;
import hopstat.serve.BatchService;
import hopstat.serve.InputErrors;
import hopstat.task.InvalidInputException;
import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Executors;
import java.util.concurrent.ScheduledExecutorService;
import java.util.concurrent.TimeUnit;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/**
 * The submission inbox {@code ROOT/inbox/}, scanned every poll interval.
 *
 * <p>The rule: the service takes only regular files whose name ends in {@code .json} and does not
 * start with a dot. Write a spec elsewhere in the same file system, or as a dot-file in the inbox
 * ({@code inbox/.demo.json.part}), and rename it to its final name when complete; a rename is
 * atomic, so the service never sees half a file. An optional priority goes in the name: {@code
 * NAME@P.json} with an integer P (default 0; larger runs first).
 *
 * <p>A valid spec becomes a QUEUED job and its file moves to {@code ROOT/jobs/<id>/source.json}. An
 * invalid one moves to {@code ROOT/rejected/NAME} with {@code NAME.error.txt} beside it holding the
 * CLI's error lines. Files are taken oldest first (modification time, then name).
 */
public final class Inbox implements AutoCloseable {

  /** Largest spec file accepted (bytes). */
  public static final int MAX_SPEC_BYTES = 1 << 20;

  private static final Logger LOG = LoggerFactory.getLogger(Inbox.class);
  private static final Pattern NAME = Pattern.compile("(.*?)(?:@(-?[0-9]{1,9}))?\\.json");

  private final BatchService service;
  private final Path inbox;
  private final Path rejected;
  private final ScheduledExecutorService timer;

  private Inbox(BatchService service, Path root) {
    this.service = service;
    this.inbox = root.resolve("inbox");
    this.rejected = root.resolve("rejected");
    this.timer =
        Executors.newSingleThreadScheduledExecutor(
            r -> {
              Thread t = new Thread(r, "hopstat-serve-inbox");
              t.setDaemon(true);
              return t;
            });
  }

  /** Creates the inbox and rejected directories and starts scanning. */
  public static Inbox start(BatchService service, Path root, Duration poll) throws IOException {
    Inbox in = new Inbox(service, root);
    Files.createDirectories(in.inbox);
    Files.createDirectories(in.rejected);
    in.timer.scheduleWithFixedDelay(in::scanQuietly, 0, poll.toMillis(), TimeUnit.MILLISECONDS);
    return in;
  }

  private void scanQuietly() {
    try {
      scan();
    } catch (IOException | RuntimeException e) { // keep scanning: the next poll retries
      LOG.warn("inbox scan failed: {}", e.toString());
    }
  }

  /** Takes every complete file now in the inbox; returns how many were taken or rejected. */
  public synchronized int scan() throws IOException {
    List<Path> files = new ArrayList<>();
    try (Stream<Path> s = Files.list(inbox)) {
      for (Path p : (Iterable<Path>) s::iterator) {
        String name = p.getFileName().toString();
        if (!name.startsWith(".")
            && name.endsWith(".json")
            && Files.isRegularFile(p, LinkOption.NOFOLLOW_LINKS)) {
          files.add(p);
        }
      }
    }
    files.sort(
        (a, b) -> {
          try {
            int c = Files.getLastModifiedTime(a).compareTo(Files.getLastModifiedTime(b));
            return c != 0 ? c : a.getFileName().toString().compareTo(b.getFileName().toString());
          } catch (IOException e) {
            return a.getFileName().toString().compareTo(b.getFileName().toString());
          }
        });
    int n = 0;
    for (Path p : files) {
      if (take(p)) {
        n++;
      }
    }
    return n;
  }

  private boolean take(Path file) throws IOException {
    String name = file.getFileName().toString();
    try {
      Matcher m = NAME.matcher(name);
      if (!m.matches()) {
        throw new InvalidInputException(
            "inbox file name", name, "must be NAME.json or NAME@PRIORITY.json");
      }
      int priority = 0;
      if (m.group(2) != null) {
        try {
          priority = Integer.parseInt(m.group(2));
        } catch (NumberFormatException e) {
          throw new InvalidInputException("priority", m.group(2), "must be an integer");
        }
      }
      String text = readSpec(file);
      service.submit(text, priority, "inbox:" + name, file);
      return true;
    } catch (InvalidInputException e) {
      reject(file, e);
      return true;
    } catch (java.nio.file.NoSuchFileException gone) {
      return false; // removed by its writer between listing and reading
    }
  }

  private static String readSpec(Path file) throws IOException {
    long size = Files.size(file);
    if (size > MAX_SPEC_BYTES) {
      throw new InvalidInputException(
          "SPEC", size + " bytes", "a spec file may hold at most " + MAX_SPEC_BYTES + " bytes");
    }
    byte[] bytes = Files.readAllBytes(file);
    try {
      return StandardCharsets.UTF_8
          .newDecoder()
          .onMalformedInput(CodingErrorAction.REPORT)
          .onUnmappableCharacter(CodingErrorAction.REPORT)
          .decode(ByteBuffer.wrap(bytes))
          .toString();
    } catch (CharacterCodingException e) {
      throw new InvalidInputException("SPEC", null, "the spec file is not UTF-8 text");
    }
  }

  private void reject(Path file, InvalidInputException e) throws IOException {
    String name = file.getFileName().toString();
    String target = name;
    for (int k = 2;
        Files.exists(rejected.resolve(target))
            || Files.exists(rejected.resolve(target + ".error.txt"));
        k++) {
      target = name.substring(0, name.length() - ".json".length()) + "-" + k + ".json";
    }
    String text = String.join("\n", InputErrors.lines(e)) + "\n";
    RunDirectory.writeAtomically(
        rejected.resolve(target + ".error.txt"), text.getBytes(StandardCharsets.UTF_8));
    Files.move(file, rejected.resolve(target), StandardCopyOption.ATOMIC_MOVE);
    LOG.warn("rejected inbox file {}: {}", name, e.getMessage());
  }

  @Override
  public void close() {
    timer.shutdownNow();
    try {
      timer.awaitTermination(5, TimeUnit.SECONDS);
    } catch (InterruptedException e) {
      Thread.currentThread().interrupt();
    }
  }
}
