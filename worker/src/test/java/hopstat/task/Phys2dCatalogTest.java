package hopstat.task;

import static org.assertj.core.api.Assertions.assertThat;

import hopstat.lattice.Boundary;
import hopstat.model.Model;
import hopstat.model.ModelCatalog;
import hopstat.model.SymmetryClass;
import java.util.HashSet;
import java.util.Set;
import org.junit.jupiter.api.Test;

class Phys2dCatalogTest {

  @Test
  void quantityNamesAreGloballyUnique() {
    Set<String> seen = new HashSet<>();
    for (Observable o : ObservableCatalog.all()) {
      for (Quantity q : o.quantities()) {
        assertThat(seen.add(q.name())).as("duplicate quantity %s", q.name()).isTrue();
      }
    }
    assertThat(seen).contains("chern-marker", "chern-3region", "spin-chern", "z2");
  }

  @Test
  void modelsAreRegisteredWithTheirClasses() {
    assertThat(ModelCatalog.find("haldane")).map(Model::symmetryClass).contains(SymmetryClass.A);
    assertThat(ModelCatalog.find("flux-square"))
        .map(Model::symmetryClass)
        .contains(SymmetryClass.A);
    assertThat(ModelCatalog.find("pip-square")).map(Model::symmetryClass).contains(SymmetryClass.D);
    assertThat(ModelCatalog.find("bhz")).map(Model::symmetryClass).contains(SymmetryClass.AII);
  }

  @Test
  void applicabilityRules() {
    Model bhz = ModelCatalog.find("bhz").orElseThrow();
    Model qwz = ModelCatalog.find("qwz").orElseThrow();
    Observable z2 = ObservableCatalog.find("z2").orElseThrow();
    Observable marker = ObservableCatalog.find("chern-marker").orElseThrow();
    Observable spin = ObservableCatalog.find("spin-chern").orElseThrow();
    assertThat(z2.whyNotApplicable(bhz, Boundary.PERIODIC, SymmetryClass.AII)).isEmpty();
    assertThat(z2.whyNotApplicable(bhz, Boundary.OPEN, SymmetryClass.AII)).isPresent();
    assertThat(z2.whyNotApplicable(bhz, Boundary.PERIODIC, SymmetryClass.A)).isPresent();
    assertThat(z2.whyNotApplicable(qwz, Boundary.PERIODIC, SymmetryClass.AII)).isPresent();
    assertThat(marker.whyNotApplicable(qwz, Boundary.OPEN, SymmetryClass.A)).isEmpty();
    assertThat(marker.whyNotApplicable(qwz, Boundary.PERIODIC, SymmetryClass.A)).isPresent();
    assertThat(spin.whyNotApplicable(qwz, Boundary.PERIODIC, SymmetryClass.A)).isPresent();
    assertThat(spin.whyNotApplicable(bhz, Boundary.PERIODIC, SymmetryClass.AII)).isEmpty();
  }
}
