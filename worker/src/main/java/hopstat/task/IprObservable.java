package hopstat.task;

import hopstat.lattice.Boundary;
import hopstat.localisation.EnergyWindows;
import hopstat.localisation.IprKernel;
import hopstat.model.Model;
import hopstat.model.ParameterInfo;
import hopstat.model.SymmetryClass;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.ejml.data.ZMatrixRMaj;

/**
 * {@code ipr}: inverse participation ratio Σ_i |ψ_i|⁴ (per-orbital amplitudes, see {@link
 * IprKernel}) averaged over the eigenstates in each energy window (the same windows as {@code
 * level-ratio}, {@link WindowParameters}). Only the eigenvectors in [windowMin, windowMax] are
 * computed ({@link RealisationContext#eigenvectorsInWindow}).
 *
 * <p>No level selection: ±E partners and Kramers partners fall in their own windows and are all
 * averaged. Caveat: within an exactly degenerate level (Kramers pair, clean lattice symmetries) the
 * eigenvectors are an arbitrary basis of the eigenspace and the per-state IPR depends on it.
 * Quantities: {@code ipr} = mean over all states in [windowMin, windowMax], {@code ipr.w<k>},
 * {@code ipr.e<k>} as for level-ratio.
 */
final class IprObservable implements Observable {

  static final String NAME = "ipr";

  @Override
  public String name() {
    return NAME;
  }

  @Override
  public String description() {
    return "Inverse participation ratio sum_i |psi_i|^4 over orbitals i (1 for a state on one orbital, 1/N for a"
        + " uniform state; random vector 3/(N+2) real, 2/(N+1) complex), averaged over the eigenstates in each energy"
        + " window (parameters windows, windowMin, windowMax; default edges: the spectrum edges).";
  }

  @Override
  public List<ParameterInfo> parameters() {
    return WindowParameters.parameters();
  }

  @Override
  public List<Quantity> quantities() {
    List<Quantity> q = new ArrayList<>();
    q.add(new Quantity(NAME, false, "1", "mean inverse participation ratio over all windows"));
    q.addAll(WindowParameters.windowQuantities(NAME, "mean inverse participation ratio", "1"));
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
    EnergyWindows windows =
        WindowParameters.resolve(context.point().parameters(), spectrum[0], spectrum[n - 1]);
    int first = context.firstIndexAtOrAbove(windows.lower());
    ZMatrixRMaj vectors =
        context.eigenvectorsInWindow(windows.lower(), Math.nextUp(windows.upper()));
    double[] sums = new double[windows.count()];
    int[] counts = new int[windows.count()];
    double total = 0;
    for (int j = 0; j < vectors.numCols; j++) {
      int w = windows.indexOf(spectrum[first + j]);
      double p = IprKernel.ipr(vectors, j);
      sums[w] += p;
      counts[w]++;
      total += p;
    }
    if (vectors.numCols == 0) {
      throw new IllegalStateException(
          "no eigenstate in [" + windows.lower() + ", " + windows.upper() + "]");
    }
    out.put(NAME, total / vectors.numCols);
    for (int w = 0; w < windows.count(); w++) {
      if (counts[w] > 0) {
        out.put(NAME + ".w" + w, sums[w] / counts[w]);
      }
    }
    for (int w = 0; w < windows.count(); w++) {
      out.put(NAME + ".e" + w, windows.centre(w));
    }
  }
}
