package hopstat.linalg;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;

/** Factory wiring. The build platform (linux-x86_64) ships the native library, so it must load. */
class LinalgFactoryTest {

  @Test
  void nativeLoadsOnTheBuildPlatform() {
    assertThat(LinalgFactory.isNativeAvailable()).isTrue();
    Linalg linalg = LinalgFactory.create(LinalgKind.NATIVE);
    assertThat(linalg.kind()).isEqualTo(LinalgKind.NATIVE);
    assertThat(linalg.describe()).startsWith("native openblas 0.3.31").endsWith("(1 thread)");
  }

  @Test
  void nativeRunsOneBlasThread() {
    LinalgFactory.create(LinalgKind.NATIVE);
    assertThat(org.bytedeco.openblas.presets.openblas_nolapack.blas_get_num_threads()).isEqualTo(1);
  }

  @Test
  void preferredIsNativeWhereItLoads() {
    assertThat(LinalgFactory.preferred().kind())
        .isEqualTo(LinalgFactory.isNativeAvailable() ? LinalgKind.NATIVE : LinalgKind.JAVA);
    assertThat(LinalgFactory.preferred()).isSameAs(LinalgFactory.preferred());
  }

  @Test
  void javaIsAlwaysAvailable() {
    Linalg linalg = LinalgFactory.create(LinalgKind.JAVA);
    assertThat(linalg.kind()).isEqualTo(LinalgKind.JAVA);
    assertThat(linalg.describe()).startsWith("java ejml 0.43");
  }
}
