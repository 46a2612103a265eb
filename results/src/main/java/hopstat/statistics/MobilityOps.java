package hopstat.statistics;

import hopstat.model.SymmetryClass;
import hopstat.record.RealisationRecord;
import hopstat.record.StudyLayout;
import hopstat.task.Outcome;
import hopstat.task.Quantity;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.SplittableRandom;
import java.util.TreeMap;
import java.util.TreeSet;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Mobility edges and mobility-gap estimates from the journal records alone, by three estimators
 * ({@link MobilityMethod}): transfer-matrix Λ(E, M) across widths, level-ratio ⟨r⟩(E) across sizes
 * (or against the Poisson–Wigner–Dyson midpoint for one size), and the plateau of a quantised
 * invariant in E_F. Each gives curves (ensemble mean per position and size, with intervals), edges
 * (crossings with bootstrap intervals and existence fractions) and a gap (the window around the
 * reference energy where states are classed localised, with its half-width); gaps of different
 * estimators at the same other-axis values are compared by overlap of their intervals.
 *
 * <p>Bootstrap: realisations are resampled with replacement within each grid point, the
 * per-realisation values of all positions of that point together (so windows or Fermi energies of
 * one realisation stay paired); the stream of point p and quantity family q is seeded by {@code
 * BootstrapOps.seed(specHash, "mobility", "point=" + p, q)}. Replica r of two sizes' curves pairs
 * replica r of each. Pure functions of the layout and the records; equal journals give equal output
 * bit for bit.
 *
 * <p>Reference energy of a gap: the {@code fermiEnergy} parameter when it is the same at every
 * point of the curve and lies inside the scanned range, otherwise the centre of the scanned range
 * (e.g. when {@code fermiEnergy} itself is swept).
 *
 * <p>Cost: {@link BootstrapOps#RESAMPLES} × (realisations × positions) per grid point and quantity
 * family.
 */
public final class MobilityOps {

  /** Grid axis of the linear size (the width M of the transfer-matrix bar). */
  public static final String SIZE_AXIS = BoundaryOps.SIZE_AXIS;

  /** Parameter and grid axis of the transfer-matrix energy. */
  public static final String ENERGY_AXIS = "energy";

  /** Parameter and grid axis of the Fermi energy. */
  public static final String FERMI_ENERGY = "fermiEnergy";

  /** Transfer-matrix quantity Λ = 1/(γM). */
  public static final String LAMBDA = "lambda";

  /**
   * Level-ratio quantity prefix: {@code level-ratio.w<k>} means, {@code level-ratio.e<k>} centres.
   */
  public static final String LEVEL_RATIO = "level-ratio";

  /** Axis name written for level-ratio curves (per-realisation window centres). */
  public static final String LEVEL_RATIO_AXIS = LEVEL_RATIO + ".e";

  /** Poisson ⟨r⟩ = 2 ln 2 − 1 (derived from P(r) = 2/(1 + r)² on [0, 1] for r̃ = min/max). */
  public static final double POISSON_RATIO = 2 * Math.log(2) - 1;

  /**
   * GOE ⟨r⟩ (Atas, Bogomolny, Giraud, Roux, PRL 110, 084101 (2013), large-N numerics; value from
   * memory, 0.5307(1)).
   */
  public static final double GOE_RATIO = 0.5307;

  /** GUE ⟨r⟩ (Atas et al., PRL 110, 084101 (2013); value from memory, 0.5996(1)). */
  public static final double GUE_RATIO = 0.5996;

  /** GSE ⟨r⟩ (Atas et al., PRL 110, 084101 (2013); value from memory, 0.6744(1)). */
  public static final double GSE_RATIO = 0.6744;

  /**
   * An invariant counts as quantised at an energy when at least this fraction of realisations lie
   * within {@link SampleStatisticsOps#QUANTISATION_TOLERANCE} of the plateau integer. Our choice,
   * and arbitrary: it matches the 95 % level used for intervals; a stricter value narrows the
   * window. The Wilson interval of the fraction is reported beside it so the margin is visible.
   */
  public static final double QUANTISED_FRACTION = 0.95;

  /**
   * A level-ratio window enters a curve only if at least this fraction of the point's realisations
   * (and at least 2) have a ratio in it. Our choice: band-tail windows with few levels give noisy,
   * biased ⟨r⟩; a window missing in half the realisations holds fewer than about 3 levels.
   */
  public static final double MIN_WINDOW_PRESENCE = 0.5;

  /** Criterion names written into outputs. */
  public static final String SIZE_CROSSING = "size-crossing";

  public static final String MIDPOINT = "midpoint";
  public static final String QUANTISED = "quantised-fraction";
  public static final String CROSSING_VALUE = "crossing-value";

  /**
   * A size crossing of ⟨r⟩ fixes the critical value r_c only if it exists in at least this fraction
   * of bootstrap replicas (our choice: a majority; spurious crossings from noise where both sizes
   * are saturated at the same limit exist in far fewer).
   */
  public static final double ROBUST_EXISTENCE = 0.5;

  private static final Pattern PER_ENERGY = Pattern.compile("(.+)@E(\\d+)");

  private MobilityOps() {}

  /**
   * The Wigner–Dyson ensemble for level statistics in an effective class, from its time-reversal
   * square (derived from the Dyson index: T² = +1 → GOE, no T → GUE, T² = −1 → GSE; particle–hole
   * and chiral symmetries only constrain the spectrum near E = 0, which the worker folds out).
   *
   * @return "GOE", "GUE", "GSE", or "" for null
   */
  public static String wignerDysonEnsemble(SymmetryClass c) {
    if (c == null) {
      return "";
    }
    return switch (c.timeReversalSquare()) {
      case 1 -> "GOE";
      case -1 -> "GSE";
      default -> "GUE";
    };
  }

  /** ⟨r⟩ of {@link #wignerDysonEnsemble}; NaN for null. */
  public static double wignerDysonRatio(SymmetryClass c) {
    return switch (wignerDysonEnsemble(c)) {
      case "GOE" -> GOE_RATIO;
      case "GUE" -> GUE_RATIO;
      case "GSE" -> GSE_RATIO;
      default -> Double.NaN;
    };
  }

  /** All mobility estimates of a study; empty lists when it measured nothing they use. */
  public static MobilitySummary estimate(StudyLayout layout, List<RealisationRecord> records) {
    List<List<RealisationRecord>> byPoint = new ArrayList<>();
    for (int i = 0; i < layout.points().size(); i++) {
      byPoint.add(new ArrayList<>());
    }
    for (RealisationRecord r : records) {
      if (r.result().outcome() == Outcome.DONE) {
        byPoint.get(r.result().pointIndex()).add(r);
      }
    }
    for (List<RealisationRecord> list : byPoint) {
      list.sort(Comparator.comparingInt(r -> r.result().realisationIndex()));
    }
    Context cx = new Context(layout, byPoint);
    Output out = new Output();
    List<String> names = layout.quantities().stream().map(Quantity::name).toList();
    if (names.contains(LAMBDA)) {
      transferMatrix(cx, out);
    }
    if (names.stream().anyMatch(n -> n.startsWith(LEVEL_RATIO + ".w"))) {
      levelRatio(cx, out);
    }
    invariantPlateaus(cx, out);
    return new MobilitySummary(
        layout.effectiveClass(),
        wignerDysonEnsemble(layout.effectiveClass()),
        wignerDysonRatio(layout.effectiveClass()),
        out.curves,
        out.edges,
        out.gaps,
        agreements(out.gaps));
  }

  // ---------------------------------------------------------------- estimators

  private static void transferMatrix(Context cx, Output out) {
    List<String> axes = cx.nonSizeAxes();
    for (String axis : axes.isEmpty() ? List.of(ENERGY_AXIS) : axes) {
      for (Family f : cx.gridFamilies(axis)) {
        List<CurveData> curves = new ArrayList<>();
        for (Map.Entry<Double, List<Integer>> e : f.pointsBySize.entrySet()) {
          curves.add(cx.gridCurve(e.getKey(), axis, e.getValue(), LAMBDA));
        }
        compareSizes(
            MobilityMethod.TRANSFER_MATRIX,
            LAMBDA,
            axis,
            f.fixed,
            curves,
            cx,
            out,
            axis.equals(ENERGY_AXIS) && cx.isGridAxis(axis));
      }
    }
  }

  private static void levelRatio(Context cx, Output out) {
    double wd = wignerDysonRatio(cx.layout.effectiveClass());
    double mid = 0.5 * (POISSON_RATIO + wd);
    for (Family f : cx.pointFamilies()) {
      List<CurveData> curves = new ArrayList<>();
      for (Map.Entry<Double, List<Integer>> e : f.pointsBySize.entrySet()) {
        CurveData c = cx.windowCurve(e.getKey(), e.getValue().get(0));
        if (c != null) {
          curves.add(c);
        }
      }
      if (curves.size() >= 2) {
        compareSizes(
            MobilityMethod.LEVEL_RATIO,
            LEVEL_RATIO,
            LEVEL_RATIO_AXIS,
            f.fixed,
            curves,
            cx,
            out,
            true);
      } else if (curves.size() == 1) {
        CurveData c = curves.get(0);
        double[] d = new double[c.m()];
        double[][] rd = new double[c.replicas.length][c.m()];
        String[] states = new String[c.m()];
        for (int j = 0; j < c.m(); j++) {
          d[j] = c.mean[j] - mid;
          for (int r = 0; r < rd.length; r++) {
            rd[r][j] = c.replicas[r][j] - mid;
          }
          Interval i = c.intervals[j];
          states[j] =
              Double.isNaN(mid)
                  ? ""
                  : i.high() < mid ? "localised" : i.low() > mid ? "extended" : "undecided";
        }
        out.curves.add(
            c.toCurve(
                MobilityMethod.LEVEL_RATIO,
                LEVEL_RATIO,
                LEVEL_RATIO_AXIS,
                f.fixed,
                Double.NaN,
                states));
        if (!Double.isNaN(mid)) {
          edges(
              MobilityMethod.LEVEL_RATIO,
              LEVEL_RATIO,
              LEVEL_RATIO_AXIS,
              f.fixed,
              MIDPOINT,
              c.size,
              Double.NaN,
              mid,
              c.t,
              d,
              rd,
              out);
          gap(
              MobilityMethod.LEVEL_RATIO,
              LEVEL_RATIO,
              LEVEL_RATIO_AXIS,
              f.fixed,
              MIDPOINT,
              c.size,
              Double.NaN,
              cx.reference(f.allPoints(), c.t),
              c.t,
              d,
              rd,
              out);
        }
      }
    }
  }

  private static void invariantPlateaus(Context cx, Output out) {
    Map<String, TreeMap<Integer, String>> perEnergy = new LinkedHashMap<>();
    List<String> names = cx.layout.quantities().stream().map(Quantity::name).toList();
    for (Quantity q : cx.layout.quantities()) {
      Matcher m = PER_ENERGY.matcher(q.name());
      if (q.integerValued() && m.matches() && names.contains(q.name() + ".energy")) {
        perEnergy
            .computeIfAbsent(m.group(1), k -> new TreeMap<>())
            .put(Integer.parseInt(m.group(2)), q.name());
      }
    }
    for (Map.Entry<String, TreeMap<Integer, String>> base : perEnergy.entrySet()) {
      String label = base.getKey() + "@E";
      for (Family f : cx.pointFamilies()) {
        plateau(
            cx,
            out,
            label,
            label + ".energy",
            f,
            (size, points) -> cx.perEnergyRaw(size, points.get(0), base.getValue(), label));
      }
    }
    if (cx.isGridAxis(FERMI_ENERGY)) {
      for (Quantity q : cx.layout.quantities()) {
        if (!q.integerValued() || PER_ENERGY.matcher(q.name()).matches()) {
          continue;
        }
        for (Family f : cx.gridFamilies(FERMI_ENERGY)) {
          plateau(
              cx,
              out,
              q.name(),
              FERMI_ENERGY,
              f,
              (size, points) -> cx.gridRaw(size, FERMI_ENERGY, points, q.name()));
        }
      }
    }
  }

  private interface RawSource {
    RawCurve raw(double size, List<Integer> points);
  }

  private static void plateau(
      Context cx, Output out, String quantity, String axis, Family f, RawSource source) {
    List<RawCurve> raws = new ArrayList<>();
    for (Map.Entry<Double, List<Integer>> e : f.pointsBySize.entrySet()) {
      RawCurve raw = source.raw(e.getKey(), e.getValue());
      if (raw != null && raw.t.length > 0) {
        raws.add(raw);
      }
    }
    if (raws.isEmpty()) {
      return;
    }
    RawCurve largest = raws.get(raws.size() - 1);
    double reference = cx.reference(f.allPoints(), largest.t);
    long plateau = largest.modalNear(reference);
    for (RawCurve raw : raws) {
      CurveData c = raw.indicator(plateau);
      double[] d = new double[c.m()];
      double[][] rd = new double[c.replicas.length][c.m()];
      String[] states = new String[c.m()];
      for (int j = 0; j < c.m(); j++) {
        d[j] = QUANTISED_FRACTION - c.mean[j];
        for (int r = 0; r < rd.length; r++) {
          rd[r][j] = QUANTISED_FRACTION - c.replicas[r][j];
        }
        int k = (int) Math.round(c.mean[j] * c.n[j]);
        double[] w = SampleStatisticsOps.wilson(k, c.n[j]);
        c.intervals[j] = new Interval(w[0], w[1], SampleStatisticsOps.CONFIDENCE, "Wilson score");
        states[j] = c.mean[j] >= QUANTISED_FRACTION ? "quantised" : "not-quantised";
      }
      out.curves.add(
          c.toCurve(MobilityMethod.INVARIANT_PLATEAU, quantity, axis, f.fixed, plateau, states));
      gap(
          MobilityMethod.INVARIANT_PLATEAU,
          quantity,
          axis,
          f.fixed,
          QUANTISED,
          c.size,
          Double.NaN,
          cx.reference(f.allPoints(), c.t),
          c.t,
          d,
          rd,
          out);
    }
  }

  /**
   * Curves of consecutive sizes compared: states of the larger size's points, crossings, and (when
   * the axis is an energy) the gap from the two largest sizes.
   */
  private static void compareSizes(
      MobilityMethod method,
      String quantity,
      String axis,
      Map<String, Double> fixed,
      List<CurveData> curves,
      Context cx,
      Output out,
      boolean energyAxis) {
    if (curves.isEmpty()) {
      return;
    }
    String[] none = new String[curves.get(0).m()];
    Arrays.fill(none, "");
    out.curves.add(curves.get(0).toCurve(method, quantity, axis, fixed, Double.NaN, none));
    for (int s = 1; s < curves.size(); s++) {
      CurveData a = curves.get(s - 1);
      CurveData b = curves.get(s);
      String[] states = new String[b.m()];
      Arrays.fill(states, "");
      Paired p = Paired.of(a, b);
      for (int j = 0; j < p.t.length; j++) {
        double[] col = new double[p.rd.length];
        for (int r = 0; r < col.length; r++) {
          col[r] = p.rd[r][j];
        }
        Interval i = percentileOfFinite(col);
        states[p.ib[j]] = i.high() < 0 ? "localised" : i.low() > 0 ? "extended" : "undecided";
      }
      out.curves.add(b.toCurve(method, quantity, axis, fixed, Double.NaN, states));
      List<EdgeReplicas> found =
          p.t.length >= 2
              ? edges(
                  method,
                  quantity,
                  axis,
                  fixed,
                  SIZE_CROSSING,
                  a.size,
                  b.size,
                  Double.NaN,
                  p.t,
                  p.d,
                  p.rd,
                  out)
              : List.of();
      if (energyAxis && s == curves.size() - 1 && p.t.length >= 1) {
        double reference = cx.reference(cx.pointsOf(fixed), p.t);
        if (method == MobilityMethod.LEVEL_RATIO) {
          crossingValueGap(
              quantity,
              axis,
              fixed,
              a,
              b,
              p,
              found,
              wignerDysonRatio(cx.layout.effectiveClass()),
              reference,
              out);
        } else {
          gap(
              method,
              quantity,
              axis,
              fixed,
              SIZE_CROSSING,
              a.size,
              b.size,
              reference,
              p.t,
              p.d,
              p.rd,
              out);
        }
      }
    }
  }

  /**
   * Level-ratio gap from two sizes: the window where the larger size's ⟨r⟩ stays at or below r_c,
   * its value at the robust size crossings (existence fraction ≥ {@link #ROBUST_EXISTENCE};
   * averaged over them, the two sizes' curves averaged at each crossing); without a robust crossing
   * r_c is the Poisson–Wigner–Dyson midpoint. Why not the sign of ⟨r⟩_large − ⟨r⟩_small, as for Λ:
   * deep in the localised (extended) region both sizes sit at the Poisson (Wigner–Dyson) value, the
   * difference is pure noise and its sign flips at random; the position relative to r_c does not.
   * Each replica recomputes r_c from its own matched crossings.
   */
  private static void crossingValueGap(
      String quantity,
      String axis,
      Map<String, Double> fixed,
      CurveData a,
      CurveData b,
      Paired p,
      List<EdgeReplicas> found,
      double wignerDyson,
      double reference,
      Output out) {
    int m = p.t.length;
    int resamples = p.rd.length;
    double[] average = new double[m];
    double[] large = new double[m];
    for (int j = 0; j < m; j++) {
      average[j] = 0.5 * (a.mean[p.ia[j]] + b.mean[p.ib[j]]);
      large[j] = b.mean[p.ib[j]];
    }
    double fallback = 0.5 * (POISSON_RATIO + wignerDyson);
    double sum = 0;
    int count = 0;
    for (EdgeReplicas e : found) {
      if (e.existsFraction() >= ROBUST_EXISTENCE) {
        sum += interpolate(p.t, average, e.estimate());
        count++;
      }
    }
    double critical = count > 0 ? sum / count : fallback;
    if (Double.isNaN(critical)) {
      return;
    }
    double[] d = new double[m];
    for (int j = 0; j < m; j++) {
      d[j] = large[j] - critical;
    }
    double[][] rd = new double[resamples][m];
    double[] replicaAverage = new double[m];
    for (int r = 0; r < resamples; r++) {
      for (int j = 0; j < m; j++) {
        replicaAverage[j] = 0.5 * (a.replicas[r][p.ia[j]] + b.replicas[r][p.ib[j]]);
      }
      double rs = 0;
      int rc = 0;
      for (EdgeReplicas e : found) {
        if (e.existsFraction() >= ROBUST_EXISTENCE && !Double.isNaN(e.positions()[r])) {
          double v = interpolate(p.t, replicaAverage, e.positions()[r]);
          if (!Double.isNaN(v)) {
            rs += v;
            rc++;
          }
        }
      }
      double replicaCritical = rc > 0 ? rs / rc : critical;
      for (int j = 0; j < m; j++) {
        rd[r][j] = b.replicas[r][p.ib[j]] - replicaCritical;
      }
    }
    gap(
        MobilityMethod.LEVEL_RATIO,
        quantity,
        axis,
        fixed,
        count > 0 ? CROSSING_VALUE : MIDPOINT,
        a.size,
        b.size,
        reference,
        p.t,
        d,
        rd,
        out);
  }

  private static Interval percentileOfFinite(double[] x) {
    double[] kept = new double[x.length];
    int count = 0;
    for (double v : x) {
      if (!Double.isNaN(v)) {
        kept[count++] = v;
      }
    }
    return BootstrapOps.percentileInterval(kept, count);
  }

  /** Per replica, the position of one edge's matched crossing (NaN where it does not exist). */
  private record EdgeReplicas(double estimate, double existsFraction, double[] positions) {}

  private static List<EdgeReplicas> edges(
      MobilityMethod method,
      String quantity,
      String axis,
      Map<String, Double> fixed,
      String criterion,
      double sizeLow,
      double sizeHigh,
      double level,
      double[] t,
      double[] d,
      double[][] rd,
      Output out) {
    double[] all = BoundaryOps.zeroCrossings(t, d);
    List<EdgeReplicas> found = new ArrayList<>();
    for (double estimate : all) {
      double[] w = BoundaryOps.window(all, estimate);
      double[] replicas = new double[rd.length];
      double[] positions = new double[rd.length];
      int exists = 0;
      for (int r = 0; r < rd.length; r++) {
        double c =
            BoundaryOps.nearestWithin(BoundaryOps.zeroCrossings(t, rd[r]), estimate, w[0], w[1]);
        positions[r] = c;
        if (!Double.isNaN(c)) {
          replicas[exists++] = c;
        }
      }
      double fraction = (double) exists / rd.length;
      out.edges.add(
          new MobilityEdge(
              method,
              quantity,
              axis,
              fixed,
              criterion,
              sizeLow,
              sizeHigh,
              level,
              estimate,
              BootstrapOps.percentileInterval(replicas, exists),
              fraction,
              rd.length));
      found.add(new EdgeReplicas(estimate, fraction, positions));
    }
    return found;
  }

  /** Linear interpolation of (t, y) at x inside [t_0, t_last]; NaN outside or where y is NaN. */
  static double interpolate(double[] t, double[] y, double x) {
    for (int j = 0; j + 1 < t.length; j++) {
      if (x >= t[j] && x <= t[j + 1]) {
        return t[j + 1] == t[j] ? y[j] : y[j] + (y[j + 1] - y[j]) * (x - t[j]) / (t[j + 1] - t[j]);
      }
    }
    return t.length == 1 && x == t[0] ? y[0] : Double.NaN;
  }

  private static void gap(
      MobilityMethod method,
      String quantity,
      String axis,
      Map<String, Double> fixed,
      String criterion,
      double sizeLow,
      double sizeHigh,
      double reference,
      double[] t,
      double[] d,
      double[][] rd,
      Output out) {
    if (t.length == 0 || reference < t[0] || reference > t[t.length - 1]) {
      return;
    }
    double[] w = windowAround(t, d, reference);
    double[] half = new double[rd.length];
    double[] lows = new double[rd.length];
    double[] highs = new double[rd.length];
    int inside = 0;
    for (int r = 0; r < rd.length; r++) {
      double[] wr = windowAround(t, rd[r], reference);
      if (wr == null) {
        half[r] = 0;
      } else {
        half[r] = 0.5 * (wr[1] - wr[0]);
        lows[inside] = wr[0];
        highs[inside] = wr[1];
        inside++;
      }
    }
    out.gaps.add(
        new MobilityGap(
            method,
            quantity,
            axis,
            fixed,
            criterion,
            sizeLow,
            sizeHigh,
            reference,
            w == null ? Double.NaN : w[0],
            w == null ? Double.NaN : w[1],
            w != null && w[2] != 0,
            w != null && w[3] != 0,
            w == null ? 0 : 0.5 * (w[1] - w[0]),
            BootstrapOps.percentileInterval(half, half.length),
            BootstrapOps.percentileInterval(lows, inside),
            BootstrapOps.percentileInterval(highs, inside),
            (double) inside / rd.length,
            rd.length));
  }

  /**
   * The window around {@code reference} where the piecewise-linear curve through (t_j, d_j) is ≤ 0
   * ("inside": localised or quantised). NaN values of d are skipped. Each end is the zero of the
   * line between the last inside and first outside position, or the end of the scan (flagged open).
   *
   * @return {lower, upper, lowerOpen (0/1), upperOpen (0/1)}, or null when d at the reference is
   *     positive, undefined, or the reference lies outside the scan
   */
  static double[] windowAround(double[] t, double[] d, double reference) {
    int m = t.length;
    int left = -1;
    int right = -1;
    for (int j = 0; j < m; j++) {
      if (Double.isNaN(d[j])) {
        continue;
      }
      if (t[j] <= reference) {
        left = j;
      }
      if (t[j] >= reference && right < 0) {
        right = j;
      }
    }
    if (left < 0 || right < 0) {
      return null;
    }
    double dRef =
        left == right
            ? d[left]
            : d[left] + (d[right] - d[left]) * (reference - t[left]) / (t[right] - t[left]);
    if (!(dRef <= 0)) {
      return null;
    }
    double upper = Double.NaN;
    double tPrev = reference;
    double dPrev = dRef;
    for (int j = right; j < m; j++) {
      if (Double.isNaN(d[j]) || t[j] < reference) {
        continue;
      }
      if (d[j] > 0) {
        upper = tPrev + (t[j] - tPrev) * (-dPrev) / (d[j] - dPrev);
        break;
      }
      tPrev = t[j];
      dPrev = d[j];
    }
    boolean upperOpen = Double.isNaN(upper);
    if (upperOpen) {
      upper = tPrev;
    }
    double lower = Double.NaN;
    tPrev = reference;
    dPrev = dRef;
    for (int j = left; j >= 0; j--) {
      if (Double.isNaN(d[j]) || t[j] > reference) {
        continue;
      }
      if (d[j] > 0) {
        lower = tPrev - (tPrev - t[j]) * (-dPrev) / (d[j] - dPrev);
        break;
      }
      tPrev = t[j];
      dPrev = d[j];
    }
    boolean lowerOpen = Double.isNaN(lower);
    if (lowerOpen) {
      lower = tPrev;
    }
    return new double[] {lower, upper, lowerOpen ? 1 : 0, upperOpen ? 1 : 0};
  }

  private static List<MobilityAgreement> agreements(List<MobilityGap> gaps) {
    Map<Map<String, Double>, Map<String, MobilityGap>> groups = new LinkedHashMap<>();
    for (MobilityGap g : gaps) {
      Map<String, Double> key = new LinkedHashMap<>(g.fixed());
      key.remove(ENERGY_AXIS);
      key.remove(FERMI_ENERGY);
      String label = g.method().name() + "/" + g.quantity();
      Map<String, MobilityGap> byLabel = groups.computeIfAbsent(key, k -> new LinkedHashMap<>());
      MobilityGap previous = byLabel.get(label);
      if (previous == null || largestSize(g) > largestSize(previous)) {
        byLabel.put(label, g);
      }
    }
    List<MobilityAgreement> out = new ArrayList<>();
    for (Map.Entry<Map<String, Double>, Map<String, MobilityGap>> e : groups.entrySet()) {
      List<MobilityGap> list = new ArrayList<>(e.getValue().values());
      if (list.size() < 2) {
        continue;
      }
      String verdict = "agree";
      for (int i = 0; i < list.size() && !verdict.equals("undetermined"); i++) {
        for (int j = i + 1; j < list.size(); j++) {
          Interval a = list.get(i).interval();
          Interval b = list.get(j).interval();
          if (Double.isNaN(a.low()) || Double.isNaN(b.low())) {
            verdict = "undetermined";
            break;
          }
          if (a.high() < b.low() || b.high() < a.low()) {
            verdict = "disagree";
          }
        }
      }
      out.add(new MobilityAgreement(e.getKey(), new ArrayList<>(e.getValue().keySet()), verdict));
    }
    return out;
  }

  private static double largestSize(MobilityGap g) {
    return Double.isNaN(g.sizeHigh())
        ? (Double.isNaN(g.sizeLow()) ? Double.NEGATIVE_INFINITY : g.sizeLow())
        : g.sizeHigh();
  }

  // ---------------------------------------------------------------- data

  private static final class Output {
    final List<MobilityCurve> curves = new ArrayList<>();
    final List<MobilityEdge> edges = new ArrayList<>();
    final List<MobilityGap> gaps = new ArrayList<>();
  }

  /**
   * Points of one family: fixed other-axis values, point indices per size (ascending in the axis).
   */
  private record Family(Map<String, Double> fixed, TreeMap<Double, List<Integer>> pointsBySize) {
    List<Integer> allPoints() {
      List<Integer> all = new ArrayList<>();
      pointsBySize.values().forEach(all::addAll);
      return all;
    }
  }

  /** Per-realisation rows of one point over some columns; NaN = missing. */
  private record Block(int[] columns, double[][] rows, long seed) {}

  /** Raw per-realisation values of a curve (before the invariant's indicator). */
  private static final class RawCurve {
    final double size;
    final double[] keys;
    final double[] t;
    final List<Block> blocks;

    RawCurve(double size, double[] keys, double[] t, List<Block> blocks) {
      this.size = size;
      this.keys = keys;
      this.t = t;
      this.blocks = blocks;
    }

    /** The modal rounded value at the position nearest {@code reference}. */
    long modalNear(double reference) {
      int best = 0;
      for (int j = 1; j < t.length; j++) {
        if (Math.abs(t[j] - reference) < Math.abs(t[best] - reference)) {
          best = j;
        }
      }
      List<Double> x = new ArrayList<>();
      for (Block b : blocks) {
        for (int c = 0; c < b.columns.length; c++) {
          if (b.columns[c] == best) {
            for (double[] row : b.rows) {
              if (!Double.isNaN(row[c])) {
                x.add(row[c]);
              }
            }
          }
        }
      }
      return SampleStatisticsOps.integerDistribution(
              x.stream().mapToDouble(Double::doubleValue).toArray())
          .modalValue();
    }

    /** 1 where a value lies within the quantisation tolerance of {@code plateau}, else 0. */
    CurveData indicator(long plateau) {
      List<Block> out = new ArrayList<>();
      for (Block b : blocks) {
        double[][] rows = new double[b.rows.length][];
        for (int i = 0; i < rows.length; i++) {
          rows[i] = new double[b.columns.length];
          for (int c = 0; c < b.columns.length; c++) {
            double v = b.rows[i][c];
            rows[i][c] =
                Double.isNaN(v)
                    ? Double.NaN
                    : Math.abs(v - plateau) <= SampleStatisticsOps.QUANTISATION_TOLERANCE ? 1 : 0;
          }
        }
        out.add(new Block(b.columns, rows, b.seed));
      }
      return CurveData.of(size, keys, t, out);
    }
  }

  /** One curve's means and bootstrap replicas. */
  private static final class CurveData {
    final double size;
    final double[] keys;
    final double[] t;
    final double[] mean;
    final int[] n;
    final double[][] replicas;
    final Interval[] intervals;

    private CurveData(
        double size,
        double[] keys,
        double[] t,
        double[] mean,
        int[] n,
        double[][] replicas,
        Interval[] intervals) {
      this.size = size;
      this.keys = keys;
      this.t = t;
      this.mean = mean;
      this.n = n;
      this.replicas = replicas;
      this.intervals = intervals;
    }

    int m() {
      return t.length;
    }

    static CurveData of(double size, double[] keys, double[] t, List<Block> blocks) {
      int m = t.length;
      int b = BootstrapOps.RESAMPLES;
      double[] sum = new double[m];
      int[] n = new int[m];
      double[][] rsum = new double[b][m];
      int[][] rcount = new int[b][m];
      for (Block block : blocks) {
        int rows = block.rows.length;
        if (rows == 0) {
          continue;
        }
        for (double[] row : block.rows) {
          for (int c = 0; c < block.columns.length; c++) {
            if (!Double.isNaN(row[c])) {
              sum[block.columns[c]] += row[c];
              n[block.columns[c]]++;
            }
          }
        }
        SplittableRandom random = BootstrapOps.generator(block.seed);
        for (int r = 0; r < b; r++) {
          double[] rs = rsum[r];
          int[] rc = rcount[r];
          for (int i = 0; i < rows; i++) {
            double[] row = block.rows[BootstrapOps.index(random, rows)];
            for (int c = 0; c < block.columns.length; c++) {
              double v = row[c];
              if (!Double.isNaN(v)) {
                rs[block.columns[c]] += v;
                rc[block.columns[c]]++;
              }
            }
          }
        }
      }
      double[] mean = new double[m];
      double[][] replicas = new double[b][m];
      Interval[] intervals = new Interval[m];
      for (int j = 0; j < m; j++) {
        mean[j] = n[j] > 0 ? sum[j] / n[j] : Double.NaN;
      }
      double[] column = new double[b];
      for (int j = 0; j < m; j++) {
        for (int r = 0; r < b; r++) {
          replicas[r][j] = rcount[r][j] > 0 ? rsum[r][j] / rcount[r][j] : Double.NaN;
          column[r] = replicas[r][j];
        }
        intervals[j] =
            n[j] >= 2 ? percentileOfFinite(column) : Interval.undefined(BootstrapOps.METHOD);
      }
      return new CurveData(size, keys, t, mean, n, replicas, intervals);
    }

    MobilityCurve toCurve(
        MobilityMethod method,
        String quantity,
        String axis,
        Map<String, Double> fixed,
        double plateau,
        String[] states) {
      List<MobilityCurve.Point> points = new ArrayList<>();
      for (int j = 0; j < m(); j++) {
        points.add(new MobilityCurve.Point(t[j], n[j], mean[j], intervals[j], states[j]));
      }
      return new MobilityCurve(method, quantity, axis, fixed, size, plateau, points);
    }
  }

  /** Two sizes' curves on their common positions: d = mean_b − mean_a and its replicas. */
  private record Paired(double[] t, double[] d, double[][] rd, int[] ia, int[] ib) {
    static Paired of(CurveData a, CurveData b) {
      List<int[]> common = new ArrayList<>();
      for (int i = 0; i < a.m(); i++) {
        for (int j = 0; j < b.m(); j++) {
          if (a.keys[i] == b.keys[j] && !Double.isNaN(a.mean[i]) && !Double.isNaN(b.mean[j])) {
            common.add(new int[] {i, j});
          }
        }
      }
      int m = common.size();
      double[] t = new double[m];
      double[] d = new double[m];
      int[] ia = new int[m];
      int[] ib = new int[m];
      double[][] rd = new double[a.replicas.length][m];
      for (int k = 0; k < m; k++) {
        ia[k] = common.get(k)[0];
        ib[k] = common.get(k)[1];
        t[k] = 0.5 * (a.t[ia[k]] + b.t[ib[k]]);
        d[k] = b.mean[ib[k]] - a.mean[ia[k]];
        for (int r = 0; r < rd.length; r++) {
          rd[r][k] = b.replicas[r][ib[k]] - a.replicas[r][ia[k]];
        }
      }
      return new Paired(t, d, rd, ia, ib);
    }
  }

  /** The layout and the DONE records per point, with the grouping helpers. */
  private static final class Context {
    final StudyLayout layout;
    final List<List<RealisationRecord>> byPoint;

    Context(StudyLayout layout, List<List<RealisationRecord>> byPoint) {
      this.layout = layout;
      this.byPoint = byPoint;
    }

    boolean isGridAxis(String axis) {
      return layout.gridNames().contains(axis);
    }

    List<String> nonSizeAxes() {
      return layout.gridNames().stream().filter(g -> !g.equals(SIZE_AXIS)).toList();
    }

    double sizeOf(StudyLayout.Point p) {
      return isGridAxis(SIZE_AXIS) ? p.coordinates().get(SIZE_AXIS) : Double.NaN;
    }

    /**
     * The value of {@code axis} at a point: its grid coordinate, else the parameter of its first
     * record.
     */
    double axisValue(StudyLayout.Point p, String axis) {
      if (isGridAxis(axis)) {
        return p.coordinates().get(axis);
      }
      List<RealisationRecord> rs = byPoint.get(p.index());
      return rs.isEmpty() ? Double.NaN : rs.get(0).parameters().getOrDefault(axis, Double.NaN);
    }

    private Map<String, Double> others(StudyLayout.Point p, String axis) {
      Map<String, Double> key = new LinkedHashMap<>();
      for (String g : layout.gridNames()) {
        if (!g.equals(axis) && !g.equals(SIZE_AXIS)) {
          key.put(g, p.coordinates().get(g));
        }
      }
      return key;
    }

    /**
     * Points grouped by every grid axis but {@code axis} and L, then by L, ascending in {@code
     * axis}.
     */
    List<Family> gridFamilies(String axis) {
      Map<Map<String, Double>, TreeMap<Double, List<Integer>>> groups = new LinkedHashMap<>();
      for (StudyLayout.Point p : layout.points()) {
        double size = sizeOf(p);
        groups
            .computeIfAbsent(others(p, axis), k -> new TreeMap<>())
            .computeIfAbsent(Double.isNaN(size) ? 0 : size, k -> new ArrayList<>())
            .add(p.index());
      }
      List<Family> out = new ArrayList<>();
      for (Map.Entry<Map<String, Double>, TreeMap<Double, List<Integer>>> e : groups.entrySet()) {
        TreeMap<Double, List<Integer>> sorted = new TreeMap<>();
        for (Map.Entry<Double, List<Integer>> s : e.getValue().entrySet()) {
          List<Integer> list = new ArrayList<>(s.getValue());
          list.sort(
              Comparator.comparingDouble((Integer i) -> axisValue(layout.points().get(i), axis))
                  .thenComparingInt(i -> i));
          sorted.put(isGridAxis(SIZE_AXIS) ? s.getKey() : Double.NaN, list);
        }
        out.add(new Family(e.getKey(), sorted));
      }
      return out;
    }

    /** Points grouped by every grid axis but L, then by L (one point per size). */
    List<Family> pointFamilies() {
      return gridFamilies("");
    }

    List<Integer> pointsOf(Map<String, Double> fixed) {
      List<Integer> out = new ArrayList<>();
      for (StudyLayout.Point p : layout.points()) {
        boolean match = true;
        for (Map.Entry<String, Double> e : fixed.entrySet()) {
          match &= e.getValue().equals(p.coordinates().get(e.getKey()));
        }
        if (match) {
          out.add(p.index());
        }
      }
      return out;
    }

    /** The fixed fermiEnergy of the points if common and inside the scan, else the scan centre. */
    double reference(List<Integer> points, double[] t) {
      double low = Double.POSITIVE_INFINITY;
      double high = Double.NEGATIVE_INFINITY;
      for (double v : t) {
        low = Math.min(low, v);
        high = Math.max(high, v);
      }
      TreeSet<Double> values = new TreeSet<>();
      for (int p : points) {
        for (RealisationRecord r : byPoint.get(p)) {
          values.add(r.parameters().getOrDefault(FERMI_ENERGY, Double.NaN));
        }
      }
      if (values.size() == 1 && values.first() >= low && values.first() <= high) {
        return values.first();
      }
      return 0.5 * (low + high);
    }

    long seed(int point, String family) {
      return BootstrapOps.seed(layout.specHash(), "mobility", "point=" + point, family);
    }

    /** One column per point (distinct positions; a repeated position keeps its first point). */
    RawCurve gridRaw(double size, String axis, List<Integer> points, String quantity) {
      List<Double> t = new ArrayList<>();
      List<Block> blocks = new ArrayList<>();
      for (int p : points) {
        double position = axisValue(layout.points().get(p), axis);
        if (Double.isNaN(position) || (!t.isEmpty() && t.get(t.size() - 1) == position)) {
          continue;
        }
        double[][] rows =
            byPoint.get(p).stream()
                .filter(r -> r.result().values().containsKey(quantity))
                .map(r -> new double[] {r.result().values().get(quantity)})
                .toArray(double[][]::new);
        if (rows.length == 0) {
          continue;
        }
        blocks.add(new Block(new int[] {t.size()}, rows, seed(p, quantity)));
        t.add(position);
      }
      double[] ts = t.stream().mapToDouble(Double::doubleValue).toArray();
      return new RawCurve(size, ts, ts, blocks);
    }

    CurveData gridCurve(double size, String axis, List<Integer> points, String quantity) {
      RawCurve raw = gridRaw(size, axis, points, quantity);
      return CurveData.of(raw.size, raw.keys, raw.t, raw.blocks);
    }

    /** One column per kept level-ratio window of one point; null when none is kept. */
    CurveData windowCurve(double size, int point) {
      List<RealisationRecord> rs =
          byPoint.get(point).stream()
              .filter(r -> r.result().values().containsKey(LEVEL_RATIO))
              .toList();
      List<Integer> windows = new ArrayList<>();
      List<Double> centres = new ArrayList<>();
      for (int k = 0; k < 1000; k++) {
        String w = LEVEL_RATIO + ".w" + k;
        String e = LEVEL_RATIO + ".e" + k;
        if (layout.quantities().stream().noneMatch(q -> q.name().equals(w))) {
          break;
        }
        int present = 0;
        double centre = 0;
        int centres0 = 0;
        for (RealisationRecord r : rs) {
          if (r.result().values().containsKey(w)) {
            present++;
          }
          Double c = r.result().values().get(e);
          if (c != null) {
            centre += c;
            centres0++;
          }
        }
        if (present >= 2 && present >= MIN_WINDOW_PRESENCE * rs.size() && centres0 > 0) {
          windows.add(k);
          centres.add(centre / centres0);
        }
      }
      if (windows.isEmpty()) {
        return null;
      }
      int m = windows.size();
      int[] columns = new int[m];
      double[][] rows = new double[rs.size()][m];
      for (int j = 0; j < m; j++) {
        columns[j] = j;
      }
      for (int i = 0; i < rs.size(); i++) {
        for (int j = 0; j < m; j++) {
          rows[i][j] =
              rs.get(i)
                  .result()
                  .values()
                  .getOrDefault(LEVEL_RATIO + ".w" + windows.get(j), Double.NaN);
        }
      }
      double[] keys = windows.stream().mapToDouble(Integer::doubleValue).toArray();
      double[] t = centres.stream().mapToDouble(Double::doubleValue).toArray();
      return CurveData.of(
          size, keys, t, List.of(new Block(columns, rows, seed(point, LEVEL_RATIO))));
    }

    /** One column per Fermi energy k of {@code <base>@E<k>} at one point, ordered by energy. */
    RawCurve perEnergyRaw(
        double size, int point, TreeMap<Integer, String> quantities, String family) {
      List<RealisationRecord> rs = byPoint.get(point);
      List<String> kept = new ArrayList<>();
      List<Double> energies = new ArrayList<>();
      for (String q : quantities.values()) {
        double e = 0;
        int count = 0;
        for (RealisationRecord r : rs) {
          Double v = r.result().values().get(q);
          Double ev = r.result().values().get(q + ".energy");
          if (v != null && ev != null) {
            e += ev;
            count++;
          }
        }
        if (count > 0) {
          kept.add(q);
          energies.add(e / count);
        }
      }
      Integer[] order = new Integer[kept.size()];
      for (int i = 0; i < order.length; i++) {
        order[i] = i;
      }
      Arrays.sort(order, Comparator.comparingDouble(energies::get));
      int m = order.length;
      double[] t = new double[m];
      int[] columns = new int[m];
      double[][] rows = new double[rs.size()][m];
      for (int j = 0; j < m; j++) {
        t[j] = energies.get(order[j]);
        columns[j] = j;
        for (int i = 0; i < rs.size(); i++) {
          rows[i][j] = rs.get(i).result().values().getOrDefault(kept.get(order[j]), Double.NaN);
        }
      }
      return new RawCurve(
          size, t, t, m == 0 ? List.of() : List.of(new Block(columns, rows, seed(point, family))));
    }
  }
}
