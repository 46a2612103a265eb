package hopstat.task;

import java.io.IOException;
import java.io.InputStream;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Properties;

/** Version and commit of this build, and the library versions results depend on (provenance). */
public final class BuildInfo {

  private static final Properties PROPERTIES = load();

  private BuildInfo() {}

  private static Properties load() {
    Properties p = new Properties();
    try (InputStream in = BuildInfo.class.getResourceAsStream("/hopstat/build.properties")) {
      if (in != null) {
        p.load(in);
      }
    } catch (IOException e) {
      throw new IllegalStateException("cannot read build.properties", e);
    }
    return p;
  }

  private static String get(String key) {
    String v = PROPERTIES.getProperty(key, "unknown");
    return v.startsWith("${") ? "unknown" : v;
  }

  /** hopstat version, e.g. {@code 0.1.0-SNAPSHOT}. */
  public static String version() {
    return get("version");
  }

  /** Abbreviated git commit, with {@code +dirty} if the tree had uncommitted changes. */
  public static String commit() {
    return get("commit") + ("true".equals(get("dirty")) ? "+dirty" : "");
  }

  /** Version string for journal records: {@code version (commit)}. */
  public static String toolVersion() {
    return version() + " (" + commit() + ")";
  }

  /** Provenance entries: versions of hopstat, EJML, OpenBLAS and the JVM. */
  public static Map<String, String> provenance() {
    Map<String, String> m = new LinkedHashMap<>();
    m.put("hopstat", version());
    m.put("commit", commit());
    m.put("ejml", get("ejml"));
    m.put("openblas", get("openblas"));
    m.put(
        "jvm",
        System.getProperty("java.vm.name") + " " + System.getProperty("java.runtime.version"));
    m.put("os", System.getProperty("os.name") + " " + System.getProperty("os.arch"));
    return m;
  }
}
