package hopstat.queue;

import java.nio.file.Path;

/** A complete journal line (not a torn tail) that fails its checksum or does not parse. */
public final class JournalCorruptException extends RuntimeException {
  private static final long serialVersionUID = 1L;
  private final transient Path file;
  private final int line;

  public JournalCorruptException(Path file, int line, String reason) {
    super(
        "corrupt journal record at "
            + file
            + " line "
            + line
            + ": "
            + reason
            + " (move the file aside or delete that line to continue; every other record is kept)");
    this.file = file;
    this.line = line;
  }

  public Path file() {
    return file;
  }

  /** 1-based line number. */
  public int line() {
    return line;
  }
}
