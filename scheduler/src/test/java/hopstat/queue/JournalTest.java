package hopstat.queue;

import static hopstat.queue.TaskStoreContractTest.aRecord;
import static hopstat.queue.TaskStoreContractTest.aTask;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import hopstat.record.RealisationRecord;
import hopstat.task.Outcome;
import hopstat.task.RealisationResult;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.util.LinkedHashMap;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class JournalTest {

  @TempDir Path dir;

  @Test
  void recordRoundTripsBitForBit() {
    Map<String, Double> values = new LinkedHashMap<>();
    values.put("gap", 0.1 + 0.2);
    values.put("bott", -1.0000000000000002);
    values.put("tiny", Double.MIN_VALUE);
    values.put("huge", -Double.MAX_VALUE);
    RealisationResult r =
        new RealisationResult("p7-r3", 7, 3, Long.MIN_VALUE, Outcome.DONE, values, null, 1.25e-3);
    RealisationRecord rec =
        new RealisationRecord(
            r, Map.of("W", 1.5, "L", 8.0), Map.of("m", 1.0), "0.1 (abc)", "native");
    RealisationRecord back = JournalCodec.decode(JournalCodec.encode(rec));
    assertThat(back).isEqualTo(rec);
    assertThat(back.result().values().get("gap")).isEqualTo(0.30000000000000004);
  }

  @Test
  void failureTextWithQuotesAndUnicodeRoundTrips() {
    RealisationResult r =
        new RealisationResult(
            "p0-r0", 0, 0, 5, Outcome.FAILED, Map.of(), "bad \"thing\", ξ → ∞\nnext", 0);
    RealisationRecord rec = new RealisationRecord(r, Map.of(), Map.of(), "t", "l");
    assertThat(JournalCodec.decode(JournalCodec.encode(rec))).isEqualTo(rec);
    assertThat(JournalCodec.encode(rec)).doesNotContain("\n");
  }

  @Test
  void changedByteFailsTheChecksum() {
    String line = JournalCodec.encode(aRecord(aTask(0), Outcome.DONE));
    String tampered = line.replace("\"gap\":0.5", "\"gap\":0.6");
    assertThat(tampered).isNotEqualTo(line);
    assertThatThrownBy(() -> JournalCodec.decode(tampered))
        .hasMessageContaining("checksum mismatch");
  }

  @Test
  void tornFinalLineIsDroppedAndReported() throws IOException {
    Path file = writeJournal("part-0001.jsonl", 3);
    String whole = Files.readString(file);
    String[] lines = whole.split("\n");
    Files.writeString(
        file, lines[0] + "\n" + lines[1] + "\n" + lines[2].substring(0, lines[2].length() / 2));
    JournalReader.Contents c = JournalReader.read(dir);
    assertThat(c.records()).containsOnlyKeys("p0-r0", "p0-r1");
    assertThat(c.tornLines()).singleElement().asString().contains("part-0001.jsonl");
  }

  @Test
  void zeroFilledTailAfterAPowerCutIsTorn() throws IOException {
    Path file = writeJournal("part-0001.jsonl", 2);
    Files.write(file, new byte[512], StandardOpenOption.APPEND);
    JournalReader.Contents c = JournalReader.read(dir);
    assertThat(c.records()).hasSize(2);
    assertThat(c.tornLines()).hasSize(1);
  }

  @Test
  void corruptCompleteLineNamesFileAndLine() throws IOException {
    Path file = writeJournal("part-0001.jsonl", 3);
    String text = Files.readString(file).replaceFirst("\"realisation\":1,", "\"realisation\":9,");
    Files.writeString(file, text);
    assertThatThrownBy(() -> JournalReader.read(dir))
        .isInstanceOf(JournalCorruptException.class)
        .hasMessageContaining("part-0001.jsonl line 2")
        .hasMessageContaining("checksum mismatch");
  }

  @Test
  void doneRecordWinsOverAFailedOneForTheSameTask() throws IOException {
    try (JournalWriter w = new JournalWriter(dir.resolve("shard-0001.jsonl"), 0)) {
      w.append(aRecord(aTask(0), Outcome.FAILED));
    }
    try (JournalWriter w = new JournalWriter(dir.resolve("shard-0002.jsonl"), 0)) {
      w.append(aRecord(aTask(0), Outcome.DONE));
      w.append(aRecord(aTask(0), Outcome.DONE));
    }
    JournalReader.Contents c = JournalReader.read(dir);
    assertThat(c.records().get("p0-r0").result().outcome()).isEqualTo(Outcome.DONE);
    assertThat(c.duplicates()).isEqualTo(2);
  }

  @Test
  void writerNeverReopensAnExistingFile() throws IOException {
    writeJournal("part-0001.jsonl", 1);
    assertThatThrownBy(() -> new JournalWriter(dir.resolve("part-0001.jsonl"), 0))
        .isInstanceOf(java.nio.file.FileAlreadyExistsException.class);
  }

  @Test
  void eachLineIsOneCompleteRecord() throws IOException {
    Path file = writeJournal("part-0001.jsonl", 4);
    assertThat(Files.readAllLines(file, StandardCharsets.UTF_8))
        .hasSize(4)
        .allSatisfy(l -> assertThat(l).startsWith("{\"format\":1,").endsWith("\"}"));
  }

  private Path writeJournal(String name, int records) throws IOException {
    Path file = dir.resolve(name);
    try (JournalWriter w = new JournalWriter(file, 0)) {
      for (int i = 0; i < records; i++) {
        w.append(aRecord(aTask(i), Outcome.DONE));
      }
    }
    return file;
  }
}
