package hopstat.record;

import hopstat.model.SymmetryClass;
import hopstat.task.Outcome;
import hopstat.task.Quantity;
import hopstat.task.RealisationResult;
import hopstat.task.SeedOps;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.function.BiFunction;
import java.util.random.RandomGenerator;

/**
 * Test-data builder for synthetic studies: a product grid, quantities, and per-realisation values
 * drawn by a caller-supplied rule from a fixed-seed generator.
 *
 * <pre>
 *   SyntheticStudy s = aStudy("hash").axis("W", 0, 1, 2).integer("chern").realisations(50)
 *       .values((coords, random) -&gt; Map.of("chern", ...)).seed(7).build();
 * </pre>
 */
public final class SyntheticStudy {

  private final StudyLayout layout;
  private final List<RealisationRecord> records;

  private SyntheticStudy(StudyLayout layout, List<RealisationRecord> records) {
    this.layout = layout;
    this.records = List.copyOf(records);
  }

  public StudyLayout layout() {
    return layout;
  }

  public List<RealisationRecord> records() {
    return records;
  }

  public static Builder aStudy(String specHash) {
    return new Builder(specHash);
  }

  /** Builder; the first axis varies slowest. */
  public static final class Builder {
    private final String specHash;
    private final Map<String, double[]> axes = new LinkedHashMap<>();
    private final List<Quantity> quantities = new ArrayList<>();
    private int realisations = 10;
    private long seed = 1;
    private BiFunction<Map<String, Double>, RandomGenerator, Map<String, Double>> values;
    private BiFunction<Integer, Integer, String> failure = (p, r) -> null;
    private String linalg = "java";
    private SymmetryClass effectiveClass;

    private Builder(String specHash) {
      this.specHash = specHash;
    }

    public Builder axis(String name, double... values) {
      axes.put(name, values.clone());
      return this;
    }

    public Builder integer(String name) {
      quantities.add(new Quantity(name, true, "1", "synthetic integer invariant"));
      return this;
    }

    public Builder real(String name, String unit) {
      quantities.add(new Quantity(name, false, unit, "synthetic real quantity"));
      return this;
    }

    public Builder realisations(int n) {
      this.realisations = n;
      return this;
    }

    public Builder seed(long seed) {
      this.seed = seed;
      return this;
    }

    /** The effective symmetry class written into the layout (default: unknown). */
    public Builder effectiveClass(SymmetryClass c) {
      this.effectiveClass = c;
      return this;
    }

    public Builder linalg(String linalg) {
      this.linalg = linalg;
      return this;
    }

    /** Values of one realisation from its grid coordinates and its own generator. */
    public Builder values(
        BiFunction<Map<String, Double>, RandomGenerator, Map<String, Double>> rule) {
      this.values = rule;
      return this;
    }

    /** Failure reason of (point, realisation), or null for DONE. */
    public Builder failing(BiFunction<Integer, Integer, String> rule) {
      this.failure = rule;
      return this;
    }

    public SyntheticStudy build() {
      List<Map<String, Double>> coords = new ArrayList<>();
      coords.add(new LinkedHashMap<>());
      for (Map.Entry<String, double[]> axis : axes.entrySet()) {
        List<Map<String, Double>> next = new ArrayList<>();
        for (Map<String, Double> c : coords) {
          for (double v : axis.getValue()) {
            Map<String, Double> m = new LinkedHashMap<>(c);
            m.put(axis.getKey(), v);
            next.add(m);
          }
        }
        coords = next;
      }
      List<StudyLayout.Point> points = new ArrayList<>();
      List<RealisationRecord> records = new ArrayList<>();
      for (int p = 0; p < coords.size(); p++) {
        points.add(new StudyLayout.Point(p, coords.get(p)));
        for (int r = 0; r < realisations; r++) {
          long s = SeedOps.realisationSeed(seed, p, r);
          String reason = failure.apply(p, r);
          RealisationResult result =
              reason == null
                  ? new RealisationResult(
                      "p" + p + "r" + r,
                      p,
                      r,
                      s,
                      Outcome.DONE,
                      values.apply(coords.get(p), SeedOps.generator(s)),
                      null,
                      0.01)
                  : new RealisationResult(
                      "p" + p + "r" + r, p, r, s, Outcome.FAILED, Map.of(), reason, 0.01);
          records.add(
              new RealisationRecord(
                  result, coords.get(p), coords.get(p), "0.0-test (abc1234)", linalg));
        }
      }
      StudyLayout layout =
          new StudyLayout(
              "synthetic",
              specHash,
              new ArrayList<>(axes.keySet()),
              points,
              quantities,
              realisations,
              effectiveClass);
      return new SyntheticStudy(layout, records);
    }
  }
}
