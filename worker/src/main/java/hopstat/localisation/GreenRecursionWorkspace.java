package hopstat.localisation;

import hopstat.linalg.ComplexProducts;
import hopstat.linalg.HermitianLdltFactory;
import hopstat.linalg.HermitianLdltSolver;
import hopstat.linalg.Linalg;
import hopstat.linalg.LinalgFactory;
import hopstat.linalg.LinalgKind;
import org.ejml.data.ZMatrixRMaj;

/**
 * Scratch for {@link GreenRecursionKernel}: eight K × K complex blocks (the slice's H and T, the
 * previous T, the self-energy, the matrix to factor, G_nn, G_1n and a product buffer), an LDLᴴ
 * solver and a product engine. Memory O(K²), independent of the bar length. Grows, never shrinks.
 * One per worker thread.
 *
 * <p>Backend: slices of K ≤ {@link #SMALL_SLICE} orbitals use the pure-Java solver and products
 * whatever {@code linalg} is, because each native call crosses JNI and copies its operands, a fixed
 * cost expected to dominate 2 × 2 or 4 × 4 blocks; larger slices use {@code linalg}'s kind. The
 * threshold is a design guess, not yet backed by a benchmark.
 */
public final class GreenRecursionWorkspace {

  /** Largest K handled by the pure-Java path (see the class Javadoc). */
  public static final int SMALL_SLICE = 16;

  private final Linalg linalg;
  private final Linalg small = LinalgFactory.create(LinalgKind.JAVA);
  private int sizedFor = -1;
  ZMatrixRMaj onSlice = new ZMatrixRMaj(1, 1);
  ZMatrixRMaj coupling = new ZMatrixRMaj(1, 1);
  ZMatrixRMaj previousCoupling = new ZMatrixRMaj(1, 1);
  ZMatrixRMaj sigma = new ZMatrixRMaj(1, 1);
  ZMatrixRMaj a = new ZMatrixRMaj(1, 1);
  ZMatrixRMaj green = new ZMatrixRMaj(1, 1);
  ZMatrixRMaj endToEnd = new ZMatrixRMaj(1, 1);
  ZMatrixRMaj scratch = new ZMatrixRMaj(1, 1);
  ZMatrixRMaj identity = new ZMatrixRMaj(1, 1);
  HermitianLdltSolver ldlt;
  ComplexProducts products;
  private HermitianLdltSolver ldltLarge;
  private ComplexProducts productsLarge;
  private HermitianLdltSolver ldltSmall;
  private ComplexProducts productsSmall;

  /** @param linalg the backend for slices larger than {@link #SMALL_SLICE}; read */
  public GreenRecursionWorkspace(Linalg linalg) {
    this.linalg = java.util.Objects.requireNonNull(linalg, "linalg");
  }

  void ensure(int k) {
    if (k <= SMALL_SLICE) {
      if (ldltSmall == null) {
        ldltSmall = HermitianLdltFactory.create(small);
        productsSmall = small.newComplexProducts();
      }
      ldlt = ldltSmall;
      products = productsSmall;
    } else {
      if (ldltLarge == null) {
        ldltLarge = HermitianLdltFactory.create(linalg);
        productsLarge = linalg.newComplexProducts();
      }
      ldlt = ldltLarge;
      products = productsLarge;
    }
    if (k == sizedFor) {
      return;
    }
    for (ZMatrixRMaj m : new ZMatrixRMaj[] {onSlice, coupling, previousCoupling, sigma, a, green, endToEnd, scratch, identity}) {
      m.reshape(k, k);
    }
    identity.zero();
    for (int i = 0; i < k; i++) {
      identity.set(i, i, 1.0, 0.0);
    }
    sizedFor = k;
  }
}
