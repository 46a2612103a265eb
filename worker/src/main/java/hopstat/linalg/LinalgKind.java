package hopstat.linalg;

/** Which dense linear-algebra implementation serves a worker. */
public enum LinalgKind {
  /** OpenBLAS/LAPACK shipped in a Maven jar, one BLAS thread per worker. The default. */
  NATIVE,
  /** Pure-Java EJML, for machines where the native library does not load. */
  JAVA
}
