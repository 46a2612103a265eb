package hopstat.disorder;

import hopstat.lattice.HamiltonianBuilder;
import hopstat.lattice.Lattice;
import hopstat.model.Model;
import hopstat.model.ParameterValues;
import java.util.Map;
import java.util.random.RandomGenerator;

/** A kind of disorder: how a term with strength W adds random terms to a Hamiltonian. */
public interface DisorderKind {

  /** Name used in the spec's {@code disorder[i].type}. */
  String name();

  /** Distribution, convention and which symmetries it keeps. */
  String description();

  /**
   * The symmetries of {@code model}'s class that this disorder keeps. The realisation's class is
   * the model's class restricted to these ({@link hopstat.model.SymmetryClass#restrictTo}).
   */
  java.util.Set<hopstat.model.Symmetry> keptSymmetries(Model model);

  /**
   * Why this disorder cannot be applied to {@code model} (e.g. the model lacks the couplings it
   * randomises), or empty if it can. Default: applicable to every model.
   */
  default java.util.Optional<String> whyNotApplicable(Model model) {
    return java.util.Optional.empty();
  }

  /**
   * Why {@code strength} is not a valid strength of this kind beyond the general W ≥ 0 (e.g. a
   * concentration must be below 1), or empty if it is. Called by spec validation for every value a
   * strength can take. Default: every W ≥ 0 is valid.
   */
  default java.util.Optional<String> whyNotValidStrength(double strength) {
    return java.util.Optional.empty();
  }

  /**
   * Why a term of this kind may not be followed by a term of kind {@code later} in the spec's
   * disorder list (e.g. vacancies cancel the terms present when they are applied, so later terms
   * would touch removed sites), or empty if it may. Default: any order.
   */
  default java.util.Optional<String> whyNotBefore(DisorderKind later) {
    return java.util.Optional.empty();
  }

  /**
   * True if this disorder leaves decoupled levels far outside the band of the rest of the sample
   * (vacancies at ±U), which upsets observables that scale or bin by the whole spectrum (KPM,
   * default energy windows, automatic localizer kappa). Default: false.
   */
  default boolean hasDecoupledLevels() {
    return false;
  }

  /** Allowed option keys and, for each, the allowed values (empty set = any text). */
  Map<String, java.util.Set<String>> options();

  /**
   * Adds this realisation's random terms. Draws from {@code random} in a fixed, documented order
   * (site index order) so a realisation is reproducible from its seed.
   *
   * @param term read
   * @param model read
   * @param parameters read
   * @param lattice read
   * @param random consumed
   * @param out terms appended
   */
  void apply(
      DisorderTerm term,
      Model model,
      ParameterValues parameters,
      Lattice lattice,
      RandomGenerator random,
      HamiltonianBuilder out);
}
