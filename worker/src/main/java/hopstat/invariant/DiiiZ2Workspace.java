package hopstat.invariant;

import hopstat.linalg.ComplexDeterminantWorkspace;
import hopstat.linalg.ComplexPfaffianWorkspace;
import org.ejml.data.ZMatrixRMaj;

/**
 * Scratch for {@link DiiiZ2Kernel}: the chiral block q(φ), its antisymmetrised copy and the
 * determinant and Pfaffian scratch. Grows, never shrinks. One per worker thread.
 */
public final class DiiiZ2Workspace {

  final ZMatrixRMaj block = new ZMatrixRMaj(1, 1);
  final ZMatrixRMaj antisymmetric = new ZMatrixRMaj(1, 1);
  final ComplexDeterminantWorkspace determinant = new ComplexDeterminantWorkspace();
  final ComplexPfaffianWorkspace pfaffian = new ComplexPfaffianWorkspace();
}
