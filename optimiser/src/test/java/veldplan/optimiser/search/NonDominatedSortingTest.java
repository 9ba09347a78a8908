package veldplan.optimiser.search;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/**
 * Tests for {@link NonDominatedSorting} and {@link Dominance}: decision-methods.md §2.1 and §2.4
 * (Deb et al. 2002).
 */
class NonDominatedSortingTest {

  @Test
  void fronts_handExample_ranksA1B1D1C2E3() {
    // decision-methods §2.1 [calc by hand]: a=(1,5) b=(2,3) c=(3,4) d=(4,1) e=(5,5)
    // -> ranks a1 b1 d1 c2 e3.
    List<Evaluation> points = List.of(Evaluation.of(1, 5), Evaluation.of(2, 3),
        Evaluation.of(3, 4), Evaluation.of(4, 1), Evaluation.of(5, 5));
    int[][] fronts = NonDominatedSorting.fronts(points);
    assertEquals(3, fronts.length);
    assertArrayEquals(new int[] {0, 1, 3}, fronts[0]);
    assertArrayEquals(new int[] {2}, fronts[1]);
    assertArrayEquals(new int[] {4}, fronts[2]);
    assertArrayEquals(new int[] {0, 0, 1, 0, 2}, NonDominatedSorting.ranks(fronts, 5));
  }

  @Test
  void constrainedDomination_decisionMethodsChecks() {
    // decision-methods §2.4: CV 0.2 beats CV 0.5; any feasible beats any infeasible.
    Evaluation small = new Evaluation(new double[] {9, 9}, 0.2);
    Evaluation large = new Evaluation(new double[] {0, 0}, 0.5);
    assertEquals(-1, Dominance.constrained(small, large));
    assertEquals(1, Dominance.constrained(large, small));
    Evaluation feasibleButPoor = Evaluation.of(100, 100);
    Evaluation infeasibleButGood = new Evaluation(new double[] {-100, -100}, 1e-9);
    assertEquals(-1, Dominance.constrained(feasibleButPoor, infeasibleButGood));
    // Both infeasible with equal violations: neither dominates (Deb et al. 2002, case b).
    assertEquals(0, Dominance.constrained(new Evaluation(new double[] {0, 0}, 0.3),
        new Evaluation(new double[] {1, 1}, 0.3)));
    // Both feasible: plain Pareto dominance.
    assertEquals(-1, Dominance.constrained(Evaluation.of(1, 1), Evaluation.of(1, 2)));
    assertEquals(0, Dominance.constrained(Evaluation.of(1, 2), Evaluation.of(2, 1)));
    assertEquals(0, Dominance.constrained(Evaluation.of(1, 2), Evaluation.of(1, 2)));
  }

  @Test
  void fronts_withConstraints_feasibleFrontsFirstThenByViolation() {
    List<Evaluation> points = List.of(
        new Evaluation(new double[] {0, 0}, 0.5),   // 0: infeasible, worst violation
        Evaluation.of(5, 5),                        // 1: feasible, dominated by 2
        Evaluation.of(1, 1),                        // 2: feasible
        new Evaluation(new double[] {9, 9}, 0.2),   // 3: infeasible, smaller violation
        new Evaluation(new double[] {8, 0}, 0.2));  // 4: same violation as 3: incomparable
    int[][] fronts = NonDominatedSorting.fronts(points);
    assertArrayEquals(new int[] {2}, fronts[0]);
    assertArrayEquals(new int[] {1}, fronts[1]);
    assertArrayEquals(new int[] {3, 4}, fronts[2]);
    assertArrayEquals(new int[] {0}, fronts[3]);
  }

  @Test
  void fronts_randomSets_matchTheDefinition() {
    // Property (100 random sets): a member of front k is dominated by some member of front k-1
    // and by no member of fronts k, k+1, ...
    SplittableRandom random = new SplittableRandom(2002);
    for (int trial = 0; trial < 100; trial++) {
      int n = 1 + random.nextInt(60);
      int m = 2 + random.nextInt(3);
      List<Evaluation> points = new ArrayList<>();
      for (int i = 0; i < n; i++) {
        double[] f = new double[m];
        for (int j = 0; j < m; j++) {
          f[j] = random.nextInt(6); // small integers: ties and duplicates happen
        }
        points.add(new Evaluation(f, random.nextInt(4) == 0 ? random.nextInt(3) * 0.5 : 0));
      }
      int[][] fronts = NonDominatedSorting.fronts(points);
      int[] rank = NonDominatedSorting.ranks(fronts, n);
      int total = 0;
      for (int[] front : fronts) {
        total += front.length;
      }
      assertEquals(n, total);
      for (int i = 0; i < n; i++) {
        boolean dominatedByPrevious = rank[i] == 0;
        for (int j = 0; j < n; j++) {
          if (Dominance.constrained(points.get(j), points.get(i)) < 0) {
            assertEquals(true, rank[j] < rank[i], "dominator in the same or a later front");
            dominatedByPrevious |= rank[j] == rank[i] - 1;
          }
        }
        assertEquals(true, dominatedByPrevious, "front " + rank[i] + " member " + i);
      }
    }
  }

  @Test
  void fronts_twoAndThreeObjectives_sweepEqualsCounting() {
    // The sweep used for M = 2, 3 (Zhang et al. 2015, ENS-BS with staircases) against Deb et
    // al.'s counting procedure on the same input: identical fronts, element for element. Grids
    // give ties in f1 (the pairwise part of the sweep), duplicates and -0.0 against 0.0; points
    // near a sphere give large first fronts; some are infeasible, with repeated violations.
    SplittableRandom random = new SplittableRandom(2015);
    for (int trial = 0; trial < 400; trial++) {
      int m = 2 + trial % 2;
      int n = 1 + random.nextInt(trial % 5 == 0 ? 400 : 60);
      double[] objectives = new double[n * m];
      double[] violations = new double[n];
      for (int i = 0; i < n; i++) {
        double norm = 0;
        for (int j = 0; j < m; j++) {
          double f = trial % 3 == 0 ? random.nextInt(5) : random.nextDouble();
          if (f == 0 && random.nextBoolean()) {
            f = -0.0;
          }
          objectives[i * m + j] = f;
          norm += f * f;
        }
        if (trial % 3 == 2 && norm > 0) {
          double radius = (1 + 0.02 * random.nextDouble()) / Math.sqrt(norm);
          for (int j = 0; j < m; j++) {
            objectives[i * m + j] *= radius;
          }
        }
        violations[i] = trial % 4 == 1 && random.nextInt(3) == 0 ? random.nextInt(3) * 0.25 : 0;
      }
      int[][] sweep = NonDominatedSorting.fronts(objectives, violations, n, m);
      int[][] counting = NonDominatedSorting.fronts(objectives, violations, n, m, true);
      assertEquals(counting.length, sweep.length, "trial " + trial);
      for (int r = 0; r < counting.length; r++) {
        assertArrayEquals(counting[r], sweep[r], "trial " + trial + " front " + r);
      }
    }
  }
}
