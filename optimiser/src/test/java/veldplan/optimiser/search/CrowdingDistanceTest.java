package veldplan.optimiser.search;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/** Tests for {@link CrowdingDistance}: decision-methods.md §2.2 (Deb et al. 2002). */
class CrowdingDistanceTest {
  private static final double INF = Double.POSITIVE_INFINITY;

  @Test
  void of_publishedExample() {
    // decision-methods §2.2 and §9 [calc]: front (0,10), (1,4), (2,3), (10,0)
    // -> distances [inf, 0.9, 1.3, inf].
    double[] d = CrowdingDistance.of(new double[][] {{0, 10}, {1, 4}, {2, 3}, {10, 0}});
    assertArrayEquals(new double[] {INF, 0.9, 1.3, INF}, d, 1e-12);
  }

  @Test
  void of_orderOfTheFrontDoesNotMatter() {
    double[] d = CrowdingDistance.of(new double[][] {{2, 3}, {10, 0}, {0, 10}, {1, 4}});
    assertArrayEquals(new double[] {1.3, INF, INF, 0.9}, d, 1e-12);
  }

  @Test
  void of_degenerateObjectiveIsSkipped() {
    // decision-methods §2.2: if f_max = f_min, skip that objective (no 0/0).
    double[] d = CrowdingDistance.of(new double[][] {{0, 5}, {1, 5}, {3, 5}, {4, 5}});
    // f1 spans 4: (3 - 0)/4 and (4 - 1)/4; f2 adds nothing.
    assertArrayEquals(new double[] {INF, 0.75, 0.75, INF}, d, 1e-12);
    double[] same = CrowdingDistance.of(new double[][] {{1, 1}, {1, 1}, {1, 1}});
    assertArrayEquals(new double[] {0, 0, 0}, same, 0);
  }

  @Test
  void of_oneOrTwoMembers_areBoundaries() {
    assertArrayEquals(new double[] {INF, INF},
        CrowdingDistance.of(new double[][] {{0, 1}, {1, 0}}), 0);
    assertEquals(0, CrowdingDistance.of(new double[][] {{0, 1}})[0], 0,
        "a single member spans no range in any objective");
  }
}
