package hopstat.cluster;

import hopstat.pool.Shard;
import hopstat.queue.RunDirectoryException;
import java.io.IOException;
import java.lang.management.ManagementFactory;
import java.net.InetAddress;
import java.nio.ByteBuffer;
import java.nio.channels.FileChannel;
import java.nio.channels.FileLock;
import java.nio.channels.OverlappingFileLockException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.time.Instant;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * What a cluster shard holds while it works: an exclusive OS lock on {@code DIR/locks/shard-KKKK}
 * (one process per shard; its text names the owner) and a <em>shared</em> lock on the run-wide
 * {@code DIR/lock}. Shards therefore run side by side, each writing its own journal file, while a
 * local {@code hopstat run/resume}, which takes {@code DIR/lock} exclusively, is refused until
 * every shard has ended. The OS drops both locks when the process dies, however it dies.
 *
 * <p>Across nodes this relies on the shared file system honouring POSIX (fcntl) locks, as NFSv4 and
 * Lustre mounted with {@code flock} do.
 */
public final class ShardLock implements AutoCloseable {

  /**
   * The JVM's shared holds on run-wide lock files, counted per file. Java refuses a second lock on
   * a file region that the same JVM already locks (even a shared one), so shards running in one JVM
   * (tests, or a future multi-shard worker) share one hold.
   */
  private static final Map<Path, SharedHold> SHARED = new HashMap<>();

  private static final class SharedHold {
    final FileChannel channel;
    final FileLock lock;
    int users;

    SharedHold(FileChannel channel, FileLock lock) {
      this.channel = channel;
      this.lock = lock;
    }
  }

  private final Path runFile;
  private final FileChannel shardChannel;
  private final FileLock shardLock;

  private ShardLock(Path runFile, FileChannel shardChannel, FileLock shardLock) {
    this.runFile = runFile;
    this.shardChannel = shardChannel;
    this.shardLock = shardLock;
  }

  /** {@code DIR/locks/shard-KKKK}. */
  public static Path file(Path dir, int shard) {
    return dir.resolve("locks").resolve(String.format(Locale.ROOT, "shard-%04d", shard));
  }

  /**
   * @throws RunDirectoryException if a local session owns the directory or another process works on
   *     the same shard
   */
  public static ShardLock acquire(Path dir, Shard shard) throws IOException {
    Path runFile = holdShared(dir, shard);
    Path file = file(dir, shard.index());
    Files.createDirectories(file.getParent());
    FileChannel own =
        FileChannel.open(
            file, StandardOpenOption.CREATE, StandardOpenOption.READ, StandardOpenOption.WRITE);
    FileLock exclusive = tryLock(own, false);
    if (exclusive == null) {
      String owner = new String(Files.readAllBytes(file), StandardCharsets.UTF_8).trim();
      own.close();
      releaseShared(runFile);
      throw new RunDirectoryException(
          "shard "
              + shard.index()
              + " of "
              + dir
              + " is already being worked on ("
              + (owner.isEmpty() ? "owner unknown" : owner)
              + ")");
    }
    String me =
        "pid "
            + ProcessHandle.current().pid()
            + " on "
            + hostName()
            + " since "
            + Instant.ofEpochMilli(ManagementFactory.getRuntimeMXBean().getStartTime())
            + slurmJob()
            + "\n";
    own.truncate(0);
    own.write(ByteBuffer.wrap(me.getBytes(StandardCharsets.UTF_8)), 0);
    own.force(false);
    return new ShardLock(runFile, own, exclusive);
  }

  private static Path holdShared(Path dir, Shard shard) throws IOException {
    Path runFile = dir.resolve("lock").toAbsolutePath().normalize();
    synchronized (SHARED) {
      SharedHold hold = SHARED.get(runFile);
      if (hold == null) {
        FileChannel run =
            FileChannel.open(
                runFile,
                StandardOpenOption.CREATE,
                StandardOpenOption.READ,
                StandardOpenOption.WRITE);
        FileLock shared = tryLock(run, true);
        if (shared == null) {
          String owner = new String(Files.readAllBytes(runFile), StandardCharsets.UTF_8).trim();
          run.close();
          throw new RunDirectoryException(
              dir
                  + " is in use by a local hopstat session ("
                  + (owner.isEmpty() ? "owner unknown" : owner)
                  + "); shard "
                  + shard.index()
                  + " does not start while it runs");
        }
        hold = new SharedHold(run, shared);
        SHARED.put(runFile, hold);
      }
      hold.users++;
    }
    return runFile;
  }

  private static void releaseShared(Path runFile) throws IOException {
    synchronized (SHARED) {
      SharedHold hold = SHARED.get(runFile);
      if (hold != null && --hold.users == 0) {
        SHARED.remove(runFile);
        try {
          if (hold.lock.isValid()) {
            hold.lock.release();
          }
        } finally {
          hold.channel.close();
        }
      }
    }
  }

  /**
   * The shards whose lock is held by a live process right now (tested by trying each lock), in
   * ascending order. Does not block.
   */
  public static List<Integer> held(Path dir, int shardCount) throws IOException {
    List<Integer> held = new ArrayList<>();
    for (int k = 0; k < shardCount; k++) {
      Path file = file(dir, k);
      if (!Files.exists(file)) {
        continue;
      }
      try (FileChannel c =
          FileChannel.open(file, StandardOpenOption.READ, StandardOpenOption.WRITE)) {
        FileLock probe = tryLock(c, false);
        if (probe == null) {
          held.add(k);
        } else {
          probe.release();
        }
      }
    }
    return held;
  }

  private static FileLock tryLock(FileChannel channel, boolean shared) throws IOException {
    try {
      return channel.tryLock(0, Long.MAX_VALUE, shared);
    } catch (OverlappingFileLockException e) {
      return null; // held inside this very JVM
    }
  }

  /** Slurm's job and array ids when running as a batch job: for the lock's owner text. */
  private static String slurmJob() {
    // The CLI layer would be the natural reader of the environment; the lock text is the one
    // place that needs it, and it is informational only.
    String array = System.getenv("SLURM_ARRAY_JOB_ID");
    String task = System.getenv("SLURM_ARRAY_TASK_ID");
    String job = System.getenv("SLURM_JOB_ID");
    if (array != null && task != null) {
      return " (slurm job " + array + "_" + task + ")";
    }
    return job == null ? "" : " (slurm job " + job + ")";
  }

  private static String hostName() {
    try {
      return InetAddress.getLocalHost().getHostName();
    } catch (IOException e) {
      return "unknown host";
    }
  }

  @Override
  public void close() throws IOException {
    try {
      if (shardLock.isValid()) {
        shardLock.release();
      }
      shardChannel.close();
    } finally {
      releaseShared(runFile);
    }
  }
}
