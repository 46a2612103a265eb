package hopstat.task;

import hopstat.disorder.DisorderCatalog;
import hopstat.disorder.DisorderKind;
import hopstat.disorder.DisorderTerm;
import hopstat.lattice.HamiltonianBuilder;
import hopstat.lattice.Lattice;
import hopstat.model.Model;
import hopstat.model.Symmetry;
import hopstat.model.SymmetryCheckKernel;
import hopstat.model.SymmetryCheckResult;
import hopstat.model.SymmetryCheckWorkspace;
import hopstat.model.SymmetryClass;
import hopstat.model.SymmetryOperator;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.random.RandomGenerator;
import org.ejml.data.ZMatrixRMaj;

/**
 * Spec-time symmetry audit: builds one realisation of a grid point exactly as {@link
 * RealisationRunner} does (clean terms, then the disorder terms in spec order from one generator)
 * and checks every symmetry the point's effective class claims against the operators the model
 * declares. A claimed symmetry that fails means the spec combines a model, parameters and disorder
 * that do not have the class the analysis assumes; callers report it as bad input.
 *
 * <p>Needs no eigen-solver: it builds the dense matrix and compares entries, O(N² o).
 */
public final class SymmetryCheckOps {

  private SymmetryCheckOps() {}

  /**
   * The model's class restricted to the symmetries kept by every disorder term of the point.
   *
   * @throws IllegalStateException for an unknown disorder type (validation runs first)
   */
  public static SymmetryClass effectiveClass(Model model, List<DisorderTerm> disorder) {
    boolean keepT = true;
    boolean keepC = true;
    boolean keepS = true;
    for (DisorderTerm term : disorder) {
      DisorderKind kind =
          DisorderCatalog.find(term.type())
              .orElseThrow(() -> new IllegalStateException("unknown disorder " + term.type()));
      Set<Symmetry> kept = kind.keptSymmetries(model);
      keepT &= kept.contains(Symmetry.TIME_REVERSAL);
      keepC &= kept.contains(Symmetry.PARTICLE_HOLE);
      keepS &= kept.contains(Symmetry.CHIRAL);
    }
    return model.symmetryClass().restrictTo(keepT, keepC, keepS);
  }

  /**
   * Builds one realisation of {@code point} with the given seed and checks the claimed symmetries.
   *
   * @param point read
   * @param seed the realisation seed (e.g. that of realisation 0)
   * @param tolerance threshold on the relative violation, e.g. {@link
   *     SymmetryCheckKernel#TOLERANCE}
   */
  public static SymmetryCheckReport check(PointSpec point, long seed, double tolerance) {
    Model model = point.resolveModel();
    Lattice lattice = model.lattice(point.linearSize(), point.boundary());
    HamiltonianBuilder builder = new HamiltonianBuilder();
    builder.reset(lattice.orbitals());
    model.addClean(point.parameters(), lattice, builder);
    RandomGenerator random = SeedOps.generator(seed);
    for (DisorderTerm term : point.disorder()) {
      DisorderKind kind =
          DisorderCatalog.find(term.type())
              .orElseThrow(() -> new IllegalStateException("unknown disorder " + term.type()));
      kind.apply(term, model, point.parameters(), lattice, random, builder);
    }
    ZMatrixRMaj h = new ZMatrixRMaj(1, 1);
    SymmetryClass effective = effectiveClass(model, point.disorder());
    // No declared operator: nothing reads the matrix. Above the runner's dense limit the N x N
    // matrix would not fit (e.g. N = 80 000 for dense-free localizer runs): not checked there
    // either.
    if (model.symmetryOperators().on(lattice).isEmpty()
        || lattice.orbitals() > RealisationRunner.MAX_SYMMETRY_CHECK_DIMENSION) {
      return checkClaimed(model, lattice, h, effective, tolerance, false);
    }
    builder.toDense(h);
    return checkClaimed(model, lattice, h, effective, tolerance);
  }

  /**
   * Checks the symmetries that {@code claimed} has against the model's declared operators.
   *
   * @param hamiltonian read, not modified
   */
  public static SymmetryCheckReport checkClaimed(
      Model model,
      Lattice lattice,
      ZMatrixRMaj hamiltonian,
      SymmetryClass claimed,
      double tolerance) {
    return checkClaimed(model, lattice, hamiltonian, claimed, tolerance, true);
  }

  /**
   * As above; with {@code withMatrix} false the declared operators are listed but not applied (no
   * dense matrix).
   */
  private static SymmetryCheckReport checkClaimed(
      Model model,
      Lattice lattice,
      ZMatrixRMaj hamiltonian,
      SymmetryClass claimed,
      double tolerance,
      boolean withMatrix) {
    Map<Symmetry, SymmetryOperator> declared = new EnumMap<>(Symmetry.class);
    for (SymmetryOperator op : model.symmetryOperators().on(lattice)) {
      if (declared.put(op.symmetry(), op) != null) {
        throw new IllegalStateException(
            model.name() + " declares two operators for " + op.symmetry());
      }
    }
    List<SymmetryCheckResult> checks = new ArrayList<>();
    List<Symmetry> undeclared = new ArrayList<>();
    SymmetryCheckWorkspace workspace = new SymmetryCheckWorkspace();
    for (Symmetry s : Symmetry.values()) {
      if (!isClaimed(claimed, s)) {
        continue;
      }
      SymmetryOperator op = declared.get(s);
      if (op == null) {
        undeclared.add(s);
      } else if (withMatrix) {
        checks.add(SymmetryCheckKernel.check(hamiltonian, lattice, op, tolerance, workspace));
      }
    }
    return new SymmetryCheckReport(claimed, checks, undeclared);
  }

  private static boolean isClaimed(SymmetryClass k, Symmetry s) {
    return switch (s) {
      case TIME_REVERSAL -> k.hasTimeReversal();
      case PARTICLE_HOLE -> k.hasParticleHole();
      case CHIRAL -> k.hasChiral();
    };
  }
}
