package hopstat.report;

import hopstat.statistics.IntegerDistribution;
import hopstat.statistics.MeanEstimate;
import hopstat.statistics.PointSummary;
import hopstat.statistics.QuantitySummary;
import hopstat.statistics.Summary;
import java.io.IOException;
import java.io.Writer;
import java.util.ArrayList;
import java.util.List;

/**
 * {@code summary.csv}: tidy, one row per (grid point, quantity). Columns: the grid axes named as in
 * the spec, then {@code observable, n, mean, stderr, ci95_low, ci95_high, std, median, min, max,
 * failed, modal, modal_fraction, non_quantised, max_int_distance}. The last four are empty for
 * quantities that are not integer-valued. Empty cells mean "not defined" (e.g. stderr for n = 1).
 */
final class CsvSummaryFormat implements ReportFormat {

  static final List<String> STAT_COLUMNS = List.of("observable", "n", "mean", "stderr", "ci95_low", "ci95_high", "std", "median", "min", "max",
      "failed", "modal", "modal_fraction", "non_quantised", "max_int_distance");

  @Override
  public String fileName() {
    return "summary.csv";
  }

  @Override
  public void write(Summary summary, Writer out) throws IOException {
    List<String> header = new ArrayList<>(summary.gridNames());
    header.addAll(STAT_COLUMNS);
    line(out, header);
    for (PointSummary p : summary.points()) {
      for (QuantitySummary q : p.quantities()) {
        List<String> row = new ArrayList<>();
        for (String g : summary.gridNames()) {
          row.add(NumberText.of(p.coordinates().get(g)));
        }
        MeanEstimate m = q.mean();
        row.add(q.name());
        row.add(Integer.toString(m.n()));
        row.add(NumberText.of(m.mean()));
        row.add(NumberText.of(m.standardError()));
        row.add(NumberText.of(m.ciLow()));
        row.add(NumberText.of(m.ciHigh()));
        row.add(NumberText.of(m.standardDeviation()));
        row.add(NumberText.of(q.median()));
        row.add(NumberText.of(q.min()));
        row.add(NumberText.of(q.max()));
        row.add(Integer.toString(p.failed()));
        IntegerDistribution d = q.integer();
        row.add(d == null ? "" : Long.toString(d.modalValue()));
        row.add(d == null ? "" : NumberText.of(d.modalFraction()));
        row.add(d == null ? "" : Integer.toString(d.nonQuantised()));
        row.add(d == null ? "" : NumberText.of(d.maxDistanceToInteger()));
        line(out, row);
      }
    }
  }

  private static void line(Writer out, List<String> cells) throws IOException {
    for (int i = 0; i < cells.size(); i++) {
      if (i > 0) {
        out.write(',');
      }
      out.write(escape(cells.get(i)));
    }
    out.write('\n');
  }

  private static String escape(String cell) {
    if (cell.indexOf(',') < 0 && cell.indexOf('"') < 0 && cell.indexOf('\n') < 0) {
      return cell;
    }
    return '"' + cell.replace("\"", "\"\"") + '"';
  }
}
