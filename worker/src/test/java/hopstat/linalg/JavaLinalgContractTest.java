package hopstat.linalg;

/** The contract on the pure-Java EJML backend. */
class JavaLinalgContractTest extends LinalgContractTest {

  @Override
  protected Linalg linalg() {
    return LinalgFactory.create(LinalgKind.JAVA);
  }
}
