package hopstat.report;

import hopstat.record.RealisationRecord;
import hopstat.record.StudyLayout;
import hopstat.statistics.Summary;
import java.util.Collections;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;

/**
 * Everything the human-facing outputs (report.html, figures, results.h5) show: the study's layout,
 * its summary (statistics and boundaries, already computed), the journal records, the spec text,
 * axis labels and provenance. Writers format this; they compute no statistics.
 *
 * @param layout grid and quantities
 * @param summary statistics and boundary estimates from {@code SummaryOps.summarise}
 * @param records journal records, held in canonical order (point, realisation)
 * @param specText the exact spec text of the run
 * @param axisLabels grid axis name → axis label with unit (axes not listed are labelled by name)
 * @param provenance where and with what the numbers were made
 */
public record StudyReport(
    StudyLayout layout,
    Summary summary,
    List<RealisationRecord> records,
    String specText,
    Map<String, String> axisLabels,
    Provenance provenance) {

  public StudyReport {
    Objects.requireNonNull(layout, "layout");
    Objects.requireNonNull(summary, "summary");
    Objects.requireNonNull(specText, "specText");
    Objects.requireNonNull(provenance, "provenance");
    records =
        records.stream()
            .sorted(
                Comparator.comparingInt((RealisationRecord r) -> r.result().pointIndex())
                    .thenComparingInt(r -> r.result().realisationIndex()))
            .toList();
    axisLabels = Collections.unmodifiableMap(new LinkedHashMap<>(axisLabels));
  }

  /** The label of a grid axis, e.g. {@code "W (units of t)"}. */
  public String axisLabel(String axis) {
    return axisLabels.getOrDefault(axis, axis);
  }
}
