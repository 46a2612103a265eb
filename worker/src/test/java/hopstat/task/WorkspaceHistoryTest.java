package hopstat.task;

import static hopstat.task.Points2d.aPoint;
import static org.assertj.core.api.Assertions.assertThat;

import hopstat.linalg.LinalgFactory;
import hopstat.linalg.LinalgKind;
import java.util.Map;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

/**
 * A realisation's values must not depend on what the worker's workspace computed before it (common
 * practice for reproducible runs; here it is the contract that makes 1 and N threads, resume and
 * sharding give identical journals). Regression: LAPACK's workspace size (lwork) and EJML's shift
 * generator used to carry over between calls and change the last bits.
 */
class WorkspaceHistoryTest {

  @ParameterizedTest
  @EnumSource(LinalgKind.class)
  void valuesAreIndependentOfEarlierRealisations(LinalgKind kind) {
    PointSpec clean =
        aPoint("qwz").with("m", 1).with("t", 1).size(12).observing("gap", "bott").build();
    RealisationTask task = new RealisationTask("p0-r0", 0, 0, 42L, clean);
    RealisationResult fresh =
        RealisationRunner.run(task, new RealisationWorkspace(LinalgFactory.create(kind)));

    RealisationWorkspace used = new RealisationWorkspace(LinalgFactory.create(kind));
    for (int i = 0; i < 4; i++) {
      // Other sizes and disordered samples whose occupied counts differ from the clean one's.
      PointSpec other =
          aPoint("qwz")
              .with("m", 1)
              .with("t", 1)
              .size(10 + i)
              .boxDisorder(5.0, Map.of())
              .observing("gap", "bott")
              .build();
      RealisationRunner.run(new RealisationTask("p1-r" + i, 1, i, 1000L + i, other), used);
    }
    RealisationResult after = RealisationRunner.run(task, used);
    assertThat(after.values()).isEqualTo(fresh.values());
  }
}
