package hopstat.task;

import hopstat.invariant.DiiiZ2Kernel;
import hopstat.invariant.DiiiZ2Result;
import hopstat.invariant.DiiiZ2Workspace;
import hopstat.lattice.Boundary;
import hopstat.model.Model;
import hopstat.model.Symmetry;
import hopstat.model.SymmetryOperator;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * The class DIII, d = 1 branch of the {@code z2} observable: the Pfaffian /
 * determinant-continuation invariant of the closed ring, twisted as a supercell Bloch Hamiltonian
 * ({@link DiiiZ2Kernel}; Qi, Hughes, Zhang, PRB 81, 134508 (2010); Budich &amp; Ardonne, PRB 88,
 * 134523 (2013)). Needs a model that declares local, unstaggered T and S operators (e.g.
 * diii-wire).
 */
final class Z2ClassDiii1d {

  private Z2ClassDiii1d() {}

  static String description() {
    return "class DIII, d = 1, periodic ring (L >= 3): (-1)^z2 = [Pf q(pi)/Pf q(0)] sqrt(det q(0))/sqrt(det q(pi)), q(phi) the"
        + " chiral off-diagonal block of the ring with Bloch twist e^{i phi} on the closing bond, sqrt continued along"
        + " [0, pi] (Qi, Hughes, Zhang, PRB 81, 134508 (2010); Budich & Ardonne, PRB 88, 134523 (2013)); needs a model"
        + " declaring T and S (diii-wire); a gap closing on the way fails the realisation.";
  }

  static Optional<String> whyNotApplicable(Model model, Boundary boundary) {
    if (boundary != Boundary.PERIODIC) {
      return Optional.of(
          "z2 for class DIII in d = 1 compares periodic and antiperiodic closures: it needs \"boundary\": \"periodic\"");
    }
    List<SymmetryOperator> ops = model.symmetryOperators().on(model.lattice(3, Boundary.PERIODIC));
    if (find(ops, Symmetry.TIME_REVERSAL).isEmpty() || find(ops, Symmetry.CHIRAL).isEmpty()) {
      return Optional.of(
          "z2 for class DIII in d = 1 needs a model that declares its time-reversal and chiral operators; "
              + model.name()
              + " does not");
    }
    if (find(ops, Symmetry.TIME_REVERSAL).get().siteSignCount() != 0
        || find(ops, Symmetry.CHIRAL).get().siteSignCount() != 0) {
      return Optional.of(
          "z2 for class DIII in d = 1 needs unstaggered T and S operators; "
              + model.name()
              + " declares staggered ones");
    }
    return Optional.empty();
  }

  /** Puts {@code z2} (0 or 1). */
  static void compute(RealisationContext context, Map<String, Double> out) {
    if (context.lattice().linearSize() < 3) {
      throw new IllegalStateException("z2 needs L >= 3 to tell the closing bond apart");
    }
    List<SymmetryOperator> ops = context.model().symmetryOperators().on(context.lattice());
    SymmetryOperator t =
        find(ops, Symmetry.TIME_REVERSAL)
            .orElseThrow(() -> new IllegalStateException("no T operator"));
    SymmetryOperator s =
        find(ops, Symmetry.CHIRAL).orElseThrow(() -> new IllegalStateException("no S operator"));
    DiiiZ2Workspace ws =
        context.workspace().scratch(DiiiZ2Workspace.class, linalg -> new DiiiZ2Workspace());
    DiiiZ2Result r = DiiiZ2Kernel.compute(context.lattice(), context.terms(), t, s, ws);
    switch (r.status()) {
      case CONVERGED -> out.put("z2", (double) r.z2());
      case GAP_CLOSED ->
          throw new ConvergenceFailure(
              "class DIII z2: the E = 0 gap of the twisted ring closes (or nearly) between"
                  + " periodic and antiperiodic closure ("
                  + r.determinantEvaluations()
                  + " determinants)");
      case NOT_QUANTISED ->
          throw new ConvergenceFailure(
              "class DIII z2: (-1)^nu is "
                  + r.quantisationDefect()
                  + " rad away from +-1 (rounding)");
    }
  }

  private static Optional<SymmetryOperator> find(List<SymmetryOperator> ops, Symmetry symmetry) {
    return ops.stream().filter(o -> o.symmetry() == symmetry).findFirst();
  }
}
