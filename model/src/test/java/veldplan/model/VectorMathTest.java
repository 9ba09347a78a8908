package veldplan.model;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/**
 * {@link VectorMath} against {@link Math}: within 2 units in the last place for exp and log
 * over their working ranges, within 1e-14 relative for powers, and the special values.
 */
class VectorMathTest {
  private static final int LANES = LaneState.LANES;

  private static double ulps(double expected, double actual) {
    return expected == actual ? 0 : Math.abs(expected - actual) / Math.ulp(expected);
  }

  @Test
  void exp_isWithinTwoUlpsOfMathExp() {
    SplittableRandom random = new SplittableRandom(1);
    double[] a = new double[LANES];
    double worst = 0;
    for (int i = 0; i < 200_000; i++) {
      for (int r = 0; r < LANES; r++) {
        a[r] = i < 100_000 ? random.nextDouble(-30, 30) : random.nextDouble(-708, 709.7);
      }
      double[] x = a.clone();
      VectorMath.exp(a, 0);
      for (int r = 0; r < LANES; r++) {
        worst = Math.max(worst, ulps(Math.exp(x[r]), a[r]));
      }
    }
    assertTrue(worst <= 2, "worst " + worst + " ulps");
  }

  @Test
  void exp_specialValues() {
    double[] x = {0, -0.0, 1, -1, 710, -746, Double.NaN, Double.POSITIVE_INFINITY,
        Double.NEGATIVE_INFINITY, 1e-300, -1e-300, 709.78};
    for (double v : x) {
      double[] a = new double[LANES];
      java.util.Arrays.fill(a, v);
      VectorMath.exp(a, 0);
      double expected = v < -708.3964185322641 ? 0 : Math.exp(v);
      assertTrue(ulps(expected, a[0]) <= 2 || (Double.isNaN(expected) && Double.isNaN(a[0])),
          "exp(" + v + ") = " + a[0] + ", Math.exp " + expected);
    }
    double[] one = new double[LANES];
    VectorMath.exp(one, 0);
    assertEquals(1.0, one[0], 0.0);
  }

  @Test
  void log_isWithinTwoUlpsOfMathLog() {
    SplittableRandom random = new SplittableRandom(2);
    double[] a = new double[LANES];
    double worst = 0;
    for (int i = 0; i < 200_000; i++) {
      for (int r = 0; r < LANES; r++) {
        a[r] = i < 100_000 ? random.nextDouble(1e-9, 10)
            : Math.exp(random.nextDouble(-700, 700));
      }
      double[] x = a.clone();
      VectorMath.log(a, 0);
      for (int r = 0; r < LANES; r++) {
        double expected = Math.log(x[r]);
        // Near x = 1 the log is near 0: compare against the ulp of the argument's distance.
        double scale = Math.max(Math.ulp(expected), Math.ulp(1.0) * Math.abs(x[r] - 1) / 4);
        worst = Math.max(worst, expected == a[r] ? 0 : Math.abs(expected - a[r]) / scale);
      }
    }
    assertTrue(worst <= 2, "worst " + worst + " ulps");
  }

  @Test
  void log_specialValues() {
    double[][] cases = {{1, 0}, {0, Double.NEGATIVE_INFINITY}, {-1, Double.NaN},
        {Double.NaN, Double.NaN}, {Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY},
        {Math.E, 1}};
    for (double[] c : cases) {
      double[] a = new double[LANES];
      java.util.Arrays.fill(a, c[0]);
      VectorMath.log(a, 0);
      if (Double.isNaN(c[1])) {
        assertTrue(Double.isNaN(a[0]), "log(" + c[0] + ") = " + a[0]);
      } else {
        assertTrue(ulps(c[1], a[0]) <= 2, "log(" + c[0] + ") = " + a[0]);
      }
    }
  }

  @Test
  void pow_isWithin1e14OfMathPow_andExactForExponentsOneAndTwo() {
    SplittableRandom random = new SplittableRandom(3);
    double[] a = new double[LANES];
    double worst = 0;
    for (int i = 0; i < 50_000; i++) {
      double m = random.nextDouble(0.3, 3.5);
      for (int r = 0; r < LANES; r++) {
        a[r] = r == 0 ? 0 : Math.exp(random.nextDouble(-10, 20));
      }
      double[] x = a.clone();
      VectorMath.pow(a, 0, m);
      assertEquals(0.0, a[0], 0.0);
      for (int r = 1; r < LANES; r++) {
        double expected = Math.pow(x[r], m);
        worst = Math.max(worst, Math.abs(expected - a[r]) / expected);
      }
    }
    assertTrue(worst <= 1e-14, "worst relative " + worst);
    double[] b = {3.7, 0, 1e6, 2, 5, 6, 7, 8};
    double[] c = java.util.Arrays.copyOf(b, LANES);
    VectorMath.pow(c, 0, 2);
    assertEquals(3.7 * 3.7, c[0], 0.0);
    VectorMath.pow(c, 0, 1);
    assertEquals(3.7 * 3.7, c[0], 0.0);
  }
}
