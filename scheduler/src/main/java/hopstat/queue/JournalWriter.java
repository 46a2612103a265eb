package hopstat.queue;

import hopstat.record.RealisationRecord;
import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.channels.FileChannel;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;

/**
 * Appends records to one journal file that this writer alone owns (created new; never reopened).
 *
 * <p>Durability policy: every record is handed to the kernel with one {@code write} of the whole
 * line, so a killed process (SIGKILL, OOM kill) loses nothing written; the file is fsync'ed when at
 * least {@code syncIntervalNanos} passed since the last sync, and on close, which bounds what a
 * power cut can take to the last interval. A crash can at worst leave one torn final line, which
 * the reader drops.
 */
public final class JournalWriter implements AutoCloseable {

  /** Default fsync interval: 1 s (see docs/design-notes.md for the measured cost). */
  public static final long DEFAULT_SYNC_INTERVAL_NANOS = 1_000_000_000L;

  private final Path file;
  private final FileChannel channel;
  private final long syncIntervalNanos;
  private long lastSync = System.nanoTime();
  private long written;

  /**
   * @param file the new journal file (must not exist)
   * @param syncIntervalNanos fsync at most this often; 0 = after every record
   */
  public JournalWriter(Path file, long syncIntervalNanos) throws IOException {
    this.file = file;
    this.channel =
        FileChannel.open(
            file,
            StandardOpenOption.CREATE_NEW,
            StandardOpenOption.WRITE,
            StandardOpenOption.APPEND);
    this.syncIntervalNanos = syncIntervalNanos;
  }

  public Path file() {
    return file;
  }

  /** Appends one record as one line. */
  public synchronized void append(RealisationRecord record) throws IOException {
    byte[] line = (JournalCodec.encode(record) + "\n").getBytes(StandardCharsets.UTF_8);
    ByteBuffer buffer = ByteBuffer.wrap(line);
    while (buffer.hasRemaining()) {
      channel.write(buffer);
    }
    written++;
    long now = System.nanoTime();
    if (now - lastSync >= syncIntervalNanos) {
      channel.force(false);
      lastSync = now;
    }
  }

  /** Records appended by this writer. */
  public synchronized long written() {
    return written;
  }

  @Override
  public synchronized void close() throws IOException {
    if (channel.isOpen()) {
      channel.force(false);
      channel.close();
    }
  }
}
