package hopstat.linalg.internal;

import org.ejml.data.ZMatrixRMaj;

/** Argument checks shared by both backends, done once on entry to each call. */
final class LinalgCheckOps {

  private LinalgCheckOps() {}

  /** Returns n for a square matrix, else throws. */
  static int requireSquare(ZMatrixRMaj a) {
    if (a.numRows != a.numCols) {
      throw new IllegalArgumentException(
          "matrix must be square, got " + a.numRows + "x" + a.numCols);
    }
    return a.numRows;
  }

  static void requireLength(double[] array, int n, String name) {
    if (array.length < n) {
      throw new IllegalArgumentException(name + " has length " + array.length + " < n = " + n);
    }
  }

  static void requireRange(int first, int last, int n) {
    if (first < 0 || last < first - 1 || last >= n) {
      throw new IllegalArgumentException(
          "eigenvector index range " + first + ".." + last + " invalid for n = " + n);
    }
  }

  static void requireDistinct(Object in, Object out, String inName, String outName) {
    if (in == out) {
      throw new IllegalArgumentException(outName + " must not alias " + inName);
    }
  }

  static void requireDistinct(double[] a, double[] b) {
    if (a == b) {
      throw new IllegalArgumentException("real and imaginary outputs must be distinct arrays");
    }
  }

  /** Checks inner dimensions and aliasing; returns nothing, c is reshaped by the caller. */
  static void requireProduct(
      ZMatrixRMaj a, ZMatrixRMaj b, ZMatrixRMaj c, int innerA, int innerB, String op) {
    if (innerA != innerB) {
      throw new IllegalArgumentException(
          op
              + ": inner dimensions differ, a is "
              + a.numRows
              + "x"
              + a.numCols
              + ", b is "
              + b.numRows
              + "x"
              + b.numCols);
    }
    requireDistinct(a, c, "a", "c");
    requireDistinct(b, c, "b", "c");
  }
}
