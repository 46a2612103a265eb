package hopstat.report;

import hopstat.statistics.Summary;
import java.io.IOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;

/** The machine-readable summary formats, and the one place that writes them to disk. */
public enum ReportFormats {
  CSV(new CsvSummaryFormat()),
  JSON(new JsonSummaryFormat()),
  BOUNDARIES_CSV(new BoundaryCsvFormat()),
  MOBILITY_CSV(new MobilityCsvFormat());

  private final ReportFormat format;

  ReportFormats(ReportFormat format) {
    this.format = format;
  }

  public ReportFormat format() {
    return format;
  }

  /**
   * Writes every summary format into {@code dir}, each through a temporary file renamed into place,
   * so a reader never sees a half-written summary.
   *
   * @return the files written
   */
  public static java.util.List<Path> writeAll(Summary summary, Path dir) throws IOException {
    java.util.List<Path> written = new java.util.ArrayList<>();
    for (ReportFormats f : values()) {
      Path target = dir.resolve(f.format.fileName());
      Path tmp = dir.resolve(f.format.fileName() + ".tmp");
      try (Writer w = Files.newBufferedWriter(tmp, StandardCharsets.UTF_8)) {
        f.format.write(summary, w);
      }
      Files.move(tmp, target, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
      written.add(target);
    }
    return written;
  }
}
