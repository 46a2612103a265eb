package hopstat.invariant;

import hopstat.linalg.PfaffianWorkspace;
import org.ejml.data.DMatrixRMaj;

/**
 * Scratch for {@link MajoranaKernel}: the Majorana matrix, its imaginary-part check and the
 * Pfaffian scratch. Grows, never shrinks. One per worker thread.
 */
public final class MajoranaWorkspace {

  final DMatrixRMaj majorana = new DMatrixRMaj(1, 1);
  final DMatrixRMaj imaginary = new DMatrixRMaj(1, 1);
  final PfaffianWorkspace pfaffian = new PfaffianWorkspace();
}
