package hopstat.task;

import hopstat.disorder.DisorderCatalog;
import hopstat.disorder.DisorderKind;
import hopstat.disorder.DisorderTerm;
import hopstat.lattice.Lattice;
import hopstat.model.Model;
import hopstat.model.SymmetryCheckKernel;
import hopstat.model.SymmetryCheckResult;
import hopstat.model.SymmetryClass;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.random.RandomGenerator;

/**
 * The worker boundary: turns a {@link RealisationTask} into a {@link RealisationResult}.
 *
 * <p>Order of work, fixed so that a realisation is reproducible: build the clean Hamiltonian; seed
 * one generator from the task's seed ({@link SeedOps}); apply the disorder terms in spec order,
 * each drawing in its documented order; compute the observables in spec order. Any exception, a
 * non-converged solver or a non-finite value becomes a FAILED result with the reason; the caller's
 * run goes on.
 */
public final class RealisationRunner {

  /** Largest matrix dimension at which every realisation's symmetries are checked densely. */
  public static final int MAX_SYMMETRY_CHECK_DIMENSION = 6000;

  private RealisationRunner() {}

  /**
   * Runs one realisation.
   *
   * @param task read
   * @param workspace the calling thread's scratch
   * @return DONE with all quantities, or FAILED with the reason
   */
  public static RealisationResult run(RealisationTask task, RealisationWorkspace workspace) {
    long start = System.nanoTime();
    Map<String, Double> values = new LinkedHashMap<>();
    try {
      compute(task, workspace, values);
      for (Map.Entry<String, Double> e : values.entrySet()) {
        if (!Double.isFinite(e.getValue())) {
          return failed(task, "non-finite value " + e.getValue() + " for " + e.getKey(), start);
        }
      }
      return new RealisationResult(
          task.taskId(),
          task.pointIndex(),
          task.realisationIndex(),
          task.seed(),
          Outcome.DONE,
          values,
          null,
          secondsSince(start));
    } catch (ConvergenceFailure e) {
      return failed(task, "not converged: " + e.getMessage(), start);
    } catch (Exception e) { // worker boundary: one bad realisation must not stop the run
      return failed(task, e.getClass().getSimpleName() + ": " + e.getMessage(), start);
    }
  }

  private static void compute(
      RealisationTask task, RealisationWorkspace workspace, Map<String, Double> values) {
    PointSpec point = task.point();
    Model model = point.resolveModel();
    Lattice lattice = model.lattice(point.linearSize(), point.boundary());
    workspace.builder.reset(lattice.orbitals());
    model.addClean(point.parameters(), lattice, workspace.builder);

    RandomGenerator random = SeedOps.generator(task.seed());
    for (DisorderTerm term : point.disorder()) {
      DisorderKind kind =
          DisorderCatalog.find(term.type())
              .orElseThrow(() -> new IllegalStateException("unknown disorder " + term.type()));
      kind.apply(term, model, point.parameters(), lattice, random, workspace.builder);
    }

    List<Observable> observables = new ArrayList<>();
    boolean vectors = false;
    for (String name : point.observables()) {
      Observable o =
          ObservableCatalog.find(name)
              .orElseThrow(() -> new IllegalStateException("unknown observable " + name));
      observables.add(o);
      vectors |= o.needsOccupiedStates();
    }
    RealisationContext context =
        new RealisationContext(workspace, model, lattice, point, vectors, random);
    checkSymmetries(model, lattice, point, context);
    for (Observable o : observables) {
      o.compute(context, values);
    }
  }

  /**
   * Checks the symmetries the point's class claims on the built matrix (O(N²) against the O(N³) of
   * the observables); a violation fails the realisation. Skipped above {@link
   * #MAX_SYMMETRY_CHECK_DIMENSION}, where no dense matrix may be built.
   */
  private static void checkSymmetries(
      Model model, Lattice lattice, PointSpec point, RealisationContext context) {
    if (lattice.orbitals() > MAX_SYMMETRY_CHECK_DIMENSION
        || model.symmetryOperators().on(lattice).isEmpty()) {
      return;
    }
    SymmetryClass claimed = SymmetryCheckOps.effectiveClass(model, point.disorder());
    SymmetryCheckReport report =
        SymmetryCheckOps.checkClaimed(
            model, lattice, context.denseHamiltonian(), claimed, SymmetryCheckKernel.TOLERANCE);
    if (!report.violations().isEmpty()) {
      SymmetryCheckResult v = report.violations().get(0);
      throw new IllegalStateException(
          "symmetry "
              + v.symmetry()
              + " of class "
              + claimed
              + " violated: relative violation "
              + v.relativeViolation());
    }
  }

  private static RealisationResult failed(RealisationTask task, String reason, long start) {
    return new RealisationResult(
        task.taskId(),
        task.pointIndex(),
        task.realisationIndex(),
        task.seed(),
        Outcome.FAILED,
        Map.of(),
        reason,
        secondsSince(start));
  }

  private static double secondsSince(long startNanos) {
    return (System.nanoTime() - startNanos) * 1e-9;
  }
}
