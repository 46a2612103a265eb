package hopstat.report;

import hopstat.statistics.IntegerDistribution;
import hopstat.statistics.MeanEstimate;
import hopstat.statistics.PointSummary;
import hopstat.statistics.Quantiles;
import hopstat.statistics.QuantitySummary;
import hopstat.statistics.Summary;
import hopstat.statistics.TypicalValue;
import java.io.IOException;
import java.io.Writer;
import java.util.ArrayList;
import java.util.List;

/**
 * {@code summary.csv}: tidy, one row per (grid point, quantity). Columns: the grid axes named as in
 * the spec, then {@code observable, n, mean, stderr, ci95_low, ci95_high, std, median, min, max,
 * failed, modal, modal_fraction, non_quantised, max_int_distance, q05, q25, q75, q95, boot95_low,
 * boot95_high, typical, typical_ci95_low, typical_ci95_high}. modal..max_int_distance are empty for
 * quantities that are not integer-valued; q05..q95 are type-7 sample quantiles; boot95_* is the
 * percentile-bootstrap interval of the mean; typical* is the geometric mean with its log-scale
 * Student-t interval, empty unless every sample is positive and the quantity is not integer-valued.
 * Empty cells mean "not defined" (e.g. stderr for n = 1). Columns are only ever appended, never
 * renamed or reordered.
 */
final class CsvSummaryFormat implements ReportFormat {

  static final List<String> STAT_COLUMNS =
      List.of(
          "observable",
          "n",
          "mean",
          "stderr",
          "ci95_low",
          "ci95_high",
          "std",
          "median",
          "min",
          "max",
          "failed",
          "modal",
          "modal_fraction",
          "non_quantised",
          "max_int_distance",
          "q05",
          "q25",
          "q75",
          "q95",
          "boot95_low",
          "boot95_high",
          "typical",
          "typical_ci95_low",
          "typical_ci95_high");

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
        Quantiles qs = q.quantiles();
        row.add(NumberText.of(qs.q05()));
        row.add(NumberText.of(qs.q25()));
        row.add(NumberText.of(qs.q75()));
        row.add(NumberText.of(qs.q95()));
        row.add(NumberText.of(q.meanBootstrap().low()));
        row.add(NumberText.of(q.meanBootstrap().high()));
        TypicalValue tv = q.typical();
        row.add(tv == null ? "" : NumberText.of(tv.geometricMean()));
        row.add(tv == null ? "" : NumberText.of(tv.ciLow()));
        row.add(tv == null ? "" : NumberText.of(tv.ciHigh()));
        line(out, row);
      }
    }
  }

  static void line(Writer out, List<String> cells) throws IOException {
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
