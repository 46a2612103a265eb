package hopstat.report;

import hopstat.report.figure.Figure;
import hopstat.report.figure.FigureOps;
import hopstat.report.hdf5.Hdf5ResultsWriter;
import hopstat.report.html.HtmlReportWriter;
import java.io.IOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.ArrayList;
import java.util.List;

/**
 * Writes every output of a study into its run directory: summary.csv, summary.json, boundaries.csv,
 * figures/*.png and *.svg, report.html and results.h5. Each file goes through a temporary file
 * renamed into place. Needs a headless-capable AWT (set {@code java.awt.headless=true} on servers).
 */
public final class ReportFiles {

  /** Sub-directory of the figures. */
  public static final String FIGURES = "figures";

  private ReportFiles() {}

  /**
   * @return the files written, in writing order
   */
  public static List<Path> writeAll(StudyReport report, Path dir) throws IOException {
    List<Path> written = new ArrayList<>(ReportFormats.writeAll(report.summary(), dir));
    Path figures = dir.resolve(FIGURES);
    Files.createDirectories(figures);
    List<HtmlReportWriter.EmbeddedFigure> embedded = new ArrayList<>();
    for (Figure f : FigureOps.figures(report)) {
      byte[] png = FigureOps.png(f);
      written.add(atomicWrite(figures.resolve(f.name() + ".png"), png));
      written.add(
          atomicWrite(
              figures.resolve(f.name() + ".svg"),
              FigureOps.svg(f).getBytes(StandardCharsets.UTF_8)));
      embedded.add(new HtmlReportWriter.EmbeddedFigure(f.name(), f.caption(), png));
    }
    Path html = dir.resolve("report.html");
    Path tmp = dir.resolve("report.html.tmp");
    try (Writer w = Files.newBufferedWriter(tmp, StandardCharsets.UTF_8)) {
      HtmlReportWriter.write(report, embedded, w);
    }
    Files.move(tmp, html, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
    written.add(html);
    Path h5 = dir.resolve("results.h5");
    Path h5tmp = dir.resolve("results.h5.tmp");
    Hdf5ResultsWriter.write(report, h5tmp);
    Files.move(h5tmp, h5, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
    written.add(h5);
    return written;
  }

  private static Path atomicWrite(Path target, byte[] bytes) throws IOException {
    Path tmp = target.resolveSibling(target.getFileName() + ".tmp");
    Files.write(tmp, bytes);
    Files.move(tmp, target, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
    return target;
  }
}
