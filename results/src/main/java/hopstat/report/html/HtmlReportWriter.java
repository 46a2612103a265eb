package hopstat.report.html;

import hopstat.report.Provenance;
import hopstat.report.StudyReport;
import hopstat.statistics.BootstrapOps;
import hopstat.statistics.BoundaryEstimate;
import hopstat.statistics.BoundaryKind;
import hopstat.statistics.IntegerDistribution;
import hopstat.statistics.MobilityAgreement;
import hopstat.statistics.MobilityEdge;
import hopstat.statistics.MobilityGap;
import hopstat.statistics.MobilityOps;
import hopstat.statistics.MobilitySummary;
import hopstat.statistics.PointSummary;
import hopstat.statistics.QuantitySummary;
import hopstat.statistics.SampleStatisticsOps;
import hopstat.statistics.Summary;
import hopstat.statistics.TypicalValue;
import hopstat.statistics.ValueProbability;
import java.io.IOException;
import java.io.Writer;
import java.time.format.DateTimeFormatter;
import java.util.Base64;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * {@code report.html}: one self-contained page (no external resources; figures embedded as base64
 * PNG) with provenance, caveats, boundary estimates, figures, per-point tables, failures and the
 * spec text. Formats only: every number comes from the {@link StudyReport}.
 */
public final class HtmlReportWriter {

  /** A rendered figure to embed. */
  public record EmbeddedFigure(String name, String caption, byte[] png) {}

  private static final String STYLE =
      """
      body{font-family:sans-serif;max-width:1100px;margin:2em auto;padding:0 1em;color:#222}
      table{border-collapse:collapse;margin:0.5em 0;font-size:0.85em}
      th,td{border:1px solid #bbb;padding:2px 6px;text-align:right}
      th{background:#eee}td.l,th.l{text-align:left}
      figure{margin:1.5em 0}figcaption{font-size:0.9em;color:#444;max-width:760px}
      pre{background:#f6f6f6;padding:0.6em;overflow-x:auto}
      .caveats{background:#fff8e5;border-left:4px solid #e0a800;padding:0.2em 1em}
      """;

  private HtmlReportWriter() {}

  /**
   * Writes the page.
   *
   * @param report read
   * @param figures rendered figures in display order
   * @param out receives UTF-8 text; not closed
   */
  public static void write(StudyReport report, List<EmbeddedFigure> figures, Writer out)
      throws IOException {
    Summary s = report.summary();
    StringBuilder h = new StringBuilder();
    h.append(
            "<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n<title>hopstat report: ")
        .append(esc(s.name()))
        .append("</title>\n");
    h.append("<style>").append(STYLE).append("</style>\n</head>\n<body>\n");
    h.append("<h1>hopstat report: ").append(esc(s.name())).append("</h1>\n");
    provenance(h, report);
    caveats(h);
    boundaries(h, report);
    mobility(h, report);
    h.append("<h2>Figures</h2>\n");
    if (figures.isEmpty()) {
      h.append(
          "<p>No figures: the grid has no axis with three or more values and no boundary.</p>\n");
    }
    for (EmbeddedFigure f : figures) {
      h.append("<figure id=\"fig-")
          .append(esc(f.name()))
          .append("\"><img alt=\"")
          .append(esc(f.name()))
          .append("\" width=\"760\" src=\"data:image/png;base64,")
          .append(Base64.getEncoder().encodeToString(f.png()))
          .append("\"><figcaption>")
          .append(esc(f.caption()))
          .append(" (file figures/")
          .append(esc(f.name()))
          .append(".png, .svg)</figcaption></figure>\n");
    }
    statisticsTable(h, report);
    distributionTable(h, report);
    failures(h, s);
    h.append("<h2>Spec</h2>\n<pre>").append(esc(report.specText())).append("</pre>\n");
    // Marks the page with the number of figures the browser decoded (checked by the
    // headless-browser test).
    h.append(
            "<script>window.addEventListener('load',function(){var n=0;for(var i=0;i<document.images.length;i++){var m=document.images[i];")
        .append(
            "if(m.complete&&m.naturalWidth>0){n++;}}document.body.setAttribute('data-rendered-images',String(n));});</script>\n");
    h.append("</body>\n</html>\n");
    out.write(h.toString());
  }

  private static void provenance(StringBuilder h, StudyReport report) {
    Summary s = report.summary();
    Provenance p = report.provenance();
    long nonQuantised = 0;
    for (PointSummary ps : s.points()) {
      for (QuantitySummary q : ps.quantities()) {
        if (q.integer() != null) {
          nonQuantised += q.integer().nonQuantised();
        }
      }
    }
    h.append("<h2>Provenance and counts</h2>\n<table>\n");
    row(h, "spec hash (SHA-256)", p.specHash());
    row(h, "report written by", "hopstat " + p.reportTool());
    row(h, "report JVM", p.jvm());
    row(h, "results computed by", counts(p.recordTools()));
    row(h, "linear algebra backend", counts(p.linalgBackends()));
    for (Map.Entry<String, String> e : p.libraries().entrySet()) {
      row(h, e.getKey(), e.getValue());
    }
    row(h, "report generated (UTC)", DateTimeFormatter.ISO_INSTANT.format(p.generated()));
    row(h, "grid points", Integer.toString(s.points().size()));
    row(h, "realisations planned per point", Integer.toString(s.plannedPerPoint()));
    row(h, "realisations DONE", Long.toString(s.done()));
    row(h, "realisations FAILED", Long.toString(s.failed()));
    row(
        h,
        "non-quantised samples of integer invariants (|x − round(x)| > "
            + SampleStatisticsOps.QUANTISATION_TOLERANCE
            + ")",
        Long.toString(nonQuantised));
    row(
        h,
        "realisation seeds",
        "derived from the spec seed, grid-point and realisation index (per-realisation seeds in results.h5)");
    row(h, "bootstrap", BootstrapOps.METHOD + "; seeds: " + BootstrapOps.SEED_RULE);
    h.append("</table>\n");
  }

  private static void caveats(StringBuilder h) {
    h.append("<div class=\"caveats\"><h2>Caveats</h2><ul>\n");
    h.append(
            "<li>Error bars and intervals include only the statistical error from sampling a finite number of disorder realisations. ")
        .append(
            "They exclude finite-size effects and every other systematic error (grid spacing, convergence tolerances, the choice of estimator).</li>\n");
    h.append(
            "<li>Finite-size effects: transitions in finite systems are smooth crossovers whose position drifts with L. ")
        .append(
            "A boundary estimate is the estimate at the sizes computed, not the thermodynamic-limit value.</li>\n");
    h.append(
            "<li>Near a transition the gap closes and real-space invariants may come out non-quantised; such samples are counted above and in the tables, ")
        .append("and they are rounded to the nearest integer for P(value = k).</li>\n");
    h.append(
            "<li>Boundary positions between grid points come from linear interpolation (crossings) or a three-point parabola (variance peaks); ")
        .append(
            "their bootstrap intervals do not include this interpolation error, so the grid spacing limits the resolution ")
        .append(
            "(a variance peak whose two neighbours have equal variance, e.g. both fully quantised, sits exactly on a grid point and its interval can shrink to that point). ")
        .append("Several crossings along one cut usually mean noise: ")
        .append("check the existence fraction and the figures.</li>\n");
    h.append(
        "<li>These are numerical estimates. Judge them against the physics, the figures and other sizes before relying on them.</li>\n");
    h.append("</ul></div>\n");
  }

  private static void boundaries(StringBuilder h, StudyReport report) {
    List<BoundaryEstimate> list = report.summary().boundaries();
    h.append("<h2>Estimated phase boundaries</h2>\n");
    if (list.isEmpty()) {
      h.append(
          "<p>None found: no integer-valued quantity changes its modal value, peaks in variance or has crossing size curves along any grid cut.</p>\n");
      return;
    }
    h.append("<p>Intervals: ")
        .append(esc(BootstrapOps.METHOD))
        .append(", realisations resampled per grid point; ")
        .append(
            "\"exists\" is the fraction of bootstrap replicas in which the crossing or peak is found.</p>\n");
    h.append(
            "<table>\n<tr><th class=\"l\">kind</th><th class=\"l\">quantity</th><th class=\"l\">along</th><th class=\"l\">at</th><th>level / sizes</th>")
        .append(
            "<th>estimate</th><th>95 % interval</th><th>exists</th><th>nearest point</th></tr>\n");
    for (BoundaryEstimate b : list) {
      String detail =
          switch (b.kind()) {
            case HALF_INTEGER_CROSSING -> "mean = " + num(b.level());
            case VARIANCE_PEAK -> "";
            case SIZE_CROSSING -> "L = " + num(b.sizeLow()) + " / " + num(b.sizeHigh());
          };
      h.append("<tr><td class=\"l\">")
          .append(kindText(b.kind()))
          .append("</td><td class=\"l\">")
          .append(esc(b.quantity()))
          .append("</td><td class=\"l\">")
          .append(esc(report.axisLabel(b.axis())))
          .append("</td><td class=\"l\">")
          .append(esc(fixedText(b.fixed())))
          .append("</td><td>")
          .append(esc(detail))
          .append("</td><td>")
          .append(num(b.estimate()))
          .append("</td><td>[")
          .append(num(b.interval().low()))
          .append(", ")
          .append(num(b.interval().high()))
          .append("]</td><td>")
          .append(num(b.existsFraction()))
          .append("</td><td>")
          .append(b.nearestPoint())
          .append("</td></tr>\n");
    }
    h.append("</table>\n");
  }

  private static void mobility(StringBuilder h, StudyReport report) {
    MobilitySummary m = report.summary().mobility();
    if (m.isEmpty()) {
      return;
    }
    h.append("<h2 id=\"mobility\">Mobility edges and mobility gap</h2>\n");
    h.append("<p>Level-statistics references: Poisson ⟨r⟩ = 2 ln 2 − 1 = ")
        .append(num(MobilityOps.POISSON_RATIO))
        .append("; Wigner–Dyson ")
        .append(
            m.wignerDysonEnsemble().isEmpty()
                ? "unknown (effective class not known)"
                : esc(m.wignerDysonEnsemble())
                    + " ⟨r⟩ = "
                    + num(m.wignerDysonRatio())
                    + " (effective class "
                    + m.effectiveClass()
                    + ")")
        .append(". Invariant quantised where the fraction within ")
        .append(num(SampleStatisticsOps.QUANTISATION_TOLERANCE))
        .append(" of the plateau integer is ≥ ")
        .append(num(MobilityOps.QUANTISED_FRACTION))
        .append(" (our threshold). The mobility gap is the half-width of the window ")
        .append(
            "around the reference energy classed localised (quantised); 0 when the reference is not inside one. Intervals: ")
        .append(esc(BootstrapOps.METHOD))
        .append(
            ". An open side means the window reached the end of the scan, so the half-width is a lower bound.</p>\n");
    h.append(
            "<table>\n<tr><th class=\"l\">estimator</th><th class=\"l\">quantity</th><th class=\"l\">at</th><th class=\"l\">criterion</th><th>sizes</th>")
        .append(
            "<th>reference</th><th>window</th><th>half-width</th><th>95 % interval</th><th>reference inside</th></tr>\n");
    for (MobilityGap g : m.gaps()) {
      String sizes =
          Double.isNaN(g.sizeHigh())
              ? num(g.sizeLow())
              : num(g.sizeLow()) + " / " + num(g.sizeHigh());
      String window =
          Double.isNaN(g.lower())
              ? "none"
              : (g.lowerOpen() ? "≤ " : "")
                  + num(g.lower())
                  + " … "
                  + (g.upperOpen() ? "≥ " : "")
                  + num(g.upper());
      h.append("<tr><td class=\"l\">")
          .append(esc(g.method().name()))
          .append("</td><td class=\"l\">")
          .append(esc(g.quantity()))
          .append("</td><td class=\"l\">")
          .append(esc(fixedText(g.fixed())))
          .append("</td><td class=\"l\">")
          .append(esc(g.criterion()))
          .append("</td><td>")
          .append(esc(sizes))
          .append("</td><td>")
          .append(num(g.reference()))
          .append("</td><td>")
          .append(esc(window))
          .append("</td><td>")
          .append(num(g.halfWidth()))
          .append("</td><td>")
          .append(interval(g.interval().low(), g.interval().high()))
          .append("</td><td>")
          .append(num(g.insideFraction()))
          .append("</td></tr>\n");
    }
    h.append("</table>\n");
    if (!m.agreements().isEmpty()) {
      h.append(
          "<p>Agreement between estimators (all pairs of 95 % intervals of the half-width overlap; a lenient test):</p>\n<ul>\n");
      for (MobilityAgreement a : m.agreements()) {
        h.append("<li>")
            .append(esc(fixedText(a.fixed())))
            .append(": ")
            .append(esc(String.join(", ", a.estimates())))
            .append(" → <b>")
            .append(esc(a.verdict()))
            .append("</b></li>\n");
      }
      h.append("</ul>\n");
    }
    if (!m.edges().isEmpty()) {
      h.append(
              "<table>\n<tr><th class=\"l\">estimator</th><th class=\"l\">quantity</th><th class=\"l\">along</th><th class=\"l\">at</th>")
          .append(
              "<th class=\"l\">criterion</th><th>sizes / level</th><th>edge</th><th>95 % interval</th><th>exists</th></tr>\n");
      for (MobilityEdge e : m.edges()) {
        String detail =
            Double.isNaN(e.sizeHigh())
                ? "⟨r⟩ = " + num(e.level())
                : "L = " + num(e.sizeLow()) + " / " + num(e.sizeHigh());
        h.append("<tr><td class=\"l\">")
            .append(esc(e.method().name()))
            .append("</td><td class=\"l\">")
            .append(esc(e.quantity()))
            .append("</td><td class=\"l\">")
            .append(esc(e.axis()))
            .append("</td><td class=\"l\">")
            .append(esc(fixedText(e.fixed())))
            .append("</td><td class=\"l\">")
            .append(esc(e.criterion()))
            .append("</td><td>")
            .append(esc(detail))
            .append("</td><td>")
            .append(num(e.estimate()))
            .append("</td><td>")
            .append(interval(e.interval().low(), e.interval().high()))
            .append("</td><td>")
            .append(num(e.existsFraction()))
            .append("</td></tr>\n");
      }
      h.append("</table>\n");
    }
    h.append(
            "<p>Assumptions and failure modes: transfer-matrix crossings drift with the widths (corrections to scaling) and Λ(M) may be non-monotonic ")
        .append(
            "(such points show as undecided); level-ratio windows with few levels are noisy and are dropped when present in fewer than ")
        .append(num(MobilityOps.MIN_WINDOW_PRESENCE))
        .append(
            " of the realisations, and the one-size midpoint criterion is a convention; the quantisation threshold ")
        .append(
            "is arbitrary and the invariant window is a finite-size estimate limited by the energy spacing of the scan. Intervals exclude all of these.</p>\n");
  }

  private static void statisticsTable(StringBuilder h, StudyReport report) {
    Summary s = report.summary();
    h.append(
            "<h2>Statistics per grid point</h2>\n<p>mean ± standard error; t-CI: 95 % Student-t interval; boot: 95 % percentile-bootstrap interval; ")
        .append(
            "quantiles 5/25/50/75/95 %; typical: geometric mean with 95 % log-scale interval (positive non-integer quantities); ")
        .append("P(modal) with 95 % Wilson interval.</p>\n<table>\n<tr>");
    for (String g : s.gridNames()) {
      h.append("<th>").append(esc(g)).append("</th>");
    }
    h.append(
            "<th class=\"l\">quantity</th><th>n</th><th>mean ± se</th><th>t-CI</th><th>boot</th><th>q05</th><th>q25</th><th>median</th><th>q75</th><th>q95</th>")
        .append(
            "<th>typical [CI]</th><th>modal</th><th>P(modal) [Wilson]</th><th>non-quantised</th><th>failed</th></tr>\n");
    for (PointSummary p : s.points()) {
      for (QuantitySummary q : p.quantities()) {
        h.append("<tr>");
        for (String g : s.gridNames()) {
          h.append("<td>").append(num(p.coordinates().get(g))).append("</td>");
        }
        h.append("<td class=\"l\">")
            .append(esc(q.name()))
            .append("</td><td>")
            .append(q.mean().n())
            .append("</td><td>")
            .append(num(q.mean().mean()))
            .append(" ± ")
            .append(num(q.mean().standardError()))
            .append("</td><td>")
            .append(interval(q.mean().ciLow(), q.mean().ciHigh()))
            .append("</td><td>")
            .append(interval(q.meanBootstrap().low(), q.meanBootstrap().high()))
            .append("</td><td>")
            .append(num(q.quantiles().q05()))
            .append("</td><td>")
            .append(num(q.quantiles().q25()))
            .append("</td><td>")
            .append(num(q.median()))
            .append("</td><td>")
            .append(num(q.quantiles().q75()))
            .append("</td><td>")
            .append(num(q.quantiles().q95()))
            .append("</td><td>");
        TypicalValue t = q.typical();
        h.append(t == null ? "" : num(t.geometricMean()) + " " + interval(t.ciLow(), t.ciHigh()))
            .append("</td>");
        IntegerDistribution d = q.integer();
        if (d == null) {
          h.append("<td></td><td></td><td></td>");
        } else {
          h.append("<td>")
              .append(d.modalValue())
              .append("</td><td>")
              .append(num(d.modalFraction()))
              .append(" ")
              .append(interval(d.modalWilsonLow(), d.modalWilsonHigh()))
              .append("</td><td>")
              .append(d.nonQuantised())
              .append("</td>");
        }
        h.append("<td>").append(p.failed()).append("</td></tr>\n");
      }
    }
    h.append("</table>\n");
  }

  private static void distributionTable(StringBuilder h, StudyReport report) {
    Summary s = report.summary();
    if (s.integerQuantities().isEmpty()) {
      return;
    }
    h.append(
        "<h2>P(value = k) of integer invariants</h2>\n<p>Rounded values; fraction with 95 % Wilson interval.</p>\n<table>\n<tr>");
    for (String g : s.gridNames()) {
      h.append("<th>").append(esc(g)).append("</th>");
    }
    h.append("<th class=\"l\">quantity</th><th class=\"l\">k: P [Wilson 95 %]</th></tr>\n");
    for (PointSummary p : s.points()) {
      for (QuantitySummary q : p.quantities()) {
        if (q.integer() == null) {
          continue;
        }
        h.append("<tr>");
        for (String g : s.gridNames()) {
          h.append("<td>").append(num(p.coordinates().get(g))).append("</td>");
        }
        h.append("<td class=\"l\">").append(esc(q.name())).append("</td><td class=\"l\">");
        boolean first = true;
        for (ValueProbability v : q.integer().probabilities()) {
          h.append(first ? "" : "; ")
              .append(v.value())
              .append(": ")
              .append(num(v.fraction()))
              .append(' ')
              .append(interval(v.wilsonLow(), v.wilsonHigh()));
          first = false;
        }
        h.append("</td></tr>\n");
      }
    }
    h.append("</table>\n");
  }

  private static void failures(StringBuilder h, Summary s) {
    h.append("<h2>Failures</h2>\n");
    if (s.failed() == 0) {
      h.append("<p>No realisation failed.</p>\n");
      return;
    }
    h.append(
        "<table>\n<tr><th>point</th><th class=\"l\">at</th><th>failed</th><th class=\"l\">reasons (count)</th></tr>\n");
    for (PointSummary p : s.points()) {
      if (p.failed() == 0) {
        continue;
      }
      StringBuilder reasons = new StringBuilder();
      p.failureReasons()
          .forEach(
              (k, v) ->
                  reasons
                      .append(reasons.length() > 0 ? "; " : "")
                      .append(k)
                      .append(" (")
                      .append(v)
                      .append(')'));
      h.append("<tr><td>")
          .append(p.index())
          .append("</td><td class=\"l\">")
          .append(esc(fixedText(p.coordinates())))
          .append("</td><td>")
          .append(p.failed())
          .append("</td><td class=\"l\">")
          .append(esc(reasons.toString()))
          .append("</td></tr>\n");
    }
    h.append("</table>\n");
  }

  private static String kindText(BoundaryKind k) {
    return switch (k) {
      case HALF_INTEGER_CROSSING -> "mean crosses half-integer";
      case VARIANCE_PEAK -> "variance peak";
      case SIZE_CROSSING -> "size curves cross";
    };
  }

  private static String counts(Map<String, Integer> m) {
    StringBuilder b = new StringBuilder();
    m.forEach(
        (k, v) ->
            b.append(b.length() > 0 ? "; " : "")
                .append(k)
                .append(" (")
                .append(v)
                .append(" records)"));
    return b.length() == 0 ? "no records" : b.toString();
  }

  private static String fixedText(Map<String, Double> fixed) {
    StringBuilder b = new StringBuilder();
    fixed.forEach(
        (k, v) -> b.append(b.length() > 0 ? ", " : "").append(k).append(" = ").append(num(v)));
    return b.length() == 0 ? "-" : b.toString();
  }

  private static void row(StringBuilder h, String key, String value) {
    h.append("<tr><th class=\"l\">")
        .append(esc(key))
        .append("</th><td class=\"l\">")
        .append(esc(value))
        .append("</td></tr>\n");
  }

  private static String interval(double low, double high) {
    if (Double.isNaN(low) || Double.isNaN(high)) {
      return "";
    }
    return "[" + num(low) + ", " + num(high) + "]";
  }

  /** Human-readable number, 5 significant digits, locale-free. */
  static String num(double x) {
    if (Double.isNaN(x)) {
      return "";
    }
    if (x == Math.rint(x) && Math.abs(x) < 1e9) {
      return Long.toString((long) x);
    }
    String text = String.format(Locale.ROOT, "%.5g", x);
    int e = text.indexOf('e');
    String mantissa = e < 0 ? text : text.substring(0, e);
    if (mantissa.indexOf('.') >= 0) {
      mantissa = mantissa.replaceAll("0+$", "").replaceAll("\\.$", "");
    }
    return e < 0 ? mantissa : mantissa + text.substring(e);
  }

  static String esc(String s) {
    StringBuilder b = new StringBuilder(s.length());
    for (char c : s.toCharArray()) {
      switch (c) {
        case '<' -> b.append("&lt;");
        case '>' -> b.append("&gt;");
        case '&' -> b.append("&amp;");
        case '"' -> b.append("&quot;");
        default -> b.append(c);
      }
    }
    return b.toString();
  }
}
