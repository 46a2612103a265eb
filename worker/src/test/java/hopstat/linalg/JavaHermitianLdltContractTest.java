package hopstat.linalg;

/** The LDLᴴ contract on the pure-Java Bunch–Kaufman fallback. */
class JavaHermitianLdltContractTest extends HermitianLdltContractTest {
  @Override
  protected LinalgKind kind() {
    return LinalgKind.JAVA;
  }
}
