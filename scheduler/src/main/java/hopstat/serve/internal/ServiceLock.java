package hopstat.serve.internal;

import hopstat.queue.RunDirectoryException;
import java.io.IOException;
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
 * One service per root: an OS lock on {@code ROOT/service.lock}, whose text names the owner. The OS
 * drops the lock when the process dies however it dies, so a crash never leaves the root locked.
 */
public final class ServiceLock implements AutoCloseable {

  /** Lock file name under the root. */
  public static final String FILE = "service.lock";

  private final FileChannel channel;
  private final FileLock lock;

  private ServiceLock(FileChannel channel, FileLock lock) {
    this.channel = channel;
    this.lock = lock;
  }

  /**
   * @throws RunDirectoryException if another live service (in this or another process) holds the
   *     root
   */
  public static ServiceLock acquire(Path root) throws IOException {
    Path file = root.resolve(FILE);
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
          "a hopstat service already runs on "
              + root
              + " ("
              + (owner.isEmpty() ? "owner unknown" : owner)
              + "); submit to it (inbox/ or its HTTP API) or stop it first");
    }
    String me = "pid " + ProcessHandle.current().pid() + " since " + Instant.now() + "\n";
    channel.truncate(0);
    channel.write(ByteBuffer.wrap(me.getBytes(StandardCharsets.UTF_8)), 0);
    channel.force(false);
    return new ServiceLock(channel, lock);
  }

  @Override
  public void close() throws IOException {
    if (lock.isValid()) {
      lock.release();
    }
    channel.close();
  }
}
