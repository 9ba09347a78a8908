package veldplan.optimiser.search;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Tests for {@link Sbx}. Check values are decision-methods.md §2.5 and §9 [calc]: computed there
 * by script from the formula of Deb &amp; Agrawal (1995) and printed to 6–7 significant figures,
 * hence the tolerances of half a unit in the last printed digit.
 */
class SbxTest {

  @ParameterizedTest
  @CsvSource({
      // eta, lower quartile 0.5^(1/(eta+1)), upper quartile 2^(1/(eta+1)): decision-methods §2.5
      "20,  0.96753, 1.03356",
      "15,  0.95760, 1.04427",
      "30,  0.97789, 1.02261",
      "2.5, 0.82034, 1.21901"})
  void beta_atQuartilesOfU_matchesPublishedQuartiles(double eta, double lower, double upper) {
    // beta is increasing in u, so its quartiles are beta(0.25) and beta(0.75).
    assertEquals(lower, Sbx.beta(0.25, eta), 5e-6);
    assertEquals(upper, Sbx.beta(0.75, eta), 5e-6);
  }

  @Test
  void beta_eta20_matchesConsolidatedCheckValues() {
    // decision-methods §9: SBX eta=20 beta quartiles 0.9675318, 1.0335578 [calc].
    assertEquals(0.9675318, Sbx.beta(0.25, 20), 5e-8);
    assertEquals(1.0335578, Sbx.beta(0.75, 20), 5e-8);
  }

  @Test
  void beta_halfOfTheUniformMassGivesBetaAtMostOne() {
    // decision-methods §2.5: P(beta <= 1) = 0.5. beta(0.5) = 1 and beta is increasing in u.
    assertEquals(1.0, Sbx.beta(0.5, 20), 0);
    SplittableRandom random = new SplittableRandom(7); // fixed seed: reproducible sample
    int atMostOne = 0;
    int draws = 100_000;
    for (int i = 0; i < draws; i++) {
      if (Sbx.beta(random.nextDouble(), 20) <= 1) {
        atMostOne++;
      }
    }
    // Binomial(1e5, 0.5): sd = 158; 5 sd, false failure probability about 6e-7.
    assertEquals(draws / 2.0, atMostOne, 5 * 158.2);
  }

  @ParameterizedTest
  @CsvSource({
      // u, c1, c2: decision-methods §2.5 example p1=0.2, p2=0.6, eta=20 [calc]
      "0.25, 0.206494, 0.593506",
      "0.75, 0.193288, 0.606712"})
  void unbounded_publishedExample(double u, double c1, double c2) {
    double[] children = Sbx.unbounded(0.2, 0.6, u, 20);
    assertEquals(c1, children[0], 5e-7);
    assertEquals(c2, children[1], 5e-7);
  }

  @Test
  void unbounded_childrenMeanIsParentsMean_andIdenticalParentsGiveCopies() {
    // decision-methods §2.5 unit-test properties.
    SplittableRandom random = new SplittableRandom(11);
    for (int i = 0; i < 1000; i++) {
      double p1 = random.nextDouble(-3, 3);
      double p2 = random.nextDouble(-3, 3);
      double[] c = Sbx.unbounded(p1, p2, random.nextDouble(), 20);
      assertEquals(p1 + p2, c[0] + c[1], 1e-12);
      double[] same = Sbx.unbounded(p1, p1, random.nextDouble(), 20);
      assertEquals(p1, same[0], 1e-15);
      assertEquals(p1, same[1], 1e-15);
    }
  }

  @ParameterizedTest
  @CsvSource({"0.25", "0.75", "0.1", "0.9"})
  void bounded_withFarBounds_isTheUnboundedForm(double u) {
    // decision-methods §2.5: with infinite bounds alpha = 2 and the bounded form is SBX itself.
    double[] bounded = Sbx.bounded(0.2, 0.6, -1e9, 1e9, u, 20);
    double[] unbounded = Sbx.unbounded(0.2, 0.6, u, 20);
    assertEquals(unbounded[0], bounded[0], 1e-12);
    assertEquals(unbounded[1], bounded[1], 1e-12);
  }

  @ParameterizedTest
  @CsvSource({
      // [calc] computed for this test with Python (double precision) from the bounded formula of
      // decision-methods §2.5 on [0, 1], eta = 20: beta_L, alpha, betaq, c1 and c2 as printed there.
      "0.2,  0.6, 0.25,  0.2064936465, 0.5935063557",
      "0.6,  0.2, 0.75,  0.1932884504, 0.6067115566",
      "0.2,  0.6, 0.0,   0.4,          0.4",
      "0.2,  0.6, 0.999, 0.1311268398, 0.6688762088"})
  void bounded_onUnitInterval_matchesHandComputation(double p1, double p2, double u, double c1,
      double c2) {
    double[] children = Sbx.bounded(p1, p2, 0, 1, u, 20);
    assertEquals(c1, children[0], 1e-9);
    assertEquals(c2, children[1], 1e-9);
  }

  @Test
  void bounded_nearTheBounds_staysInside() {
    // [calc] as above, eta = 2.5: p1 = 0.01, p2 = 0.9, u = 0.999 -> 0.0001724483, 0.9995150870.
    double[] children = Sbx.bounded(0.01, 0.9, 0, 1, 0.999, 2);
    assertEquals(0.0001724483, children[0], 1e-9);
    assertEquals(0.9995150870, children[1], 1e-9);
    SplittableRandom random = new SplittableRandom(3);
    for (int i = 0; i < 10_000; i++) {
      double[] c = Sbx.bounded(random.nextDouble(), random.nextDouble(), 0, 1,
          random.nextDouble(), random.nextDouble(0, 30));
      assertTrue(c[0] >= 0 && c[0] <= 1 && c[1] >= 0 && c[1] <= 1, c[0] + ", " + c[1]);
    }
  }

  @Test
  void crossPair_probabilityZero_copiesParents() {
    double[] p1 = {0.1, 0.2, 0.3};
    double[] p2 = {0.9, 0.8, 0.7};
    double[] c1 = new double[3];
    double[] c2 = new double[3];
    Sbx.crossPair(p1, p2, 0.0, 20, new SplittableRandom(1), c1, c2);
    assertArrayEquals(p1, c1, 0);
    assertArrayEquals(p2, c2, 0);
  }

  @Test
  void crossPair_probabilityOne_crossesAboutHalfTheVariables_andSwapsEveryVariableAtRandom() {
    // Reference code: each variable crossed with probability 0.5 (decision-methods §2.5 [mem]).
    // Then every variable, crossed or not, goes to either child with probability 0.5 (the
    // uniform swap MOEA Framework 5.0's SBX applies; see the Sbx class comment).
    int n = 10_000;
    double[] p1 = new double[n];
    double[] p2 = new double[n];
    java.util.Arrays.fill(p1, 0.3);
    java.util.Arrays.fill(p2, 0.7);
    double[] c1 = new double[n];
    double[] c2 = new double[n];
    Sbx.crossPair(p1, p2, 1.0, 20, new SplittableRandom(5), c1, c2);
    int crossed = 0;
    int kept = 0;
    int swapped = 0;
    int lowerFirst = 0;
    for (int i = 0; i < n; i++) {
      if (c1[i] == 0.3 && c2[i] == 0.7) {
        kept++;
      } else if (c1[i] == 0.7 && c2[i] == 0.3) {
        swapped++;
      } else {
        crossed++;
        assertEquals(1.0, c1[i] + c2[i], 1e-3); // bounded: mean almost preserved
        if (c1[i] < c2[i]) {
          lowerFirst++;
        }
      }
    }
    // Binomial(1e4, 0.5): sd 50; 5 sd, false failure probability about 6e-7.
    assertEquals(n / 2.0, crossed, 250);
    // Binomial(about 5000, 0.5): sd about 35; 5 sd.
    assertEquals((kept + swapped) / 2.0, swapped, 180);
    assertEquals(crossed / 2.0, lowerFirst, 180);
  }
}
