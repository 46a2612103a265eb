package hopstat.expand;

import hopstat.task.InvalidInputException;
import hopstat.task.RealisationCost;
import java.lang.management.ManagementFactory;
import java.util.Locale;

/**
 * Refuses, before anything runs, a study whose realisations cannot fit in memory with the threads
 * asked for.
 */
public final class MemoryCheck {

  /** Heap kept free for the JVM, the journal and the task list. */
  public static final long HEAP_RESERVE_BYTES = 256L << 20;

  private MemoryCheck() {}

  /** The largest per-realisation cost over the grid. */
  public static RealisationCost largest(StudyPlan plan) {
    RealisationCost worst = null;
    for (GridPoint p : plan.points()) {
      RealisationCost c = RealisationCost.of(p.point());
      if (worst == null
          || c.heapBytes() + c.nativeBytes() > worst.heapBytes() + worst.nativeBytes()) {
        worst = c;
      }
    }
    return worst;
  }

  /**
   * @throws InvalidInputException (field {@code --threads}) when threads × the largest realisation
   *     does not fit in the JVM's maximum heap or the machine's physical memory
   */
  public static void require(StudyPlan plan, int threads) {
    RealisationCost c = largest(plan);
    long heapMax = Runtime.getRuntime().maxMemory();
    long physical = physicalMemory();
    long heapNeed = threads * c.heapBytes() + HEAP_RESERVE_BYTES;
    long totalNeed = heapNeed + threads * c.nativeBytes();
    if (heapNeed > heapMax || (physical > 0 && totalNeed > physical)) {
      long fitThreads =
          Math.max(
              0,
              Math.min(
                  (heapMax - HEAP_RESERVE_BYTES) / Math.max(1, c.heapBytes()),
                  physical > 0
                      ? (physical - HEAP_RESERVE_BYTES)
                          / Math.max(1, c.heapBytes() + c.nativeBytes())
                      : Long.MAX_VALUE));
      throw new InvalidInputException(
          "--threads",
          threads,
          String.format(
              Locale.ROOT,
              "the largest realisation (N = %d) needs %s heap + %s native per worker: %s heap in all for %d thread(s), but the JVM may use %s"
                  + " (machine: %s). Fit it with --threads %d, a smaller L, or more heap (java -Xmx...)",
              c.matrixDimension(),
              bytes(c.heapBytes()),
              bytes(c.nativeBytes()),
              bytes(heapNeed),
              threads,
              bytes(heapMax),
              physical > 0 ? bytes(physical) : "unknown",
              Math.max(1, fitThreads)));
    }
  }

  public static long physicalMemory() {
    if (ManagementFactory.getOperatingSystemMXBean()
        instanceof com.sun.management.OperatingSystemMXBean os) {
      return os.getTotalMemorySize();
    }
    return -1;
  }

  public static String bytes(long b) {
    if (b >= 1L << 30) {
      return String.format(Locale.ROOT, "%.2f GiB", b / (double) (1L << 30));
    }
    return String.format(Locale.ROOT, "%.1f MiB", b / (double) (1L << 20));
  }
}
