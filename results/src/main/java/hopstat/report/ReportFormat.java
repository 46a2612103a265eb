package hopstat.report;

import hopstat.statistics.Summary;
import java.io.IOException;
import java.io.Writer;

/** A machine-readable rendering of a {@link Summary}. Writers only format; they compute nothing. */
public interface ReportFormat {

  /** File name inside the run directory, e.g. {@code summary.csv}. */
  String fileName();

  /**
   * Writes the summary.
   *
   * @param summary read
   * @param out receives the text (UTF-8 when it is a file); not closed
   */
  void write(Summary summary, Writer out) throws IOException;
}
