package hopstat.linalg;

import static org.bytedeco.openblas.global.openblas.LAPACKE_zheevr_work;
import static org.bytedeco.openblas.global.openblas.LAPACK_COL_MAJOR;

import java.util.SplittableRandom;
import java.util.concurrent.TimeUnit;
import org.bytedeco.javacpp.DoublePointer;
import org.bytedeco.javacpp.IntPointer;
import org.ejml.data.ZMatrixRMaj;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.TearDown;
import org.openjdk.jmh.annotations.Warmup;

/**
 * Hermitian eigensolver cost: the hopstat solvers (native and Java) against the bare LAPACKE {@code
 * zheevr} call on preallocated buffers, which bounds what the native wrapper can reach. The raw
 * variants include the copy of the input into native memory, since {@code zheevr} destroys its
 * input and every real call needs it too.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(1)
public class HermitianEigenBenchmark {

  @Param({"200", "800"})
  int n;

  private ZMatrixRMaj a;
  private double[] values;
  private ZMatrixRMaj vectors;
  private HermitianEigenSolver nativeSolver;
  private HermitianEigenSolver javaSolver;

  private DoublePointer matrix;
  private DoublePointer w;
  private DoublePointer z;
  private IntPointer found;
  private IntPointer support;
  private DoublePointer work;
  private DoublePointer rwork;
  private IntPointer iwork;
  private int lwork;
  private int lrwork;
  private int liwork;

  @Setup(Level.Trial)
  public void setUp() {
    SplittableRandom rng = new SplittableRandom(20240601L + n);
    a = new ZMatrixRMaj(n, n);
    for (int i = 0; i < n; i++) {
      a.set(i, i, rng.nextDouble(-1, 1), 0.0);
      for (int j = 0; j < i; j++) {
        double re = rng.nextDouble(-1, 1);
        double im = rng.nextDouble(-1, 1);
        a.set(i, j, re, im);
        a.set(j, i, re, -im);
      }
    }
    values = new double[n];
    vectors = new ZMatrixRMaj(n, n);
    nativeSolver = LinalgFactory.create(LinalgKind.NATIVE).newHermitianEigenSolver();
    javaSolver = LinalgFactory.create(LinalgKind.JAVA).newHermitianEigenSolver();

    matrix = new DoublePointer(2L * n * n);
    w = new DoublePointer(n);
    z = new DoublePointer(2L * n * n);
    found = new IntPointer(1);
    support = new IntPointer(2L * n);
    DoublePointer optWork = new DoublePointer(2);
    DoublePointer optRwork = new DoublePointer(1);
    IntPointer optIwork = new IntPointer(1);
    matrix.put(a.data, 0, 2 * n * n);
    int info =
        LAPACKE_zheevr_work(
            LAPACK_COL_MAJOR,
            (byte) 'V',
            (byte) 'A',
            (byte) 'U',
            n,
            matrix,
            n,
            0,
            0,
            0,
            0,
            0,
            found,
            w,
            z,
            n,
            support,
            optWork,
            -1,
            optRwork,
            -1,
            optIwork,
            -1);
    if (info != 0) {
      throw new IllegalStateException("workspace query failed: " + info);
    }
    lwork = (int) optWork.get(0);
    lrwork = (int) optRwork.get(0);
    liwork = optIwork.get(0);
    work = new DoublePointer(2L * lwork);
    rwork = new DoublePointer(lrwork);
    iwork = new IntPointer(liwork);
  }

  @TearDown(Level.Trial)
  public void tearDown() {
    matrix.close();
    w.close();
    z.close();
    found.close();
    support.close();
    work.close();
    rwork.close();
    iwork.close();
  }

  private int rawZheevr(byte jobz) {
    matrix.put(a.data, 0, 2 * n * n);
    return LAPACKE_zheevr_work(
        LAPACK_COL_MAJOR,
        jobz,
        (byte) 'A',
        (byte) 'U',
        n,
        matrix,
        n,
        0,
        0,
        0,
        0,
        0,
        found,
        w,
        z,
        n,
        support,
        work,
        lwork,
        rwork,
        lrwork,
        iwork,
        liwork);
  }

  @Benchmark
  public int rawLapackeValues() {
    return rawZheevr((byte) 'N');
  }

  @Benchmark
  public int rawLapackeVectors() {
    return rawZheevr((byte) 'V');
  }

  @Benchmark
  public double[] nativeValues() {
    nativeSolver.eigenvalues(a, values);
    return values;
  }

  @Benchmark
  public ZMatrixRMaj nativeVectorsAll() {
    nativeSolver.eigenpairs(a, values, 0, n - 1, vectors);
    return vectors;
  }

  @Benchmark
  public ZMatrixRMaj nativeVectorsLowerHalf() {
    nativeSolver.eigenpairs(a, values, 0, n / 2 - 1, vectors);
    return vectors;
  }

  @Benchmark
  public double[] javaValues() {
    javaSolver.eigenvalues(a, values);
    return values;
  }

  @Benchmark
  public ZMatrixRMaj javaVectorsAll() {
    javaSolver.eigenpairs(a, values, 0, n - 1, vectors);
    return vectors;
  }
}
