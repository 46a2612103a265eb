package hopstat.spec;

import java.util.List;
import java.util.Objects;

/**
 * Adaptive sampling: realisations are run in batches per grid point; after each complete batch a
 * point stops once every target is met or {@code maximum} realisations are done.
 *
 * @param minimum realisations always run per point (a multiple of {@code batch})
 * @param maximum realisations never exceeded per point
 * @param batch realisations per batch
 * @param targets the stopping targets; all must hold
 */
public record SamplingSpec(int minimum, int maximum, int batch, List<Target> targets) {

  public SamplingSpec {
    targets = List.copyOf(targets);
    if (batch < 1 || minimum < batch || maximum < minimum) {
      throw new IllegalArgumentException("need 1 <= batch <= minimum <= maximum");
    }
  }

  /** What a stopping target measures. */
  public enum TargetKind {
    /** Standard error of the mean of a quantity ≤ threshold. */
    STDERR,
    /** Half-width of the 95 % Wilson interval of the fraction at the modal integer ≤ threshold. */
    MODAL_FRACTION_HALF_WIDTH
  }

  /**
   * One target.
   *
   * @param kind what is measured
   * @param quantity the quantity (journal column) it applies to
   * @param threshold the largest acceptable value
   */
  public record Target(TargetKind kind, String quantity, double threshold) {
    public Target {
      Objects.requireNonNull(kind, "kind");
      Objects.requireNonNull(quantity, "quantity");
      if (!(threshold > 0) || Double.isInfinite(threshold)) {
        throw new IllegalArgumentException("threshold must be positive and finite");
      }
    }
  }
}
