package hopstat.task;

import hopstat.lattice.Boundary;
import hopstat.model.Model;
import hopstat.model.SymmetryClass;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * A per-realisation measurement requested by name in the spec's {@code observables}.
 * Implementations are stateless adapters from a {@link RealisationContext} to kernels; scratch
 * lives in the context's workspace.
 */
public interface Observable {

  /** Name used in the spec. */
  String name();

  /** Meaning, conventions and sources (shown by the CLI and the README). */
  String description();

  /**
   * Spec parameters this observable reads (besides the model's), with defaults; a {@code null}
   * default means required, a NaN default means optional without a value. They join the spec's
   * parameter namespace. Default: none.
   */
  default List<hopstat.model.ParameterInfo> parameters() {
    return List.of();
  }

  /** The numbers written per realisation, in order. */
  List<Quantity> quantities();

  /** True if the observable needs eigenvectors of the occupied states (E &lt; E_F). */
  boolean needsOccupiedStates();

  /**
   * True if the observable uses the dense N × N Hamiltonian or its spectrum (the default).
   * Observables that work on the sparse term list only return false, so that {@link
   * RealisationCost} sizes their runs without an N² matrix.
   */
  default boolean needsDenseMatrix() {
    return true;
  }

  /**
   * Why the observable cannot be used with this model, boundary and effective symmetry class (the
   * model's class restricted by the disorder), or empty if it can.
   */
  Optional<String> whyNotApplicable(Model model, Boundary boundary, SymmetryClass effectiveClass);

  /**
   * Why the observable cannot be used together with a disorder term of this kind, given the spec's
   * parameters (e.g. observables that scale or bin by the whole spectrum cannot cope with the
   * far-away levels of {@link hopstat.disorder.DisorderKind#hasDecoupledLevels()} unless the spec
   * fixes their energy range), or empty if it can. Called by spec validation for every pair of
   * observable and disorder term. Default: compatible with every kind.
   *
   * @param kind read
   * @param parameters read: every parameter of the spec (given or defaulted) with all its values
   */
  default Optional<String> whyNotApplicableWith(
      hopstat.disorder.DisorderKind kind, Map<String, List<Double>> parameters) {
    return Optional.empty();
  }

  /**
   * As {@link #whyNotApplicable(Model, Boundary, SymmetryClass)}, also knowing the spec's disorder
   * types (spec order), for observables that cannot use every disorder kind (e.g. {@code lyapunov}
   * draws the disorder slice by slice). Default: ignores the disorder.
   *
   * @param disorderTypes the {@code disorder[i].type} names; read
   */
  default Optional<String> whyNotApplicable(
      Model model, Boundary boundary, SymmetryClass effectiveClass, List<String> disorderTypes) {
    return whyNotApplicable(model, boundary, effectiveClass);
  }

  /**
   * Computes the quantities of one realisation.
   *
   * @param context read (lazily computes and caches spectra)
   * @param out receives one entry per quantity
   */
  void compute(RealisationContext context, Map<String, Double> out);
}
