package hopstat.queue;

import hopstat.record.RealisationRecord;
import hopstat.task.Outcome;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;

/**
 * Reads every journal file of a run directory ({@code journal/*.jsonl}, in name order).
 *
 * <p>Rules: a final segment without its newline is a torn write from a crash and is dropped (and
 * reported in {@link Contents#tornLines}); a complete line that fails its checksum or does not
 * parse throws {@link JournalCorruptException} naming file and line. Several records for one task
 * (a retried cluster shard, say) collapse to one: a DONE record wins over FAILED ones, and the
 * first DONE in file order wins over later ones.
 */
public final class JournalReader {

  private JournalReader() {}

  /**
   * What the journal holds.
   *
   * @param records one record per task id, in first-seen order
   * @param tornLines "file: bytes" of dropped torn tails
   * @param duplicates records that repeated a task id
   */
  public record Contents(
      Map<String, RealisationRecord> records, List<String> tornLines, int duplicates) {}

  public static Contents read(Path journalDir) throws IOException {
    Map<String, RealisationRecord> records = new LinkedHashMap<>();
    List<String> torn = new ArrayList<>();
    int duplicates = 0;
    if (!Files.isDirectory(journalDir)) {
      return new Contents(records, torn, 0);
    }
    List<Path> files;
    try (Stream<Path> s = Files.list(journalDir)) {
      files = s.filter(p -> p.getFileName().toString().endsWith(".jsonl")).sorted().toList();
    }
    for (Path file : files) {
      String text = new String(Files.readAllBytes(file), StandardCharsets.UTF_8);
      int lineNo = 0;
      int start = 0;
      while (start < text.length()) {
        int end = text.indexOf('\n', start);
        lineNo++;
        if (end < 0) {
          torn.add(
              file.getFileName()
                  + ": "
                  + (text.length() - start)
                  + " bytes after line "
                  + (lineNo - 1));
          break;
        }
        String line = text.substring(start, end);
        start = end + 1;
        if (line.isBlank()) {
          continue;
        }
        RealisationRecord r;
        try {
          r = JournalCodec.decode(line);
        } catch (RuntimeException e) {
          throw new JournalCorruptException(file, lineNo, e.getMessage());
        }
        RealisationRecord previous = records.get(r.result().taskId());
        if (previous == null) {
          records.put(r.result().taskId(), r);
        } else {
          duplicates++;
          if (previous.result().outcome() == Outcome.FAILED
              && r.result().outcome() == Outcome.DONE) {
            records.put(r.result().taskId(), r);
          }
        }
      }
    }
    return new Contents(records, torn, duplicates);
  }
}
