package hopstat.report;

import hopstat.statistics.MobilityEdge;
import hopstat.statistics.MobilityGap;
import hopstat.statistics.Summary;
import java.io.IOException;
import java.io.Writer;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/**
 * {@code mobility.csv}: one row per mobility-gap estimate ({@code record = GAP}) and per mobility
 * edge ({@code record = EDGE}), gaps first. Columns: {@code record, method, quantity, axis, fixed,
 * criterion, size_low, size_high, level, reference, estimate, ci95_low, ci95_high, exists_fraction,
 * lower, lower_ci95_low, lower_ci95_high, upper, upper_ci95_low, upper_ci95_high, lower_open,
 * upper_open, resamples}. For GAP, {@code estimate} is the half-width of the window [lower, upper]
 * around {@code reference} and {@code exists_fraction} the fraction of bootstrap replicas with the
 * reference inside a window; for EDGE, {@code estimate} is the crossing position and the window
 * columns are empty. {@code fixed} lists the other grid axes (without L) as {@code name=value}
 * separated by {@code ;}. Empty cells mean "not defined".
 */
final class MobilityCsvFormat implements ReportFormat {

  static final List<String> COLUMNS =
      List.of(
          "record",
          "method",
          "quantity",
          "axis",
          "fixed",
          "criterion",
          "size_low",
          "size_high",
          "level",
          "reference",
          "estimate",
          "ci95_low",
          "ci95_high",
          "exists_fraction",
          "lower",
          "lower_ci95_low",
          "lower_ci95_high",
          "upper",
          "upper_ci95_low",
          "upper_ci95_high",
          "lower_open",
          "upper_open",
          "resamples");

  @Override
  public String fileName() {
    return "mobility.csv";
  }

  @Override
  public void write(Summary summary, Writer out) throws IOException {
    CsvSummaryFormat.line(out, COLUMNS);
    for (MobilityGap g : summary.mobility().gaps()) {
      List<String> row = new ArrayList<>();
      row.add("GAP");
      row.add(g.method().name());
      row.add(g.quantity());
      row.add(g.axis());
      row.add(fixed(g.fixed()));
      row.add(g.criterion());
      row.add(NumberText.of(g.sizeLow()));
      row.add(NumberText.of(g.sizeHigh()));
      row.add("");
      row.add(NumberText.of(g.reference()));
      row.add(NumberText.of(g.halfWidth()));
      row.add(NumberText.of(g.interval().low()));
      row.add(NumberText.of(g.interval().high()));
      row.add(NumberText.of(g.insideFraction()));
      row.add(NumberText.of(g.lower()));
      row.add(NumberText.of(g.lowerInterval().low()));
      row.add(NumberText.of(g.lowerInterval().high()));
      row.add(NumberText.of(g.upper()));
      row.add(NumberText.of(g.upperInterval().low()));
      row.add(NumberText.of(g.upperInterval().high()));
      row.add(Boolean.toString(g.lowerOpen()));
      row.add(Boolean.toString(g.upperOpen()));
      row.add(Integer.toString(g.resamples()));
      CsvSummaryFormat.line(out, row);
    }
    for (MobilityEdge e : summary.mobility().edges()) {
      List<String> row = new ArrayList<>();
      row.add("EDGE");
      row.add(e.method().name());
      row.add(e.quantity());
      row.add(e.axis());
      row.add(fixed(e.fixed()));
      row.add(e.criterion());
      row.add(NumberText.of(e.sizeLow()));
      row.add(NumberText.of(e.sizeHigh()));
      row.add(NumberText.of(e.level()));
      row.add("");
      row.add(NumberText.of(e.estimate()));
      row.add(NumberText.of(e.interval().low()));
      row.add(NumberText.of(e.interval().high()));
      row.add(NumberText.of(e.existsFraction()));
      for (int i = 0; i < 8; i++) {
        row.add("");
      }
      row.add(Integer.toString(e.resamples()));
      CsvSummaryFormat.line(out, row);
    }
  }

  private static String fixed(Map<String, Double> fixed) {
    StringBuilder b = new StringBuilder();
    fixed.forEach(
        (k, v) ->
            b.append(b.length() > 0 ? ";" : "").append(k).append('=').append(NumberText.of(v)));
    return b.toString();
  }
}
