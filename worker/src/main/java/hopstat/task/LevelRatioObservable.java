package hopstat.task;

import hopstat.lattice.Boundary;
import hopstat.localisation.EnergyWindows;
import hopstat.localisation.LevelRatioKernel;
import hopstat.model.Model;
import hopstat.model.ParameterInfo;
import hopstat.model.SymmetryClass;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * {@code level-ratio}: mean adjacent-gap ratio ⟨r⟩ per energy window (Oganesyan &amp; Huse, PRB 75,
 * 155111 (2007); Atas et al., PRL 110, 084101 (2013)); see {@link LevelRatioKernel}. Windows: see
 * {@link WindowParameters}.
 *
 * <p>Level selection, from the model's clean class: if it has particle–hole or chiral symmetry
 * (spectrum symmetric under E → −E) only E &gt; 0 is kept; if T² = −1 (Kramers degeneracy) one
 * level of each degenerate pair is kept (only if the pairs are found degenerate, so a disorder that
 * breaks T is handled). Quantities: {@code level-ratio} = mean over all ratios in [windowMin,
 * windowMax]; {@code level-ratio.w<k>} = mean in window k; {@code level-ratio.e<k>} = centre of
 * window k. Per-realisation means: the ensemble mean of window means weights realisations equally,
 * not ratios.
 */
final class LevelRatioObservable implements Observable {

  static final String NAME = "level-ratio";

  @Override
  public String name() {
    return NAME;
  }

  @Override
  public String description() {
    return "Mean adjacent-gap ratio r = min(s_n, s_n-1)/max(s_n, s_n-1) of consecutive level spacings, no unfolding"
        + " (Oganesyan & Huse, PRB 75, 155111 (2007); Atas et al., PRL 110, 084101 (2013)): Poisson 0.386, GOE 0.531,"
        + " GUE 0.600. Per energy window (parameters windows, windowMin, windowMax; default edges: the realisation's"
        + " spectrum edges). E > 0 only for particle-hole/chiral models; one level per Kramers pair for T^2 = -1.";
  }

  @Override
  public List<ParameterInfo> parameters() {
    return WindowParameters.parameters();
  }

  @Override
  public List<Quantity> quantities() {
    List<Quantity> q = new ArrayList<>();
    q.add(new Quantity(NAME, false, "1", "mean adjacent-gap ratio over all windows"));
    q.addAll(WindowParameters.windowQuantities(NAME, "mean adjacent-gap ratio", "1"));
    return q;
  }

  @Override
  public boolean needsOccupiedStates() {
    return false;
  }

  @Override
  public Optional<String> whyNotApplicable(
      Model model, Boundary boundary, SymmetryClass effectiveClass) {
    return Optional.empty();
  }

  @Override
  public Optional<String> whyNotApplicableWith(
      hopstat.disorder.DisorderKind kind, Map<String, List<Double>> parameters) {
    return WindowParameters.whyNotWith(NAME, kind, parameters);
  }

  @Override
  public void compute(RealisationContext context, Map<String, Double> out) {
    double[] spectrum = context.spectrum();
    int n = context.dimension();
    SymmetryClass k = context.model().symmetryClass();
    LevelScratch scratch =
        context.workspace().scratch(LevelScratch.class, linalg -> new LevelScratch());
    scratch.ensure(n);
    int m =
        LevelRatioKernel.selectLevels(
            spectrum,
            n,
            k.hasParticleHole() || k.hasChiral(),
            k.timeReversalSquare() == -1,
            scratch.levels);
    if (m < 3) {
      throw new IllegalStateException(
          "level-ratio needs at least 3 levels after symmetry reduction, got " + m);
    }
    EnergyWindows windows =
        WindowParameters.resolve(
            context.point().parameters(), scratch.levels[0], scratch.levels[m - 1]);
    LevelRatioKernel.accumulate(scratch.levels, m, windows, scratch.sums, scratch.counts);
    double total = 0;
    int count = 0;
    for (int w = 0; w < windows.count(); w++) {
      total += scratch.sums[w];
      count += scratch.counts[w];
    }
    if (count == 0) {
      throw new IllegalStateException(
          "no level ratio in [" + windows.lower() + ", " + windows.upper() + "]");
    }
    out.put(NAME, total / count);
    for (int w = 0; w < windows.count(); w++) {
      if (scratch.counts[w] > 0) {
        out.put(NAME + ".w" + w, scratch.sums[w] / scratch.counts[w]);
      }
    }
    for (int w = 0; w < windows.count(); w++) {
      out.put(NAME + ".e" + w, windows.centre(w));
    }
  }

  /** Per-thread scratch of the level observables. */
  static final class LevelScratch {
    double[] levels = new double[1];
    final double[] sums = new double[WindowParameters.MAX_WINDOWS];
    final int[] counts = new int[WindowParameters.MAX_WINDOWS];

    void ensure(int n) {
      if (levels.length < n) {
        levels = new double[n];
      }
    }
  }
}
