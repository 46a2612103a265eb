package hopstat.localisation;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.data.Offset.offset;

import java.util.SplittableRandom;
import org.ejml.data.ZMatrixRMaj;
import org.junit.jupiter.api.Test;

class IprKernelTest {

  @Test
  void localisedStateGivesOneAndPlaneWaveGivesOneOverN() {
    int n = 16;
    ZMatrixRMaj v = new ZMatrixRMaj(n, 2);
    v.set(5, 0, 0.0, -1.0);
    for (int i = 0; i < n; i++) {
      double k = 2 * Math.PI * 3 * i / n;
      v.set(i, 1, Math.cos(k), Math.sin(k)); // unnormalised on purpose
    }
    assertThat(IprKernel.ipr(v, 0)).isCloseTo(1.0, offset(1e-15));
    assertThat(IprKernel.ipr(v, 1)).isCloseTo(1.0 / n, offset(1e-15));
  }

  /**
   * Random real unit vectors (Porter–Thomas): ⟨P⟩ = 3/(N+2) (common practice; derived from ⟨x⁴⟩ =
   * 3⟨x²⟩² for Gaussian components on the sphere). Tolerance 4 standard errors of the sample mean,
   * measured from the same sample.
   */
  @Test
  void randomRealVectorsFollowPorterThomas() {
    int n = 40;
    assertMeanIpr(false, n, 3.0 / (n + 2), 11);
  }

  /** Random complex unit vectors: ⟨P⟩ = 2/(N+1) (common practice); tolerance as above. */
  @Test
  void randomComplexVectorsFollowPorterThomas() {
    int n = 40;
    assertMeanIpr(true, n, 2.0 / (n + 1), 12);
  }

  private static void assertMeanIpr(boolean complex, int n, double expected, long seed) {
    SplittableRandom rng = new SplittableRandom(seed);
    int samples = 4000;
    ZMatrixRMaj v = new ZMatrixRMaj(n, 1);
    double sum = 0;
    double sumSquares = 0;
    for (int s = 0; s < samples; s++) {
      for (int i = 0; i < n; i++) {
        v.set(i, 0, gaussian(rng), complex ? gaussian(rng) : 0.0);
      }
      double p = IprKernel.ipr(v, 0);
      sum += p;
      sumSquares += p * p;
    }
    double mean = sum / samples;
    double standardError = Math.sqrt((sumSquares / samples - mean * mean) / samples);
    assertThat(mean).isCloseTo(expected, offset(4 * standardError));
    // the two ensembles differ by far more than the tolerance at this N
    assertThat(Math.abs(3.0 / (n + 2) - 2.0 / (n + 1))).isGreaterThan(8 * standardError);
  }

  private static double gaussian(SplittableRandom rng) {
    double u = 1.0 - rng.nextDouble();
    return Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * rng.nextDouble());
  }
}
