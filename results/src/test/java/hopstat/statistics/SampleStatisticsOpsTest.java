package hopstat.statistics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;

class SampleStatisticsOpsTest {

  @Test
  void type7QuantilesInterpolateBetweenOrderStatistics() {
    // Hyndman and Fan, Am. Stat. 50, 361 (1996), definition 7: h = (n-1)p. For x = 1..4:
    // Q(0.25) = 1 + 0.75 = 1.75, Q(0.75) = 3.25, Q(0.05) = 1.15, Q(0.95) = 3.85 (derived).
    Quantiles q = SampleStatisticsOps.quantiles(new double[] {4, 1, 3, 2});
    assertThat(q.q05()).isCloseTo(1.15, within(1e-12));
    assertThat(q.q25()).isCloseTo(1.75, within(1e-12));
    assertThat(q.q75()).isCloseTo(3.25, within(1e-12));
    assertThat(q.q95()).isCloseTo(3.85, within(1e-12));
    // Q(0.5) is the median (derived), for odd and even n.
    double[] sorted = {1, 2, 3, 4, 10};
    assertThat(SampleStatisticsOps.quantileOfSorted(sorted, 0.5))
        .isEqualTo(SampleStatisticsOps.median(sorted));
    assertThat(SampleStatisticsOps.quantileOfSorted(new double[] {1, 2, 3, 4}, 0.5)).isEqualTo(2.5);
  }

  @Test
  void typicalValueIsTheGeometricMeanWithAnIntervalThatIsSymmetricOnTheLogScale() {
    // exp(mean(ln x)) of {1, 10, 100} is 10 (derived).
    TypicalValue t = SampleStatisticsOps.typical(new double[] {1, 10, 100});
    assertThat(t.geometricMean()).isCloseTo(10, within(1e-12));
    assertThat(Math.log(t.ciHigh()) - Math.log(10))
        .isCloseTo(Math.log(10) - Math.log(t.ciLow()), within(1e-12));
    assertThat(t.ciLow()).isLessThan(10);
    assertThat(SampleStatisticsOps.typical(new double[] {1, 0})).isNull();
    assertThat(SampleStatisticsOps.typical(new double[] {1, -2})).isNull();
  }

  @Test
  void everyIntegerValueCarriesItsWilsonInterval() {
    IntegerDistribution d =
        SampleStatisticsOps.integerDistribution(new double[] {0, 1, 1, 1, 0.98, 2});
    assertThat(d.probabilities()).extracting(ValueProbability::value).containsExactly(0L, 1L, 2L);
    assertThat(d.probabilities()).extracting(ValueProbability::count).containsExactly(1, 4, 1);
    ValueProbability one = d.probabilities().get(1);
    assertThat(one.fraction()).isCloseTo(4 / 6.0, within(1e-15));
    // Same interval as the modal fraction's (the modal value is 1).
    assertThat(one.wilsonLow()).isEqualTo(d.modalWilsonLow());
    assertThat(one.wilsonHigh()).isEqualTo(d.modalWilsonHigh());
    // Fractions are a normalised distribution (source-free check).
    assertThat(d.probabilities().stream().mapToDouble(ValueProbability::fraction).sum())
        .isCloseTo(1, within(1e-15));
  }
}
