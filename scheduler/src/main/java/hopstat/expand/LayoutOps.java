package hopstat.expand;

import hopstat.record.StudyLayout;
import hopstat.task.ObservableCatalog;
import hopstat.task.Quantity;
import java.util.ArrayList;
import java.util.List;

/** Derives the results-side {@link StudyLayout} from an expanded plan. */
public final class LayoutOps {

  private LayoutOps() {}

  public static StudyLayout layout(StudyPlan plan) {
    List<StudyLayout.Point> points = new ArrayList<>();
    for (GridPoint p : plan.points()) {
      points.add(new StudyLayout.Point(p.index(), p.coordinates()));
    }
    List<Quantity> quantities = new ArrayList<>();
    for (String name : plan.spec().observables()) {
      quantities.addAll(ObservableCatalog.find(name).orElseThrow().quantities());
    }
    return new StudyLayout(
        plan.spec().name(),
        plan.spec().specHash(),
        plan.gridNames(),
        points,
        quantities,
        plan.spec().realisations(),
        plan.spec().effectiveClass());
  }
}
