package hopstat.queue;

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

/**
 * Exclusive ownership of a run directory: an OS lock on {@code DIR/lock}, whose text names the
 * owner (pid, host, start time). The OS drops the lock when the owning process dies, however it
 * dies, so a lock file left behind by a crash is stale by construction and is simply taken over.
 */
public final class RunLock implements AutoCloseable {

  private final FileChannel channel;
  private final FileLock lock;

  private RunLock(FileChannel channel, FileLock lock) {
    this.channel = channel;
    this.lock = lock;
  }

  /**
   * @throws RunDirectoryException if another live process holds the directory
   */
  public static RunLock acquire(Path dir) throws IOException {
    Path file = dir.resolve("lock");
    FileChannel channel =
        FileChannel.open(
            file, StandardOpenOption.CREATE, StandardOpenOption.READ, StandardOpenOption.WRITE);
    FileLock lock;
    try {
      lock = channel.tryLock();
    } catch (OverlappingFileLockException e) {
      lock = null;
    }
    if (lock == null) {
      String owner = new String(Files.readAllBytes(file), StandardCharsets.UTF_8).trim();
      channel.close();
      throw new RunDirectoryException(
          dir
              + " is in use by another hopstat process ("
              + (owner.isEmpty() ? "owner unknown" : owner)
              + "); wait for it to finish or stop it first");
    }
    String me =
        "pid "
            + ProcessHandle.current().pid()
            + " on "
            + hostName()
            + " since "
            + Instant.ofEpochMilli(ManagementFactory.getRuntimeMXBean().getStartTime())
            + "\n";
    channel.truncate(0);
    channel.write(ByteBuffer.wrap(me.getBytes(StandardCharsets.UTF_8)), 0);
    channel.force(false);
    return new RunLock(channel, lock);
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
    if (lock.isValid()) {
      lock.release();
    }
    channel.close();
  }
}
