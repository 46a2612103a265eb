package hopstat.model;

import static hopstat.invariant.TestRealisation.aRealisation;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import hopstat.disorder.DisorderCatalog;
import hopstat.invariant.MajoranaKernel;
import hopstat.invariant.MajoranaNumberResult;
import hopstat.invariant.MajoranaWorkspace;
import hopstat.invariant.TestRealisation;
import hopstat.lattice.Boundary;
import hopstat.lattice.HamiltonianBuilder;
import hopstat.lattice.Lattice;
import hopstat.linalg.HermitianEigenSolver;
import hopstat.linalg.LinalgFactory;
import hopstat.linalg.LinalgKind;
import hopstat.task.SeedOps;
import hopstat.task.SymmetryCheckOps;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.random.RandomGenerator;
import org.ejml.data.ZMatrixRMaj;
import org.junit.jupiter.api.Test;

class DiiiWireModelTest {

  private final HermitianEigenSolver eig =
      LinalgFactory.create(LinalgKind.JAVA).newHermitianEigenSolver();
  private final SymmetryCheckWorkspace symmetryWorkspace = new SymmetryCheckWorkspace();

  private double[] spectrum(HamiltonianBuilder b) {
    ZMatrixRMaj h = new ZMatrixRMaj(1, 1);
    b.toDense(h);
    double[] values = new double[h.numRows];
    assertThat(eig.eigenvalues(h, values)).isTrue();
    return values;
  }

  @Test
  void blochFormMatchesItsClosedFormAndTheRingSpectrum() {
    // Derived: the eigenvalues of a clean periodic ring of L sites are those of H(k) at k = 2πn/L.
    double mu = 0.7;
    double t = 0.9;
    double delta = 0.6;
    double lambda = 0.45;
    int size = 9;
    double[] expected = new double[4 * size];
    for (int n = 0; n < size; n++) {
      double k = 2 * Math.PI * n / size;
      double[] bloch = new double[4];
      assertThat(eig.eigenvalues(DiiiWireBloch.hamiltonian(k, mu, t, delta, lambda), bloch))
          .isTrue();
      double[] closed = DiiiWireBloch.closedFormEnergies(k, mu, t, delta, lambda);
      Arrays.sort(closed);
      for (int i = 0; i < 4; i++) {
        assertThat(bloch[i]).isCloseTo(closed[i], within(1e-12));
        expected[4 * n + i] = bloch[i];
      }
    }
    Arrays.sort(expected);
    double[] ring =
        spectrum(
            aRealisation(DiiiWireModel.NAME)
                .with("mu", mu)
                .with("t", t)
                .with("delta", delta)
                .with("lambda", lambda)
                .size(size)
                .build());
    for (int i = 0; i < expected.length; i++) {
      assertThat(ring[i]).as("level %d", i).isCloseTo(expected[i], within(1e-12));
    }
  }

  @Test
  void declaredSymmetriesHoldWithSpinIndependentDisorder() {
    // Derived (class comment): T = i s_y K, C = τ_x K, S = TC; spin-independent μ_j and real
    // pairing shifts keep all three, so the class stays DIII.
    Model model = ModelCatalog.find(DiiiWireModel.NAME).orElseThrow();
    for (String kind : List.of("onsite-box", "onsite-gauss", "pairing-box")) {
      assertThat(
              SymmetryCheckOps.effectiveClass(
                  model, List.of(new hopstat.disorder.DisorderTerm(kind, 1.0, Map.of()))))
          .as(kind)
          .isEqualTo(SymmetryClass.DIII);
      TestRealisation r =
          aRealisation(DiiiWireModel.NAME)
              .with("mu", 0.4)
              .with("lambda", 0.7)
              .size(7)
              .seed(5)
              .disorder(kind, 1.5);
      for (SymmetryOperator op : model.symmetryOperators().on(r.lattice())) {
        SymmetryCheckResult check =
            SymmetryCheckKernel.check(
                dense(r.build()),
                r.lattice(),
                op,
                SymmetryCheckKernel.TOLERANCE,
                symmetryWorkspace);
        assertThat(check.isSatisfied()).as("%s under %s", op.symmetry(), kind).isTrue();
      }
    }
    assertThat(SymmetryClass.DIII.invariantGroup(1)).isEqualTo("Z2");
  }

  @Test
  void zeemanDisorderBreaksTimeReversalOnlyAndLeavesClassD() {
    // Derived: h s_z is odd under T = i s_y K and even under C in BdG form.
    Model model = ModelCatalog.find(DiiiWireModel.NAME).orElseThrow();
    assertThat(
            SymmetryCheckOps.effectiveClass(
                model, List.of(new hopstat.disorder.DisorderTerm("zeeman-box", 1.0, Map.of()))))
        .isEqualTo(SymmetryClass.D);
    TestRealisation r =
        aRealisation(DiiiWireModel.NAME)
            .with("mu", 0.4)
            .with("lambda", 0.7)
            .size(7)
            .seed(5)
            .disorder("zeeman-box", 1.0);
    for (SymmetryOperator op : model.symmetryOperators().on(r.lattice())) {
      SymmetryCheckResult check =
          SymmetryCheckKernel.check(
              dense(r.build()), r.lattice(), op, SymmetryCheckKernel.TOLERANCE, symmetryWorkspace);
      assertThat(check.isSatisfied())
          .as("%s", op.symmetry())
          .isEqualTo(op.symmetry() == Symmetry.PARTICLE_HOLE);
    }
    assertThat(
            DisorderCatalog.find("zeeman-box")
                .orElseThrow()
                .whyNotApplicable(ModelCatalog.find("pwave-wire").orElseThrow()))
        .isPresent();
    assertThat(DisorderCatalog.find("zeeman-box").orElseThrow().whyNotApplicable(model)).isEmpty();
  }

  private static ZMatrixRMaj dense(HamiltonianBuilder b) {
    ZMatrixRMaj h = new ZMatrixRMaj(1, 1);
    b.toDense(h);
    return h;
  }

  /** The four smallest |E| and the fifth of an open chain. */
  private double[] smallest(TestRealisation r) {
    double[] e = spectrum(r.build());
    double[] abs = Arrays.stream(e).map(Math::abs).sorted().toArray();
    return Arrays.copyOf(abs, 5);
  }

  @Test
  void openNonTrivialChainHasAKramersPairOfMajoranasAtEachEnd() {
    // Kitaev (2001) per spin block, Kramers partners by T (Qi, Hughes, Zhang 2010; common
    // practice):
    // four BdG levels (two Kramers doublets, ±E each) vanish exponentially in L; with S_z broken
    // and
    // disorder too. The rest of the spectrum is Kramers-degenerate (T² = −1, derived) and gapped.
    for (long seed = 1; seed <= 2; seed++) {
      TestRealisation shortChain =
          aRealisation(DiiiWireModel.NAME)
              .with("mu", 0.5)
              .with("delta", 0.8)
              .with("lambda", 0.4)
              .boundary(Boundary.OPEN)
              .size(12)
              .seed(seed)
              .disorder("onsite-box", 1.0);
      TestRealisation longChain =
          aRealisation(DiiiWireModel.NAME)
              .with("mu", 0.5)
              .with("delta", 0.8)
              .with("lambda", 0.4)
              .boundary(Boundary.OPEN)
              .size(36)
              .seed(seed)
              .disorder("onsite-box", 1.0);
      double[] s = smallest(shortChain);
      double[] l = smallest(longChain);
      assertThat(l[3]).as("seed %d", seed).isLessThan(1e-8);
      assertThat(l[3]).isLessThan(1e-3 * s[3]);
      assertThat(l[4]).isGreaterThan(0.2);
      double[] e = spectrum(longChain.build());
      for (int i = 0; i < e.length; i += 2) {
        assertThat(e[i + 1] - e[i]).as("Kramers pair %d", i / 2).isLessThan(1e-9);
      }
    }
    // Trivial side: no level near zero.
    double[] trivial =
        smallest(
            aRealisation(DiiiWireModel.NAME)
                .with("mu", 3.0)
                .with("delta", 0.8)
                .with("lambda", 0.4)
                .boundary(Boundary.OPEN)
                .size(36));
    assertThat(trivial[0]).isGreaterThan(0.5);
  }

  @Test
  void classDMajoranaNumberIsTheProductOfTheSpinBlocks() {
    // Derived: at λ = 0 a Zeeman field h_j s_z keeps S_z; the spin blocks are Kitaev chains with
    // μ_j ∓ h_j, and the Majorana number of a direct sum is the product (Kitaev 2001). Checks the
    // multi-fermion-per-site Majorana matrix of MajoranaOps against the one-fermion pwave-wire.
    MajoranaWorkspace ws = new MajoranaWorkspace();
    int size = 10;
    int odd = 0;
    for (long seed = 1; seed <= 8; seed++) {
      double mu = 1.4;
      double w = 3.0;
      TestRealisation r =
          aRealisation(DiiiWireModel.NAME)
              .with("mu", mu)
              .with("delta", 0.6)
              .size(size)
              .seed(seed)
              .disorder("zeeman-box", w);
      MajoranaNumberResult q =
          MajoranaKernel.majoranaNumber((MajoranaForm) r.model(), r.lattice(), r.build(), ws);
      RandomGenerator random = SeedOps.generator(seed);
      double[] h = new double[size];
      for (int s = 0; s < size; s++) {
        h[s] = w * (random.nextDouble() - 0.5);
      }
      int expected = blockMajoranaNumber(mu, h, -1, ws) * blockMajoranaNumber(mu, h, +1, ws);
      assertThat(q.q()).as("seed %d", seed).isEqualTo(expected).isNotZero();
      odd += expected == -1 ? 1 : 0;
    }
    assertThat(odd).isBetween(1, 7);
  }

  /** Majorana number of a pwave-wire ring with μ_j = mu + sign·h_j (spin ↑: sign −1). */
  private static int blockMajoranaNumber(double mu, double[] h, int sign, MajoranaWorkspace ws) {
    PWaveWireModel wire = new PWaveWireModel();
    Lattice lattice = wire.lattice(h.length, Boundary.PERIODIC);
    HamiltonianBuilder b = new HamiltonianBuilder();
    b.reset(lattice.orbitals());
    wire.addClean(new ParameterValues(Map.of("mu", mu, "t", 1.0, "delta", 0.6)), lattice, b);
    for (int s = 0; s < h.length; s++) {
      wire.addOnsitePotential(lattice, s, sign * h[s], b);
    }
    return MajoranaKernel.majoranaNumber(wire, lattice, b, ws).q();
  }
}
