package veldplan.optimiser.search.problems;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

/**
 * The test problems against their definitions and known fronts: Zitzler, Deb &amp; Thiele (2000)
 * and Deb et al. (2002/2005), as summarised in decision-methods.md §3.5–3.6.
 */
class TestProblemsTest {

  @ParameterizedTest
  @EnumSource(value = Zdt.class, names = {"ZDT1", "ZDT2", "ZDT3", "ZDT4", "ZDT6"})
  void zdt_onTheParetoSet_lieOnTheFront(Zdt problem) {
    // Pareto set: x1 free, the other variables at g's minimum g = 1 (0 for ZDT1-3 and ZDT6; 0 in
    // [-5, 5], i.e. gene 0.5, for ZDT4).
    SplittableRandom random = new SplittableRandom(1);
    for (int t = 0; t < 200; t++) {
      double[] x = new double[problem.variables()];
      x[0] = random.nextDouble();
      if (problem == Zdt.ZDT4) {
        Arrays.fill(x, 1, x.length, 0.5);
      }
      double[] f = problem.objectives(x);
      double f1 = f[0];
      double expected = switch (problem) {
        case ZDT1, ZDT4 -> 1 - Math.sqrt(f1);
        case ZDT2, ZDT6 -> 1 - f1 * f1;
        case ZDT3 -> 1 - Math.sqrt(f1) - f1 * Math.sin(10 * Math.PI * f1);
        default -> throw new AssertionError();
      };
      assertEquals(expected, f[1], 1e-12);
      assertEquals(problem == Zdt.ZDT6 ? 1 - Math.exp(-4 * x[0])
          * Math.pow(Math.sin(6 * Math.PI * x[0]), 6) : x[0], f1, 1e-15);
    }
  }

  @Test
  void zdt_awayFromTheParetoSet_gIsLarger() {
    // ZDT1: g = 1 + 9 sum x_i/(n-1) = 10 with all x_i = 1, so f2 = 10 (1 - sqrt(f1/10)).
    double[] x = new double[30];
    Arrays.fill(x, 1.0);
    x[0] = 0.4;
    assertEquals(10 * (1 - Math.sqrt(0.04)), Zdt.ZDT1.objectives(x)[1], 1e-12);
    // ZDT4: g = 1 + 10 (n - 1) + sum (x^2 - 10 cos(4 pi x)); x = 5 (gene 1) gives 25 - 10 each.
    double[] y = new double[10];
    Arrays.fill(y, 1.0);
    y[0] = 0.25;
    double g = 1 + 90 + 9 * (25 - 10 * Math.cos(20 * Math.PI));
    assertEquals(g * (1 - Math.sqrt(0.25 / g)), Zdt.ZDT4.objectives(y)[1], 1e-9);
  }

  @Test
  void zdt6_minimumOfF1() {
    // decision-methods §3.5 [calc]: minimum f1 = 0.28077531881 at x1 = 0.0814578.
    double[] x = new double[10];
    x[0] = 0.0814578;
    assertEquals(0.28077531881, Zdt.ZDT6.objectives(x)[0], 1e-9);
  }

  @Test
  void zdt3_frontReachesItsLowestValue() {
    // decision-methods §3.5 [calc]: on the front f2 goes down to -0.7733690 (last piece, f1 in
    // [0.8233318, 0.8518329]).
    double lowest = Double.POSITIVE_INFINITY;
    double[] x = new double[30];
    for (int i = 0; i <= 200_000; i++) {
      x[0] = 0.8233318 + (0.8518329 - 0.8233318) * i / 200_000;
      lowest = Math.min(lowest, Zdt.ZDT3.objectives(x)[1]);
    }
    assertEquals(-0.7733690, lowest, 5e-7);
  }

  @Test
  void dtlz1_onTheParetoSet_objectivesSumToOneHalf() {
    // decision-methods §3.6: x_M = 0.5 gives g = 0 and sum f_i = 0.5.
    for (int m : new int[] {2, 3, 5}) {
      Dtlz problem = Dtlz.dtlz1(m);
      assertEquals(m + 4, problem.variables());
      SplittableRandom random = new SplittableRandom(m);
      for (int t = 0; t < 100; t++) {
        double[] x = new double[problem.variables()];
        Arrays.fill(x, 0.5);
        for (int i = 0; i < m - 1; i++) {
          x[i] = random.nextDouble();
        }
        double[] f = problem.objectives(x);
        assertEquals(0.5, Arrays.stream(f).sum(), 1e-12);
        assertTrue(Arrays.stream(f).allMatch(v -> v >= 0));
      }
      // away from x_M = 0.5: g = 100 [k + sum((x-0.5)^2 - cos(20 pi (x-0.5)))], here x = 0
      double[] x = new double[problem.variables()];
      double g = 100 * (5 + 5 * (0.25 - Math.cos(10 * Math.PI)));
      assertEquals(0.5 * (1 + g), Arrays.stream(problem.objectives(x)).sum(), 1e-9);
    }
  }

  @Test
  void dtlz2_onTheParetoSet_liesOnTheUnitSphere() {
    // decision-methods §3.6: x_M = 0.5 gives g = 0 and sum f_i^2 = 1.
    for (int m : new int[] {2, 3, 4}) {
      Dtlz problem = Dtlz.dtlz2(m);
      assertEquals(m + 9, problem.variables());
      SplittableRandom random = new SplittableRandom(m);
      for (int t = 0; t < 100; t++) {
        double[] x = new double[problem.variables()];
        Arrays.fill(x, 0.5);
        for (int i = 0; i < m - 1; i++) {
          x[i] = random.nextDouble();
        }
        double[] f = problem.objectives(x);
        assertEquals(1.0, Arrays.stream(f).map(v -> v * v).sum(), 1e-12);
      }
    }
    // M = 3: f = (1+g)(cos a cos b, cos a sin b, sin a), a = x1 pi/2, b = x2 pi/2.
    double[] x = new double[12];
    Arrays.fill(x, 0.5);
    x[0] = 1.0 / 3;
    x[1] = 0.5;
    x[11] = 1.0; // g = 0.25
    double[] f = Dtlz.dtlz2(3).objectives(x);
    double a = Math.PI / 6;
    double b = Math.PI / 4;
    assertEquals(1.25 * Math.cos(a) * Math.cos(b), f[0], 1e-12);
    assertEquals(1.25 * Math.cos(a) * Math.sin(b), f[1], 1e-12);
    assertEquals(1.25 * Math.sin(a), f[2], 1e-12);
  }
}
