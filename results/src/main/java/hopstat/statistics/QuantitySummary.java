package hopstat.statistics;

/**
 * Statistics of one quantity at one grid point over its DONE realisations.
 *
 * @param name quantity name
 * @param mean mean, standard error and 95 % interval
 * @param median sample median (mean of the middle two for even n)
 * @param min smallest sample
 * @param max largest sample
 * @param integer distribution of rounded values for integer-valued quantities, else null
 */
public record QuantitySummary(String name, MeanEstimate mean, double median, double min, double max, IntegerDistribution integer) {}
