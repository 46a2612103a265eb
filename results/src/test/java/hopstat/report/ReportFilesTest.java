package hopstat.report;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import hopstat.record.SyntheticStudy;
import hopstat.statistics.PointSummary;
import hopstat.statistics.QuantitySummary;
import hopstat.statistics.Summary;
import hopstat.statistics.SummaryOps;
import io.jhdf.HdfFile;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The full set of report files for {@link GoldenStudy}, written twice at different times. */
class ReportFilesTest {

  @TempDir static Path root;
  static Path first;
  static Path second;
  static StudyReport report;

  static StudyReport report(Instant generated) {
    SyntheticStudy s = GoldenStudy.study();
    Summary summary = SummaryOps.summarise(s.layout(), s.records());
    return new StudyReport(
        s.layout(),
        summary,
        s.records(),
        "{\"name\": \"synthetic\", \"note\": \"<b>escaped</b>\"}",
        Map.of("W", "W (box strength, units of t)", "L", "L (lattice sites)"),
        Provenance.of(s.layout().specHash(), s.records(), generated));
  }

  @BeforeAll
  static void writeTwice() throws IOException {
    first = Files.createDirectories(root.resolve("a"));
    second = Files.createDirectories(root.resolve("b"));
    report = report(Instant.parse("2026-01-01T00:00:00Z"));
    ReportFiles.writeAll(report, first);
    ReportFiles.writeAll(report(Instant.parse("2026-06-30T12:00:00Z")), second);
  }

  private static List<Path> files(Path dir) throws IOException {
    try (Stream<Path> s = Files.walk(dir)) {
      return s.filter(Files::isRegularFile).map(dir::relativize).sorted().toList();
    }
  }

  @Test
  void everyOutputExistsAndOnlyTheHtmlAndHdf5CarryTheDate() throws IOException {
    List<Path> names = files(first);
    assertThat(names)
        .contains(
            Path.of("summary.csv"),
            Path.of("summary.json"),
            Path.of("boundaries.csv"),
            Path.of("report.html"),
            Path.of("results.h5"));
    assertThat(names.stream().filter(p -> p.toString().endsWith(".png"))).isNotEmpty();
    assertThat(names.stream().filter(p -> p.toString().endsWith(".svg")).count())
        .isEqualTo(names.stream().filter(p -> p.toString().endsWith(".png")).count());
    assertThat(names).allMatch(p -> !p.toString().endsWith(".tmp"));
    assertThat(files(second)).isEqualTo(names);
    for (Path p : names) {
      byte[] a = Files.readAllBytes(first.resolve(p));
      byte[] b = Files.readAllBytes(second.resolve(p));
      if (p.toString().equals("report.html") || p.toString().equals("results.h5")) {
        assertThat(a).as(p.toString()).isNotEqualTo(b);
      } else {
        assertThat(a).as("%s is byte-identical across runs", p).isEqualTo(b);
      }
    }
    assertThat(Files.readString(first.resolve("summary.json"))).doesNotContain("2026");
  }

  @Test
  void htmlIsSelfContainedAndCarriesProvenanceCaveatsAndEscapedSpec() throws IOException {
    String html = Files.readString(first.resolve("report.html"), StandardCharsets.UTF_8);
    assertThat(html)
        .contains(
            report.summary().specHash(),
            "2026-01-01T00:00:00Z",
            "java (40 records)",
            "0.0-test (abc1234) (40 records)",
            "Caveats",
            "finite-size",
            "ConvergenceFailure: synthetic",
            "&lt;b&gt;escaped&lt;/b&gt;",
            "W (box strength, units of t)");
    // No external resources: nothing fetched by src/href other than inline data.
    Matcher m = Pattern.compile("(src|href)=\"([^\"]*)\"").matcher(html);
    int images = 0;
    while (m.find()) {
      assertThat(m.group(2)).startsWith("data:image/png;base64,");
      images++;
    }
    long pngFiles = files(first).stream().filter(p -> p.toString().endsWith(".png")).count();
    assertThat(images).isEqualTo((int) pngFiles);
  }

  @Test
  void pngFiguresAreReadableImagesWithContent() throws IOException {
    for (Path p : files(first)) {
      if (p.toString().endsWith(".png")) {
        BufferedImage image = ImageIO.read(first.resolve(p).toFile());
        assertThat(image.getWidth()).isEqualTo(760);
        Set<Integer> colours = new HashSet<>();
        for (int y = 0; y < image.getHeight(); y += 4) {
          for (int x = 0; x < image.getWidth(); x += 4) {
            colours.add(image.getRGB(x, y));
          }
        }
        assertThat(colours.size()).as("distinct colours in %s", p).isGreaterThan(5);
      }
      if (p.toString().endsWith(".svg")) {
        assertThat(Files.readString(first.resolve(p)).strip())
            .startsWith("<?xml")
            .contains("<svg")
            .endsWith("</svg>");
      }
    }
  }

  @Test
  void hdf5HoldsTheRecordsAndAggregatesAsWritten() {
    try (HdfFile h5 = new HdfFile(first.resolve("results.h5"))) {
      assertThat(h5.getAttribute("specHash").getData()).isEqualTo(report.summary().specHash());
      long[] seeds = (long[]) h5.getDatasetByPath("realisations/seed").getData();
      String[] status = (String[]) h5.getDatasetByPath("realisations/status").getData();
      double[] chern = (double[]) h5.getDatasetByPath("realisations/values/chern").getData();
      assertThat(seeds).hasSize(40);
      for (int i = 0; i < 40; i++) {
        var r = report.records().get(i).result();
        assertThat(seeds[i]).isEqualTo(r.seed());
        assertThat(status[i]).isEqualTo(r.outcome().name());
        if (r.values().containsKey("chern")) {
          assertThat(chern[i]).isEqualTo(r.values().get("chern"));
        } else {
          assertThat(chern[i]).isNaN();
        }
      }
      double[] means = (double[]) h5.getDatasetByPath("aggregates/gap/mean").getData();
      int k = 0;
      for (PointSummary p : report.summary().points()) {
        for (QuantitySummary q : p.quantities()) {
          if (q.name().equals("gap")) {
            assertThat(means[k++]).isEqualTo(q.mean().mean());
          }
        }
      }
      double[] estimate = (double[]) h5.getDatasetByPath("boundaries/estimate").getData();
      assertThat(estimate).hasSize(report.summary().boundaries().size());
      assertThat(estimate[0])
          .isCloseTo(report.summary().boundaries().get(0).estimate(), within(0.0));
    }
  }

  @Test
  void hdf5IsReadableByTheReferenceHdf5Tools() throws Exception {
    ExternalTools.require(Path.of("/usr/bin/h5dump"), "hdf5-tools");
    ExternalTools.Run header =
        ExternalTools.run(
            root, 60, "/usr/bin/h5dump", "-H", first.resolve("results.h5").toString());
    assertThat(header.exitCode()).as(header.stderr()).isZero();
    assertThat(header.stdout())
        .contains(
            "GROUP \"realisations\"",
            "DATASET \"seed\"",
            "H5T_STD_I64LE",
            "GROUP \"aggregates\"",
            "DATASET \"estimate\"");
    ExternalTools.Run data =
        ExternalTools.run(
            root,
            60,
            "/usr/bin/h5dump",
            "-d",
            "/points/done",
            first.resolve("results.h5").toString());
    assertThat(data.exitCode()).as(data.stderr()).isZero();
    // Eight points, five realisations each, one failure at point 2 (GoldenStudy).
    assertThat(data.stdout().replaceAll("\\s+", " ")).contains("(0): 5, 5, 4, 5, 5, 5, 5, 5");
  }

  @Test
  void htmlRendersWithItsFiguresInAHeadlessBrowser() throws Exception {
    Path chromium = Path.of("/usr/bin/chromium");
    ExternalTools.require(chromium, "chromium");
    Path profile = Files.createTempDirectory(root, "profile");
    Path shot = root.resolve("shot.png");
    String url = first.resolve("report.html").toUri().toString();
    String[] common = {
      chromium.toString(),
      "--headless",
      "--no-sandbox",
      "--disable-gpu",
      "--disable-background-networking",
      "--disable-component-update",
      "--disable-sync",
      "--no-first-run",
      "--user-data-dir=" + profile,
      "--window-size=1200,2400",
      "--virtual-time-budget=5000"
    };
    ExternalTools.Run dom = ExternalTools.run(root, 120, concat(common, "--dump-dom", url));
    assertThat(dom.exitCode()).as(dom.stderr()).isZero();
    long pngFiles = files(first).stream().filter(p -> p.toString().endsWith(".png")).count();
    assertThat(dom.stdout()).contains("<img", "Estimated phase boundaries");
    // The page's own script counts images the browser decoded (complete with a natural width).
    assertThat(dom.stdout()).contains("data-rendered-images=\"" + pngFiles + "\"");
    ExternalTools.Run screenshot =
        ExternalTools.run(root, 120, concat(common, "--screenshot=" + shot, url));
    assertThat(screenshot.exitCode()).as(screenshot.stderr()).isZero();
    BufferedImage image = ImageIO.read(shot.toFile());
    Set<Integer> colours = new HashSet<>();
    for (int y = 0; y < image.getHeight(); y += 3) {
      for (int x = 0; x < image.getWidth(); x += 3) {
        colours.add(image.getRGB(x, y));
      }
    }
    // Text and figures give hundreds of distinct colours; a blank or error page gives a handful.
    assertThat(colours.size()).isGreaterThan(100);
  }

  private static String[] concat(String[] a, String... b) {
    String[] c = new String[a.length + b.length];
    System.arraycopy(a, 0, c, 0, a.length);
    System.arraycopy(b, 0, c, a.length, b.length);
    return c;
  }
}
