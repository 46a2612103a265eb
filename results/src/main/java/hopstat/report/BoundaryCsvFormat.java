package hopstat.report;

import hopstat.statistics.BoundaryEstimate;
import hopstat.statistics.Summary;
import java.io.IOException;
import java.io.Writer;
import java.util.ArrayList;
import java.util.List;

/**
 * {@code boundaries.csv}: one row per phase-boundary estimate. Columns: {@code kind, quantity,
 * axis, fixed, level, size_low, size_high, estimate, ci95_low, ci95_high, exists_fraction,
 * resamples, nearest_point}. {@code fixed} lists the other grid axes as {@code name=value}
 * separated by {@code ;}. Empty cells mean "not defined for this kind".
 */
final class BoundaryCsvFormat implements ReportFormat {

  static final List<String> COLUMNS =
      List.of(
          "kind",
          "quantity",
          "axis",
          "fixed",
          "level",
          "size_low",
          "size_high",
          "estimate",
          "ci95_low",
          "ci95_high",
          "exists_fraction",
          "resamples",
          "nearest_point");

  @Override
  public String fileName() {
    return "boundaries.csv";
  }

  @Override
  public void write(Summary summary, Writer out) throws IOException {
    CsvSummaryFormat.line(out, COLUMNS);
    for (BoundaryEstimate b : summary.boundaries()) {
      List<String> row = new ArrayList<>();
      row.add(b.kind().name());
      row.add(b.quantity());
      row.add(b.axis());
      StringBuilder fixed = new StringBuilder();
      b.fixed()
          .forEach(
              (k, v) ->
                  fixed
                      .append(fixed.length() > 0 ? ";" : "")
                      .append(k)
                      .append('=')
                      .append(NumberText.of(v)));
      row.add(fixed.toString());
      row.add(NumberText.of(b.level()));
      row.add(NumberText.of(b.sizeLow()));
      row.add(NumberText.of(b.sizeHigh()));
      row.add(NumberText.of(b.estimate()));
      row.add(NumberText.of(b.interval().low()));
      row.add(NumberText.of(b.interval().high()));
      row.add(NumberText.of(b.existsFraction()));
      row.add(Integer.toString(b.resamples()));
      row.add(Integer.toString(b.nearestPoint()));
      CsvSummaryFormat.line(out, row);
    }
  }
}
