package hopstat.task;

import hopstat.invariant.MajoranaKernel;
import hopstat.invariant.MajoranaNumberResult;
import hopstat.invariant.MajoranaWorkspace;
import hopstat.lattice.Boundary;
import hopstat.model.MajoranaForm;
import hopstat.model.Model;
import hopstat.model.SymmetryClass;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * {@code z2}: the one Z2 invariant name for every class, 0 trivial, 1 non-trivial, so its mean over
 * realisations is the fraction of non-trivial samples. Dispatches on dimension and effective class:
 * one-dimensional BdG chains with C² = +1 (classes D, BDI; {@link MajoranaForm} models): the
 * Majorana number (Kitaev, Phys.-Usp. 44, 131 (2001)); class DIII in d = 1: {@link Z2ClassDiii1d}
 * (checked before the Majorana number, which is always trivial with Kramers pairs); class AII in d
 * = 2: {@link Z2ClassAii2d}. Eigenvectors are computed only on the AII path (the context computes
 * them on demand).
 */
final class Z2Observable implements Observable {

  static final String NAME = "z2";

  @Override
  public String name() {
    return NAME;
  }

  @Override
  public String description() {
    return "Z2 invariant, 0 trivial / 1 non-trivial (mean = fraction non-trivial). d = 1 BdG chains (classes D, BDI):"
        + " Majorana number Q = sign Pf(A_periodic) sign Pf(A_antiperiodic) of the closed ring (Kitaev, Phys.-Usp. 44, 131"
        + " (2001)), z2 = 1 iff Q = -1; needs boundary periodic and L >= 3. ising-chain: z2 = 1 is the ordered phase."
        + " A zero Pfaffian (zero mode under one closure) fails the realisation. "
        + Z2ClassDiii1d.description()
        + " "
        + Z2ClassAii2d.description();
  }

  @Override
  public List<Quantity> quantities() {
    return List.of(
        new Quantity(
            "z2",
            true,
            "1",
            "Z2 invariant: 0 trivial, 1 non-trivial (d = 1 BdG chains: Majorana number Q = -1; class DIII d = 1: Kramers pairs of"
                + " Majorana end modes; class AII d = 2: spin Chern number mod 2)"));
  }

  @Override
  public boolean needsOccupiedStates() {
    return false;
  }

  @Override
  public Optional<String> whyNotApplicable(
      Model model, Boundary boundary, SymmetryClass effectiveClass) {
    if (effectiveClass == SymmetryClass.AII && model.dimension() == 2) {
      return Z2ClassAii2d.whyNotApplicable(model, boundary);
    }
    if (effectiveClass == SymmetryClass.DIII && model.dimension() == 1) {
      return Z2ClassDiii1d.whyNotApplicable(model, boundary);
    }
    if (!(model instanceof MajoranaForm) || model.dimension() != 1) {
      return Optional.of(
          "z2 is implemented for one-dimensional BdG chains in Majorana form (pwave-wire, ising-chain, diii-wire), class DIII"
              + " chains and class AII in d = 2; "
              + model.name()
              + " is not one");
    }
    if (effectiveClass.particleHoleSquare() != 1) {
      return Optional.of(
          "the Majorana number needs particle-hole symmetry with C^2 = +1 (class D or BDI); the disorder leaves class "
              + effectiveClass);
    }
    if (boundary != Boundary.PERIODIC) {
      return Optional.of(
          "the Majorana number compares periodic and antiperiodic closures: z2 needs \"boundary\": \"periodic\"");
    }
    return Optional.empty();
  }

  @Override
  public void compute(RealisationContext context, Map<String, Double> out) {
    Model model = context.model();
    if (model.dimension() == 2
        && SymmetryCheckOps.effectiveClass(model, context.point().disorder())
            == SymmetryClass.AII) {
      Z2ClassAii2d.compute(context, out);
      return;
    }
    if (model.dimension() == 1
        && SymmetryCheckOps.effectiveClass(model, context.point().disorder())
            == SymmetryClass.DIII) {
      Z2ClassDiii1d.compute(context, out);
      return;
    }
    if (context.lattice().linearSize() < 3) {
      throw new IllegalStateException("z2 needs L >= 3 to tell the closing bond apart");
    }
    MajoranaWorkspace ws =
        context.workspace().scratch(MajoranaWorkspace.class, linalg -> new MajoranaWorkspace());
    MajoranaNumberResult r =
        MajoranaKernel.majoranaNumber(
            (MajoranaForm) context.model(), context.lattice(), context.terms(), ws);
    if (r.q() == 0) {
      throw new IllegalStateException(
          "a Pfaffian vanishes (zero mode under periodic or antiperiodic closure): Majorana number undefined");
    }
    out.put("z2", r.q() == -1 ? 1.0 : 0.0);
  }
}
