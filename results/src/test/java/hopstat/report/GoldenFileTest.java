package hopstat.report;

import static org.assertj.core.api.Assertions.assertThat;

import hopstat.statistics.Summary;
import java.io.IOException;
import java.io.InputStream;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.util.Locale;
import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Golden files pin the machine-readable layouts (summary.csv, summary.json, boundaries.csv) byte
 * for byte, under two default locales (decimal comma and decimal point), since a locale-dependent
 * number format would change the bytes. Expected files: src/test/resources/golden/. They were
 * generated from {@link GoldenStudy} and checked by eye; regenerate deliberately when a column or
 * field is appended, never to silence a difference.
 */
class GoldenFileTest {

  static Stream<Arguments> cases() {
    return Stream.of(Locale.GERMANY, Locale.US, Locale.forLanguageTag("ar-EG"))
        .flatMap(l -> Stream.of(ReportFormats.values()).map(f -> Arguments.of(l, f)));
  }

  @ParameterizedTest
  @MethodSource("cases")
  void outputMatchesTheGoldenFile(Locale locale, ReportFormats format) throws IOException {
    Locale saved = Locale.getDefault();
    try {
      Locale.setDefault(locale);
      Summary summary = GoldenStudy.summary();
      StringWriter out = new StringWriter();
      format.format().write(summary, out);
      assertThat(out.toString()).isEqualTo(golden(format.format().fileName()));
    } finally {
      Locale.setDefault(saved);
    }
  }

  private static String golden(String name) throws IOException {
    try (InputStream in = GoldenFileTest.class.getResourceAsStream("/golden/" + name)) {
      assertThat(in).as("golden file %s", name).isNotNull();
      return new String(in.readAllBytes(), StandardCharsets.UTF_8);
    }
  }
}
