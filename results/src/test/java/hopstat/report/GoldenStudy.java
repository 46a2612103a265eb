package hopstat.report;

import static hopstat.record.SyntheticStudy.aStudy;

import hopstat.record.SyntheticStudy;
import hopstat.statistics.Summary;
import hopstat.statistics.SummaryOps;
import java.util.Map;

/** The small synthetic study whose summaries are pinned by golden files. */
final class GoldenStudy {

  private GoldenStudy() {}

  /**
   * Two sizes × four W values, five realisations each; an integer invariant that switches from 1 to
   * 0 around W = 1.5 (with one non-quantised sample), a positive gap in units of t, and one failed
   * realisation at point 2.
   */
  static SyntheticStudy study() {
    return aStudy("0123456789abcdef")
        .axis("L", 4, 6)
        .axis("W", 0, 1, 2, 3)
        .integer("chern")
        .real("gap", "t")
        .realisations(5)
        .seed(11)
        .failing((p, r) -> p == 2 && r == 4 ? "ConvergenceFailure: synthetic" : null)
        .values(
            (c, random) -> {
              double p = 1 / (1 + Math.exp(3 * (c.get("W") - 1.5)));
              double chern = random.nextDouble() < p ? 1.0 : 0.0;
              if (c.get("W") == 2.0 && c.get("L") == 6.0 && chern == 0.0) {
                chern = 0.12;
              }
              double gap = Math.exp(-c.get("W")) * (0.5 + random.nextDouble());
              return Map.of("chern", chern, "gap", gap);
            })
        .build();
  }

  static Summary summary() {
    SyntheticStudy s = study();
    return SummaryOps.summarise(s.layout(), s.records());
  }
}
