package veldplan.objectives;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;
import veldplan.shared.scenario.OverPaths;

class PathStepTest {
  private static final double[] PATHS = {0.9, 0.6, 0.8, 0.7};

  @Test
  void meanCountsEveryPathTheSame() {
    assertEquals(0.75, PathStep.MEAN.combine(PATHS, Direction.MAXIMISE), 1e-15);
    assertEquals(0.75, PathStep.MEAN.combine(PATHS, Direction.MINIMISE), 1e-15);
  }

  @Test
  void worstDependsOnTheDirection() {
    assertEquals(0.6, PathStep.WORST.combine(PATHS, Direction.MAXIMISE));
    assertEquals(0.9, PathStep.WORST.combine(PATHS, Direction.MINIMISE));
  }

  @Test
  void percentileCountsFromTheBetterSide() {
    PathStep p100 = new PathStep(OverPaths.PERCENTILE, 100);
    PathStep p0 = new PathStep(OverPaths.PERCENTILE, 0);
    PathStep p50 = new PathStep(OverPaths.PERCENTILE, 50);
    assertEquals(PathStep.WORST.combine(PATHS, Direction.MAXIMISE),
        p100.combine(PATHS, Direction.MAXIMISE));
    assertEquals(PathStep.WORST.combine(PATHS, Direction.MINIMISE),
        p100.combine(PATHS, Direction.MINIMISE));
    assertEquals(0.9, p0.combine(PATHS, Direction.MAXIMISE));
    assertEquals(0.6, p0.combine(PATHS, Direction.MINIMISE));
    // Median of four values: halfway between the 2nd and 3rd (type 7 interpolation).
    assertEquals(0.75, p50.combine(PATHS, Direction.MAXIMISE), 1e-15);
    // 90th percentile, worse side, maximise: sorted 0.9 0.8 0.7 0.6, h = 3 x 0.9 = 2.7.
    assertEquals(0.7 + 0.7 * (0.6 - 0.7),
        new PathStep(OverPaths.PERCENTILE, 90).combine(PATHS, Direction.MAXIMISE), 1e-15);
  }

  @Test
  void worstPathKeepsItsOwnInterval() {
    Estimate[] perPath = {
        new Estimate(0.9, 0.8, 0.95, 40), new Estimate(0.5, 0.35, 0.65, 40)};
    Estimate worst = PathStep.WORST.combine(perPath, Direction.MAXIMISE);
    assertEquals(new Estimate(0.5, 0.35, 0.65, 80), worst);
  }

  @Test
  void percentileOutsideZeroToHundredIsRejected() {
    assertThrows(IllegalArgumentException.class, () -> new PathStep(OverPaths.PERCENTILE, 101));
  }

  @Test
  void describesItself() {
    assertEquals("worst path", PathStep.WORST.describe());
    assertEquals("90th percentile of paths (worse side)",
        new PathStep(OverPaths.PERCENTILE, 90).describe());
  }
}
