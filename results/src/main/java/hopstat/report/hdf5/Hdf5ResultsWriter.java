package hopstat.report.hdf5;

import hopstat.record.RealisationRecord;
import hopstat.report.Provenance;
import hopstat.report.StudyReport;
import hopstat.statistics.BootstrapOps;
import hopstat.statistics.BoundaryEstimate;
import hopstat.statistics.PointSummary;
import hopstat.statistics.QuantitySummary;
import hopstat.statistics.Summary;
import hopstat.task.Outcome;
import hopstat.task.Quantity;
import io.jhdf.HdfFile;
import io.jhdf.WritableHdfFile;
import io.jhdf.api.WritableGroup;
import io.jhdf.api.WritableNode;
import java.nio.file.Path;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.function.ToDoubleFunction;

/**
 * {@code results.h5} (HDF5, written by the pure-Java jHDF library). Layout, format 1:
 *
 * <pre>
 * /                      attributes: format, name, specHash, reportTool, jvm, generated (UTC),
 *                        recordTools, linalgBackends, bootstrap, bootstrapSeed, spec (text)
 * /realisations/         one row per journal record, canonical order (point, realisation):
 *     task (string), point (int32), realisation (int32), seed (int64), status (string),
 *     failure (string, "" when DONE), wall_seconds (float64),
 *     coordinates/&lt;axis&gt; (float64), values/&lt;quantity&gt; (float64, NaN when absent)
 * /points/               index, done, failed (int32), coordinates/&lt;axis&gt; (float64)
 * /aggregates/&lt;quantity&gt;/ one row per point with samples: point, n, mean, stderr, ci95_low,
 *     ci95_high, std, median, min, max, q05, q25, q75, q95, boot95_low, boot95_high, typical,
 *     typical_ci95_low, typical_ci95_high (NaN when undefined); for integer quantities also modal
 *     (int64), modal_fraction, modal_wilson_low, modal_wilson_high, non_quantised (int32)
 * /boundaries/           kind, quantity, axis, fixed (strings), level, size_low, size_high, estimate,
 *     ci95_low, ci95_high, exists_fraction (float64), nearest_point (int32)
 * </pre>
 *
 * Every dataset is one-dimensional. jHDF cannot write empty datasets, so a group whose table has no
 * rows carries the attribute {@code rows = 0} and no datasets. Formats only.
 */
public final class Hdf5ResultsWriter {

  /** Layout version written as the root attribute {@code format}. */
  public static final int FORMAT_VERSION = 1;

  private Hdf5ResultsWriter() {}

  /** Writes (or overwrites) {@code file}. */
  public static void write(StudyReport report, Path file) {
    Summary s = report.summary();
    Provenance p = report.provenance();
    try (WritableHdfFile h5 = HdfFile.write(file)) {
      h5.putAttribute("format", FORMAT_VERSION);
      h5.putAttribute("name", s.name());
      h5.putAttribute("specHash", p.specHash());
      h5.putAttribute("reportTool", "hopstat " + p.reportTool());
      h5.putAttribute("jvm", p.jvm());
      h5.putAttribute("generated", DateTimeFormatter.ISO_INSTANT.format(p.generated()));
      h5.putAttribute("recordTools", p.recordTools().toString());
      h5.putAttribute("linalgBackends", p.linalgBackends().toString());
      h5.putAttribute("bootstrap", BootstrapOps.METHOD);
      h5.putAttribute("bootstrapSeed", BootstrapOps.SEED_RULE);
      h5.putAttribute("spec", report.specText());
      realisations(h5.putGroup("realisations"), report);
      points(h5.putGroup("points"), report);
      WritableGroup aggregates = h5.putGroup("aggregates");
      for (Quantity q : report.layout().quantities()) {
        aggregate(aggregates.putGroup(q.name()), s, q);
      }
      boundaries(h5.putGroup("boundaries"), report);
    }
  }

  private static boolean empty(WritableNode group, int rows) {
    group.putAttribute("rows", rows);
    return rows == 0;
  }

  private static void realisations(WritableGroup g, StudyReport report) {
    List<RealisationRecord> records = report.records();
    int n = records.size();
    if (empty(g, n)) {
      return;
    }
    String[] task = new String[n];
    int[] point = new int[n];
    int[] realisation = new int[n];
    long[] seed = new long[n];
    String[] status = new String[n];
    String[] failure = new String[n];
    double[] wall = new double[n];
    for (int i = 0; i < n; i++) {
      var r = records.get(i).result();
      task[i] = r.taskId();
      point[i] = r.pointIndex();
      realisation[i] = r.realisationIndex();
      seed[i] = r.seed();
      status[i] = r.outcome().name();
      failure[i] = r.failure() == null ? "" : r.failure();
      wall[i] = r.wallSeconds();
    }
    g.putDataset("task", task);
    g.putDataset("point", point);
    g.putDataset("realisation", realisation);
    g.putDataset("seed", seed);
    g.putDataset("status", status);
    g.putDataset("failure", failure);
    g.putDataset("wall_seconds", wall);
    WritableGroup coordinates = g.putGroup("coordinates");
    for (String axis : report.layout().gridNames()) {
      coordinates.putDataset(
          axis,
          column(
              records,
              r -> {
                Double v = r.grid().get(axis);
                return v == null ? Double.NaN : v;
              }));
    }
    WritableGroup values = g.putGroup("values");
    for (Quantity q : report.layout().quantities()) {
      values
          .putDataset(
              q.name(),
              column(
                  records,
                  r -> {
                    Double v =
                        r.result().outcome() == Outcome.DONE
                            ? r.result().values().get(q.name())
                            : null;
                    return v == null ? Double.NaN : v;
                  }))
          .putAttribute("unit", q.unit());
    }
  }

  private static double[] column(
      List<RealisationRecord> records, ToDoubleFunction<RealisationRecord> f) {
    double[] x = new double[records.size()];
    for (int i = 0; i < x.length; i++) {
      x[i] = f.applyAsDouble(records.get(i));
    }
    return x;
  }

  private static void points(WritableGroup g, StudyReport report) {
    List<PointSummary> points = report.summary().points();
    int n = points.size();
    if (empty(g, n)) {
      return;
    }
    int[] index = new int[n];
    int[] done = new int[n];
    int[] failed = new int[n];
    for (int i = 0; i < n; i++) {
      index[i] = points.get(i).index();
      done[i] = points.get(i).done();
      failed[i] = points.get(i).failed();
    }
    g.putDataset("index", index);
    g.putDataset("done", done);
    g.putDataset("failed", failed);
    WritableGroup coordinates = g.putGroup("coordinates");
    for (String axis : report.layout().gridNames()) {
      double[] x = new double[n];
      for (int i = 0; i < n; i++) {
        x[i] = points.get(i).coordinates().get(axis);
      }
      coordinates.putDataset(axis, x);
    }
  }

  private static void aggregate(WritableGroup g, Summary s, Quantity q) {
    List<Integer> pointIndex = new ArrayList<>();
    List<QuantitySummary> rows = new ArrayList<>();
    for (PointSummary p : s.points()) {
      for (QuantitySummary qs : p.quantities()) {
        if (qs.name().equals(q.name())) {
          pointIndex.add(p.index());
          rows.add(qs);
        }
      }
    }
    g.putAttribute("unit", q.unit());
    g.putAttribute("description", q.description());
    if (empty(g, rows.size())) {
      return;
    }
    g.putDataset("point", pointIndex.stream().mapToInt(Integer::intValue).toArray());
    g.putDataset("n", rows.stream().mapToInt(r -> r.mean().n()).toArray());
    put(g, rows, "mean", r -> r.mean().mean());
    put(g, rows, "stderr", r -> r.mean().standardError());
    put(g, rows, "ci95_low", r -> r.mean().ciLow());
    put(g, rows, "ci95_high", r -> r.mean().ciHigh());
    put(g, rows, "std", r -> r.mean().standardDeviation());
    put(g, rows, "median", QuantitySummary::median);
    put(g, rows, "min", QuantitySummary::min);
    put(g, rows, "max", QuantitySummary::max);
    put(g, rows, "q05", r -> r.quantiles().q05());
    put(g, rows, "q25", r -> r.quantiles().q25());
    put(g, rows, "q75", r -> r.quantiles().q75());
    put(g, rows, "q95", r -> r.quantiles().q95());
    put(g, rows, "boot95_low", r -> r.meanBootstrap().low());
    put(g, rows, "boot95_high", r -> r.meanBootstrap().high());
    put(g, rows, "typical", r -> r.typical() == null ? Double.NaN : r.typical().geometricMean());
    put(g, rows, "typical_ci95_low", r -> r.typical() == null ? Double.NaN : r.typical().ciLow());
    put(g, rows, "typical_ci95_high", r -> r.typical() == null ? Double.NaN : r.typical().ciHigh());
    if (q.integerValued()) {
      g.putDataset("modal", rows.stream().mapToLong(r -> r.integer().modalValue()).toArray());
      put(g, rows, "modal_fraction", r -> r.integer().modalFraction());
      put(g, rows, "modal_wilson_low", r -> r.integer().modalWilsonLow());
      put(g, rows, "modal_wilson_high", r -> r.integer().modalWilsonHigh());
      g.putDataset(
          "non_quantised", rows.stream().mapToInt(r -> r.integer().nonQuantised()).toArray());
    }
  }

  private static void put(
      WritableGroup g,
      List<QuantitySummary> rows,
      String name,
      ToDoubleFunction<QuantitySummary> f) {
    g.putDataset(name, rows.stream().mapToDouble(f).toArray());
  }

  private static void boundaries(WritableGroup g, StudyReport report) {
    List<BoundaryEstimate> b = report.summary().boundaries();
    if (empty(g, b.size())) {
      return;
    }
    g.putDataset("kind", b.stream().map(x -> x.kind().name()).toArray(String[]::new));
    g.putDataset("quantity", b.stream().map(BoundaryEstimate::quantity).toArray(String[]::new));
    g.putDataset("axis", b.stream().map(BoundaryEstimate::axis).toArray(String[]::new));
    g.putDataset("fixed", b.stream().map(x -> fixedText(x.fixed())).toArray(String[]::new));
    g.putDataset("level", b.stream().mapToDouble(BoundaryEstimate::level).toArray());
    g.putDataset("size_low", b.stream().mapToDouble(BoundaryEstimate::sizeLow).toArray());
    g.putDataset("size_high", b.stream().mapToDouble(BoundaryEstimate::sizeHigh).toArray());
    g.putDataset("estimate", b.stream().mapToDouble(BoundaryEstimate::estimate).toArray());
    g.putDataset("ci95_low", b.stream().mapToDouble(x -> x.interval().low()).toArray());
    g.putDataset("ci95_high", b.stream().mapToDouble(x -> x.interval().high()).toArray());
    g.putDataset(
        "exists_fraction", b.stream().mapToDouble(BoundaryEstimate::existsFraction).toArray());
    g.putDataset("nearest_point", b.stream().mapToInt(BoundaryEstimate::nearestPoint).toArray());
  }

  private static String fixedText(Map<String, Double> fixed) {
    StringBuilder t = new StringBuilder();
    fixed.forEach((k, v) -> t.append(t.length() > 0 ? ";" : "").append(k).append('=').append(v));
    return t.toString();
  }
}
