package hopstat.cluster;

import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import hopstat.queue.RunDirectory;
import hopstat.queue.RunDirectoryException;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;

/** Reads and writes {@code DIR/cluster.json} (atomic replace on every write). */
public final class ClusterRunStore {

  /** File name inside the run directory. */
  public static final String FILE = "cluster.json";

  private static final ObjectMapper JSON =
      new ObjectMapper()
          .enable(SerializationFeature.INDENT_OUTPUT)
          .disable(DeserializationFeature.FAIL_ON_UNKNOWN_PROPERTIES);

  private ClusterRunStore() {}

  /** The file's path in {@code dir}. */
  public static Path file(RunDirectory dir) {
    return dir.path().resolve(FILE);
  }

  /** The run's cluster side, or empty for a run that was never submitted to a cluster. */
  public static Optional<ClusterRun> read(RunDirectory dir) throws IOException {
    Path file = file(dir);
    if (!Files.isRegularFile(file)) {
      return Optional.empty();
    }
    try {
      return Optional.of(JSON.readValue(file.toFile(), ClusterRun.class));
    } catch (com.fasterxml.jackson.core.JacksonException e) {
      throw new RunDirectoryException(file + " cannot be read: " + e.getOriginalMessage());
    }
  }

  /** Replaces cluster.json with {@code run}. */
  public static void write(RunDirectory dir, ClusterRun run) throws IOException {
    RunDirectory.writeAtomically(file(dir), JSON.writeValueAsBytes(run));
  }
}
