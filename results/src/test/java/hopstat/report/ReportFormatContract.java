package hopstat.report;

import static org.assertj.core.api.Assertions.assertThat;

import hopstat.statistics.Summary;
import java.io.IOException;
import java.io.StringWriter;
import org.junit.jupiter.api.Test;

/**
 * What every {@link ReportFormat} promises: deterministic text, no non-JSON/non-CSV number words
 * (NaN, Infinity), a trailing newline, and a stable file name. One small subclass per format.
 */
abstract class ReportFormatContract {

  abstract ReportFormat format();

  abstract String expectedFileName();

  private String render(Summary s) throws IOException {
    StringWriter out = new StringWriter();
    format().write(s, out);
    return out.toString();
  }

  @Test
  void writingTwiceGivesIdenticalText() throws IOException {
    assertThat(render(GoldenStudy.summary())).isEqualTo(render(GoldenStudy.summary()));
  }

  @Test
  void undefinedNumbersAreNeverWrittenAsNanOrInfinity() throws IOException {
    String text = render(GoldenStudy.summary());
    assertThat(text).doesNotContain("NaN").doesNotContain("Infinity").endsWith("\n");
  }

  @Test
  void fileNameIsStable() {
    assertThat(format().fileName()).isEqualTo(expectedFileName());
  }
}

class CsvSummaryFormatTest extends ReportFormatContract {
  @Override
  ReportFormat format() {
    return ReportFormats.CSV.format();
  }

  @Override
  String expectedFileName() {
    return "summary.csv";
  }
}

class JsonSummaryFormatTest extends ReportFormatContract {
  @Override
  ReportFormat format() {
    return ReportFormats.JSON.format();
  }

  @Override
  String expectedFileName() {
    return "summary.json";
  }
}

class BoundaryCsvFormatTest extends ReportFormatContract {
  @Override
  ReportFormat format() {
    return ReportFormats.BOUNDARIES_CSV.format();
  }

  @Override
  String expectedFileName() {
    return "boundaries.csv";
  }
}
