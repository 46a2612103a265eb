package hopstat.statistics;

import java.util.Collections;
import java.util.List;
import java.util.SortedMap;
import java.util.TreeMap;

/**
 * Distribution of an integer-valued invariant over realisations, after rounding each sample to the
 * nearest integer.
 *
 * @param n number of samples
 * @param counts rounded value → count, ascending
 * @param modalValue the most frequent rounded value (smallest on ties)
 * @param modalFraction count of the modal value / n
 * @param modalWilsonLow lower end of the 95 % Wilson score interval of modalFraction
 * @param modalWilsonHigh upper end of the 95 % Wilson score interval of modalFraction
 * @param maxDistanceToInteger largest |x − round(x)| over samples
 * @param nonQuantised samples with |x − round(x)| &gt; tolerance
 * @param tolerance the quantisation tolerance used
 * @param probabilities P(rounded value = k) with 95 % Wilson intervals, ascending in k (one entry
 *     per value in counts)
 */
public record IntegerDistribution(
    int n,
    SortedMap<Long, Integer> counts,
    long modalValue,
    double modalFraction,
    double modalWilsonLow,
    double modalWilsonHigh,
    double maxDistanceToInteger,
    int nonQuantised,
    double tolerance,
    List<ValueProbability> probabilities) {

  public IntegerDistribution {
    counts = Collections.unmodifiableSortedMap(new TreeMap<>(counts));
    probabilities = List.copyOf(probabilities);
  }
}
