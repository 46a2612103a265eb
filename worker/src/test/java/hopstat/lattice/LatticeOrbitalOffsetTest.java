package hopstat.lattice;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import hopstat.model.CustomModel;
import hopstat.model.CustomModelDefinition;
import hopstat.model.CustomModelDefinition.Amplitude;
import hopstat.model.CustomModelDefinition.Orbital;
import hopstat.model.CustomModelDefinition.Term;
import hopstat.model.SymmetryClass;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * Orbital offsets of {@link Lattice}: defaults, copies, validation, Nambu layout of custom models
 * (direct checks).
 */
class LatticeOrbitalOffsetTest {

  @Test
  void defaultOffsetsAreZeroAndOrbitalPositionIsTheSitePosition() {
    Lattice square = Lattice.square(3, 2, Boundary.OPEN);
    assertThat(square.hasOrbitalOffsets()).isFalse();
    for (int i = 0; i < square.orbitals(); i++) {
      assertThat(square.orbitalPosition(0, i)).isEqualTo(square.position(0, i / 2));
      assertThat(square.orbitalPosition(1, i)).isEqualTo(square.position(1, i / 2));
    }
    assertThat(square.minOrbitalPosition(0)).isEqualTo(square.minPosition(0));
    assertThat(square.maxOrbitalPosition(1)).isEqualTo(square.maxPosition(1));
  }

  @Test
  void withOrbitalOffsetsShiftsEachOrbitalAndCopiesItsInput() {
    Lattice square = Lattice.square(3, 2, Boundary.PERIODIC);
    double[][] offsets = {{0.0, 0.25}, {0.0, -0.5}};
    Lattice moved = square.withOrbitalOffsets(offsets);
    offsets[0][1] = 9.0;
    assertThat(moved.orbitalPosition(0, 2 * 4 + 1)).isEqualTo(1.25);
    assertThat(moved.orbitalPosition(1, 2 * 4 + 1)).isEqualTo(0.5);
    assertThat(moved.orbitalPosition(0, 2 * 4)).isEqualTo(1.0);
    assertThat(moved.minOrbitalPosition(1)).isEqualTo(-0.5);
    assertThat(moved.maxOrbitalPosition(0)).isEqualTo(2.25);
    assertThat(moved).isNotEqualTo(square);
    assertThat(moved.withOrbitalOffsets(new double[2][2])).isEqualTo(square);
    moved.orbitalOffsets()[0][1] = 7.0;
    assertThat(moved.orbitalOffset(0, 1)).isEqualTo(0.25);
    assertThatThrownBy(() -> square.withOrbitalOffsets(new double[2][3]))
        .isInstanceOf(IllegalArgumentException.class);
    assertThatThrownBy(() -> square.withOrbitalOffsets(new double[][] {{0, Double.NaN}, {0, 0}}))
        .isInstanceOf(IllegalArgumentException.class);
  }

  /**
   * Nambu form (CustomModel): orbitals 0..n−1 particles, n..2n−1 holes; a hole sits at its
   * particle's position.
   */
  @Test
  void customNambuHolesSitAtTheirParticlePositions() {
    CustomModel model =
        new CustomModel(
            new CustomModelDefinition(
                2,
                List.of(List.of(1.0, 0.0), List.of(0.0, 1.0)),
                List.of(new Orbital("a", List.of(0.1, 0.2)), new Orbital("b", List.of(0.5, 0.0))),
                List.of(),
                List.of(new Term(List.of(0, 0), 0, 1, Amplitude.of(1.0, 0.0))),
                List.of(new Term(List.of(1, 0), 0, 0, Amplitude.of(0.3, 0.0))),
                SymmetryClass.D,
                List.of()));
    Lattice lattice = model.lattice(3, Boundary.OPEN);
    assertThat(lattice.orbitalsPerSite()).isEqualTo(4);
    double[][] expected = {{0.1, 0.5, 0.1, 0.5}, {0.2, 0.0, 0.2, 0.0}};
    assertThat(lattice.orbitalOffsets()).isDeepEqualTo(expected);
    // cell 4 = (1, 1): hole of b at (1.5, 1.0)
    assertThat(lattice.orbitalPosition(0, 4 * 4 + 3)).isEqualTo(1.5);
    assertThat(lattice.orbitalPosition(1, 4 * 4 + 3)).isEqualTo(1.0);
  }
}
