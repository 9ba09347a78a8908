package veldplan.model;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/**
 * {@link Fire#ignites} with the bounds of {@link Fire#ignitionBounds} must decide exactly as the
 * published test draw &lt; 1 - exp(-rate) (Poisson: at least one ignition), including rates a
 * few ulps from each draw's threshold. Arithmetic identity, no outside values.
 */
class FireIgnitionTest {
  private static boolean exact(double rate, double draw) {
    return draw < 1 - Math.exp(-rate);
  }

  private static void check(double u, double rate, double[] above, double[] below) {
    boolean fast = Fire.ignites(rate, u, above[0], below[0]);
    assertEquals(exact(rate, u), fast, () -> "u " + u + " rate " + rate);
  }

  private static void checkAround(double u) {
    double[] above = new double[1];
    double[] below = new double[1];
    Fire.ignitionBounds(u, above, below, 0);
    assertTrue(below[0] < above[0]);
    double t = -Math.log1p(-u);
    // Rates a few ulps either side of the threshold, a little further out, at the bounds, and
    // far away.
    double r = t;
    for (int step = 0; step < 40; step++) {
      check(u, r, above, below);
      r = Math.nextUp(r);
    }
    r = t;
    for (int step = 0; step < 40 && r > 0; step++) {
      check(u, r, above, below);
      r = Math.nextDown(r);
    }
    for (double factor : new double[] {1e-9, 1e-6, 1e-3, 0.01, 0.5, 2, 10}) {
      check(u, t * (1 + factor), above, below);
      check(u, t * (1 - Math.min(factor, 1)), above, below);
    }
    for (double bound : new double[] {above[0], below[0]}) {
      if (bound >= 0 && bound < Double.POSITIVE_INFINITY) {
        check(u, bound, above, below);
        check(u, Math.nextUp(bound), above, below);
        check(u, Math.nextDown(Math.max(bound, Double.MIN_VALUE)), above, below);
      }
    }
    check(u, 0, above, below);
    check(u, 50, above, below);
  }

  @Test
  void fastDecision_equalsExactTest_nearEveryThreshold() {
    SplittableRandom random = new SplittableRandom(20261202);
    for (int i = 0; i < 200_000; i++) {
      checkAround(random.nextDouble());
    }
    // Extremes: the smallest draws, draws near 1, and 1 - 2^-53.
    double[] special = {0, 0x1p-53, 0x1p-40, 1e-300, 1e-16, 0.5, 1 - 0x1p-20, 1 - 0x1p-46,
        1 - 0x1p-47, 1 - 0x1p-48, 1 - 0x1p-52, Math.nextDown(1.0)};
    for (double u : special) {
      checkAround(u);
    }
  }

  @Test
  void bounds_areTight_soTheExponentialIsRarelyNeeded() {
    // A loose bound would still decide correctly but buy nothing: for a typical draw the
    // bounds lie within a relative 1e-9 of the threshold.
    double[] above = new double[1];
    double[] below = new double[1];
    Fire.ignitionBounds(0.3, above, below, 0);
    double t = -Math.log1p(-0.3);
    assertTrue(above[0] > t && above[0] < t * (1 + 1e-9));
    assertTrue(below[0] < t && below[0] > t * (1 - 1e-9));
  }
}
