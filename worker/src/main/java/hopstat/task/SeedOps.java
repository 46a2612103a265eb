package hopstat.task;

import java.util.random.RandomGenerator;
import java.util.random.RandomGeneratorFactory;

/**
 * The documented derivation of every random number in a run.
 *
 * <p>A realisation's stream is seeded with
 *
 * <pre>
 *   s0   = mix64(specSeed + GOLDEN)
 *   s1   = mix64(s0 ^ mix64(pointIndex + 1) )
 *   seed = mix64(s1 ^ mix64((realisationIndex + 1) * GOLDEN))
 * </pre>
 *
 * where {@code mix64} is the SplitMix64 finaliser (Steele, Lea, Flood, OOPSLA 2014) and {@code
 * GOLDEN = 0x9E3779B97F4A7C15}. The seed feeds a JDK {@code L64X128MixRandom}, whose output for a
 * given seed is fixed by its specification (JEP 356). The stream therefore depends only on (spec
 * seed, grid-point index, realisation index): never on thread, host, order or resume.
 */
public final class SeedOps {

  /** The JDK algorithm every realisation stream uses. */
  public static final String ALGORITHM = "L64X128MixRandom";

  private static final long GOLDEN = 0x9E3779B97F4A7C15L;
  private static final RandomGeneratorFactory<RandomGenerator> FACTORY =
      RandomGeneratorFactory.of(ALGORITHM);

  private SeedOps() {}

  /** SplitMix64 finaliser: a bijection on 64-bit values with good avalanche. */
  public static long mix64(long z) {
    z = (z ^ (z >>> 30)) * 0xBF58476D1CE4E5B9L;
    z = (z ^ (z >>> 27)) * 0x94D049BB133111EBL;
    return z ^ (z >>> 31);
  }

  /** The seed of realisation {@code realisationIndex} at grid point {@code pointIndex}. */
  public static long realisationSeed(long specSeed, int pointIndex, int realisationIndex) {
    if (pointIndex < 0 || realisationIndex < 0) {
      throw new IllegalArgumentException("indices are 0-based and non-negative");
    }
    long s0 = mix64(specSeed + GOLDEN);
    long s1 = mix64(s0 ^ mix64(pointIndex + 1L));
    return mix64(s1 ^ mix64((realisationIndex + 1L) * GOLDEN));
  }

  /** A fresh generator for one realisation's seed. */
  public static RandomGenerator generator(long realisationSeed) {
    return FACTORY.create(realisationSeed);
  }
}
