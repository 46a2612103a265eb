package hopstat.task;

import hopstat.invariant.MajoranaKernel;
import hopstat.invariant.MajoranaWorkspace;
import hopstat.lattice.Boundary;
import hopstat.linalg.PfaffianResult;
import hopstat.model.MajoranaForm;
import hopstat.model.Model;
import hopstat.model.SymmetryClass;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * {@code parity}: ground-state fermion parity of a d = 0 class-D system, the Z2 invariant of the
 * periodic table at d = 0, from sign Pf(A) (Kitaev, Phys.-Usp. 44, 131 (2001)): 0 even (Pf &gt; 0),
 * 1 odd (Pf &lt; 0), with the Majorana convention of {@link MajoranaForm}.
 */
final class ParityObservable implements Observable {

  static final String NAME = "parity";

  @Override
  public String name() {
    return NAME;
  }

  @Override
  public String description() {
    return "ground-state fermion parity of a d = 0 BdG system (class D), 0 even / 1 odd, from sign Pf(A) with"
        + " H = (i/4) sum A_mn g_m g_n, a_s = c_s + c+_s, b_s = -i(c_s - c+_s), Pf(A) > 0 even (Kitaev, Phys.-Usp. 44, 131 (2001))."
        + " A zero Pfaffian (degenerate ground state) fails the realisation.";
  }

  @Override
  public List<Quantity> quantities() {
    return List.of(
        new Quantity(
            "parity", true, "1", "ground-state fermion parity: 0 even, 1 odd (sign Pf(A))"));
  }

  @Override
  public boolean needsOccupiedStates() {
    return false;
  }

  @Override
  public Optional<String> whyNotApplicable(
      Model model, Boundary boundary, SymmetryClass effectiveClass) {
    if (!(model instanceof MajoranaForm) || model.dimension() != 0) {
      return Optional.of(
          "parity is defined for zero-dimensional BdG models in Majorana form (majorana-cluster); "
              + model.name()
              + " is not one");
    }
    if (effectiveClass.particleHoleSquare() != 1) {
      return Optional.of(
          "the Pfaffian parity needs particle-hole symmetry with C^2 = +1; the disorder leaves class "
              + effectiveClass);
    }
    return Optional.empty();
  }

  @Override
  public void compute(RealisationContext context, Map<String, Double> out) {
    MajoranaWorkspace ws =
        context.workspace().scratch(MajoranaWorkspace.class, linalg -> new MajoranaWorkspace());
    PfaffianResult pf =
        MajoranaKernel.groundStateParity(
            (MajoranaForm) context.model(), context.lattice(), context.terms(), ws);
    if (pf.sign() == 0) {
      throw new IllegalStateException("Pf(A) = 0: degenerate ground state, parity undefined");
    }
    out.put("parity", pf.sign() < 0 ? 1.0 : 0.0);
  }
}
