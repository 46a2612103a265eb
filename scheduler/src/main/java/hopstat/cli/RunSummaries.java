package hopstat.cli;

import hopstat.expand.GridExpander;
import hopstat.expand.LayoutOps;
import hopstat.expand.StudyPlan;
import hopstat.queue.JournalReader;
import hopstat.queue.RunDirectory;
import hopstat.record.RealisationRecord;
import hopstat.report.ReportFormats;
import hopstat.spec.SpecParser;
import hopstat.statistics.Summary;
import hopstat.statistics.SummaryOps;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/** Summaries of a run directory: a pure function of spec.json and the journal. */
final class RunSummaries {

  private RunSummaries() {}

  /** The run's plan, re-expanded from its stored spec. */
  static StudyPlan plan(RunDirectory dir) throws IOException {
    return GridExpander.expand(SpecParser.parse(dir.specText()));
  }

  /** The summary of everything journaled so far. */
  static Summary summarise(RunDirectory dir, StudyPlan plan) throws IOException {
    JournalReader.Contents contents = JournalReader.read(dir.journalDir());
    List<RealisationRecord> records = new ArrayList<>(contents.records().values());
    return SummaryOps.summarise(LayoutOps.layout(plan), records);
  }

  /** Writes summary.csv and summary.json into the run directory. */
  static List<Path> write(RunDirectory dir, StudyPlan plan) throws IOException {
    return ReportFormats.writeAll(summarise(dir, plan), dir.path());
  }
}
