package hopstat.pool;

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

/**
 * Summaries of a run directory: a pure function of {@code spec.json} and the journal, so every
 * caller (the CLI's run, resume, status and report, and the batch service) gets the same bytes.
 */
public final class RunSummaryOps {

  private RunSummaryOps() {}

  /** The run's plan, re-expanded from its stored spec. */
  public static StudyPlan plan(RunDirectory dir) throws IOException {
    return GridExpander.expand(SpecParser.parse(dir.specText()));
  }

  /**
   * The summary of everything journaled so far; safe while a writer appends (a torn last line is
   * left out).
   */
  public static Summary summarise(RunDirectory dir, StudyPlan plan) throws IOException {
    JournalReader.Contents contents = JournalReader.read(dir.journalDir());
    List<RealisationRecord> records = new ArrayList<>(contents.records().values());
    return SummaryOps.summarise(LayoutOps.layout(plan), records);
  }

  /**
   * Writes every summary format ({@link ReportFormats#writeAll}) into the run directory, each via
   * temp + rename.
   */
  public static List<Path> write(RunDirectory dir, StudyPlan plan) throws IOException {
    return ReportFormats.writeAll(summarise(dir, plan), dir.path());
  }
}
