package hopstat.task;

import java.util.Collection;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Optional;

/** The built-in observables, by spec name, and their quantities. */
public final class ObservableCatalog {

  private static final Map<String, Observable> OBSERVABLES = build();

  private ObservableCatalog() {}

  private static Map<String, Observable> build() {
    Map<String, Observable> m = new LinkedHashMap<>();
    register(m, new GapObservable());
    register(m, new BottObservable());
    register(m, new ChernMarkerObservable());
    register(m, new ThreeRegionChernObservable());
    register(m, new SpinChernObservable());
    register(m, new SpinBottObservable());
    register(m, new Z2Observable());
    register(m, new ParityObservable());
    register(m, new WindingObservable());
    register(m, new LyapunovObservable());
    register(m, new LevelRatioObservable());
    register(m, new IprObservable());
    register(m, new BottVersusFermiEnergyObservable());
    register(m, new LocalizerChernObservable());
    register(m, new LocalizerGapObservable());
    register(m, new LocalizerWindingObservable());
    register(m, new InertiaGapObservable());
    register(m, new KpmDosObservable());
    register(m, new KpmChernMarkerObservable());
    return Collections.unmodifiableMap(m);
  }

  private static void register(Map<String, Observable> m, Observable o) {
    if (m.put(o.name(), o) != null) {
      throw new IllegalStateException("duplicate observable " + o.name());
    }
  }

  public static Optional<Observable> find(String name) {
    return Optional.ofNullable(OBSERVABLES.get(name));
  }

  public static Collection<Observable> all() {
    return OBSERVABLES.values();
  }

  /** The quantity of that name produced by any observable, if there is one. */
  public static Optional<Quantity> quantity(String name) {
    for (Observable o : OBSERVABLES.values()) {
      for (Quantity q : o.quantities()) {
        if (q.name().equals(name)) {
          return Optional.of(q);
        }
      }
    }
    return Optional.empty();
  }
}
