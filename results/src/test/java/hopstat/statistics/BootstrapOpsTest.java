package hopstat.statistics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

class BootstrapOpsTest {

  @Test
  void seedsDependOnlyOnTheirKeys() {
    long a = BootstrapOps.seed("abc", "mean", "point=1", "bott");
    assertThat(BootstrapOps.seed("abc", "mean", "point=1", "bott")).isEqualTo(a);
    assertThat(BootstrapOps.seed("abc", "mean", "point=2", "bott")).isNotEqualTo(a);
    assertThat(BootstrapOps.seed("abd", "mean", "point=1", "bott")).isNotEqualTo(a);
    // Keys are separated, so ("point=1", "bott") and ("point=1\nbott") would collide only by
    // design.
    assertThat(BootstrapOps.seed("abc", "mean", "point=1b", "ott")).isNotEqualTo(a);
  }

  @Test
  void indicesAreUniform() {
    // Chi-square goodness of fit over 7 cells, 70000 draws: the 99.9 % point of chi2(6) is 22.46
    // (standard tables); a biased index would exceed it.
    SplittableRandom random = new SplittableRandom(42);
    int[] counts = new int[7];
    for (int i = 0; i < 70000; i++) {
      counts[BootstrapOps.index(random, 7)]++;
    }
    double chi2 = 0;
    for (int c : counts) {
      chi2 += (c - 10000.0) * (c - 10000.0) / 10000.0;
    }
    assertThat(chi2).isLessThan(22.46);
    assertThat(BootstrapOps.index(random, 1)).isZero();
  }

  @Test
  void meanIntervalIsReproducibleAndBracketsTheMean() {
    double[] x = new double[60];
    SplittableRandom data = new SplittableRandom(3);
    for (int i = 0; i < x.length; i++) {
      x[i] = data.nextGaussian();
    }
    Interval a = BootstrapOps.meanInterval(x, 17);
    Interval b = BootstrapOps.meanInterval(x, 17);
    assertThat(a).isEqualTo(b);
    MeanEstimate m = SampleStatisticsOps.mean(x);
    assertThat(a.low()).isLessThan(m.mean());
    assertThat(a.high()).isGreaterThan(m.mean());
    // For near-normal data the percentile interval approaches mean ± 1.96 s/sqrt(n) (common
    // practice); allow 15 % on the width for bootstrap noise and n = 60.
    assertThat(a.high() - a.low())
        .isCloseTo(m.ciHigh() - m.ciLow(), within(0.15 * (m.ciHigh() - m.ciLow())));
    assertThat(BootstrapOps.meanInterval(new double[] {1}, 1).low()).isNaN();
  }
}
