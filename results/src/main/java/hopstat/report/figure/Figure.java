package hopstat.report.figure;

import java.util.Objects;
import org.jfree.chart.JFreeChart;

/**
 * One figure of a report.
 *
 * @param name file stem under {@code figures/}, unique within a report (letters, digits, '-', '_',
 *     '.')
 * @param caption one or two sentences saying what is plotted, with error-bar meaning
 * @param chart the chart
 */
public record Figure(String name, String caption, JFreeChart chart) {
  public Figure {
    Objects.requireNonNull(chart, "chart");
    if (!name.matches("[A-Za-z0-9_.-]+")) {
      throw new IllegalArgumentException("figure name must be a safe file stem: " + name);
    }
  }
}
