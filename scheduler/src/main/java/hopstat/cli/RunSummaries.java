package hopstat.cli;

import hopstat.expand.LayoutOps;
import hopstat.expand.StudyPlan;
import hopstat.pool.RunSummaryOps;
import hopstat.queue.JournalReader;
import hopstat.queue.RunDirectory;
import hopstat.record.RealisationRecord;
import hopstat.record.StudyLayout;
import hopstat.report.Provenance;
import hopstat.report.ReportFiles;
import hopstat.report.StudyReport;
import hopstat.spec.DisorderSpec;
import hopstat.spec.JobSpec;
import hopstat.statistics.Summary;
import hopstat.statistics.SummaryOps;
import java.io.IOException;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/** Summaries and reports of a run directory: pure functions of spec.json and the journal. */
final class RunSummaries {

  private RunSummaries() {}

  /** The run's plan, re-expanded from its stored spec. */
  static StudyPlan plan(RunDirectory dir) throws IOException {
    return RunSummaryOps.plan(dir);
  }

  private static List<RealisationRecord> records(RunDirectory dir) throws IOException {
    return new ArrayList<>(JournalReader.read(dir.journalDir()).records().values());
  }

  /** The summary of everything journaled so far. */
  static Summary summarise(RunDirectory dir, StudyPlan plan) throws IOException {
    return RunSummaryOps.summarise(dir, plan);
  }

  /** Writes summary.csv, summary.json and boundaries.csv into the run directory. */
  static List<Path> write(RunDirectory dir, StudyPlan plan) throws IOException {
    return RunSummaryOps.write(dir, plan);
  }

  /**
   * Writes every output (summaries, figures, report.html, results.h5) from the spec and journal.
   *
   * @param generated the report's generation time (shown in report.html and results.h5 only)
   */
  static List<Path> report(RunDirectory dir, StudyPlan plan, Instant generated) throws IOException {
    StudyLayout layout = LayoutOps.layout(plan);
    List<RealisationRecord> records = records(dir);
    Summary summary = SummaryOps.summarise(layout, records);
    StudyReport report =
        new StudyReport(
            layout,
            summary,
            records,
            dir.specText(),
            axisLabels(plan.spec()),
            Provenance.of(layout.specHash(), records, generated));
    return ReportFiles.writeAll(report, dir.path());
  }

  /**
   * Axis labels with units where the spec fixes them: disorder strengths and the Fermi energy are
   * energies in units of the model's energy scale t; L counts lattice sites (unit cells).
   */
  static Map<String, String> axisLabels(JobSpec spec) {
    Map<String, String> labels = new LinkedHashMap<>();
    labels.put("L", "L (lattice sites)");
    labels.put("fermiEnergy", "fermiEnergy E_F (units of t)");
    for (DisorderSpec d : spec.disorder()) {
      if (d.strengthParameter() != null) {
        labels.put(
            d.strengthParameter(),
            d.strengthParameter() + " (" + d.type() + " strength, units of t)");
      }
    }
    return labels;
  }
}
