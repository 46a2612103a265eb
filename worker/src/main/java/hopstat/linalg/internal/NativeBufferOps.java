package hopstat.linalg.internal;

import org.bytedeco.javacpp.DoublePointer;
import org.bytedeco.javacpp.IntPointer;

/** Grow-only native buffers: reallocate only when a larger size arrives, never shrink. */
final class NativeBufferOps {

  private NativeBufferOps() {}

  static DoublePointer ensure(DoublePointer p, long doubles) {
    long want = Math.max(1, doubles);
    if (p != null && p.capacity() >= want) {
      return p;
    }
    if (p != null) {
      p.close();
    }
    return new DoublePointer(want);
  }

  static IntPointer ensure(IntPointer p, long ints) {
    long want = Math.max(1, ints);
    if (p != null && p.capacity() >= want) {
      return p;
    }
    if (p != null) {
      p.close();
    }
    return new IntPointer(want);
  }

  static double[] ensure(double[] array, int length) {
    return array != null && array.length >= length ? array : new double[length];
  }
}
