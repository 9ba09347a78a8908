package veldplan.model.ecology;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Tests for {@link YanHunt}: the properties the sheet asks for (methods.md §6, exact) and its
 * hand-computed values [D], tolerance 1e-6 as the sheet says.
 */
class YanHuntTest {

  @ParameterizedTest(name = "Tmin {0}, Topt {1}, Tmax {2}")
  @CsvSource({"0, 32.1, 43.7", "10, 32, 44", "0, 25, 40", "5, 30, 41", "2, 24, 38", "-3, 4, 30"})
  void relativeRate_cardinalTemperatures_areZeroOneZero(double tmin, double topt, double tmax) {
    // Yan & Hunt (1999) [V, methods §6]: f(Tmin) = 0, f(Topt) = 1, f(Tmax) = 0, 0 outside.
    assertEquals(0.0, YanHunt.relativeRate(tmin, tmin, topt, tmax), 0);
    assertEquals(1.0, YanHunt.relativeRate(topt, tmin, topt, tmax), 1e-15);
    assertEquals(0.0, YanHunt.relativeRate(tmax, tmin, topt, tmax), 0);
    assertEquals(0.0, YanHunt.relativeRate(tmin - 5, tmin, topt, tmax), 0);
    assertEquals(0.0, YanHunt.relativeRate(tmax + 5, tmin, topt, tmax), 0);
  }

  @ParameterizedTest(name = "Tmin {0}, Topt {1}, Tmax {2}")
  @CsvSource({"0, 32.1, 43.7", "10, 32, 44", "0, 25, 40", "5, 30, 41", "2, 24, 38"})
  void relativeRate_anyTemperature_peaksAtTopt(double tmin, double topt, double tmax) {
    // Yan & Hunt (1999) [V, methods §6]: the maximum lies at Topt; f rises below, falls above.
    double previous = 0;
    for (double t = tmin; t <= topt; t += 0.25) {
      double f = YanHunt.relativeRate(t, tmin, topt, tmax);
      assertTrue(f >= previous && f <= 1, "rising at " + t);
      previous = f;
    }
    previous = 1;
    for (double t = topt; t <= tmax; t += 0.25) {
      double f = YanHunt.relativeRate(t, tmin, topt, tmax);
      assertTrue(f <= previous && f >= 0, "falling at " + t);
      previous = f;
    }
  }

  @ParameterizedTest(name = "f({0}; {1}, {2}, {3}) = {4}")
  @CsvSource({
      // [D] methods §6, arithmetic from the general three-cardinal form.
      "25, 0,  32.1, 43.7, 0.807157",
      "40, 0,  32.1, 43.7, 0.586364",
      "25, 10, 32,   44,   0.784569",
      "20, 10, 32,   44,   0.471254",
      "15, 0,  25,   40,   0.711379"})
  void relativeRate_sheetCases_matchHandArithmetic(double t, double tmin, double topt,
      double tmax, double expected) {
    assertEquals(expected, YanHunt.relativeRate(t, tmin, topt, tmax), 1e-6);
  }

  @ParameterizedTest
  @CsvSource({"5, 32.1, 43.7", "25, 32.1, 43.7", "40, 32.1, 43.7", "30, 35, 45"})
  void relativeRate_tminZero_equalsPublishedForm(double t, double topt, double tmax) {
    // Yan & Hunt (1999), the equation of the abstract with Tmin = 0 [V, methods §6]:
    // r/Rmax = ((Tmax - T)/(Tmax - Topt)) (T/Topt)^(Topt/(Tmax - Topt)).
    double published = (tmax - t) / (tmax - topt) * Math.pow(t / topt, topt / (tmax - topt));
    assertEquals(published, YanHunt.relativeRate(t, 0, topt, tmax), 1e-14);
  }

  @Test
  void relativeRate_cardinalsNotIncreasing_throws() {
    assertThrows(IllegalArgumentException.class, () -> YanHunt.relativeRate(20, 30, 25, 40));
    assertThrows(IllegalArgumentException.class, () -> YanHunt.relativeRate(20, 0, 40, 40));
    assertThrows(IllegalArgumentException.class,
        () -> YanHunt.relativeRate(20, Double.NaN, 25, 40));
  }

  @Test
  void relativeRate_nanTemperature_throws() {
    assertThrows(IllegalArgumentException.class,
        () -> YanHunt.relativeRate(Double.NaN, 0, 25, 40));
  }
}
