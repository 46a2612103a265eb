package hopstat.task;

import hopstat.lattice.Boundary;
import hopstat.model.Model;
import hopstat.model.SymmetryClass;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * {@code z2}: the one Z2 invariant name for every (class, dimension), 0 trivial, 1 non-trivial, so
 * its mean over realisations is the fraction of non-trivial samples. Dispatches on the effective
 * class and the dimension; implemented on this branch: class AII in d = 2 ({@link Z2ClassAii2d}).
 */
final class Z2Observable implements Observable {

  static final String NAME = "z2";

  @Override
  public String name() {
    return NAME;
  }

  @Override
  public String description() {
    return "Z2 invariant, 0 trivial / 1 non-trivial (mean = fraction non-trivial). " + Z2ClassAii2d.description();
  }

  @Override
  public List<Quantity> quantities() {
    return List.of(new Quantity("z2", true, "1", "Z2 invariant: 0 trivial, 1 non-trivial (class AII d = 2: spin Chern number mod 2)"));
  }

  @Override
  public boolean needsOccupiedStates() {
    return true;
  }

  @Override
  public Optional<String> whyNotApplicable(Model model, Boundary boundary, SymmetryClass effectiveClass) {
    if (effectiveClass == SymmetryClass.AII && model.dimension() == 2) {
      return Z2ClassAii2d.whyNotApplicable(model, boundary);
    }
    return Optional.of("z2 is implemented for class AII in d = 2; the point has class " + effectiveClass + " in d = " + model.dimension());
  }

  @Override
  public void compute(RealisationContext context, Map<String, Double> out) {
    Model model = context.model();
    SymmetryClass effective = SymmetryCheckOps.effectiveClass(model, context.point().disorder());
    if (effective == SymmetryClass.AII && model.dimension() == 2) {
      Z2ClassAii2d.compute(context, out);
      return;
    }
    throw new IllegalStateException("z2 is not implemented for class " + effective + " in d = " + model.dimension());
  }
}
