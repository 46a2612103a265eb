package hopstat.statistics;

/**
 * P(rounded invariant = value) at one grid point.
 *
 * @param value the integer value
 * @param count samples that round to it
 * @param fraction count / n
 * @param wilsonLow lower end of the 95 % Wilson score interval of the fraction
 * @param wilsonHigh upper end of the 95 % Wilson score interval of the fraction
 */
public record ValueProbability(
    long value, int count, double fraction, double wilsonLow, double wilsonHigh) {}
