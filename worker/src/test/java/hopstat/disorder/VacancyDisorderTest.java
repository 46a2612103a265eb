package hopstat.disorder;

import static hopstat.invariant.TestRealisation.aRealisation;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import hopstat.invariant.TestRealisation;
import hopstat.lattice.Boundary;
import hopstat.lattice.HamiltonianBuilder;
import hopstat.lattice.Lattice;
import hopstat.linalg.Linalg;
import hopstat.linalg.LinalgFactory;
import hopstat.linalg.LinalgKind;
import hopstat.model.ModelCatalog;
import hopstat.model.ParameterValues;
import hopstat.model.Symmetry;
import hopstat.model.SymmetryCheckKernel;
import hopstat.model.SymmetryCheckResult;
import hopstat.model.SymmetryClass;
import hopstat.task.InvalidInputException;
import hopstat.task.Outcome;
import hopstat.task.PointSpec;
import hopstat.task.RealisationResult;
import hopstat.task.RealisationRunner;
import hopstat.task.RealisationTask;
import hopstat.task.RealisationWorkspace;
import hopstat.task.SeedOps;
import hopstat.task.SymmetryCheckOps;
import hopstat.task.SymmetryCheckReport;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.random.RandomGenerator;
import org.ejml.data.ZMatrixRMaj;
import org.junit.jupiter.api.Test;

/**
 * Site dilution ({@code vacancies}): draw order, exact equivalence with deleting the sites,
 * invariants, symmetry, bad input.
 */
class VacancyDisorderTest {

  private static final Linalg LINALG = LinalgFactory.create(LinalgKind.NATIVE);
  private static final RealisationWorkspace WORKSPACE = new RealisationWorkspace(LINALG);

  /**
   * The sites the documented rule removes: site s iff its draw u_s &lt; c, after {@code skip}
   * earlier draws.
   */
  private static boolean[] replayRemoved(long seed, int skip, int sites, double c) {
    RandomGenerator random = SeedOps.generator(seed);
    for (int i = 0; i < skip; i++) {
      random.nextDouble();
    }
    boolean[] removed = new boolean[sites];
    for (int s = 0; s < sites; s++) {
      removed[s] = random.nextDouble() < c;
    }
    return removed;
  }

  private static int count(boolean[] flags) {
    int n = 0;
    for (boolean f : flags) {
      n += f ? 1 : 0;
    }
    return n;
  }

  private static double[] eigenvalues(ZMatrixRMaj h) {
    double[] values = new double[h.numRows];
    assertThat(LINALG.newHermitianEigenSolver().eigenvalues(h, values)).isTrue();
    return values;
  }

  private static ZMatrixRMaj dense(HamiltonianBuilder b) {
    ZMatrixRMaj h = new ZMatrixRMaj(1, 1);
    b.toDense(h);
    return h;
  }

  /**
   * The principal submatrix on the orbitals of the kept sites: the sample with the removed sites
   * deleted by hand.
   */
  private static ZMatrixRMaj deleteSites(
      ZMatrixRMaj h, boolean[] removedSite, int orbitalsPerSite) {
    int[] keep = new int[h.numRows];
    int n = 0;
    for (int i = 0; i < h.numRows; i++) {
      if (!removedSite[i / orbitalsPerSite]) {
        keep[n++] = i;
      }
    }
    ZMatrixRMaj out = new ZMatrixRMaj(n, n);
    for (int a = 0; a < n; a++) {
      for (int b = 0; b < n; b++) {
        out.set(a, b, h.getReal(keep[a], keep[b]), h.getImag(keep[a], keep[b]));
      }
    }
    return out;
  }

  private static RealisationResult run(PointSpec point, long seed) {
    return RealisationRunner.run(new RealisationTask("t", 0, 0, seed, point), WORKSPACE);
  }

  /**
   * (a) Exact: the removed sites are those whose draw is below c, one draw per site in site order;
   * every term touching them is zero and their diagonal is U. Statistics (common practice): the
   * number removed among N = 3·1600 sites is binomial(N, c); at c = 0.2 its mean is 960 and its
   * standard deviation sqrt(N c (1 − c)) = 27.7; we allow 4σ (a fixed seed: deterministic).
   */
  @Test
  void removesEachSiteWithProbabilityCInSiteOrder() {
    double c = 0.2;
    int size = 40;
    int total = 0;
    int sites = 0;
    for (long seed = 1; seed <= 3; seed++) {
      TestRealisation r =
          aRealisation("qwz")
              .with("m", -1.0)
              .size(size)
              .disorder(VacancyDisorder.NAME, c)
              .seed(seed);
      HamiltonianBuilder b = r.build();
      Lattice lattice = r.lattice();
      boolean[] expected = replayRemoved(seed, 0, lattice.sites(), c);
      double[] diagonal = new double[b.dimension()];
      for (int k = 0; k < b.termCount(); k++) {
        int i = b.row(k);
        int j = b.column(k);
        if (i == j) {
          diagonal[i] += b.realPart(k);
        } else if (expected[i / 2] || expected[j / 2]) {
          assertThat(b.realPart(k)).isZero();
          assertThat(b.imaginaryPart(k)).isZero();
        }
      }
      for (int s = 0; s < lattice.sites(); s++) {
        // removed: U = 1000 R with R ≥ 1 here; kept: |diagonal| ≤ R ≈ 5
        assertThat(diagonal[2 * s] > 100 && diagonal[2 * s + 1] > 100)
            .as("site " + s)
            .isEqualTo(expected[s]);
      }
      total += count(expected);
      sites += lattice.sites();
    }
    double mean = sites * c;
    double sigma = Math.sqrt(sites * c * (1 - c));
    assertThat((double) total).isCloseTo(mean, within(4 * sigma));
  }

  /** c = 0 removes nothing: the matrix equals the clean one exactly. */
  @Test
  void zeroConcentrationChangesNothing() {
    ZMatrixRMaj diluted =
        dense(
            aRealisation("qwz")
                .with("m", -1.0)
                .size(5)
                .disorder(VacancyDisorder.NAME, 0.0)
                .seed(3)
                .build());
    ZMatrixRMaj clean = dense(aRealisation("qwz").with("m", -1.0).size(5).build());
    assertThat(diluted.data).containsExactly(clean.data);
  }

  /**
   * (b) Derived: a removed site is an exactly decoupled block, so the diluted spectrum without the
   * levels at ±U equals the spectrum of the same sample with those sites' rows and columns deleted
   * by hand (dense comparison). The vacancy levels themselves sit at U = 1000 R (R the Gershgorin
   * radius before removal): U on both orbitals for qwz, ±U on particle/hole for the BdG model.
   * Tolerance 1e-9: LAPACK eigenvalues are accurate to ~ε‖H‖ ≈ 1e-12 with ‖H‖ ≈ U ≈ 10⁴.
   */
  @Test
  void dilutedSpectrumEqualsTheSpectrumWithTheSitesDeleted() {
    // qwz, vacancies only
    checkEquivalence(aRealisation("qwz").with("m", -1.0).size(6), 0.25, 5, 0, false);
    // pip-square (class D): onsite-box first (one draw per site), then vacancies, whose draws
    // follow
    checkEquivalence(
        aRealisation("pip-square").with("mu", 1.0).size(6).disorder(OnsiteBoxDisorder.NAME, 1.5),
        0.25,
        8,
        36,
        true);
    // pwave-wire (class BDI), a ring
    checkEquivalence(aRealisation("pwave-wire").with("mu", 0.5).size(16), 0.25, 2, 0, true);
  }

  private static void checkEquivalence(
      TestRealisation reference, double c, long seed, int skip, boolean bdg) {
    reference.seed(seed);
    Lattice lattice = reference.lattice();
    HamiltonianBuilder refTerms = reference.build();
    double level = VacancyDisorder.LEVEL_FACTOR * VacancyDisorder.gershgorinRadius(refTerms);
    ZMatrixRMaj refDense = dense(refTerms);
    boolean[] removed = replayRemoved(seed, skip, lattice.sites(), c);
    int removedCount = count(removed);
    assertThat(removedCount)
        .as("the fixture must remove some sites")
        .isBetween(1, lattice.sites() - 2);

    double[] diluted = eigenvalues(dense(reference.disorder(VacancyDisorder.NAME, c).build()));
    double[] deleted = eigenvalues(deleteSites(refDense, removed, lattice.orbitalsPerSite()));

    int vacancyLevels = removedCount * lattice.orbitalsPerSite();
    int low = bdg ? vacancyLevels / 2 : 0;
    int n = diluted.length;
    for (int i = 0; i < low; i++) {
      assertThat(diluted[i]).isCloseTo(-level, within(1e-9 * level));
    }
    for (int i = n - (vacancyLevels - low); i < n; i++) {
      assertThat(diluted[i]).isCloseTo(level, within(1e-9 * level));
    }
    double[] rest = Arrays.copyOfRange(diluted, low, n - (vacancyLevels - low));
    assertThat(rest).hasSameSizeAs(deleted);
    for (int i = 0; i < rest.length; i++) {
      assertThat(rest[i]).isCloseTo(deleted[i], within(1e-9));
    }
  }

  /**
   * (c) The Bott index is unchanged by weak dilution in the topological phase of QWZ: clean C = +1
   * at m = −1 (Qi, Wu, Zhang, PRB 74, 085308 (2006); sign as in REFERENCE.md), Bott index = C
   * (Loring & Hastings, EPL 92, 67004 (2010)). A vacancy is a decoupled level at +U, above E_F = 0,
   * so the occupied projector is that of the diluted sample. Tolerance 1e-6 on the unrounded index.
   * The gap at E_F stays a band-scale gap (clean 2|m| = 2; vacancy-bound in-gap states may shrink
   * it), never a distance to the vacancy levels at U ≈ 10³.
   */
  @Test
  void bottIndexOfWeaklyDilutedQwzStaysAtItsCleanValue() {
    Map<String, Double> parameters = Map.of("m", -1.0, "t", 1.0);
    PointSpec clean =
        new PointSpec(
            "qwz",
            new ParameterValues(parameters),
            12,
            Boundary.PERIODIC,
            0.0,
            List.of(),
            List.of("bott"));
    RealisationResult cleanResult = run(clean, 1);
    assertThat(cleanResult.outcome()).isEqualTo(Outcome.DONE);
    assertThat(cleanResult.values().get("bott")).isCloseTo(1.0, within(1e-6));
    PointSpec diluted =
        new PointSpec(
            "qwz",
            new ParameterValues(parameters),
            12,
            Boundary.PERIODIC,
            0.0,
            List.of(new DisorderTerm(VacancyDisorder.NAME, 0.05, Map.of())),
            List.of("bott", "gap"));
    for (long seed = 1; seed <= 3; seed++) {
      assertThat(count(replayRemoved(seed, 0, 144, 0.05)))
          .as("sites removed with seed " + seed)
          .isPositive();
      RealisationResult r = run(diluted, seed);
      assertThat(r.outcome()).as(String.valueOf(r.failure())).isEqualTo(Outcome.DONE);
      assertThat(r.values().get("bott")).isCloseTo(1.0, within(1e-6));
      assertThat(r.values().get("gap")).isBetween(0.1, 10.0);
    }
  }

  /**
   * BdG: the vacancy's hole level at −U is occupied at E_F = 0 but is one orbital of one site, so
   * it commutes with the position operators and leaves the Bott index unchanged. pip-square at μ =
   * 1, t = Δ = 1 is in the weak-pairing phase with |C| = 1 (Read & Green, PRB 61, 10267 (2000),
   * lattice version: from memory; checked here only as |bott| = 1 on the clean sample).
   */
  @Test
  void bottIndexOfADilutedBdgSampleIsUnchanged() {
    Map<String, Double> parameters = Map.of("mu", 1.0, "t", 1.0, "delta", 1.0);
    PointSpec clean =
        new PointSpec(
            "pip-square",
            new ParameterValues(parameters),
            10,
            Boundary.PERIODIC,
            0.0,
            List.of(),
            List.of("bott"));
    double cleanBott = run(clean, 1).values().get("bott");
    assertThat(Math.abs(cleanBott)).isCloseTo(1.0, within(1e-6));
    PointSpec diluted =
        new PointSpec(
            "pip-square",
            new ParameterValues(parameters),
            10,
            Boundary.PERIODIC,
            0.0,
            List.of(new DisorderTerm(VacancyDisorder.NAME, 0.05, Map.of())),
            List.of("bott"));
    for (long seed = 1; seed <= 2; seed++) {
      assertThat(count(replayRemoved(seed, 0, 100, 0.05)))
          .as("sites removed with seed " + seed)
          .isPositive();
      RealisationResult r = run(diluted, seed);
      assertThat(r.outcome()).as(String.valueOf(r.failure())).isEqualTo(Outcome.DONE);
      assertThat(r.values().get("bott")).isCloseTo(cleanBott, within(1e-6));
    }
  }

  /**
   * Class AII: vacancies keep T, so bhz stays AII and its Z2 (spin Chern number mod 2) is unchanged
   * by weak dilution: odd for 0 &lt; M/B &lt; 8, M/B ≠ 4 (Bernevig, Hughes, Zhang, Science 314,
   * 1757 (2006); mapping to the two-band model derived in REFERENCE.md).
   */
  @Test
  void z2OfWeaklyDilutedBhzStaysOdd() {
    PointSpec diluted =
        new PointSpec(
            "bhz",
            new ParameterValues(Map.of("A", 1.0, "B", 1.0, "M", 2.0, "rashba", 0.0)),
            8,
            Boundary.PERIODIC,
            0.0,
            List.of(new DisorderTerm(VacancyDisorder.NAME, 0.05, Map.of())),
            List.of("z2"));
    for (long seed = 1; seed <= 2; seed++) {
      assertThat(count(replayRemoved(seed, 0, 64, 0.05)))
          .as("sites removed with seed " + seed)
          .isPositive();
      RealisationResult r = run(diluted, seed);
      assertThat(r.outcome()).as(String.valueOf(r.failure())).isEqualTo(Outcome.DONE);
      assertThat(r.values().get("z2")).isEqualTo(1.0);
    }
  }

  /**
   * With a fixed κ the spectral localizer is blind to vacancies: a removed site is a 2 × 2 block
   * [[U − E, κ x], [κ x, −(U − E)]] of signature 0 (derived). Clean qwz, m = −1: ½ sig L = −C with
   * centred X, Y (Loring, Ann. Phys. 356, 383 (2015); sign as in REFERENCE.md, κ = 0.05–0.2 worked
   * at L = 16); the observable reports −½ sig L, i.e. C = +1 (Qi, Wu, Zhang 2006); here κ = 0.1, L
   * = 12.
   */
  @Test
  void localizerIndexWithFixedKappaIgnoresVacancies() {
    Map<String, Double> parameters = Map.of("m", -1.0, "t", 1.0, "kappa", 0.1);
    PointSpec clean =
        new PointSpec(
            "qwz",
            new ParameterValues(parameters),
            12,
            Boundary.OPEN,
            0.0,
            List.of(),
            List.of("chern-localizer"));
    assertThat(run(clean, 1).values().get("chern-localizer")).isEqualTo(1.0);
    PointSpec diluted =
        new PointSpec(
            "qwz",
            new ParameterValues(parameters),
            12,
            Boundary.OPEN,
            0.0,
            List.of(new DisorderTerm(VacancyDisorder.NAME, 0.05, Map.of())),
            List.of("chern-localizer"));
    for (long seed = 1; seed <= 2; seed++) {
      RealisationResult r = run(diluted, seed);
      assertThat(r.outcome()).as(String.valueOf(r.failure())).isEqualTo(Outcome.DONE);
      assertThat(r.values().get("chern-localizer")).isEqualTo(1.0);
    }
  }

  /**
   * The Bianco–Resta marker is a density per unit cell averaged over all bulk cells, vacancies
   * included (a removed site carries no occupied weight and contributes 0, so the area average is
   * kept). Clean C = +1 (qwz, m = −1; Qi, Wu, Zhang 2006). Measured (this test's setup, L = 16
   * open, c = 0.05): clean 0.99986; diluted, seeds 1–8: 0.9999, 0.9670, 1.0097, 0.9986, 0.9953,
   * 1.0062, 1.0087, 0.9789. Tolerance 0.05: a finite bulk window of a disordered sample fluctuates
   * at the per-cent level (Bianco & Resta, PRB 84, 241106(R) (2011), disordered samples). Kitaev's
   * three-region formula (Ann. Phys. 321, 2 (2006), App. C; reported as −ν = C) is projector-based
   * too; measured: clean 0.99923, seeds 1–2: 0.99643, 0.99872; tolerance 0.02.
   */
  @Test
  void chernMarkersOfWeaklyDilutedQwzStayNearTheirCleanValue() {
    PointSpec diluted =
        new PointSpec(
            "qwz",
            new ParameterValues(Map.of("m", -1.0, "t", 1.0)),
            16,
            Boundary.OPEN,
            0.0,
            List.of(new DisorderTerm(VacancyDisorder.NAME, 0.05, Map.of())),
            List.of("chern-marker", "chern-3region"));
    for (long seed = 1; seed <= 2; seed++) {
      RealisationResult r = run(diluted, seed);
      assertThat(r.outcome()).as(String.valueOf(r.failure())).isEqualTo(Outcome.DONE);
      assertThat(r.values().get("chern-marker")).as("seed " + seed).isCloseTo(1.0, within(0.05));
      assertThat(r.values().get("chern-3region")).as("seed " + seed).isCloseTo(1.0, within(0.02));
    }
  }

  /**
   * With explicit windows inside the band (as spec validation demands with vacancies) the level
   * statistics never see the vacancy levels: a vacancy eigenvector is one site, IPR = 1. Measured
   * (this setup, seed 4): mean IPR 0.0238 with windows [−2, 2]; 0.0895 if the default windows are
   * forced (bypassing validation), as the vacancy states enter. The bound 0.05 tells the two apart.
   * r̃ = 0.479 lies between Poisson 0.386 and GOE 0.531 (Atas et al., PRL 110, 084101 (2013),
   * values from memory), as expected for L = 12 at W = 2 with dilution.
   */
  @Test
  void windowedLevelStatisticsIgnoreTheVacancyLevels() {
    Map<String, Double> parameters =
        Map.of("t", 1.0, "windows", 2.0, "windowMin", -2.0, "windowMax", 2.0);
    PointSpec point =
        new PointSpec(
            "anderson-2d",
            new ParameterValues(parameters),
            12,
            Boundary.PERIODIC,
            0.0,
            List.of(
                new DisorderTerm(OnsiteBoxDisorder.NAME, 2.0, Map.of()),
                new DisorderTerm(VacancyDisorder.NAME, 0.1, Map.of())),
            List.of("level-ratio", "ipr"));
    RealisationResult r = run(point, 4);
    assertThat(r.outcome()).as(String.valueOf(r.failure())).isEqualTo(Outcome.DONE);
    assertThat(r.values().get("level-ratio")).isBetween(0.3, 0.7);
    assertThat(r.values().get("ipr")).isBetween(0.0, 0.05);
  }

  /**
   * (c) Kitaev ring with one vacancy. Clean, |μ| &lt; 2|t|: Majorana number Q = −1, z2 = 1 (Kitaev,
   * Phys.-Usp. 44, 131 (2001)). One vacancy cuts the ring into an open wire of L − 1 sites plus a
   * decoupled site. Derived expectation: on an open wire the closure phase −1 of the bond (L−1, 0)
   * is removed by the gauge c_j → −c_j on the sites on one side of it (an orthogonal map of
   * determinant +1 on the Majoranas, so Pf is unchanged), hence Pf(A_periodic) = Pf(A_antiperiodic)
   * and Q = +1, z2 = 0, whatever the phase of the wire; the decoupled site multiplies both
   * Pfaffians by the same factor. μ = 1 keeps the open wire's end-mode splitting ~ (μ/2t)^(L−1) ≈
   * 2e-3 far above round-off, so both Pfaffian signs are well defined.
   */
  @Test
  void kitaevRingWithOneVacancyIsAnOpenWire() {
    Map<String, Double> parameters = Map.of("mu", 1.0, "t", 1.0, "delta", 1.0);
    int size = 10;
    PointSpec clean =
        new PointSpec(
            "pwave-wire",
            new ParameterValues(parameters),
            size,
            Boundary.PERIODIC,
            0.0,
            List.of(),
            List.of("z2"));
    assertThat(run(clean, 1).values().get("z2")).isEqualTo(1.0);
    long seed = 1;
    while (count(replayRemoved(seed, 0, size, 0.1)) != 1) {
      seed++;
    }
    PointSpec diluted =
        new PointSpec(
            "pwave-wire",
            new ParameterValues(parameters),
            size,
            Boundary.PERIODIC,
            0.0,
            List.of(new DisorderTerm(VacancyDisorder.NAME, 0.1, Map.of())),
            List.of("z2"));
    RealisationResult r = run(diluted, seed);
    assertThat(r.outcome()).as(String.valueOf(r.failure())).isEqualTo(Outcome.DONE);
    assertThat(r.values().get("z2")).isEqualTo(0.0);
  }

  /**
   * (d) The BdG sign rule keeps C (pip-square, class D, declared C = τx K) and the real potential
   * keeps T (bhz, class AII): the audit of the claimed class passes. On ssh only T is claimed (BDI
   * → AI), because +U on both sublattice orbitals breaks the sublattice C and S.
   */
  @Test
  void symmetryChecksPassWithVacancies() {
    List<DisorderTerm> vacancies = List.of(new DisorderTerm(VacancyDisorder.NAME, 0.3, Map.of()));
    SymmetryCheckReport pip =
        SymmetryCheckOps.check(
            new PointSpec(
                "pip-square",
                new ParameterValues(Map.of("mu", 1.0, "t", 1.0, "delta", 1.0)),
                6,
                Boundary.PERIODIC,
                0.0,
                vacancies,
                List.of()),
            7L,
            SymmetryCheckKernel.TOLERANCE);
    assertThat(pip.effectiveClass()).isEqualTo(SymmetryClass.D);
    assertThat(pip.checks())
        .extracting(SymmetryCheckResult::symmetry)
        .containsExactly(Symmetry.PARTICLE_HOLE);
    assertThat(pip.violations()).isEmpty();
    SymmetryCheckReport bhz =
        SymmetryCheckOps.check(
            new PointSpec(
                "bhz",
                new ParameterValues(Map.of("A", 1.0, "B", 1.0, "M", 2.0, "rashba", 0.3)),
                6,
                Boundary.PERIODIC,
                0.0,
                vacancies,
                List.of()),
            7L,
            SymmetryCheckKernel.TOLERANCE);
    assertThat(bhz.effectiveClass()).isEqualTo(SymmetryClass.AII);
    assertThat(bhz.checks())
        .extracting(SymmetryCheckResult::symmetry)
        .containsExactly(Symmetry.TIME_REVERSAL);
    assertThat(bhz.violations()).isEmpty();
    SymmetryCheckReport diii =
        SymmetryCheckOps.check(
            new PointSpec(
                "diii-wire",
                new ParameterValues(Map.of("mu", 0.5, "t", 1.0, "delta", 1.0, "lambda", 0.3)),
                12,
                Boundary.PERIODIC,
                0.0,
                vacancies,
                List.of()),
            7L,
            SymmetryCheckKernel.TOLERANCE);
    assertThat(diii.effectiveClass()).isEqualTo(SymmetryClass.DIII);
    assertThat(diii.violations()).isEmpty();
    assertThat(diii.undeclared()).isEmpty();
    SymmetryCheckReport ssh =
        SymmetryCheckOps.check(
            new PointSpec(
                "ssh",
                new ParameterValues(Map.of("v", 0.5, "w", 1.0)),
                12,
                Boundary.OPEN,
                0.0,
                vacancies,
                List.of()),
            7L,
            SymmetryCheckKernel.TOLERANCE);
    assertThat(ssh.effectiveClass()).isEqualTo(SymmetryClass.AI);
    assertThat(ssh.violations()).isEmpty();
    assertThat(
            SymmetryCheckOps.effectiveClass(
                ModelCatalog.find("pwave-wire").orElseThrow(), vacancies))
        .isEqualTo(SymmetryClass.BDI);
  }

  /** (e) The concentration must lie in [0, 1); the kind refuses anything else, naming the field. */
  @Test
  void concentrationOutsideTheUnitIntervalIsBadInput() {
    VacancyDisorder kind = new VacancyDisorder();
    assertThat(kind.whyNotValidStrength(0.0)).isEmpty();
    assertThat(kind.whyNotValidStrength(0.999)).isEmpty();
    assertThat(kind.whyNotValidStrength(1.0)).isPresent();
    assertThat(kind.whyNotValidStrength(2.5)).isPresent();
    assertThatThrownBy(
            () ->
                aRealisation("qwz")
                    .with("m", -1.0)
                    .size(4)
                    .disorder(VacancyDisorder.NAME, 1.0)
                    .build())
        .isInstanceOfSatisfying(
            InvalidInputException.class,
            e ->
                assertThat(e.violations())
                    .extracting(InvalidInputException.Violation::fieldPath)
                    .containsExactly("disorder.strength"));
    assertThat(kind.whyNotApplicable(ModelCatalog.find("majorana-cluster").orElseThrow()))
        .isPresent();
    assertThat(kind.whyNotBefore(new OnsiteBoxDisorder())).isPresent();
  }
}
