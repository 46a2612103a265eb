package hopstat.statistics;

/**
 * The typical (geometric-mean) value of a strictly positive quantity such as a gap or a
 * localisation length: exp⟨ln x⟩, the usual estimator for quantities whose distribution is broad on
 * a linear scale (common practice, e.g. the typical localisation length in the transfer-matrix
 * literature). The interval is the Student-t interval of ⟨ln x⟩ mapped through exp, so it is
 * asymmetric about the value.
 *
 * @param n samples used (all strictly positive)
 * @param geometricMean exp of the mean of ln x
 * @param logStandardError standard error of the mean of ln x; NaN for n &lt; 2
 * @param ciLow exp(⟨ln x⟩ − t·se); NaN for n &lt; 2
 * @param ciHigh exp(⟨ln x⟩ + t·se); NaN for n &lt; 2
 */
public record TypicalValue(
    int n, double geometricMean, double logStandardError, double ciLow, double ciHigh) {

  /** Method text written into outputs. */
  public static final String METHOD =
      "geometric mean exp(mean(ln x)); Student t interval on ln x, mapped through exp";
}
