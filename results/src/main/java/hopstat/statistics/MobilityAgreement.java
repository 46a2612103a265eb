package hopstat.statistics;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Whether the mobility-gap half-widths of different estimators at the same other-axis values agree,
 * judged by overlap of their 95 % intervals (every pair must overlap). Overlap is a lenient test:
 * two intervals of independent estimates can overlap while the estimates differ significantly. Per
 * estimator and quantity one estimate enters: the one from the largest size (the first in {@link
 * MobilitySummary#gaps()} order on a tie, e.g. level-ratio estimates repeated at each value of a
 * grid axis they do not depend on, such as the transfer-matrix {@code energy}).
 *
 * @param fixed grid values shared by the compared estimates (without L and the energy axes)
 * @param estimates labels {@code METHOD/quantity} of the compared estimates, in {@link
 *     MobilitySummary#gaps()} order
 * @param verdict {@code agree} (all pairs overlap), {@code disagree} (some pair does not), or
 *     {@code undetermined} (some interval undefined)
 */
public record MobilityAgreement(Map<String, Double> fixed, List<String> estimates, String verdict) {
  public MobilityAgreement {
    fixed = Collections.unmodifiableMap(new LinkedHashMap<>(fixed));
    estimates = List.copyOf(estimates);
  }
}
