package veldplan.model.ecology;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Tests for {@link QuasiExtinction} against methods.md §12.1. The Monte Carlo check of the formula
 * is in {@link QuasiExtinctionMonteCarloTest}.
 */
class QuasiExtinctionTest {
  private static final double LN10 = Math.log(10);

  @Test
  void probability_publishedWorkedExample_is0point113846() {
    // Published worked example [V2, methods §12.1]: d 0.5, mu 0, sigma^2 0.01, T 10; tol 1e-6.
    assertEquals(0.113846, QuasiExtinction.probability(0.5, 0, 0.01, 10), 1e-6);
  }

  @Test
  void probability_decliningPopulation_is0point176341() {
    // [D] methods §12.1: d ln 10, mu -0.01, sigma^2 0.04, T 50 (half the last printed digit).
    assertEquals(0.176341, QuasiExtinction.probability(LN10, -0.01, 0.04, 50), 5e-7);
  }

  @Test
  void probability_growingPopulation_is0point027615() {
    // [D] methods §12.1: d ln 10, mu +0.02, sigma^2 0.04, T 50.
    assertEquals(0.027615, QuasiExtinction.probability(LN10, 0.02, 0.04, 50), 5e-7);
  }

  @ParameterizedTest(name = "mu {0}, sigma2 {1} -> {2}")
  @CsvSource({
      // [D] the same equation evaluated with 50-digit arithmetic (mpmath), d = ln 10, T = 50.
      // Here exp(-2 mu d / sigma^2) overflows a double (argument 2300 and 2120) while the Phi
      // factor underflows; the product is what is checked.
      "-0.05,   1e-4, 0.99749896369799091",
      "-0.046,  1e-4, 0.49154193476599681",
      "-0.0461, 1e-3, 0.52362273308721313"})
  void probability_lowVarianceDecline_staysFiniteAndAccurate(double mu, double sigma2,
      double expected) {
    assertEquals(expected, QuasiExtinction.probability(LN10, mu, sigma2, 50), 1e-9);
  }

  @Test
  void probability_vanishinglySmall_isZeroNotNaN() {
    // [D] 50-digit arithmetic gives 5.6e-1414 and 5.6e-3414: below the smallest double.
    assertEquals(0, QuasiExtinction.probability(LN10, -0.01, 1e-5, 50), 1e-300);
    assertEquals(0, QuasiExtinction.probability(LN10, 0.01, 1e-5, 50), 1e-300);
  }

  @ParameterizedTest(name = "z {0}")
  @CsvSource({
      // [D] ln Phi(z) with 50-digit arithmetic (mpmath); z = -37 is where the series takes over.
      "-40,   -804.60844201375378817",
      "-37.5, -707.66898931750719107",
      "-37,   -689.0305855768905936",
      "-36,   -652.50322759379839685",
      "-10,   -53.231285150512470578",
      "-1,    -1.8410216450092635058",
      "0,     -0.69314718055994530942",
      "3,     -0.0013508099647481937988"})
  void logStandardNormalCdf_acrossTheSwitch_matchesHighPrecision(double z, double expected) {
    assertEquals(expected, QuasiExtinction.logStandardNormalCdf(z), 1e-12 * Math.abs(expected));
  }

  @Test
  void probability_degenerateCases_followTheDefinition() {
    assertEquals(1, QuasiExtinction.probability(0, 0.01, 0.04, 50), 0);
    assertEquals(1, QuasiExtinction.probability(-0.3, 0.01, 0.04, 50), 0);
    assertEquals(0, QuasiExtinction.probability(0.5, -0.01, 0.04, 0), 0);
    // Deterministic decline of 0.1 per year from 1.0 above the threshold reaches it at year 10.
    assertEquals(1, QuasiExtinction.probability(1.0, -0.1, 0, 10), 0);
    assertEquals(0, QuasiExtinction.probability(1.0, -0.1, 0, 9.9), 0);
  }

  @Test
  void probability_moreTimeLessDistanceOrLowerGrowth_isHigher() {
    // [D] P(T) is a first-passage distribution: non-decreasing in T, decreasing in d and mu.
    double base = QuasiExtinction.probability(LN10, 0, 0.04, 50);
    assertTrue(QuasiExtinction.probability(LN10, 0, 0.04, 80) > base);
    assertTrue(QuasiExtinction.probability(Math.log(5), 0, 0.04, 50) > base);
    assertTrue(QuasiExtinction.probability(LN10, -0.01, 0.04, 50) > base);
    assertTrue(QuasiExtinction.probability(LN10, 0.01, 0.04, 50) < base);
  }

  @Test
  void probability_noDriftLongHorizon_approachesOne() {
    // [D] with mu = 0 the threshold is reached eventually: 2 Phi(-d / (sigma sqrt T)) -> 1.
    assertEquals(1, QuasiExtinction.probability(0.5, 0, 0.01, 1e9), 1e-3);
  }

  @Test
  void invalidArguments_throw() {
    assertThrows(IllegalArgumentException.class,
        () -> QuasiExtinction.probability(0.5, 0, -0.01, 10));
    assertThrows(IllegalArgumentException.class,
        () -> QuasiExtinction.probability(0.5, 0, 0.01, -1));
    assertThrows(IllegalArgumentException.class,
        () -> QuasiExtinction.probability(Double.NaN, 0, 0.01, 10));
  }
}
