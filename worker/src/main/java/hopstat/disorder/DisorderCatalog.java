package hopstat.disorder;

import java.util.Collection;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Optional;

/** The built-in disorder kinds, by spec name. */
public final class DisorderCatalog {

  private static final Map<String, DisorderKind> KINDS = build();

  private DisorderCatalog() {}

  private static Map<String, DisorderKind> build() {
    Map<String, DisorderKind> m = new LinkedHashMap<>();
    m.put(OnsiteBoxDisorder.NAME, new OnsiteBoxDisorder());
    m.put(OnsiteGaussDisorder.NAME, new OnsiteGaussDisorder());
    m.put(FieldBoxDisorder.NAME, new FieldBoxDisorder());
    m.put(CouplingBoxDisorder.NAME, new CouplingBoxDisorder());
    m.put(PairingBoxDisorder.NAME, new PairingBoxDisorder());
    m.put(BondBoxDisorder.NAME, new BondBoxDisorder());
    m.put(BondPhaseDisorder.NAME, new BondPhaseDisorder());
    m.put(MajoranaGaussDisorder.NAME, new MajoranaGaussDisorder());
    m.put(ZeemanBoxDisorder.NAME, new ZeemanBoxDisorder());
    m.put(VacancyDisorder.NAME, new VacancyDisorder());
    m.put(BondScaleDisorder.NAME, new BondScaleDisorder());
    return Collections.unmodifiableMap(m);
  }

  public static Optional<DisorderKind> find(String name) {
    return Optional.ofNullable(KINDS.get(name));
  }

  public static Collection<DisorderKind> all() {
    return KINDS.values();
  }
}
