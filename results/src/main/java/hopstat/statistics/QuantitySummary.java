package hopstat.statistics;

/**
 * Statistics of one quantity at one grid point over its DONE realisations.
 *
 * @param name quantity name
 * @param mean mean, standard error and 95 % Student-t interval
 * @param median sample median (mean of the middle two for even n)
 * @param min smallest sample
 * @param max largest sample
 * @param integer distribution of rounded values for integer-valued quantities, else null
 * @param quantiles sample quantiles at {@link Quantiles#LEVELS}
 * @param meanBootstrap percentile-bootstrap 95 % interval of the mean ({@link BootstrapOps})
 * @param typical geometric mean with its log-scale interval when every sample is strictly positive
 *     and the quantity is not integer-valued, else null
 */
public record QuantitySummary(
    String name,
    MeanEstimate mean,
    double median,
    double min,
    double max,
    IntegerDistribution integer,
    Quantiles quantiles,
    Interval meanBootstrap,
    TypicalValue typical) {}
