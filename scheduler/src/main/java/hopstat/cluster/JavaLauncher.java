package hopstat.cluster;

import java.net.URISyntaxException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

/**
 * How a batch job starts hopstat on a compute node: an explicit java binary and the arguments that
 * select hopstat (normally {@code -jar /abs/path/hopstat.jar}). Paths are absolute because the job
 * runs in another process, on another node, with another working directory; they must be on a file
 * system that the compute nodes share.
 *
 * @param javaBinary absolute path of the java executable
 * @param launch arguments after the JVM options that start hopstat's main class
 */
public record JavaLauncher(String javaBinary, List<String> launch) {
  public JavaLauncher {
    Objects.requireNonNull(javaBinary, "javaBinary");
    launch = List.copyOf(launch);
    if (!Path.of(javaBinary).isAbsolute()) {
      throw new IllegalArgumentException("java binary must be an absolute path: " + javaBinary);
    }
  }

  /**
   * The launcher of the running JVM: its own java binary ({@code java.home}), and the jar this
   * class was loaded from; when running from class folders (development, tests) the class path and
   * {@code mainClass} instead.
   */
  public static JavaLauncher current(Class<?> mainClass) {
    Path javaBin = Path.of(System.getProperty("java.home"), "bin", "java").toAbsolutePath();
    Path source;
    try {
      source =
          Path.of(mainClass.getProtectionDomain().getCodeSource().getLocation().toURI())
              .toAbsolutePath();
    } catch (URISyntaxException e) {
      throw new IllegalStateException("cannot locate the hopstat jar: " + e.getMessage(), e);
    }
    if (Files.isRegularFile(source) && source.getFileName().toString().endsWith(".jar")) {
      return new JavaLauncher(javaBin.toString(), List.of("-jar", source.toString()));
    }
    List<String> absolute = new ArrayList<>();
    for (String entry : System.getProperty("java.class.path").split(java.io.File.pathSeparator)) {
      absolute.add(Path.of(entry).toAbsolutePath().toString());
    }
    return new JavaLauncher(
        javaBin.toString(),
        List.of("-cp", String.join(java.io.File.pathSeparator, absolute), mainClass.getName()));
  }

  /**
   * The command line: java, then {@code jvmOptions}, then the launch arguments, then {@code
   * hopstatArgs}.
   */
  public List<String> command(List<String> jvmOptions, List<String> hopstatArgs) {
    List<String> argv = new ArrayList<>();
    argv.add(javaBinary);
    argv.addAll(jvmOptions);
    argv.addAll(launch);
    argv.addAll(hopstatArgs);
    return argv;
  }
}
