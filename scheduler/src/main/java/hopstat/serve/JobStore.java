package hopstat.serve;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import hopstat.queue.RunDirectory;
import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.channels.FileChannel;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.time.Clock;
import java.time.Instant;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;
import java.util.stream.Stream;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/**
 * The durable job queue of a service root:
 *
 * <pre>
 * ROOT/jobs/&lt;id&gt;/job.json     the {@link JobRecord} (written to a temp file, forced, renamed)
 * ROOT/jobs/&lt;id&gt;/run/         the job's run directory, as {@code hopstat run} makes it
 * ROOT/jobs/&lt;id&gt;/source.json  the inbox file the job came from, if any
 * ROOT/jobs/.new-&lt;id&gt;/        a submission being staged (finished or discarded at the next open)
 * </pre>
 *
 * A submission is staged completely, then committed by one rename of the staging directory. An
 * inbox file is consumed by renaming it into the staging directory just before that commit; a
 * staging directory found at open that holds {@code source.json} is committed, any other is deleted
 * (its inbox file is still in the inbox). So a crash anywhere never loses or duplicates a
 * submission. Every state change is stamped from the injected clock.
 *
 * <p>Thread-safe: all methods synchronise on the store.
 */
public final class JobStore {

  /** Directory of jobs under the root. */
  public static final String JOBS = "jobs";

  static final String STAGING_PREFIX = ".new-";
  static final String SOURCE_FILE = "source.json";
  static final String RECORD_FILE = "job.json";
  static final String RUN_DIR = "run";

  private static final Logger LOG = LoggerFactory.getLogger(JobStore.class);
  private static final ObjectMapper JSON =
      new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

  private final Path jobsDir;
  private final Clock clock;
  private final Map<String, JobRecord> jobs = new TreeMap<>();
  private long lastSequence;

  private JobStore(Path jobsDir, Clock clock) {
    this.jobsDir = jobsDir;
    this.clock = clock;
  }

  /**
   * Opens (creating if needed) the store under {@code root}, finishing or discarding staged
   * submissions.
   */
  public static JobStore open(Path root, Clock clock) throws IOException {
    Path jobsDir = root.toAbsolutePath().normalize().resolve(JOBS);
    Files.createDirectories(jobsDir);
    JobStore store = new JobStore(jobsDir, clock);
    store.load();
    return store;
  }

  private void load() throws IOException {
    List<Path> entries;
    try (Stream<Path> s = Files.list(jobsDir)) {
      entries = s.sorted().toList();
    }
    for (Path p : entries) {
      String name = p.getFileName().toString();
      if (name.startsWith(STAGING_PREFIX) && Files.isDirectory(p)) {
        String id = name.substring(STAGING_PREFIX.length());
        if (JobIds.isValid(id)
            && Files.isRegularFile(p.resolve(SOURCE_FILE))
            && Files.isRegularFile(p.resolve(RECORD_FILE))
            && !Files.exists(jobsDir.resolve(id))) {
          Files.move(p, jobsDir.resolve(id), StandardCopyOption.ATOMIC_MOVE);
          LOG.info("committed submission {} staged before a crash", id);
        } else {
          deleteTree(p);
          LOG.info("discarded unfinished submission {}", name);
        }
      }
    }
    try (Stream<Path> s = Files.list(jobsDir)) {
      entries = s.sorted().toList();
    }
    for (Path p : entries) {
      String id = p.getFileName().toString();
      if (!JobIds.isValid(id) || !Files.isDirectory(p)) {
        continue;
      }
      lastSequence = Math.max(lastSequence, JobIds.sequence(id));
      Path file = p.resolve(RECORD_FILE);
      try {
        JobRecord r = fromJson(JSON.readTree(file.toFile()));
        if (!r.id().equals(id)) {
          throw new IOException("job.json names job " + r.id());
        }
        jobs.put(id, r);
      } catch (IOException | RuntimeException e) { // one unreadable record must not hide the others
        LOG.error("skipping job {}: {} is unreadable ({})", id, file, e.getMessage());
      }
    }
  }

  /** Every job, in submission order. */
  public synchronized List<JobRecord> list() {
    List<JobRecord> all = new ArrayList<>(jobs.values());
    all.sort(Comparator.comparingLong(JobRecord::sequence));
    return all;
  }

  /** The job with this id; empty for unknown or malformed ids. */
  public synchronized Optional<JobRecord> find(String id) {
    return JobIds.isValid(id) ? Optional.ofNullable(jobs.get(id)) : Optional.empty();
  }

  /** The QUEUED job to run next: highest priority, then lowest sequence (FIFO). */
  public synchronized Optional<JobRecord> nextQueued() {
    return jobs.values().stream()
        .filter(j -> j.state() == JobState.QUEUED)
        .min(
            Comparator.comparingInt((JobRecord j) -> -j.priority())
                .thenComparingLong(JobRecord::sequence));
  }

  /** The run directory of a job (which must exist in the store). */
  public Path runDir(String id) {
    return jobDir(id).resolve(RUN_DIR);
  }

  /** The directory of a job; refuses malformed ids, so the result is always inside ROOT/jobs. */
  public Path jobDir(String id) {
    if (!JobIds.isValid(id)) {
      throw new IllegalArgumentException("not a job id: " + id);
    }
    Path p = jobsDir.resolve(id).normalize();
    if (!p.getParent().equals(jobsDir)) {
      throw new IllegalArgumentException("job id escapes the jobs directory: " + id);
    }
    return p;
  }

  /**
   * Adds a QUEUED job: stages its run directory and record, consumes {@code consumed} (an inbox
   * file, or {@code null}) by renaming it into the staging directory, and commits by renaming the
   * staging directory into place.
   *
   * @param specText the exact spec text (already validated by the caller)
   * @param runMetadata members of the run's run.json
   */
  public synchronized JobRecord create(
      String specText,
      String specName,
      int priority,
      String source,
      Map<String, Object> runMetadata,
      Path consumed)
      throws IOException {
    long sequence = lastSequence + 1;
    String id = JobIds.of(sequence, specName);
    Path stage = jobsDir.resolve(STAGING_PREFIX + id);
    JobRecord record =
        JobRecord.submitted(id, specName, priority, sequence, source, clock.instant());
    try {
      if (Files.exists(stage)) {
        deleteTree(stage);
      }
      Files.createDirectories(stage);
      RunDirectory.create(stage.resolve(RUN_DIR), specText, runMetadata);
      writeRecord(stage.resolve(RECORD_FILE), record);
      if (consumed != null) {
        Files.move(consumed, stage.resolve(SOURCE_FILE), StandardCopyOption.ATOMIC_MOVE);
      }
    } catch (IOException | RuntimeException e) {
      deleteTree(stage);
      throw e;
    }
    Files.move(stage, jobsDir.resolve(id), StandardCopyOption.ATOMIC_MOVE);
    lastSequence = sequence;
    jobs.put(id, record);
    return record;
  }

  /**
   * Moves a job to {@code next} and writes its record.
   *
   * @param message new user-facing message, or {@code null}
   * @throws IllegalStateException if the transition is not allowed
   * @throws IllegalArgumentException if there is no such job
   */
  public synchronized JobRecord transition(String id, JobState next, String reason, String message)
      throws IOException {
    JobRecord current = find(id).orElseThrow(() -> new IllegalArgumentException("no job " + id));
    JobRecord moved = current.moveTo(next, reason, clock.instant(), message);
    writeRecord(jobDir(id).resolve(RECORD_FILE), moved);
    jobs.put(id, moved);
    return moved;
  }

  private static void writeRecord(Path target, JobRecord record) throws IOException {
    byte[] bytes = JSON.writeValueAsBytes(toJson(record));
    Path tmp = target.resolveSibling("." + target.getFileName() + ".tmp");
    try (FileChannel ch =
        FileChannel.open(
            tmp,
            StandardOpenOption.CREATE,
            StandardOpenOption.WRITE,
            StandardOpenOption.TRUNCATE_EXISTING)) {
      ByteBuffer b = ByteBuffer.wrap(bytes);
      while (b.hasRemaining()) {
        ch.write(b);
      }
      ch.force(true);
    }
    Files.move(tmp, target, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
  }

  /** The record as JSON (job.json, and the {@code job} member of the API's answers). */
  public static ObjectNode toJson(JobRecord r) {
    ObjectNode o = JSON.createObjectNode();
    o.put("format", r.format());
    o.put("id", r.id());
    o.put("name", r.name());
    o.put("priority", r.priority());
    o.put("sequence", r.sequence());
    o.put("source", r.source());
    o.put("state", r.state().name());
    o.put("submitted", r.submittedAt().toString());
    o.put("updated", r.updatedAt().toString());
    if (r.message() == null) {
      o.putNull("message");
    } else {
      o.put("message", r.message());
    }
    ArrayNode h = o.putArray("history");
    for (JobEvent e : r.history()) {
      ObjectNode x = h.addObject();
      x.put("at", e.at().toString());
      if (e.from() == null) {
        x.putNull("from");
      } else {
        x.put("from", e.from().name());
      }
      x.put("to", e.to().name());
      x.put("reason", e.reason());
    }
    return o;
  }

  static JobRecord fromJson(JsonNode o) {
    List<JobEvent> history = new ArrayList<>();
    for (JsonNode x : o.path("history")) {
      JsonNode from = x.path("from");
      history.add(
          new JobEvent(
              Instant.parse(x.path("at").asText()),
              from.isNull() || from.isMissingNode() ? null : JobState.valueOf(from.asText()),
              JobState.valueOf(x.path("to").asText()),
              x.path("reason").asText()));
    }
    JsonNode message = o.path("message");
    return new JobRecord(
        o.path("format").asInt(-1),
        o.path("id").asText(),
        o.path("name").asText(),
        o.path("priority").asInt(),
        o.path("sequence").asLong(),
        o.path("source").asText(),
        JobState.valueOf(o.path("state").asText()),
        history,
        message.isNull() || message.isMissingNode() ? null : message.asText());
  }

  private void deleteTree(Path p) throws IOException {
    Path abs = p.toAbsolutePath().normalize();
    if (!abs.startsWith(jobsDir) || abs.equals(jobsDir)) {
      throw new IllegalArgumentException("refusing to delete outside " + jobsDir + ": " + p);
    }
    if (!Files.exists(abs)) {
      return;
    }
    try (Stream<Path> walk = Files.walk(abs)) {
      for (Path q : walk.sorted(Comparator.reverseOrder()).toList()) {
        Files.delete(q);
      }
    }
  }
}
