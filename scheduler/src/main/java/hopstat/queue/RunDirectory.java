package hopstat.queue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.Locale;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;

/**
 * The on-disk layout of one run, format {@value #FORMAT}:
 *
 * <pre>
 * DIR/spec.json          the exact spec text the run uses
 * DIR/run.json           format version, spec hash, tool version, provenance of the first session
 * DIR/journal/*.jsonl    append-only records, one file per writer session or cluster shard
 * DIR/lock               owner of the directory while a process works in it
 * DIR/summary.csv|json   derived from spec + journal by `hopstat report`
 * </pre>
 */
public final class RunDirectory {

  /** Layout version written to run.json. */
  public static final int FORMAT = 1;

  private static final ObjectMapper JSON =
      new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

  /**
   * The last group of digits in a journal file name: the session number of {@code
   * prefix-NNNN.jsonl}, whatever the prefix holds.
   */
  private static final Pattern PART = Pattern.compile("(?:.*\\D)?(\\d+)\\D*\\.jsonl");

  private final Path dir;

  private RunDirectory(Path dir) {
    this.dir = dir;
  }

  public Path path() {
    return dir;
  }

  public Path journalDir() {
    return dir.resolve("journal");
  }

  public Path specFile() {
    return dir.resolve("spec.json");
  }

  /**
   * Creates a new run directory for a spec (the directory may exist but must be empty).
   *
   * @param metadata run.json members (spec hash, versions, provenance)
   * @throws RunDirectoryException if DIR already holds a run
   */
  public static RunDirectory create(Path dir, String specText, Map<String, Object> metadata)
      throws IOException {
    if (Files.exists(dir.resolve("spec.json")) || Files.exists(dir.resolve("journal"))) {
      throw new RunDirectoryException(
          dir
              + " already holds a run; continue it with `hopstat resume "
              + dir
              + "` or choose another --out");
    }
    if (Files.exists(dir) && !Files.isDirectory(dir)) {
      throw new RunDirectoryException(dir + " exists and is not a directory");
    }
    Files.createDirectories(dir.resolve("journal"));
    writeAtomically(dir.resolve("spec.json"), specText.getBytes(StandardCharsets.UTF_8));
    Map<String, Object> run = new java.util.LinkedHashMap<>();
    run.put("format", FORMAT);
    run.putAll(metadata);
    writeAtomically(dir.resolve("run.json"), JSON.writeValueAsBytes(run));
    return new RunDirectory(dir);
  }

  /**
   * Opens an existing run directory.
   *
   * @throws RunDirectoryException if it is not a run directory of a format this version reads
   */
  public static RunDirectory open(Path dir) throws IOException {
    if (!Files.isRegularFile(dir.resolve("spec.json"))
        || !Files.isRegularFile(dir.resolve("run.json"))) {
      throw new RunDirectoryException(
          dir + " is not a hopstat run directory (no spec.json/run.json)");
    }
    JsonNode run = JSON.readTree(dir.resolve("run.json").toFile());
    int format = run.path("format").asInt(-1);
    if (format != FORMAT) {
      throw new RunDirectoryException(
          dir
              + "/run.json has layout format "
              + run.path("format")
              + "; this hopstat reads format "
              + FORMAT);
    }
    Files.createDirectories(dir.resolve("journal"));
    return new RunDirectory(dir);
  }

  /** The exact spec text of the run. */
  public String specText() throws IOException {
    return Files.readString(specFile(), StandardCharsets.UTF_8);
  }

  /** run.json as a tree. */
  public JsonNode runMetadata() throws IOException {
    return JSON.readTree(dir.resolve("run.json").toFile());
  }

  /**
   * A fresh journal file name for a new writer session: {@code prefix-NNNN.jsonl} with NNNN one
   * more than any existing file's number.
   */
  public Path newJournalFile(String prefix) throws IOException {
    int max = 0;
    try (Stream<Path> s = Files.list(journalDir())) {
      for (Path p : (Iterable<Path>) s::iterator) {
        Matcher m = PART.matcher(p.getFileName().toString());
        if (m.matches()) {
          max = Math.max(max, Integer.parseInt(m.group(1)));
        }
      }
    }
    return journalDir().resolve(String.format(Locale.ROOT, "%s-%04d.jsonl", prefix, max + 1));
  }

  /** Writes through a temporary file and an atomic rename. */
  public static void writeAtomically(Path target, byte[] bytes) throws IOException {
    Path tmp = target.resolveSibling(target.getFileName() + ".tmp");
    Files.write(tmp, bytes);
    Files.move(tmp, target, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
  }
}
