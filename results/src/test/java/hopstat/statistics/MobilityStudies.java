package hopstat.statistics;

import static hopstat.record.SyntheticStudy.aStudy;

import hopstat.model.SymmetryClass;
import hopstat.record.SyntheticStudy;
import java.util.HashMap;
import java.util.Map;

/**
 * Synthetic studies with known mobility edges, shared by the mobility tests. Every model is built
 * so that the linear interpolation the estimators use recovers the true edge exactly from the exact
 * (noise-free) curves; any miss is then sampling error, which the intervals are meant to cover.
 */
final class MobilityStudies {

  /** Transfer-matrix edge: Λ_M(E) = Λ_c + a(|E| − E_c)·M^{1/ν}. */
  static final double TM_EDGE = 1.1;

  static final double LAMBDA_C = 0.58;
  static final double TM_SLOPE = 0.1;
  static final double NU = 1.5;
  static final double TM_NOISE = 0.03;

  /** Energies −2..2 in steps of 0.25. */
  static final double[] ENERGIES = range(-2, 0.25, 17);

  /** Level-ratio edge: midway between window centres 0.875 and 1.125. */
  static final double LEVEL_EDGE = 1.0;

  static final int WINDOWS = 16;
  static final double LEVEL_NOISE = 0.02;

  /** Window k has centre −1.875 + 0.25 k. */
  static final double[] CENTRES = range(-1.875, 0.25, WINDOWS);

  /** Invariant plateau: quantised fraction 1 for |E| ≤ 0.8, 0.9 at 1.0, 0.3 at 1.2, 0 beyond. */
  static final double PLATEAU_EDGE = 0.9;

  static final int FERMI_ENERGIES = 21;
  static final double[] FERMI = range(-2, 0.2, FERMI_ENERGIES);

  private MobilityStudies() {}

  static double[] range(double start, double step, int count) {
    double[] x = new double[count];
    for (int i = 0; i < count; i++) {
      x[i] = Math.round((start + i * step) * 1e9) / 1e9;
    }
    return x;
  }

  /**
   * Λ with one-parameter scaling around the edges ±E_c (a linearised scaling form as in MacKinnon
   * and Kramer, Z. Phys. B 53, 1 (1983); the shape is our choice): localised (Λ falls with M) for
   * |E| &lt; E_c, extended outside. Λ_M(±E_c) = Λ_c for every M and Λ_8 − Λ_4 is linear in |E|, so
   * interpolated crossings are exact (derived).
   */
  static double lambda(double energy, double m, double edge) {
    return LAMBDA_C + TM_SLOPE * (Math.abs(energy) - edge) * Math.pow(m, 1 / NU);
  }

  /**
   * ⟨r⟩ in window centre E at size L: midpoint + half-span·tanh((|E| − E_c)·L/4), Poisson-like for
   * |E| &lt; E_c and GOE-like outside (shape our choice). Odd about E_c, and E_c lies midway
   * between two centres, so linear interpolation crosses the midpoint (and two sizes' curves cross
   * each other) exactly at E_c (derived).
   */
  static double ratio(double centre, double size, double edge) {
    double mid = 0.5 * (MobilityOps.POISSON_RATIO + MobilityOps.GOE_RATIO);
    double half = 0.5 * (MobilityOps.GOE_RATIO - MobilityOps.POISSON_RATIO);
    return mid + half * Math.tanh((Math.abs(centre) - edge) * size / 4);
  }

  /** Probability of a quantised sample at Fermi energy E (piecewise linear in |E|). */
  static double quantisedProbability(double energy) {
    double e = Math.abs(energy);
    if (e <= 0.8 + 1e-9) {
      return 1;
    }
    if (e <= 1.0 + 1e-9) {
      return 1 - 0.5 * (e - 0.8);
    }
    if (e <= 1.2 + 1e-9) {
      return 0.9 - 3 * (e - 1.0);
    }
    return 0;
  }

  /** Transfer matrix on a (L, energy) grid. */
  static SyntheticStudy transferMatrix(long seed, int realisations, double edge) {
    return aStudy("tm-" + seed)
        .axis("L", 4, 8)
        .axis("energy", ENERGIES)
        .real("lambda", "1")
        .realisations(realisations)
        .seed(seed)
        .values(
            (c, random) ->
                Map.of(
                    "lambda",
                    lambda(c.get("energy"), c.get("L"), edge) + TM_NOISE * random.nextGaussian()))
        .build();
  }

  /**
   * Level ratios in {@link #WINDOWS} windows at the given sizes; the outermost windows are missing
   * in 70 % of the realisations (band tails with too few levels) and must be dropped.
   */
  static SyntheticStudy levelRatio(long seed, int realisations, double edge, double... sizes) {
    SyntheticStudy.Builder b =
        aStudy("lr-" + seed)
            .axis("L", sizes)
            .real("level-ratio", "1")
            .realisations(realisations)
            .seed(seed)
            .effectiveClass(SymmetryClass.AI);
    for (int k = 0; k < WINDOWS; k++) {
      b.real("level-ratio.w" + k, "1");
    }
    for (int k = 0; k < WINDOWS; k++) {
      b.real("level-ratio.e" + k, "energy");
    }
    return b.values((c, random) -> levelValues(c.get("L"), edge, random)).build();
  }

  static Map<String, Double> levelValues(
      double size, double edge, java.util.random.RandomGenerator random) {
    Map<String, Double> v = new HashMap<>();
    double sum = 0;
    int count = 0;
    for (int k = 0; k < WINDOWS; k++) {
      v.put("level-ratio.e" + k, CENTRES[k]);
      boolean tail = k == 0 || k == WINDOWS - 1;
      double r = ratio(CENTRES[k], size, edge) + LEVEL_NOISE * random.nextGaussian();
      if (!tail || random.nextDouble() < 0.3) {
        v.put("level-ratio.w" + k, tail ? 0.9 : r);
        sum += r;
        count++;
      }
    }
    v.put("level-ratio", sum / count);
    return v;
  }

  /**
   * bott@E0..E20 at Fermi energies −2..2, one size; plateau value 1, non-quantised values
   * otherwise.
   */
  static SyntheticStudy plateau(long seed, int realisations) {
    SyntheticStudy.Builder b =
        aStudy("pl-" + seed).axis("L", 12).realisations(realisations).seed(seed);
    for (int k = 0; k < FERMI_ENERGIES; k++) {
      b.integer("bott@E" + k);
    }
    for (int k = 0; k < FERMI_ENERGIES; k++) {
      b.real("bott@E" + k + ".energy", "energy");
    }
    return b.values(
            (c, random) -> {
              Map<String, Double> v = new HashMap<>();
              for (int k = 0; k < FERMI_ENERGIES; k++) {
                double u = random.nextDouble();
                v.put(
                    "bott@E" + k, u < quantisedProbability(FERMI[k]) ? 1.0 : u < 0.5 ? 0.0 : 0.55);
                v.put("bott@E" + k + ".energy", FERMI[k]);
              }
              return v;
            })
        .build();
  }
}
