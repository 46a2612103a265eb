package hopstat.linalg;

/** The contract on the native OpenBLAS/LAPACK backend. */
class NativeLinalgContractTest extends LinalgContractTest {

  @Override
  protected Linalg linalg() {
    return LinalgFactory.create(LinalgKind.NATIVE);
  }
}
