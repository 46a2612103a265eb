package hopstat.testing;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;

/**
 * Test-data builder for job spec text: {@code aQwzSpec().sweep("W", 0,
 * 2).sizes(6).realisations(4).text()}. Starts from a small valid QWZ study.
 */
public final class SpecJson {

  private static final ObjectMapper JSON = new ObjectMapper();
  private final ObjectNode root = JSON.createObjectNode();

  private SpecJson() {
    root.put("name", "test-study");
    root.put("seed", 4242);
    root.put("model", "qwz");
    ObjectNode p = root.putObject("parameters");
    p.put("m", 1.0);
    p.putArray("W").add(0.0).add(3.0);
    p.putArray("L").add(4);
    root.putArray("disorder").addObject().put("type", "onsite-box").put("strength", "W");
    root.put("boundary", "periodic");
    root.putArray("observables").add("gap").add("bott");
    root.put("realisations", 3);
  }

  public static SpecJson aQwzSpec() {
    return new SpecJson();
  }

  public SpecJson sweep(String name, double... values) {
    ArrayNode a = ((ObjectNode) root.get("parameters")).putArray(name);
    for (double v : values) {
      a.add(v);
    }
    return this;
  }

  public SpecJson parameter(String name, double value) {
    ((ObjectNode) root.get("parameters")).put(name, value);
    return this;
  }

  public SpecJson sizes(int... sizes) {
    ArrayNode a = ((ObjectNode) root.get("parameters")).putArray("L");
    for (int s : sizes) {
      a.add(s);
    }
    return this;
  }

  public SpecJson realisations(int n) {
    root.put("realisations", n);
    return this;
  }

  public SpecJson seed(long seed) {
    root.put("seed", seed);
    return this;
  }

  public SpecJson observables(String... names) {
    ArrayNode a = root.putArray("observables");
    for (String n : names) {
      a.add(n);
    }
    return this;
  }

  /** Replaces {@code realisations} by an adaptive sampling block with one stderr target. */
  public SpecJson adaptive(int minimum, int maximum, int batch, String quantity, double stderr) {
    root.remove("realisations");
    ObjectNode s = root.putObject("sampling");
    s.put("minimum", minimum).put("maximum", maximum).put("batch", batch);
    s.putArray("targets").addObject().put("quantity", quantity).put("stderr", stderr);
    return this;
  }

  /** The root object, for edits the builder does not cover (bad-input tests). */
  public ObjectNode tree() {
    return root;
  }

  public String text() {
    try {
      return JSON.writerWithDefaultPrettyPrinter().writeValueAsString(root);
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
  }

  public Path writeTo(Path file) {
    try {
      Files.writeString(file, text());
      return file;
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
  }
}
