package hopstat.cli;

import hopstat.disorder.DisorderCatalog;
import hopstat.disorder.DisorderKind;
import hopstat.lattice.Boundary;
import hopstat.model.Model;
import hopstat.model.ModelCatalog;
import hopstat.model.ParameterInfo;
import hopstat.task.Observable;
import hopstat.task.ObservableCatalog;
import java.io.PrintStream;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.ParentCommand;

/**
 * {@code hopstat models}: the built-in models, their classes, parameters and applicable
 * observables.
 */
@Command(
    mixinStandardHelpOptions = true,
    name = "models",
    description =
        "List the built-in models (class, dimension, parameters, observables) and disorder types.")
final class ModelsCommand implements Callable<Integer> {

  @ParentCommand HopstatCommand root;

  @Override
  public Integer call() {
    PrintStream out = root.out;
    for (Model m : ModelCatalog.all()) {
      out.printf(
          Locale.ROOT,
          "%s  (class %s, d = %d)%n  %s%n  parameters:%n",
          m.name(),
          m.symmetryClass(),
          m.dimension(),
          m.description());
      for (ParameterInfo p : m.parameters()) {
        out.printf(
            Locale.ROOT,
            "    %-12s %-10s %s%n",
            p.name(),
            p.isRequired() ? "required" : "= " + p.defaultValue(),
            p.description());
      }
      List<String> applicable = new ArrayList<>();
      for (Observable o : ObservableCatalog.all()) {
        List<String> boundaries = new ArrayList<>();
        for (Boundary b : Boundary.values()) {
          if (o.whyNotApplicable(m, b, m.symmetryClass()).isEmpty()) {
            boundaries.add(b.specName());
          }
        }
        if (!boundaries.isEmpty()) {
          applicable.add(o.name() + " (" + String.join("/", boundaries) + ")");
        }
      }
      out.printf(Locale.ROOT, "  observables: %s%n%n", String.join(", ", applicable));
    }
    out.printf(
        Locale.ROOT,
        "%s  (user-defined, d = 1..3)%n  %s%n%n",
        hopstat.model.CustomModel.NAME,
        "the spec's \"lattice\" block: orbitals, onsite, hoppings, optional BdG pairings, the AZ class and its T/C/S operators;"
            + " amplitudes may name parameters, which join the spec's parameters");
    out.println("disorder types:");
    for (DisorderKind d : DisorderCatalog.all()) {
      out.printf(Locale.ROOT, "  %-14s %s%n", d.name(), d.description());
    }
    out.println();
    out.println("observables:");
    for (Observable o : ObservableCatalog.all()) {
      out.printf(Locale.ROOT, "  %-14s %s%n", o.name(), o.description());
    }
    return ExitCode.OK;
  }
}
