package hopstat.report.figure;

import hopstat.record.RealisationRecord;
import hopstat.report.StudyReport;
import hopstat.statistics.BoundaryEstimate;
import hopstat.statistics.BoundaryKind;
import hopstat.statistics.MobilityCurve;
import hopstat.statistics.MobilityEdge;
import hopstat.statistics.MobilityGap;
import hopstat.statistics.MobilityMethod;
import hopstat.statistics.MobilityOps;
import hopstat.statistics.MobilitySummary;
import hopstat.statistics.PointSummary;
import hopstat.statistics.QuantitySummary;
import hopstat.task.Outcome;
import hopstat.task.Quantity;
import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import javax.imageio.ImageIO;
import org.jfree.chart.ChartFactory;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.DatasetRenderingOrder;
import org.jfree.chart.plot.IntervalMarker;
import org.jfree.chart.plot.PlotOrientation;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYBarRenderer;
import org.jfree.chart.renderer.xy.XYBlockRenderer;
import org.jfree.chart.renderer.xy.XYErrorRenderer;
import org.jfree.chart.title.PaintScaleLegend;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.chart.ui.RectangleInsets;
import org.jfree.data.statistics.HistogramDataset;
import org.jfree.data.xy.DefaultXYZDataset;
import org.jfree.data.xy.XYIntervalSeries;
import org.jfree.data.xy.XYIntervalSeriesCollection;
import org.jfree.data.xy.YIntervalSeries;
import org.jfree.data.xy.YIntervalSeriesCollection;
import org.jfree.svg.SVGGraphics2D;

/**
 * Builds a report's figures from an already computed {@link StudyReport} and renders them to PNG
 * and SVG (JFreeChart; JFreeSVG). Plots only: every number drawn comes from the summary, the
 * boundary estimates or the records. Rendering is headless and deterministic (no time stamps; SVG
 * ids are prefixed by the figure name so several SVGs can share one HTML page).
 */
public final class FigureOps {

  /** Pixel size of every figure. */
  public static final int WIDTH = 760;

  public static final int HEIGHT = 480;

  /** At most this many curves per line plot (one per L or per combination of the other axes). */
  public static final int MAX_SERIES = 8;

  /**
   * At most this many mobility figures (one per estimator, quantity, axis and other-axis values).
   */
  public static final int MAX_MOBILITY_FIGURES = 8;

  /** Histograms are drawn at most at this many grid points (those nearest the boundaries). */
  public static final int MAX_HISTOGRAM_POINTS = 4;

  private static final Font LABEL_FONT = new Font("SansSerif", Font.PLAIN, 14);

  private FigureOps() {}

  /**
   * All figures, in order: per quantity and per grid axis with at least three values, the mean
   * against that axis; for two-axis grids, heat maps of each mean and of P(modal value) with the
   * boundary estimates overlaid; histograms at the points nearest the boundary estimates; then the
   * mobility curves (one figure per estimator, quantity, axis and other-axis values, at most {@link
   * #MAX_MOBILITY_FIGURES}) with the edges and gap windows overlaid.
   */
  public static List<Figure> figures(StudyReport report) {
    List<Figure> figures = new ArrayList<>();
    List<String> axes = report.layout().gridNames();
    for (Quantity q : report.layout().quantities()) {
      for (String axis : axes) {
        if (distinct(report, axis).size() >= 3) {
          figures.add(lineFigure(report, q, axis));
        }
      }
    }
    if (axes.size() == 2
        && distinct(report, axes.get(0)).size() >= 2
        && distinct(report, axes.get(1)).size() >= 2) {
      for (Quantity q : report.layout().quantities()) {
        figures.add(heatMap(report, q, false));
        if (q.integerValued()) {
          figures.add(heatMap(report, q, true));
        }
      }
    }
    for (int point : histogramPoints(report)) {
      for (Quantity q : report.layout().quantities()) {
        Figure h = histogram(report, q, point);
        if (h != null) {
          figures.add(h);
        }
      }
    }
    figures.addAll(mobilityFigures(report));
    return figures;
  }

  /**
   * One figure per group of mobility curves sharing method, quantity, axis and other-axis values.
   */
  static List<Figure> mobilityFigures(StudyReport r) {
    MobilitySummary m = r.summary().mobility();
    Map<List<Object>, List<MobilityCurve>> groups = new LinkedHashMap<>();
    for (MobilityCurve c : m.curves()) {
      groups
          .computeIfAbsent(
              List.of(c.method(), c.quantity(), c.axis(), c.fixed()), k -> new ArrayList<>())
          .add(c);
    }
    List<Figure> out = new ArrayList<>();
    int index = 0;
    for (List<MobilityCurve> curves : groups.values()) {
      if (out.size() >= MAX_MOBILITY_FIGURES) {
        break;
      }
      out.add(mobilityFigure(r, curves, index++));
    }
    return out;
  }

  private static Figure mobilityFigure(StudyReport r, List<MobilityCurve> curves, int index) {
    MobilityCurve first = curves.get(0);
    YIntervalSeriesCollection data = new YIntervalSeriesCollection();
    for (MobilityCurve c : curves) {
      YIntervalSeries s =
          new YIntervalSeries(Double.isNaN(c.size()) ? "one size" : "L = " + format(c.size()));
      for (MobilityCurve.Point p : c.points()) {
        double low = Double.isNaN(p.interval().low()) ? p.mean() : p.interval().low();
        double high = Double.isNaN(p.interval().high()) ? p.mean() : p.interval().high();
        s.add(p.position(), p.mean(), low, high);
      }
      data.addSeries(s);
    }
    XYErrorRenderer renderer = new XYErrorRenderer();
    renderer.setDrawXError(false);
    renderer.setDefaultLinesVisible(true);
    renderer.setDefaultShapesVisible(true);
    renderer.setCapLength(6);
    String xLabel =
        first.axis().equals(MobilityOps.LEVEL_RATIO_AXIS)
            ? "window centre E (units of t)"
            : r.axisLabel(first.axis());
    NumberAxis x = new NumberAxis(xLabel);
    x.setAutoRangeIncludesZero(false);
    String yLabel =
        switch (first.method()) {
          case TRANSFER_MATRIX -> "Λ = 1/(γM)";
          case LEVEL_RATIO -> "⟨r⟩";
          case INVARIANT_PLATEAU -> "fraction quantised at " + format(first.plateauValue());
        };
    NumberAxis y = new NumberAxis(yLabel);
    y.setAutoRangeIncludesZero(false);
    XYPlot plot = new XYPlot(data, x, y, renderer);
    MobilitySummary m = r.summary().mobility();
    for (MobilityGap g : m.gaps()) {
      if (g.method() == first.method()
          && g.quantity().equals(first.quantity())
          && g.axis().equals(first.axis())
          && g.fixed().equals(first.fixed())
          && !Double.isNaN(g.lower())) {
        IntervalMarker band =
            new IntervalMarker(g.lower(), g.upper(), new Color(120, 170, 230, 50));
        plot.addDomainMarker(band);
      }
    }
    for (MobilityEdge e : m.edges()) {
      if (e.method() == first.method()
          && e.quantity().equals(first.quantity())
          && e.axis().equals(first.axis())
          && e.fixed().equals(first.fixed())) {
        ValueMarker v =
            new ValueMarker(e.estimate(), new Color(200, 60, 60), new BasicStroke(1.5f));
        plot.addDomainMarker(v);
        if (!Double.isNaN(e.interval().low())) {
          plot.addDomainMarker(
              new IntervalMarker(
                  e.interval().low(), e.interval().high(), new Color(200, 60, 60, 40)));
        }
      }
    }
    if (first.method() == MobilityMethod.LEVEL_RATIO) {
      plot.addRangeMarker(
          new ValueMarker(MobilityOps.POISSON_RATIO, Color.GRAY, new BasicStroke(1f)));
      if (!Double.isNaN(m.wignerDysonRatio())) {
        plot.addRangeMarker(new ValueMarker(m.wignerDysonRatio(), Color.GRAY, new BasicStroke(1f)));
      }
    } else if (first.method() == MobilityMethod.INVARIANT_PLATEAU) {
      plot.addRangeMarker(
          new ValueMarker(MobilityOps.QUANTISED_FRACTION, Color.GRAY, new BasicStroke(1f)));
    }
    String at =
        first.fixed().isEmpty() ? "" : " at " + first.fixed().toString().replaceAll("[{}]", "");
    JFreeChart chart =
        new JFreeChart(
            first.method().name().toLowerCase(java.util.Locale.ROOT).replace('_', ' ')
                + ": "
                + first.quantity()
                + at,
            JFreeChart.DEFAULT_TITLE_FONT,
            plot,
            true);
    style(chart);
    String bars =
        first.method() == MobilityMethod.INVARIANT_PLATEAU
            ? "95 % Wilson interval of the fraction"
            : "95 % percentile-bootstrap interval of the mean";
    String caption =
        "Mobility estimator "
            + first.method().name()
            + " ("
            + first.quantity()
            + ") against "
            + xLabel
            + ", one curve per size. Error bars: "
            + bars
            + " (disorder-sampling error only). Red lines: edges (crossings) with shaded bootstrap intervals; blue band: the window around the "
            + "reference energy classed localised (quantised)"
            + (first.method() == MobilityMethod.LEVEL_RATIO
                ? "; grey lines: Poisson and Wigner-Dyson ⟨r⟩"
                : first.method() == MobilityMethod.INVARIANT_PLATEAU
                    ? "; grey line: the quantised-fraction threshold "
                        + MobilityOps.QUANTISED_FRACTION
                    : "")
            + ".";
    return new Figure(
        "mobility-"
            + index
            + "-"
            + first.method().name().toLowerCase(java.util.Locale.ROOT)
            + "-"
            + first.quantity().replaceAll("[^A-Za-z0-9_.-]", "_"),
        caption,
        chart);
  }

  /** PNG bytes of a figure. */
  public static byte[] png(Figure figure) {
    BufferedImage image = new BufferedImage(WIDTH, HEIGHT, BufferedImage.TYPE_INT_RGB);
    Graphics2D g = image.createGraphics();
    g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
    g.setRenderingHint(
        RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
    figure.chart().draw(g, new Rectangle2D.Double(0, 0, WIDTH, HEIGHT));
    g.dispose();
    ByteArrayOutputStream out = new ByteArrayOutputStream();
    try {
      ImageIO.write(image, "png", out);
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
    return out.toByteArray();
  }

  /** A standalone SVG document of a figure. */
  public static String svg(Figure figure) {
    SVGGraphics2D g = new SVGGraphics2D(WIDTH, HEIGHT);
    // JFreeSVG's default id prefix contains System.nanoTime(); a fixed one keeps files identical.
    g.setDefsKeyPrefix(figure.name().replaceAll("[^A-Za-z0-9]", "_") + "_");
    figure.chart().draw(g, new Rectangle2D.Double(0, 0, WIDTH, HEIGHT));
    return g.getSVGDocument();
  }

  private static Set<Double> distinct(StudyReport r, String axis) {
    Set<Double> values = new TreeSet<>();
    for (var p : r.layout().points()) {
      values.add(p.coordinates().get(axis));
    }
    return values;
  }

  private static String quantityLabel(Quantity q) {
    String unit =
        switch (q.unit()) {
          case "1", "" -> "";
          case "t", "energy" -> " (units of t)";
          default -> " (" + q.unit() + ")";
        };
    return q.name() + unit;
  }

  private static QuantitySummary find(PointSummary p, String quantity) {
    for (QuantitySummary q : p.quantities()) {
      if (q.name().equals(quantity)) {
        return q;
      }
    }
    return null;
  }

  private static String others(StudyReport r, Map<String, Double> coordinates, String axis) {
    StringBuilder b = new StringBuilder();
    for (String g : r.layout().gridNames()) {
      if (!g.equals(axis)) {
        b.append(b.length() > 0 ? ", " : "")
            .append(g)
            .append(" = ")
            .append(format(coordinates.get(g)));
      }
    }
    return b.length() == 0 ? "all" : b.toString();
  }

  static String format(double x) {
    return x == Math.rint(x) && Math.abs(x) < 1e9 ? Long.toString((long) x) : Double.toString(x);
  }

  private static void style(JFreeChart chart) {
    chart.setBackgroundPaint(Color.WHITE);
    chart.setAntiAlias(true);
    chart.setTextAntiAlias(true);
    if (chart.getPlot() instanceof XYPlot plot) {
      plot.setBackgroundPaint(Color.WHITE);
      plot.setDomainGridlinePaint(new Color(210, 210, 210));
      plot.setRangeGridlinePaint(new Color(210, 210, 210));
      plot.setOutlinePaint(Color.DARK_GRAY);
      plot.getDomainAxis().setLabelFont(LABEL_FONT);
      plot.getRangeAxis().setLabelFont(LABEL_FONT);
    }
  }

  private static Figure lineFigure(StudyReport r, Quantity q, String axis) {
    Map<String, YIntervalSeries> series = new LinkedHashMap<>();
    for (PointSummary p : r.summary().points()) {
      QuantitySummary s = find(p, q.name());
      if (s == null) {
        continue;
      }
      String key = others(r, p.coordinates(), axis);
      if (!series.containsKey(key) && series.size() >= MAX_SERIES) {
        continue;
      }
      double mean = s.mean().mean();
      double low = Double.isNaN(s.mean().ciLow()) ? mean : s.mean().ciLow();
      double high = Double.isNaN(s.mean().ciHigh()) ? mean : s.mean().ciHigh();
      series
          .computeIfAbsent(key, YIntervalSeries::new)
          .add(p.coordinates().get(axis), mean, low, high);
    }
    YIntervalSeriesCollection data = new YIntervalSeriesCollection();
    series.values().forEach(data::addSeries);
    XYErrorRenderer renderer = new XYErrorRenderer();
    renderer.setDrawXError(false);
    renderer.setDefaultLinesVisible(true);
    renderer.setDefaultShapesVisible(true);
    renderer.setCapLength(6);
    NumberAxis x = new NumberAxis(r.axisLabel(axis));
    x.setAutoRangeIncludesZero(false);
    NumberAxis y = new NumberAxis("mean " + quantityLabel(q));
    y.setAutoRangeIncludesZero(false);
    XYPlot plot = new XYPlot(data, x, y, renderer);
    JFreeChart chart =
        new JFreeChart(q.name() + " vs " + axis, JFreeChart.DEFAULT_TITLE_FONT, plot, true);
    style(chart);
    String caption =
        "Mean of "
            + q.name()
            + " over realisations against "
            + axis
            + ", one curve per value of the other grid axes"
            + (series.size() >= MAX_SERIES ? " (first " + MAX_SERIES + " shown)" : "")
            + ". Error bars: 95 % Student-t interval of the mean (disorder-sampling error only).";
    return new Figure("mean-" + q.name() + "-vs-" + axis, caption, chart);
  }

  private static Figure heatMap(StudyReport r, Quantity q, boolean modalFraction) {
    String xAxis = r.layout().gridNames().get(0);
    String yAxis = r.layout().gridNames().get(1);
    List<double[]> cells = new ArrayList<>();
    double min = Double.POSITIVE_INFINITY;
    double max = Double.NEGATIVE_INFINITY;
    for (PointSummary p : r.summary().points()) {
      QuantitySummary s = find(p, q.name());
      double z =
          s == null ? Double.NaN : modalFraction ? s.integer().modalFraction() : s.mean().mean();
      cells.add(new double[] {p.coordinates().get(xAxis), p.coordinates().get(yAxis), z});
      if (!Double.isNaN(z)) {
        min = Math.min(min, z);
        max = Math.max(max, z);
      }
    }
    if (modalFraction) {
      min = 0;
      max = 1;
    }
    if (min > max) {
      min = 0;
      max = 1;
    }
    double[][] xyz = new double[3][cells.size()];
    for (int i = 0; i < cells.size(); i++) {
      for (int k = 0; k < 3; k++) {
        xyz[k][i] = cells.get(i)[k];
      }
    }
    DefaultXYZDataset data = new DefaultXYZDataset();
    data.addSeries(modalFraction ? "P(modal)" : "mean", xyz);
    XYBlockRenderer block = new XYBlockRenderer();
    block.setSeriesVisibleInLegend(0, false);
    block.setBlockWidth(spacing(distinct(r, xAxis)));
    block.setBlockHeight(spacing(distinct(r, yAxis)));
    ColourScale scale = new ColourScale(min, max);
    block.setPaintScale(scale);
    NumberAxis x = new NumberAxis(r.axisLabel(xAxis));
    x.setAutoRangeIncludesZero(false);
    NumberAxis y = new NumberAxis(r.axisLabel(yAxis));
    y.setAutoRangeIncludesZero(false);
    XYPlot plot = new XYPlot(data, x, y, block);
    XYIntervalSeriesCollection overlay = boundaryOverlay(r, q.name(), xAxis, yAxis);
    if (overlay.getSeriesCount() > 0) {
      XYErrorRenderer marks = new XYErrorRenderer();
      marks.setDefaultLinesVisible(false);
      marks.setDefaultShapesVisible(true);
      marks.setErrorPaint(Color.RED);
      marks.setErrorStroke(new BasicStroke(2f));
      for (int s = 0; s < overlay.getSeriesCount(); s++) {
        marks.setSeriesPaint(s, s == 0 ? Color.RED : Color.MAGENTA);
      }
      plot.setDataset(1, overlay);
      plot.setRenderer(1, marks);
      plot.setDatasetRenderingOrder(DatasetRenderingOrder.FORWARD);
    }
    String what = modalFraction ? "P(modal value) of " + q.name() : "mean " + quantityLabel(q);
    JFreeChart chart =
        new JFreeChart(what, JFreeChart.DEFAULT_TITLE_FONT, plot, overlay.getSeriesCount() > 0);
    NumberAxis legendAxis = new NumberAxis(modalFraction ? "P(modal)" : "mean " + q.name());
    legendAxis.setRange(min, max > min ? max : min + 1);
    PaintScaleLegend legend = new PaintScaleLegend(scale, legendAxis);
    legend.setPosition(RectangleEdge.RIGHT);
    legend.setMargin(new RectangleInsets(5, 5, 5, 5));
    legend.setStripWidth(14);
    chart.addSubtitle(legend);
    style(chart);
    String caption =
        (modalFraction
                ? "Fraction of realisations at each grid point whose rounded "
                    + q.name()
                    + " equals that point's modal value"
                : "Mean of " + q.name() + " at each grid point")
            + (overlay.getSeriesCount() > 0
                ? "; marks: estimated boundaries (half-integer crossings and variance peaks) with 95 % bootstrap intervals as bars."
                : ".");
    return new Figure((modalFraction ? "pmodal-" : "heat-") + q.name(), caption, chart);
  }

  private static double spacing(Set<Double> values) {
    double best = Double.POSITIVE_INFINITY;
    Double previous = null;
    for (double v : values) {
      if (previous != null) {
        best = Math.min(best, v - previous);
      }
      previous = v;
    }
    return Double.isInfinite(best) ? 1 : best;
  }

  private static XYIntervalSeriesCollection boundaryOverlay(
      StudyReport r, String quantity, String xAxis, String yAxis) {
    XYIntervalSeries crossings = new XYIntervalSeries("half-integer crossing");
    XYIntervalSeries peaks = new XYIntervalSeries("variance peak");
    for (BoundaryEstimate b : r.summary().boundaries()) {
      if (!b.quantity().equals(quantity) || b.kind() == BoundaryKind.SIZE_CROSSING) {
        continue;
      }
      XYIntervalSeries target = b.kind() == BoundaryKind.HALF_INTEGER_CROSSING ? crossings : peaks;
      double low = Double.isNaN(b.interval().low()) ? b.estimate() : b.interval().low();
      double high = Double.isNaN(b.interval().high()) ? b.estimate() : b.interval().high();
      if (b.axis().equals(xAxis)) {
        double y = b.fixed().get(yAxis);
        target.add(b.estimate(), low, high, y, y, y);
      } else if (b.axis().equals(yAxis)) {
        double x = b.fixed().get(xAxis);
        target.add(x, x, x, b.estimate(), low, high);
      }
    }
    XYIntervalSeriesCollection c = new XYIntervalSeriesCollection();
    if (crossings.getItemCount() > 0) {
      c.addSeries(crossings);
    }
    if (peaks.getItemCount() > 0) {
      c.addSeries(peaks);
    }
    return c;
  }

  /** Points nearest the boundary estimates (distinct, in boundary order), else the middle point. */
  static List<Integer> histogramPoints(StudyReport r) {
    Set<Integer> points = new LinkedHashSet<>();
    for (BoundaryEstimate b : r.summary().boundaries()) {
      if (points.size() >= MAX_HISTOGRAM_POINTS) {
        break;
      }
      points.add(b.nearestPoint());
    }
    if (points.isEmpty() && !r.layout().points().isEmpty()) {
      points.add(r.layout().points().get(r.layout().points().size() / 2).index());
    }
    return new ArrayList<>(points);
  }

  private static Figure histogram(StudyReport r, Quantity q, int point) {
    double[] x =
        r.records().stream()
            .filter(
                rec ->
                    rec.result().pointIndex() == point
                        && rec.result().outcome() == Outcome.DONE
                        && rec.result().values().containsKey(q.name()))
            .mapToDouble((RealisationRecord rec) -> rec.result().values().get(q.name()))
            .toArray();
    if (x.length == 0) {
      return null;
    }
    double min = Double.POSITIVE_INFINITY;
    double max = Double.NEGATIVE_INFINITY;
    for (double v : x) {
      min = Math.min(min, v);
      max = Math.max(max, v);
    }
    int bins;
    if (q.integerValued()) {
      // Bins of width 0.1 centred on integers, so quantised values fill the central bins.
      min = Math.floor(min + 0.5) - 0.55;
      max = Math.ceil(max - 0.5) + 0.55;
      bins = (int) Math.round((max - min) / 0.1);
    } else {
      bins = 20;
      if (max == min) {
        double pad = Math.max(1e-12, Math.abs(min) * 1e-6);
        min -= pad;
        max += pad;
      }
    }
    HistogramDataset data = new HistogramDataset();
    String where = others(r, r.layout().points().get(point).coordinates(), "");
    data.addSeries(q.name(), x, bins, min, max);
    JFreeChart chart =
        ChartFactory.createHistogram(
            q.name() + " at " + where,
            quantityLabel(q),
            "realisations",
            data,
            PlotOrientation.VERTICAL,
            false,
            false,
            false);
    XYPlot plot = (XYPlot) chart.getPlot();
    if (plot.getRenderer() instanceof XYBarRenderer bar) {
      bar.setShadowVisible(false);
      bar.setBarPainter(new org.jfree.chart.renderer.xy.StandardXYBarPainter());
      bar.setSeriesPaint(0, new Color(59, 82, 139));
    }
    style(chart);
    String caption =
        "Histogram of "
            + q.name()
            + " over the "
            + x.length
            + " DONE realisations at grid point "
            + point
            + " ("
            + where
            + ")"
            + (q.integerValued()
                ? "; bins of width 0.1 centred on integers, so non-quantised samples stand apart."
                : "; 20 equal bins.");
    return new Figure("hist-" + q.name() + "-p" + point, caption, chart);
  }
}
