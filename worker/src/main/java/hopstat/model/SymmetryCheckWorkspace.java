package hopstat.model;

/** Scratch for {@link SymmetryCheckKernel}: two o × o complex blocks. Grows, never shrinks. */
public final class SymmetryCheckWorkspace {

  double[] blockRe = new double[1];
  double[] blockIm = new double[1];
  double[] tempRe = new double[1];
  double[] tempIm = new double[1];

  void ensure(int orbitalsPerSite) {
    int n = orbitalsPerSite * orbitalsPerSite;
    if (blockRe.length < n) {
      blockRe = new double[n];
      blockIm = new double[n];
      tempRe = new double[n];
      tempIm = new double[n];
    }
  }
}
