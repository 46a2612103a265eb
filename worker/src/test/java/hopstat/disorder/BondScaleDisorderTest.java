package hopstat.disorder;

import static hopstat.invariant.TestRealisation.aRealisation;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import hopstat.invariant.TestRealisation;
import hopstat.lattice.Boundary;
import hopstat.lattice.HamiltonianBuilder;
import hopstat.lattice.Lattice;
import hopstat.linalg.Linalg;
import hopstat.linalg.LinalgFactory;
import hopstat.linalg.LinalgKind;
import hopstat.model.CustomModel;
import hopstat.model.CustomModelDefinition;
import hopstat.model.CustomModelDefinition.Amplitude;
import hopstat.model.CustomModelDefinition.Orbital;
import hopstat.model.CustomModelDefinition.Term;
import hopstat.model.ParameterValues;
import hopstat.model.Symmetry;
import hopstat.model.SymmetryCheckKernel;
import hopstat.model.SymmetryCheckResult;
import hopstat.model.SymmetryCheckWorkspace;
import hopstat.model.SymmetryClass;
import hopstat.model.SymmetryOperator;
import hopstat.task.Outcome;
import hopstat.task.PointSpec;
import hopstat.task.RealisationResult;
import hopstat.task.RealisationRunner;
import hopstat.task.RealisationTask;
import hopstat.task.RealisationWorkspace;
import hopstat.task.SeedOps;
import hopstat.task.SymmetryCheckOps;
import hopstat.task.SymmetryCheckReport;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.random.RandomGenerator;
import org.ejml.data.ZMatrixRMaj;
import org.junit.jupiter.api.Test;

/**
 * Multiplicative bond disorder ({@code bond-scale}): draw order, distribution, symmetries,
 * reproducibility, a full run.
 */
class BondScaleDisorderTest {

  private static final Linalg LINALG = LinalgFactory.create(LinalgKind.NATIVE);

  private static ZMatrixRMaj dense(HamiltonianBuilder b) {
    ZMatrixRMaj h = new ZMatrixRMaj(1, 1);
    b.toDense(h);
    return h;
  }

  private static double[] eigenvalues(ZMatrixRMaj h) {
    double[] values = new double[h.numRows];
    assertThat(LINALG.newHermitianEigenSolver().eigenvalues(h, values)).isTrue();
    return values;
  }

  /**
   * A bipartite square lattice as a custom model: orbitals a at (0, 0) and b at (1/2, 0) of each
   * cell, every term a–b, one of them complex (i·t), so T is broken and only S = diag(1, −1) is a
   * symmetry: class AIII, with S declared.
   */
  private static CustomModelDefinition bipartiteAiii() {
    SymmetryOperator s =
        SymmetryOperator.local(
            Symmetry.CHIRAL, new double[][] {{1, 0}, {0, -1}}, new double[][] {{0, 0}, {0, 0}});
    return new CustomModelDefinition(
        2,
        List.of(List.of(1.0, 0.0), List.of(0.0, 1.0)),
        List.of(new Orbital("a", List.of(0.0, 0.0)), new Orbital("b", List.of(0.5, 0.0))),
        List.of(),
        List.of(
            new Term(List.of(0, 0), 0, 1, new Amplitude("t", 1.0, 0.0)),
            new Term(List.of(1, 0), 1, 0, new Amplitude("t", 1.0, 0.0)),
            new Term(List.of(0, 1), 0, 1, new Amplitude("t", 0.0, 1.0)),
            new Term(List.of(0, 1), 1, 0, new Amplitude("t", 0.6, 0.0))),
        List.of(),
        SymmetryClass.AIII,
        List.of(s));
  }

  /**
   * Exact draw order: one factor 1 + W(u − 1/2) per bond (pair of distinct sites), drawn when the
   * bond first appears in the clean term list; every term of the bond is multiplied by it. Then
   * (common practice) the factors' mean − 1 and variance match the uniform law: over n bonds the
   * mean of u = f − 1 has standard error W/sqrt(12 n) and the sample variance of u has standard
   * error ≈ W² / sqrt(180 n) (Var(u²) = W⁴/80 − W⁴/144 = W⁴/180, derived); 4 standard errors
   * allowed.
   */
  @Test
  void oneFactorPerBondInOrderOfFirstAppearanceWithTheUniformLaw() {
    double w = 0.8;
    long seed = 21;
    TestRealisation clean = aRealisation("anderson-2d").size(40);
    HamiltonianBuilder reference = clean.build();
    HamiltonianBuilder scaled =
        aRealisation("anderson-2d").size(40).disorder(BondScaleDisorder.NAME, w).seed(seed).build();
    assertThat(scaled.termCount()).isEqualTo(reference.termCount());
    RandomGenerator random = SeedOps.generator(seed);
    Map<Long, Double> factors = new HashMap<>();
    long n = reference.dimension();
    double sum = 0;
    double sumSquares = 0;
    for (int k = 0; k < reference.termCount(); k++) {
      int i = reference.row(k);
      int j = reference.column(k);
      if (i == j) {
        assertThat(scaled.realPart(k)).isEqualTo(reference.realPart(k));
        continue;
      }
      long key = Math.min(i, j) * n + Math.max(i, j);
      Double f = factors.get(key);
      if (f == null) {
        f = 1.0 + w * (random.nextDouble() - 0.5);
        factors.put(key, f);
        sum += f - 1;
        sumSquares += (f - 1) * (f - 1);
      }
      assertThat(scaled.realPart(k)).isCloseTo(f * reference.realPart(k), within(1e-15));
      assertThat(scaled.imaginaryPart(k)).isCloseTo(f * reference.imaginaryPart(k), within(1e-15));
    }
    int bonds = factors.size();
    assertThat(bonds).isEqualTo(2 * 40 * 40); // periodic square lattice: 2 bonds per site
    double mean = sum / bonds;
    double variance = sumSquares / bonds - mean * mean;
    assertThat(mean).isCloseTo(0.0, within(4 * w / Math.sqrt(12.0 * bonds)));
    assertThat(variance).isCloseTo(w * w / 12, within(4 * w * w / Math.sqrt(180.0 * bonds)));
  }

  /**
   * All elements of one bond (hopping and pairing, every orbital pair) share one factor: the ratio
   * to the clean matrix is constant per bond.
   */
  @Test
  void hoppingAndPairingOfABondShareTheFactor() {
    for (TestRealisation r :
        List.of(
            aRealisation("pwave-wire").with("mu", 0.4).with("delta", 0.7).size(8),
            aRealisation("qwz").with("m", -1.0).size(4),
            aRealisation("pip-square").with("mu", 1.0).size(4))) {
      ZMatrixRMaj clean = dense(r.build());
      ZMatrixRMaj scaled = dense(r.disorder(BondScaleDisorder.NAME, 1.2).seed(5).build());
      int per = r.lattice().orbitalsPerSite();
      Map<Long, Double> ratio = new HashMap<>();
      for (int i = 0; i < clean.numRows; i++) {
        for (int j = 0; j < clean.numCols; j++) {
          double re = clean.getReal(i, j);
          double im = clean.getImag(i, j);
          double modulus = Math.hypot(re, im);
          if (i / per == j / per) {
            assertThat(scaled.getReal(i, j)).isEqualTo(re);
            continue;
          }
          if (modulus == 0) {
            assertThat(Math.hypot(scaled.getReal(i, j), scaled.getImag(i, j))).isZero();
            continue;
          }
          double f = (scaled.getReal(i, j) * re + scaled.getImag(i, j) * im) / (modulus * modulus);
          assertThat(scaled.getImag(i, j) * re - scaled.getReal(i, j) * im)
              .as("a real factor")
              .isCloseTo(0.0, within(1e-14));
          long key = (long) Math.min(i / per, j / per) * clean.numRows + Math.max(i / per, j / per);
          Double previous = ratio.putIfAbsent(key, f);
          if (previous != null) {
            assertThat(f).isCloseTo(previous, within(1e-14));
          }
        }
      }
      assertThat(ratio.values()).as("factors differ between bonds").doesNotHaveDuplicates();
    }
  }

  /**
   * Derived (sublattice symmetry): on a bipartite lattice S H S = −H with S = ±1 on the two
   * sublattices, for any bond values, so the spectrum is symmetric E ↔ −E realisation by
   * realisation: anderson-2d (square lattice, even L, hopping only) and haldane with t2 = 0, M = 0
   * (honeycomb). Tolerance 1e-12 for O(1) matrices of dimension ≤ 200.
   */
  @Test
  void bipartiteSpectraStaySymmetric() {
    for (TestRealisation r :
        List.of(
            aRealisation("anderson-2d").size(10),
            aRealisation("haldane").with("t2", 0.0).with("phi", 0.0).with("M", 0.0).size(8))) {
      double[] clean = eigenvalues(dense(r.build()));
      double[] e = eigenvalues(dense(r.disorder(BondScaleDisorder.NAME, 1.5).seed(3).build()));
      int n = e.length;
      double change = 0;
      for (int i = 0; i < n; i++) {
        assertThat(e[i]).isCloseTo(-e[n - 1 - i], within(1e-12));
        change = Math.max(change, Math.abs(e[i] - clean[i]));
      }
      assertThat(change).as("the disorder changed the spectrum").isGreaterThan(1e-2);
    }
  }

  /**
   * A model declaring S (custom bipartite class AIII): bond-scale keeps the declared S, so the
   * per-realisation audit passes. Control: an independent onsite potential breaks it (relative
   * violation well above the tolerance), so the check can fail.
   */
  @Test
  void declaredChiralSymmetrySurvivesAndTheAuditCanFail() {
    CustomModelDefinition d = bipartiteAiii();
    ParameterValues p = new ParameterValues(Map.of("t", 1.0));
    PointSpec point =
        new PointSpec(
            CustomModel.NAME,
            p,
            6,
            Boundary.PERIODIC,
            0.0,
            List.of(new DisorderTerm(BondScaleDisorder.NAME, 1.0, Map.of())),
            List.of(),
            d);
    SymmetryCheckReport report = SymmetryCheckOps.check(point, 11L, SymmetryCheckKernel.TOLERANCE);
    assertThat(report.effectiveClass()).isEqualTo(SymmetryClass.AIII);
    assertThat(report.checks())
        .extracting(SymmetryCheckResult::symmetry)
        .containsExactly(Symmetry.CHIRAL);
    assertThat(report.violations()).isEmpty();

    CustomModel model = new CustomModel(d);
    Lattice lattice = model.lattice(6, Boundary.PERIODIC);
    HamiltonianBuilder b = new HamiltonianBuilder();
    b.reset(lattice.orbitals());
    model.addClean(p, lattice, b);
    ZMatrixRMaj clean = dense(b);
    new BondScaleDisorder()
        .apply(
            new DisorderTerm(BondScaleDisorder.NAME, 1.0, Map.of()),
            model,
            p,
            lattice,
            SeedOps.generator(11),
            b);
    ZMatrixRMaj scaled = dense(b);
    assertThat(scaled.getReal(0, 1))
        .as("the intracell a-b bond is a bond (different positions)")
        .isNotEqualTo(clean.getReal(0, 1));
    new OnsiteBoxDisorder()
        .apply(
            new DisorderTerm(OnsiteBoxDisorder.NAME, 1.0, Map.of()),
            model,
            p,
            lattice,
            SeedOps.generator(11),
            b);
    SymmetryOperator s = model.symmetryOperators().on(lattice).get(0);
    SymmetryCheckResult broken =
        SymmetryCheckKernel.check(
            dense(b), lattice, s, SymmetryCheckKernel.TOLERANCE, new SymmetryCheckWorkspace());
    assertThat(broken.relativeViolation()).isGreaterThan(1e-3);
  }

  /**
   * A real model stays real; the declared operators of pip-square (C: hopping and pairing scaled
   * alike), ssh (T, C, S), diii-wire (T, C, S) and bhz (T) pass the audit; ssh scales v and w and
   * stays bipartite.
   */
  @Test
  void realModelsStayRealAndBdgKeepsParticleHole() {
    ZMatrixRMaj anderson =
        dense(
            aRealisation("anderson-2d")
                .size(6)
                .disorder(BondScaleDisorder.NAME, 2.0)
                .seed(4)
                .build());
    for (int k = 1; k < anderson.data.length; k += 2) {
      assertThat(anderson.data[k]).isZero();
    }
    SymmetryCheckReport pip =
        SymmetryCheckOps.check(
            new PointSpec(
                "pip-square",
                new ParameterValues(Map.of("mu", 1.0, "t", 1.0, "delta", 0.8)),
                6,
                Boundary.PERIODIC,
                0.0,
                List.of(new DisorderTerm(BondScaleDisorder.NAME, 1.0, Map.of())),
                List.of()),
            3L,
            SymmetryCheckKernel.TOLERANCE);
    assertThat(pip.effectiveClass()).isEqualTo(SymmetryClass.D);
    assertThat(pip.checks()).isNotEmpty();
    assertThat(pip.violations()).isEmpty();
    List<DisorderTerm> scale = List.of(new DisorderTerm(BondScaleDisorder.NAME, 1.0, Map.of()));
    SymmetryCheckReport sshCheck =
        SymmetryCheckOps.check(
            new PointSpec(
                "ssh",
                new ParameterValues(Map.of("v", 0.5, "w", 1.0)),
                8,
                Boundary.OPEN,
                0.0,
                scale,
                List.of()),
            3L,
            SymmetryCheckKernel.TOLERANCE);
    assertThat(sshCheck.effectiveClass()).isEqualTo(SymmetryClass.BDI);
    assertThat(sshCheck.violations()).isEmpty();
    SymmetryCheckReport diii =
        SymmetryCheckOps.check(
            new PointSpec(
                "diii-wire",
                new ParameterValues(Map.of("mu", 0.5, "t", 1.0, "delta", 1.0, "lambda", 0.3)),
                8,
                Boundary.PERIODIC,
                0.0,
                scale,
                List.of()),
            3L,
            SymmetryCheckKernel.TOLERANCE);
    assertThat(diii.effectiveClass()).isEqualTo(SymmetryClass.DIII);
    assertThat(diii.violations()).isEmpty();
    SymmetryCheckReport bhz =
        SymmetryCheckOps.check(
            new PointSpec(
                "bhz",
                new ParameterValues(Map.of("A", 1.0, "B", 1.0, "M", 2.0, "rashba", 0.3)),
                6,
                Boundary.PERIODIC,
                0.0,
                scale,
                List.of()),
            3L,
            SymmetryCheckKernel.TOLERANCE);
    assertThat(bhz.effectiveClass()).isEqualTo(SymmetryClass.AII);
    assertThat(bhz.checks())
        .extracting(SymmetryCheckResult::symmetry)
        .containsExactly(Symmetry.TIME_REVERSAL);
    assertThat(bhz.violations()).isEmpty();
    ZMatrixRMaj ssh =
        dense(
            aRealisation("ssh")
                .with("v", 0.5)
                .with("w", 1.0)
                .size(6)
                .boundary(Boundary.OPEN)
                .disorder(BondScaleDisorder.NAME, 0.8)
                .seed(2)
                .build());
    for (int j = 0; j < 6; j++) {
      assertThat(ssh.getReal(2 * j, 2 * j + 1))
          .as("intracell v scaled")
          .isNotEqualTo(0.5)
          .isBetween(0.5 * 0.6, 0.5 * 1.4);
    }
    for (int i = 0; i < 12; i += 2) {
      for (int k = 0; k < 12; k += 2) {
        assertThat(ssh.getReal(i, k)).isZero();
        assertThat(ssh.getReal(i + 1, k + 1)).isZero();
      }
    }
  }

  /** Same seed → the identical matrix; another seed → another; W = 0 → the clean matrix exactly. */
  @Test
  void reproducibleAndTrivialAtZeroStrength() {
    TestRealisation clean = aRealisation("flux-square").with("p", 1.0).with("q", 4.0).size(8);
    double[] reference = dense(clean.build()).data.clone();
    double[] a =
        dense(
                aRealisation("flux-square")
                    .with("p", 1.0)
                    .with("q", 4.0)
                    .size(8)
                    .disorder(BondScaleDisorder.NAME, 1.0)
                    .seed(8)
                    .build())
            .data;
    double[] b =
        dense(
                aRealisation("flux-square")
                    .with("p", 1.0)
                    .with("q", 4.0)
                    .size(8)
                    .disorder(BondScaleDisorder.NAME, 1.0)
                    .seed(8)
                    .build())
            .data;
    double[] c =
        dense(
                aRealisation("flux-square")
                    .with("p", 1.0)
                    .with("q", 4.0)
                    .size(8)
                    .disorder(BondScaleDisorder.NAME, 1.0)
                    .seed(9)
                    .build())
            .data;
    double[] zero =
        dense(
                aRealisation("flux-square")
                    .with("p", 1.0)
                    .with("q", 4.0)
                    .size(8)
                    .disorder(BondScaleDisorder.NAME, 0.0)
                    .seed(8)
                    .build())
            .data;
    assertThat(a).containsExactly(b);
    assertThat(a).isNotEqualTo(c);
    assertThat(zero).containsExactly(reference);
  }

  /**
   * End to end through {@link RealisationRunner}: QWZ at m = −1 (clean C = +1, Qi, Wu, Zhang, PRB
   * 74, 085308 (2006); Bott = C, Loring & Hastings, EPL 92, 67004 (2010)) with bond factors in
   * [0.75, 1.25) keeps Bott = 1 (the clean gap 2|m| = 2 is not closed by bond changes of at most
   * 1/4 of the bandwidth-scale hoppings); tolerance 1e-6 on the unrounded index.
   */
  @Test
  void bottOfQwzWithBondScaleDisorderThroughTheRunner() {
    PointSpec point =
        new PointSpec(
            "qwz",
            new ParameterValues(Map.of("m", -1.0, "t", 1.0)),
            10,
            Boundary.PERIODIC,
            0.0,
            List.of(new DisorderTerm(BondScaleDisorder.NAME, 0.5, Map.of())),
            List.of("bott", "gap"));
    RealisationWorkspace workspace = new RealisationWorkspace(LINALG);
    for (long seed = 1; seed <= 3; seed++) {
      RealisationResult r =
          RealisationRunner.run(new RealisationTask("t", 0, 0, seed, point), workspace);
      assertThat(r.outcome()).as(String.valueOf(r.failure())).isEqualTo(Outcome.DONE);
      assertThat(r.values().get("bott")).isCloseTo(1.0, within(1e-6));
      assertThat(r.values().get("gap")).isGreaterThan(0.5);
    }
  }
}
