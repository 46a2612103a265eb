package hopstat.localisation;

import hopstat.linalg.ComplexProducts;
import hopstat.linalg.Linalg;
import hopstat.linalg.LinalgFactory;
import hopstat.linalg.LinalgKind;
import org.ejml.data.ZMatrixRMaj;

/**
 * Scratch for {@link GreenRecursionKernel}: twelve K × K complex blocks (the slice's H and T, the
 * previous T, the two halves of the solution frame, Z, the kernel halves X and C, A_n, the
 * accumulated product, a buffer and the identity), three 2K × K blocks (stacked matrix, Householder
 * reflectors, Q columns), a 2K-double row buffer for the Householder steps and a product engine.
 * The kernel swaps same-sized blocks between fields instead of copying them; every run starts by
 * overwriting what it reads, so no state carries over between runs. Memory O(K²), independent of
 * the bar length. Grows, never shrinks. One per worker thread.
 *
 * <p>Backend: the Householder steps are pure Java for every K. Slices of K ≤ {@link #SMALL_SLICE}
 * orbitals use the pure-Java products whatever {@code linalg} is, because each native call crosses
 * JNI and copies its operands, a fixed cost expected to dominate 2 × 2 or 4 × 4 blocks; larger
 * slices use {@code linalg}'s kind. The threshold is a design guess, not yet backed by a benchmark.
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
  ZMatrixRMaj frameTop = new ZMatrixRMaj(1, 1);
  ZMatrixRMaj frameBottom = new ZMatrixRMaj(1, 1);
  ZMatrixRMaj z = new ZMatrixRMaj(1, 1);
  ZMatrixRMaj x = new ZMatrixRMaj(1, 1);
  ZMatrixRMaj c = new ZMatrixRMaj(1, 1);
  ZMatrixRMaj a = new ZMatrixRMaj(1, 1);
  ZMatrixRMaj product = new ZMatrixRMaj(1, 1);
  ZMatrixRMaj scratch = new ZMatrixRMaj(1, 1);
  ZMatrixRMaj identity = new ZMatrixRMaj(1, 1);
  ZMatrixRMaj stacked = new ZMatrixRMaj(2, 1);
  ZMatrixRMaj reflectors = new ZMatrixRMaj(2, 1);
  ZMatrixRMaj kernel = new ZMatrixRMaj(2, 1);
  double[] row = new double[2];
  ComplexProducts products;
  private ComplexProducts productsLarge;
  private ComplexProducts productsSmall;

  /**
   * @param linalg the backend for slices larger than {@link #SMALL_SLICE}; read
   */
  public GreenRecursionWorkspace(Linalg linalg) {
    this.linalg = java.util.Objects.requireNonNull(linalg, "linalg");
  }

  void ensure(int k) {
    if (k <= SMALL_SLICE) {
      if (productsSmall == null) {
        productsSmall = small.newComplexProducts();
      }
      products = productsSmall;
    } else {
      if (productsLarge == null) {
        productsLarge = linalg.newComplexProducts();
      }
      products = productsLarge;
    }
    if (k == sizedFor) {
      return;
    }
    for (ZMatrixRMaj m :
        new ZMatrixRMaj[] {
          onSlice,
          coupling,
          previousCoupling,
          frameTop,
          frameBottom,
          z,
          x,
          c,
          a,
          product,
          scratch,
          identity
        }) {
      m.reshape(k, k);
    }
    for (ZMatrixRMaj m : new ZMatrixRMaj[] {stacked, reflectors, kernel}) {
      m.reshape(2 * k, k);
    }
    if (row.length < 2 * k) {
      row = new double[2 * k];
    }
    identity.zero();
    for (int i = 0; i < k; i++) {
      identity.set(i, i, 1.0, 0.0);
    }
    sizedFor = k;
  }
}
