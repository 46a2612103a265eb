package hopstat.queue;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import hopstat.record.RealisationRecord;
import hopstat.task.Outcome;
import hopstat.task.RealisationResult;
import java.io.IOException;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;
import java.util.zip.CRC32C;

/**
 * One journal line per finished realisation, format {@value #FORMAT}:
 *
 * <pre>
 * {"format":1,"task":"p3-r17","point":3,"realisation":17,"seed":-5290...,"status":"DONE",
 *  "grid":{"W":1.0,"L":12.0},"parameters":{...},"values":{"gap":0.41,...},"failure":null,
 *  "wallSeconds":0.12,"tool":"0.1.0","linalg":"native ...","crc":"89abcdef"}
 * </pre>
 *
 * Doubles are written in their shortest round-trip form, so a value read back is bit-identical.
 * {@code crc} is the CRC-32C (hex) of the UTF-8 bytes of the line with the {@code ,"crc":…} member
 * removed; a line whose checksum does not match is corrupt.
 */
public final class JournalCodec {

  /** Journal record format version. */
  public static final int FORMAT = 1;

  private static final String CRC_MEMBER = ",\"crc\":\"";
  private static final JsonFactory JSON = new JsonFactory();
  private static final ObjectMapper MAPPER = new ObjectMapper();

  private JournalCodec() {}

  /** The line for {@code record}, without the trailing newline. */
  public static String encode(RealisationRecord record) {
    StringWriter w = new StringWriter(256);
    try (JsonGenerator g = JSON.createGenerator(w)) {
      RealisationResult r = record.result();
      g.writeStartObject();
      g.writeNumberField("format", FORMAT);
      g.writeStringField("task", r.taskId());
      g.writeNumberField("point", r.pointIndex());
      g.writeNumberField("realisation", r.realisationIndex());
      g.writeNumberField("seed", r.seed());
      g.writeStringField("status", r.outcome().name());
      writeMap(g, "grid", record.grid());
      writeMap(g, "parameters", record.parameters());
      writeMap(g, "values", r.values());
      if (r.failure() == null) {
        g.writeNullField("failure");
      } else {
        g.writeStringField("failure", r.failure());
      }
      g.writeNumberField("wallSeconds", r.wallSeconds());
      g.writeStringField("tool", record.toolVersion());
      g.writeStringField("linalg", record.linalg());
      g.writeEndObject();
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
    String body = w.toString();
    String crc = crcHex(body);
    return body.substring(0, body.length() - 1) + CRC_MEMBER + crc + "\"}";
  }

  /**
   * Parses and verifies one line.
   *
   * @throws IllegalArgumentException with a reason if the line is malformed or its checksum fails
   */
  public static RealisationRecord decode(String line) {
    int at = line.lastIndexOf(CRC_MEMBER);
    if (at < 0 || !line.endsWith("\"}")) {
      throw new IllegalArgumentException("no checksum member");
    }
    String body = line.substring(0, at) + "}";
    String stored = line.substring(at + CRC_MEMBER.length(), line.length() - 2);
    if (!crcHex(body).equals(stored)) {
      throw new IllegalArgumentException(
          "checksum mismatch (stored " + stored + ", computed " + crcHex(body) + ")");
    }
    JsonNode n;
    try {
      n = MAPPER.readTree(body);
    } catch (IOException e) {
      throw new IllegalArgumentException("not valid JSON: " + e.getMessage());
    }
    int format = n.path("format").asInt(-1);
    if (format != FORMAT) {
      throw new IllegalArgumentException(
          "unsupported record format " + n.path("format") + " (this version reads " + FORMAT + ")");
    }
    Outcome outcome = Outcome.valueOf(n.get("status").asText());
    RealisationResult result =
        new RealisationResult(
            n.get("task").asText(),
            n.get("point").asInt(),
            n.get("realisation").asInt(),
            n.get("seed").asLong(),
            outcome,
            readMap(n.get("values")),
            n.get("failure").isNull() ? null : n.get("failure").asText(),
            n.get("wallSeconds").asDouble());
    return new RealisationRecord(
        result,
        readMap(n.get("grid")),
        readMap(n.get("parameters")),
        n.get("tool").asText(),
        n.get("linalg").asText());
  }

  private static void writeMap(JsonGenerator g, String field, Map<String, Double> map)
      throws IOException {
    g.writeObjectFieldStart(field);
    for (Map.Entry<String, Double> e : map.entrySet()) {
      g.writeNumberField(e.getKey(), e.getValue());
    }
    g.writeEndObject();
  }

  private static Map<String, Double> readMap(JsonNode node) {
    Map<String, Double> m = new LinkedHashMap<>();
    for (Iterator<Map.Entry<String, JsonNode>> it = node.fields(); it.hasNext(); ) {
      Map.Entry<String, JsonNode> e = it.next();
      m.put(e.getKey(), e.getValue().asDouble());
    }
    return m;
  }

  private static String crcHex(String text) {
    CRC32C crc = new CRC32C();
    crc.update(text.getBytes(StandardCharsets.UTF_8));
    return String.format(Locale.ROOT, "%08x", crc.getValue());
  }
}
