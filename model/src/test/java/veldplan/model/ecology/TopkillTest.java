package veldplan.model.ecology;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Tests for {@link Topkill}. The coefficients are Higgins et al. (2007) Appendix C, Table C2 [V,
 * methods.md §8.3]; the probabilities are the sheet's arithmetic from them with intensity in kW/m
 * [D] (the unit itself is the open caveat of §8.3), to half the last printed digit.
 */
class TopkillTest {

  @ParameterizedTest(name = "{0}: H {1} m, I {2} kW/m -> {3}")
  @CsvSource({
      // [D] methods §8.3.
      "SKUKUZA,      1, 1000, 0.9146",
      "SKUKUZA,      2, 2000, 0.6189",
      "SKUKUZA,      4, 3000, 0.1798",
      "PRETORIUSKOP, 1, 1000, 0.8789",
      "PRETORIUSKOP, 2, 2000, 0.5324",
      "PRETORIUSKOP, 4, 3000, 0.1373",
      "SATARA,       1, 1000, 0.9503",
      "SATARA,       2, 2000, 0.6167",
      "SATARA,       4, 3000, 0.1193"})
  void probability_sheetCases_matchHandArithmetic(String site, double height, double intensity,
      double expected) {
    assertEquals(expected, Topkill.probability(height, intensity, coefficients(site)), 5e-5);
  }

  private static Topkill.Coefficients coefficients(String site) {
    switch (site) {
      case "MOPANE":
        return Topkill.MOPANE;
      case "SATARA":
        return Topkill.SATARA;
      case "SKUKUZA":
        return Topkill.SKUKUZA;
      case "PRETORIUSKOP":
        return Topkill.PRETORIUSKOP;
      default:
        throw new IllegalArgumentException(site);
    }
  }

  @ParameterizedTest
  @CsvSource({"MOPANE", "SATARA", "SKUKUZA", "PRETORIUSKOP"})
  void probabilityOfFactors_overAGrid_equalsTheLogistic(String site) {
    // [D] exp(x + y) = exp(x) exp(y): the factored form is the same function. Relative 1e-13
    // for rounding (a few ulps in the exponentials, the product and the sum).
    Topkill.Coefficients c = coefficients(site);
    for (double height = 0.05; height <= 40; height *= 1.3) {
      double heightFactor = Topkill.heightFactor(Math.log(height), c.intercept(),
          c.lnHeightCoefficient());
      for (double intensity = 0; intensity <= 20_000; intensity = intensity * 1.4 + 7) {
        double expected = Topkill.probability(height, intensity, c);
        double actual = Topkill.probabilityOfFactors(heightFactor,
            Topkill.intensityFactor(Math.sqrt(intensity), c.sqrtIntensityCoefficient()));
        assertEquals(expected, actual, 1e-13 * expected, site + " H " + height + " I " + intensity);
      }
    }
  }

  @Test
  void siteCoefficients_tableC2_asPublished() {
    // Higgins et al. (2007) Appendix C, Table C2 [V, methods §8.3]: intercept, a, b.
    assertCoefficients(Topkill.MOPANE, 1.56, -2.98, 0.021);
    assertCoefficients(Topkill.SATARA, 2.95, -3.57, 0);
    assertCoefficients(Topkill.SKUKUZA, 1.17, -3.44, 0.038);
    assertCoefficients(Topkill.PRETORIUSKOP, 0.78, -3.39, 0.038);
  }

  private static void assertCoefficients(Topkill.Coefficients c, double intercept, double a,
      double b) {
    assertEquals(intercept, c.intercept(), 0);
    assertEquals(a, c.lnHeightCoefficient(), 0);
    assertEquals(b, c.sqrtIntensityCoefficient(), 0);
  }

  @ParameterizedTest
  @CsvSource({"MOPANE", "SATARA", "SKUKUZA", "PRETORIUSKOP"})
  void probability_tallerTree_isLower(String site) {
    // [D] every site's height coefficient is negative (Table C2).
    Topkill.Coefficients c = coefficients(site);
    double previous = 1;
    for (double height = 0.25; height <= 12; height *= 1.5) {
      double p = Topkill.probability(height, 2000, c);
      assertTrue(p < previous && p > 0, site + " at " + height + " m");
      previous = p;
    }
  }

  @Test
  void probability_sataraWithoutIntensityTerm_ignoresIntensity() {
    // Table C2: the intensity term was not significant at Satara [V].
    assertEquals(Topkill.probability(2, 0, Topkill.SATARA),
        Topkill.probability(2, 10_000, Topkill.SATARA), 0);
  }

  @Test
  void probability_moreIntenseFire_isHigherWhereTermIsFitted() {
    assertTrue(Topkill.probability(3, 4000, Topkill.SKUKUZA)
        > Topkill.probability(3, 1000, Topkill.SKUKUZA));
  }

  @Test
  void probability_recordAndExplicitCoefficients_agree() {
    assertEquals(Topkill.probability(2.5, 1500, 1.17, -3.44, 0.038),
        Topkill.probability(2.5, 1500, Topkill.SKUKUZA), 0);
  }

  @Test
  void probability_zeroHeight_throws() {
    assertThrows(IllegalArgumentException.class,
        () -> Topkill.probability(0, 1000, Topkill.SKUKUZA));
    assertThrows(IllegalArgumentException.class,
        () -> Topkill.probability(1, -1, Topkill.SKUKUZA));
  }
}
