package veldplan.optimiser.search;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/** Tests for {@link Indicators}: every check value of decision-methods.md §3.4 [calc]. */
class IndicatorsTest {
  private static final List<double[]> Z = List.of(new double[] {0, 1}, new double[] {0.5, 0.5},
      new double[] {1, 0});

  @Test
  void igd_publishedExample() {
    // decision-methods §3.4 / §9: Z={(0,1),(0.5,0.5),(1,0)}, A={(0,1),(1,0)} -> sqrt(0.5)/3.
    List<double[]> a = List.of(new double[] {0, 1}, new double[] {1, 0});
    assertEquals(0.2357023, Indicators.igd(a, Z), 5e-8);
    assertEquals(Math.sqrt(0.5) / 3, Indicators.igd(a, Z), 1e-15);
  }

  @Test
  void igdPlus_publishedExample() {
    // decision-methods §3.4 / §9: same sets -> 0.5/3 = 0.1666667.
    List<double[]> a = List.of(new double[] {0, 1}, new double[] {1, 0});
    assertEquals(0.1666667, Indicators.igdPlus(a, Z), 5e-8);
  }

  @Test
  void additiveEpsilon_publishedExamples() {
    // decision-methods §3.4: A={(1,2),(2,1)}, B={(1.5,1.5)} -> I(A,B) = I(B,A) = 0.5.
    List<double[]> a = List.of(new double[] {1, 2}, new double[] {2, 1});
    List<double[]> b = List.of(new double[] {1.5, 1.5});
    assertEquals(0.5, Indicators.additiveEpsilon(a, b), 1e-12);
    assertEquals(0.5, Indicators.additiveEpsilon(b, a), 1e-12);
    // A3={(0,1),(0.5,0.5),(1,0)}, B3={(0.1,1.1),(0.6,0.6),(1.2,0.1)} -> -0.1 and 0.2.
    List<double[]> b3 = List.of(new double[] {0.1, 1.1}, new double[] {0.6, 0.6},
        new double[] {1.2, 0.1});
    assertEquals(-0.1, Indicators.additiveEpsilon(Z, b3), 1e-12);
    assertEquals(0.2, Indicators.additiveEpsilon(b3, Z), 1e-12);
  }

  @Test
  void additiveEpsilon_shiftedCopy_isMinusTheShift() {
    // decision-methods §3.4: for B = A + c (all coordinates), I(A,B) = -c.
    SplittableRandom random = new SplittableRandom(4);
    List<double[]> a = new ArrayList<>();
    List<double[]> b = new ArrayList<>();
    double c = 0.37;
    for (int i = 0; i < 20; i++) {
      double[] p = {random.nextDouble(), random.nextDouble(), random.nextDouble()};
      a.add(p);
      b.add(new double[] {p[0] + c, p[1] + c, p[2] + c});
    }
    assertEquals(-c, Indicators.additiveEpsilon(a, b), 1e-12);
  }

  @Test
  void coverage_publishedExample() {
    // decision-methods §3.4: A={(1,2),(2,1)}, B={(1.5,1.5),(2,2),(0.5,3)} -> C(A,B) = 1/3,
    // C(B,A) = 0.
    List<double[]> a = List.of(new double[] {1, 2}, new double[] {2, 1});
    List<double[]> b = List.of(new double[] {1.5, 1.5}, new double[] {2, 2},
        new double[] {0.5, 3});
    assertEquals(1.0 / 3, Indicators.coverage(a, b), 1e-15);
    assertEquals(0.0, Indicators.coverage(b, a), 0);
  }

  @Test
  void indicators_emptySetsOrMixedDimensions_areRejected() {
    assertThrows(IllegalArgumentException.class, () -> Indicators.igd(List.of(), Z));
    assertThrows(IllegalArgumentException.class,
        () -> Indicators.igdPlus(List.of(new double[] {1, 2, 3}), Z));
  }
}
