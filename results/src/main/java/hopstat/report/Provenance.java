package hopstat.report;

import hopstat.record.RealisationRecord;
import hopstat.task.BuildInfo;
import java.time.Instant;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.TreeMap;

/**
 * Provenance shown in report.html and stored as results.h5 attributes. The generation time appears
 * only there, never in summary.csv/summary.json (which stay byte-identical across runs).
 *
 * @param specHash SHA-256 of the canonical spec
 * @param reportTool version and commit of the hopstat that wrote the report
 * @param jvm JVM that wrote the report
 * @param recordTools tool versions found in the journal records → record count
 * @param linalgBackends linear-algebra backends found in the journal records → record count
 * @param libraries library versions of the reporting build (EJML, OpenBLAS)
 * @param generated when the report was generated (UTC)
 */
public record Provenance(
    String specHash,
    String reportTool,
    String jvm,
    Map<String, Integer> recordTools,
    Map<String, Integer> linalgBackends,
    Map<String, String> libraries,
    Instant generated) {

  public Provenance {
    Objects.requireNonNull(specHash, "specHash");
    Objects.requireNonNull(generated, "generated");
    recordTools = Collections.unmodifiableMap(new TreeMap<>(recordTools));
    linalgBackends = Collections.unmodifiableMap(new TreeMap<>(linalgBackends));
    libraries = Collections.unmodifiableMap(new LinkedHashMap<>(libraries));
  }

  /** Provenance of this build, with counts taken from the records. */
  public static Provenance of(String specHash, List<RealisationRecord> records, Instant generated) {
    Map<String, Integer> tools = new TreeMap<>();
    Map<String, Integer> linalg = new TreeMap<>();
    for (RealisationRecord r : records) {
      tools.merge(r.toolVersion(), 1, Integer::sum);
      linalg.merge(r.linalg(), 1, Integer::sum);
    }
    Map<String, String> build = BuildInfo.provenance();
    Map<String, String> libraries = new LinkedHashMap<>();
    libraries.put("ejml", build.get("ejml"));
    libraries.put("openblas", build.get("openblas"));
    libraries.put("os", build.get("os"));
    return new Provenance(
        specHash, BuildInfo.toolVersion(), build.get("jvm"), tools, linalg, libraries, generated);
  }
}
