package veldplan.optimiser.search;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * Tests for {@link Hypervolume}: the exact check sets of decision-methods.md §3.4 and the
 * front hypervolumes of §3.5/§3.6 [calc], plus brute-force inclusion–exclusion on random sets.
 * The cross-check against another library is {@link HypervolumeReferenceTest}.
 */
class HypervolumeTest {

  private static double[] r(int d, double value) {
    double[] r = new double[d];
    Arrays.fill(r, value);
    return r;
  }

  @Test
  void twoDimensions_checkSet() {
    // decision-methods §3.4: {(1,3),(2,2),(3,1)}, r=(4,4) -> 6.
    assertEquals(6.0, Hypervolume.of(List.of(new double[] {1, 3}, new double[] {2, 2},
        new double[] {3, 1}), new double[] {4, 4}), 1e-12);
  }

  @Test
  void threeDimensions_checkSets() {
    // decision-methods §3.4: {(1,2,3),(2,3,1),(3,1,2)}, r=(4,4,4) -> 13.
    assertEquals(13.0, Hypervolume.of(List.of(new double[] {1, 2, 3}, new double[] {2, 3, 1},
        new double[] {3, 1, 2}), r(3, 4)), 1e-12);
    // {(0,0,1),(0,1,0),(1,0,0)}: r=(1,1,1) -> 0 (on the boundary); r=(2,2,2) -> 7.
    List<double[]> unit = List.of(new double[] {0, 0, 1}, new double[] {0, 1, 0},
        new double[] {1, 0, 0});
    assertEquals(0.0, Hypervolume.of(unit, r(3, 1)), 0);
    assertEquals(7.0, Hypervolume.of(unit, r(3, 2)), 1e-12);
  }

  @Test
  void fourDimensions_checkSet() {
    // decision-methods §3.4 / §9: {(1,2,3,4),(4,3,2,1),(2,2,2,2)}, r=(5,5,5,5) -> 93.
    assertEquals(93.0, Hypervolume.of(List.of(new double[] {1, 2, 3, 4},
        new double[] {4, 3, 2, 1}, new double[] {2, 2, 2, 2}), r(4, 5)), 1e-12);
  }

  @ParameterizedTest
  @CsvSource({
      // N, r, expected: N points on the ZDT1 front f2 = 1 - sqrt(f1), f1 evenly spaced on [0,1]
      // with both ends: decision-methods §3.5 [calc]
      "11, 1.0, 0.6105093", "21, 1.0, 0.6394466", "101, 1.0, 0.6614629",
      "11, 1.1, 0.8205093", "21, 1.1, 0.8494466", "101, 1.1, 0.8714629"})
  void zdt1_evenlySpacedFrontPoints(int n, double reference, double expected) {
    List<double[]> points = new ArrayList<>();
    for (int i = 0; i < n; i++) {
      double f1 = (double) i / (n - 1);
      points.add(new double[] {f1, 1 - Math.sqrt(f1)});
    }
    assertEquals(expected, Hypervolume.of(points, r(2, reference)), 5e-8);
  }

  @ParameterizedTest
  @CsvSource({
      // ZDT2 front f2 = 1 - f1^2, same spacing, r = (1,1): decision-methods §3.5 [calc]
      "11, 0.285", "21, 0.30875", "101, 0.32835"})
  void zdt2_evenlySpacedFrontPoints(int n, double expected) {
    List<double[]> points = new ArrayList<>();
    for (int i = 0; i < n; i++) {
      double f1 = (double) i / (n - 1);
      points.add(new double[] {f1, 1 - f1 * f1});
    }
    assertEquals(expected, Hypervolume.of(points, r(2, 1)), 5e-12);
  }

  @Test
  void dasDennisPoints_onDtlzFronts() {
    // decision-methods §3.6 / §9 [calc, Monte Carlo agrees to 2e-4]: the 91 Das-Dennis points
    // (M=3, p=12); 0.5 w (DTLZ1 front): 0.9736690 (r=1), 1.3046690 (r=1.1); w/|w| (DTLZ2
    // front): 0.4138509 (r=1), 0.7448509 (r=1.1).
    List<double[]> linear = new ArrayList<>();
    List<double[]> sphere = new ArrayList<>();
    int p = 12;
    for (int i = 0; i <= p; i++) {
      for (int j = 0; j <= p - i; j++) {
        double[] w = {(double) i / p, (double) j / p, (double) (p - i - j) / p};
        linear.add(new double[] {0.5 * w[0], 0.5 * w[1], 0.5 * w[2]});
        double norm = Math.sqrt(w[0] * w[0] + w[1] * w[1] + w[2] * w[2]);
        sphere.add(new double[] {w[0] / norm, w[1] / norm, w[2] / norm});
      }
    }
    assertEquals(91, linear.size()); // decision-methods §9: Das-Dennis count (3,12) = 91
    assertEquals(0.9736690, Hypervolume.of(linear, r(3, 1.0)), 5e-8);
    assertEquals(1.3046690, Hypervolume.of(linear, r(3, 1.1)), 5e-8);
    assertEquals(0.4138509, Hypervolume.of(sphere, r(3, 1.0)), 5e-8);
    assertEquals(0.7448509, Hypervolume.of(sphere, r(3, 1.1)), 5e-8);
  }

  @ParameterizedTest
  @ValueSource(ints = {1, 2, 3, 4, 5, 6})
  void randomSets_matchInclusionExclusion(int d) {
    // Brute force: HV = sum over non-empty subsets S of (-1)^(|S|+1) prod_j (r_j - max_S p_j).
    SplittableRandom random = new SplittableRandom(1000 + d);
    for (int trial = 0; trial < 60; trial++) {
      int n = 1 + random.nextInt(9);
      List<double[]> points = new ArrayList<>();
      for (int i = 0; i < n; i++) {
        double[] p = new double[d];
        for (int j = 0; j < d; j++) {
          // Some coordinates on a grid (ties, duplicates), some beyond the reference point.
          p[j] = random.nextBoolean() ? random.nextInt(5) * 0.25 : random.nextDouble(-0.1, 1.2);
        }
        points.add(p);
      }
      double[] reference = r(d, 1.0);
      assertEquals(inclusionExclusion(points, reference), Hypervolume.of(points, reference),
          1e-12, "trial " + trial);
    }
  }

  @Test
  void largerRandomSets_threeDimensionalSweepAgreesWithTheGeneralAlgorithm() {
    // A 3-D set lifted to 4-D with a constant last coordinate c has HV4 = HV3 x (r4 - c); the
    // first goes through WFG, the second through the 3-D sweep.
    SplittableRandom random = new SplittableRandom(77);
    List<double[]> points3 = new ArrayList<>();
    List<double[]> points4 = new ArrayList<>();
    for (int i = 0; i < 300; i++) {
      double[] p = {random.nextDouble(), random.nextDouble(), random.nextDouble()};
      double norm = Math.sqrt(p[0] * p[0] + p[1] * p[1] + p[2] * p[2]); // a spherical front
      p = new double[] {p[0] / norm, p[1] / norm, p[2] / norm};
      points3.add(p);
      points4.add(new double[] {p[0], p[1], p[2], 0.25});
    }
    double hv3 = Hypervolume.of(points3, r(3, 1.1));
    assertEquals(hv3 * (1.1 - 0.25), Hypervolume.of(points4, r(4, 1.1)), 1e-12);
    // and the result does not depend on the order of the points
    List<double[]> shuffled = new ArrayList<>(points3);
    Collections.shuffle(shuffled, new java.util.Random(3));
    assertEquals(hv3, Hypervolume.of(shuffled, r(3, 1.1)), 1e-12);
  }

  @Test
  void dominatedAndDuplicatedPoints_addNothing() {
    List<double[]> base = List.of(new double[] {0.2, 0.5, 0.3}, new double[] {0.6, 0.1, 0.4});
    List<double[]> more = new ArrayList<>(base);
    more.add(new double[] {0.7, 0.6, 0.5}); // dominated
    more.add(new double[] {0.2, 0.5, 0.3}); // duplicate
    assertEquals(Hypervolume.of(base, r(3, 1)), Hypervolume.of(more, r(3, 1)), 1e-15);
  }

  @Test
  void normalised_mapsIdealAndNadirToZeroAndOne() {
    // ideal (10, 100), nadir (20, 300): the point (15, 200) becomes (0.5, 0.5); r = 1.1
    // gives 0.6 x 0.6.
    double hv = Hypervolume.normalised(List.<double[]>of(new double[] {15, 200}),
        new double[] {10, 100}, new double[] {20, 300}, 1.1);
    assertEquals(0.36, hv, 1e-12);
  }

  @Test
  void invalidInput_isRejected() {
    assertThrows(IllegalArgumentException.class,
        () -> Hypervolume.of(List.<double[]>of(new double[] {Double.NaN, 0}), r(2, 1)));
    assertThrows(IllegalArgumentException.class,
        () -> Hypervolume.of(List.<double[]>of(new double[] {0, 0, 0}), r(2, 1)));
    assertThrows(IllegalArgumentException.class,
        () -> Hypervolume.of(List.<double[]>of(), new double[] {1, Double.POSITIVE_INFINITY}));
    assertEquals(0.0, Hypervolume.of(List.of(), r(3, 1)), 0);
  }

  static double inclusionExclusion(List<double[]> points, double[] reference) {
    int n = points.size();
    int d = reference.length;
    double total = 0;
    for (int mask = 1; mask < (1 << n); mask++) {
      double[] corner = new double[d];
      Arrays.fill(corner, Double.NEGATIVE_INFINITY);
      for (int i = 0; i < n; i++) {
        if ((mask & (1 << i)) != 0) {
          for (int j = 0; j < d; j++) {
            corner[j] = Math.max(corner[j], points.get(i)[j]);
          }
        }
      }
      double volume = 1;
      for (int j = 0; j < d; j++) {
        volume *= Math.max(0, reference[j] - corner[j]);
      }
      total += (Integer.bitCount(mask) % 2 == 1 ? 1 : -1) * volume;
    }
    return total;
  }
}
