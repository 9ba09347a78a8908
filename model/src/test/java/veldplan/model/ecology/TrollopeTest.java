package veldplan.model.ecology;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Tests for {@link Trollope}. The coefficients come from a secondary code copy attributed to
 * Trollope (2002) [V2, methods.md §8.2]; the values are the sheet's arithmetic from them [D],
 * to half the last printed digit.
 */
class TrollopeTest {

  @ParameterizedTest(name = "FL {0}, FM {1}, RH {2}, W {3} -> {4}")
  @CsvSource({
      // [D] methods §8.2.
      "4000, 10, 30, 3, 4156.30",
      "3000, 30, 40, 2, 1828.15"})
  void fireIntensity_sheetCases_matchHandArithmetic(double fuel, double moisture,
      double humidity, double wind, double expected) {
    assertEquals(expected, Trollope.fireIntensityKwPerM(fuel, moisture, humidity, wind), 0.005);
  }

  @Test
  void fireIntensity_lightWetFuel_isFlooredAtZero() {
    // [D] 2729 + 0 - 530 x 10 - 0.1907 x 8100 - 596/0.5 < 0; floored at 0 (methods §8.2).
    assertEquals(0, Trollope.fireIntensityKwPerM(0, 100, 90, 0.5), 0);
  }

  @Test
  void fireIntensity_calmAir_usesHalfMetrePerSecond() {
    // methods §8.2: keep W >= 0.5 m/s because the 1/W term diverges.
    double atFloor = Trollope.fireIntensityKwPerM(4000, 10, 30, 0.5);
    assertEquals(atFloor, Trollope.fireIntensityKwPerM(4000, 10, 30, 0), 0);
    assertEquals(atFloor, Trollope.fireIntensityKwPerM(4000, 10, 30, 0.2), 0);
  }

  @Test
  void fireIntensity_eachTerm_pushesInItsDirection() {
    // [D] signs of the regression terms: more fuel and wind raise FI; moisture and RH lower it.
    double base = Trollope.fireIntensityKwPerM(4000, 20, 40, 2);
    assertTrue(Trollope.fireIntensityKwPerM(5000, 20, 40, 2) > base);
    assertTrue(Trollope.fireIntensityKwPerM(4000, 20, 40, 4) > base);
    assertTrue(Trollope.fireIntensityKwPerM(4000, 30, 40, 2) < base);
    assertTrue(Trollope.fireIntensityKwPerM(4000, 20, 60, 2) < base);
  }

  @Test
  void fireIntensity_humidityAbove100_throws() {
    assertThrows(IllegalArgumentException.class,
        () -> Trollope.fireIntensityKwPerM(4000, 10, 101, 3));
    assertThrows(IllegalArgumentException.class,
        () -> Trollope.fireIntensityKwPerM(Double.NaN, 10, 30, 3));
  }

  @Test
  void fireIntensityOfTerms_overAGrid_isBitIdenticalToTheRegression() {
    // The split form (weather terms computed once, the fuel term every year) must give the
    // same bits as the published regression: same operations, same order. Arithmetic identity,
    // no outside values; a perturbed coefficient in either form fails this exactly.
    int compared = 0;
    for (int i = 0; i <= 320; i++) {
      double fuel = 37.3 * i;
      for (int m = 0; m <= 32; m++) {
        double moisture = 3.7 * m;
        for (int r = 0; r <= 16; r++) {
          double humidity = 6.1 * r;
          for (double wind : new double[] {0, 0.3, 0.5, 1.7, 3, 8.9}) {
            double reference = Trollope.fireIntensityKwPerM(fuel, moisture, humidity, wind);
            double split = Trollope.fireIntensityOfTerms(fuel, Trollope.moistureTerm(moisture),
                Trollope.humidityTerm(humidity), Trollope.windTerm(wind));
            assertEquals(Double.doubleToLongBits(reference), Double.doubleToLongBits(split),
                () -> "FL " + fuel + " FM " + moisture + " RH " + humidity + " W " + wind);
            compared++;
          }
        }
      }
    }
    assertTrue(compared > 100_000);
  }

  @Test
  void terms_checkTheirArguments() {
    assertThrows(IllegalArgumentException.class, () -> Trollope.moistureTerm(-1));
    assertThrows(IllegalArgumentException.class, () -> Trollope.humidityTerm(100.5));
    assertThrows(IllegalArgumentException.class, () -> Trollope.windTerm(Double.NaN));
  }
}
