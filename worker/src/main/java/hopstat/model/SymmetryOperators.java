package hopstat.model;

import hopstat.lattice.Lattice;
import java.util.List;

/**
 * The symmetry operators a model declares for its samples. A model declares an operator for each
 * symmetry of its Altland–Zirnbauer class that it can write down; {@link SymmetryCheckKernel} then
 * verifies built Hamiltonians against them. Implementations are stateless.
 */
@FunctionalInterface
public interface SymmetryOperators {

  /** No declared operators (the default of {@link Model#symmetryOperators()}). */
  SymmetryOperators NONE = lattice -> List.of();

  /**
   * The operators on a sample of this lattice, at most one per {@link Symmetry}.
   *
   * @param lattice read, not modified; the model's own lattice
   */
  List<SymmetryOperator> on(Lattice lattice);
}
