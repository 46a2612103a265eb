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
  void apply(DisorderTerm term, Model model, ParameterValues parameters, Lattice lattice, RandomGenerator random, HamiltonianBuilder out);
}
