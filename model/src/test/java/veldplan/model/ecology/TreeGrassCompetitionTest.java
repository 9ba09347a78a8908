package veldplan.model.ecology;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Structural tests for {@link TreeGrassCompetition} (methods.md §5, derived from the model forms
 * [D]). No published coefficients are used: the sheet gives none on purpose.
 */
class TreeGrassCompetitionTest {

  /** The two curved forms, by name, for parameterised tests. */
  private static double grass(String form, double g0, double k, double x) {
    return "exponential".equals(form)
        ? TreeGrassCompetition.negativeExponential(g0, k, x)
        : TreeGrassCompetition.hyperbolic(g0, k, x);
  }

  @ParameterizedTest
  @CsvSource({"exponential, 0.1", "hyperbolic, 0.1", "exponential, 0.02", "hyperbolic, 0.5"})
  void grass_noTrees_isG0Exactly(String form, double k) {
    assertEquals(1800, grass(form, 1800, k, 0), 0);
  }

  @ParameterizedTest
  @CsvSource({"exponential, 0.1", "hyperbolic, 0.1", "exponential, 0.02", "hyperbolic, 0.5"})
  void grass_moreTrees_isLessAndFallsFastestAtFirst(String form, double k) {
    // [D] dG/dX < 0 for all X >= 0, and the curve is convex: the first increments of tree
    // biomass suppress grass the most (common practice, no source).
    double previous = grass(form, 1800, k, 0);
    double previousDrop = Double.POSITIVE_INFINITY;
    for (double x = 1; x <= 60; x += 1) {
      double g = grass(form, 1800, k, x);
      double drop = previous - g;
      assertTrue(drop > 0, form + " not decreasing at " + x);
      assertTrue(drop < previousDrop, form + " not convex at " + x);
      previous = g;
      previousDrop = drop;
    }
  }

  @Test
  void negativeExponential_k0point1At6point93_isHalfG0() {
    // [D] methods §5: half-yield at ln 2 / k = 6.93 m2/ha for k = 0.1 ha/m2 (tol 1e-3).
    assertEquals(0.5, TreeGrassCompetition.negativeExponential(1, 0.1, 6.93), 1e-3);
    assertEquals(Math.log(2) / 0.1, TreeGrassCompetition.halfYieldNegativeExponential(0.1),
        1e-12);
  }

  @Test
  void hyperbolic_k0point1At10_isHalfG0() {
    // [D] methods §5: half-yield at 1/k = 10.
    assertEquals(0.5, TreeGrassCompetition.hyperbolic(1, 0.1, 10), 1e-15);
    assertEquals(10, TreeGrassCompetition.halfYieldHyperbolic(0.1), 1e-12);
  }

  @Test
  void linearToFloor_beforeAndAfterTheFloor_isLineThenFloor() {
    // [D] methods §5: max(Gmin, G0 (1 - X/Xmax)).
    assertEquals(1500, TreeGrassCompetition.linearToFloor(2000, 300, 20, 5), 1e-12);
    assertEquals(300, TreeGrassCompetition.linearToFloor(2000, 300, 20, 19), 0);
    assertEquals(2000, TreeGrassCompetition.linearToFloor(2000, 300, 20, 0), 0);
  }

  @Test
  void invalidArguments_throw() {
    assertThrows(IllegalArgumentException.class,
        () -> TreeGrassCompetition.negativeExponential(1800, -0.1, 5));
    assertThrows(IllegalArgumentException.class,
        () -> TreeGrassCompetition.hyperbolic(1800, 0.1, Double.NaN));
    assertThrows(IllegalArgumentException.class,
        () -> TreeGrassCompetition.linearToFloor(2000, 2500, 20, 5));
    assertThrows(IllegalArgumentException.class,
        () -> TreeGrassCompetition.halfYieldHyperbolic(0));
  }
}
