package hopstat.statistics;

import java.nio.ByteBuffer;
import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.Arrays;
import java.util.SplittableRandom;

/**
 * Non-parametric bootstrap over realisations (Efron, Ann. Stat. 7, 1 (1979); percentile interval as
 * in Efron and Tibshirani, An Introduction to the Bootstrap, Chapman and Hall 1993, ch. 13).
 *
 * <p>Determinism: every bootstrap stream is seeded with the first 8 bytes (big-endian) of SHA-256
 * over the UTF-8 text {@code specHash + "\n" + key_1 + "\n" + key_2 ...}, where the keys name what
 * is being resampled ({@code "mean", "point=<index>", <quantity>} for the interval of a mean;
 * {@code "boundary", "point=<index>", <quantity>} for the replicas of a point used by every
 * boundary estimate through it), and drives a {@link SplittableRandom} (SplitMix64) generator. No
 * clock, thread or host enters, so equal journals give equal intervals bit for bit. Pure functions
 * otherwise.
 */
public final class BootstrapOps {

  /** Bootstrap replicas per estimate (common practice: ≥ 1000 for 95 % percentile intervals). */
  public static final int RESAMPLES = 2000;

  /** Method text written into outputs. */
  public static final String METHOD =
      "percentile bootstrap over realisations, " + RESAMPLES + " resamples";

  /** How the bootstrap seed is derived, written into outputs. */
  public static final String SEED_RULE =
      "first 8 bytes of SHA-256(specHash + '\\n' + keys joined by '\\n'), keys = (mean|boundary, point=<index>, quantity); "
          + "java.util.SplittableRandom (SplitMix64) stream";

  private BootstrapOps() {}

  /**
   * The bootstrap seed for an estimate identified by {@code keys} within the study {@code
   * specHash}.
   */
  public static long seed(String specHash, String... keys) {
    StringBuilder text = new StringBuilder(specHash);
    for (String k : keys) {
      text.append('\n').append(k);
    }
    try {
      byte[] digest =
          MessageDigest.getInstance("SHA-256")
              .digest(text.toString().getBytes(StandardCharsets.UTF_8));
      return ByteBuffer.wrap(digest, 0, Long.BYTES).getLong();
    } catch (NoSuchAlgorithmException e) {
      throw new IllegalStateException("SHA-256 is required of every JVM", e);
    }
  }

  /**
   * A generator for a bootstrap seed: {@link SplittableRandom}, whose output for a given seed is
   * fixed by its specification (SplitMix64; Steele, Lea, Flood, OOPSLA 2014). Typed concretely so
   * the inner resampling loop inlines (several times faster than an interface call on this JVM).
   */
  public static SplittableRandom generator(long seed) {
    return new SplittableRandom(seed);
  }

  /**
   * Fills {@code out} with a resample (with replacement) of {@code x}.
   *
   * @param x read, not modified
   * @param random advanced by x.length draws
   * @param out overwritten; same length as x
   */
  public static void resample(double[] x, SplittableRandom random, double[] out) {
    if (out.length != x.length || out == x) {
      throw new IllegalArgumentException("out must be a distinct array of the same length as x");
    }
    for (int i = 0; i < x.length; i++) {
      out[i] = x[index(random, x.length)];
    }
  }

  /**
   * A uniform index in [0, n) without division in the common case (Lemire, ACM Trans. Model.
   * Comput. Simul. 29(1), 3 (2019), "nearly divisionless" method; exact, unbiased). The {@code
   * %}-based rejection of {@link SplittableRandom#nextInt(int)} dominated the bootstrap's cost.
   *
   * @param n bound, positive
   */
  public static int index(SplittableRandom random, int n) {
    long m = (random.nextInt() & 0xFFFFFFFFL) * n;
    long low = m & 0xFFFFFFFFL;
    if (low < n) {
      long threshold = (0x100000000L - n) % n;
      while (low < threshold) {
        m = (random.nextInt() & 0xFFFFFFFFL) * n;
        low = m & 0xFFFFFFFFL;
      }
    }
    return (int) (m >>> 32);
  }

  /**
   * Percentile bootstrap interval of the mean of {@code x}.
   *
   * @param x samples in canonical order; read, not modified
   * @return undefined for fewer than 2 samples
   */
  public static Interval meanInterval(double[] x, long seed) {
    if (x.length < 2) {
      return Interval.undefined(METHOD);
    }
    SplittableRandom random = generator(seed);
    double[] replicas = new double[RESAMPLES];
    int n = x.length;
    for (int b = 0; b < RESAMPLES; b++) {
      double sum = 0;
      for (int i = 0; i < n; i++) {
        sum += x[index(random, n)];
      }
      replicas[b] = sum / n;
    }
    return percentileInterval(replicas, replicas.length);
  }

  /**
   * The central {@link SampleStatisticsOps#CONFIDENCE} percentile interval of the first {@code
   * count} replica values (type-7 quantiles at (1 ∓ level)/2).
   *
   * @param replicas read, not modified
   * @return undefined when count is 0
   */
  public static Interval percentileInterval(double[] replicas, int count) {
    if (count == 0) {
      return Interval.undefined(METHOD);
    }
    double[] sorted = Arrays.copyOf(replicas, count);
    Arrays.sort(sorted);
    double level = SampleStatisticsOps.CONFIDENCE;
    return new Interval(
        SampleStatisticsOps.quantileOfSorted(sorted, (1 - level) / 2),
        SampleStatisticsOps.quantileOfSorted(sorted, (1 + level) / 2),
        level,
        METHOD);
  }
}
