package hopstat.linalg;

/** The LDLᴴ contract on LAPACK zhetrf/zhetrs2. */
class NativeHermitianLdltContractTest extends HermitianLdltContractTest {
  @Override
  protected LinalgKind kind() {
    return LinalgKind.NATIVE;
  }
}
