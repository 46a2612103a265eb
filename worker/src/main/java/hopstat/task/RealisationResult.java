package hopstat.task;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Objects;

/**
 * The outcome of one realisation.
 *
 * @param taskId as in {@link RealisationTask}
 * @param pointIndex 0-based grid point
 * @param realisationIndex 0-based realisation
 * @param seed the realisation's seed
 * @param outcome DONE or FAILED
 * @param values quantity name → value in the model's units (energies in units of the model's energy
 *     scale, invariants dimensionless and unrounded); empty when FAILED. Order is the observables'
 *     order.
 * @param failure reason when FAILED (exception type and message), else {@code null}
 * @param wallSeconds wall-clock seconds spent on this realisation by the worker
 */
public record RealisationResult(
    String taskId,
    int pointIndex,
    int realisationIndex,
    long seed,
    Outcome outcome,
    Map<String, Double> values,
    String failure,
    double wallSeconds) {

  public RealisationResult {
    Objects.requireNonNull(taskId, "taskId");
    Objects.requireNonNull(outcome, "outcome");
    values = Collections.unmodifiableMap(new LinkedHashMap<>(values));
    if (outcome == Outcome.FAILED && failure == null) {
      throw new IllegalArgumentException("a FAILED result needs a reason");
    }
  }
}
