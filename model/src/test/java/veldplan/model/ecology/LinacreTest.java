package veldplan.model.ecology;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * Tests for {@link Linacre}. The equations are Linacre (1977) [V, methods.md §1.1; the vegetation
 * form V2]. The check values are the sheet's hand arithmetic from those equations [D]: a
 * consistency check, not independent evidence. The sheet asks for 1e-9 relative but prints only
 * seven significant figures, so the tolerance here is half the last printed digit.
 */
class LinacreTest {

  @Test
  void openWaterEvaporation_sheetCaseAtSeaLevelOnEquator_is4point833333() {
    // [D] methods §1.1: T 20, Td 10, h 0, A 0 gives (140 + 150)/60 = 4.833333 mm/day.
    assertEquals(290.0 / 60, Linacre.openWaterEvaporationMmPerDay(20, 0, 0, 10), 1e-12);
  }

  @Test
  void dewPointDepression_sheetCase_is8point61() {
    // [D] methods §1.1: h 500, T 22, R 14, Rann 8 gives 1.15 + 8.14 + 7.42 + 2.80 - 10.9 = 8.61.
    assertEquals(8.61, Linacre.dewPointDepressionC(500, 22, 14, 8), 1e-9);
  }

  @Test
  void evaporation_sheetCaseAt24South_matchesHandArithmetic() {
    // [D] methods §1.1: h 500, T 22, T - Td 8.61, A -24: Tm = 25, E0 = 6.196779, Et = 5.062477.
    double depression = Linacre.dewPointDepressionC(500, 22, 14, 8);
    assertEquals(6.196779, Linacre.openWaterEvaporationMmPerDay(22, 500, -24, depression), 5e-7);
    assertEquals(5.062477,
        Linacre.wellWateredEvapotranspirationMmPerDay(22, 500, -24, depression), 5e-7);
  }

  @ParameterizedTest
  @CsvSource({"5, 0, 4.5", "24, 500, 8.61", "35, 1500, 12"})
  void evaporation_northAndSouthOfEquator_isSymmetric(double latitude, double altitude,
      double depression) {
    // [D] the formula uses |A| (methods §1.1).
    assertEquals(Linacre.openWaterEvaporationMmPerDay(22, altitude, latitude, depression),
        Linacre.openWaterEvaporationMmPerDay(22, altitude, -latitude, depression), 0);
    assertEquals(Linacre.wellWateredEvapotranspirationMmPerDay(22, altitude, latitude, depression),
        Linacre.wellWateredEvapotranspirationMmPerDay(22, altitude, -latitude, depression), 0);
  }

  @ParameterizedTest
  @CsvSource({"10, 0, 0, 4", "22, 500, -24, 8.61", "30, 1200, 15, 15"})
  void wellWateredEvapotranspiration_positiveSeaLevelTemperature_isBelowOpenWater(double t,
      double altitude, double latitude, double depression) {
    // [D] the vegetation form differs only by 500 instead of 700 in the radiation term.
    double lake = Linacre.openWaterEvaporationMmPerDay(t, altitude, latitude, depression);
    double vegetation =
        Linacre.wellWateredEvapotranspirationMmPerDay(t, altitude, latitude, depression);
    assertTrue(vegetation < lake, vegetation + " vs " + lake);
    double tm = t + 0.006 * altitude;
    assertEquals(200 * tm / (100 - Math.abs(latitude)) / (80 - t), lake - vegetation, 1e-12);
  }

  @Test
  void clampedDewPointDepression_regressionBelowFour_isFour() {
    // Linacre (1977) [V, methods §1.1]: the regression applies only where T - Td >= 4 °C.
    // Cool, humid month: 0.37*8 + 0.53*4 + 0.35*4 - 10.9 = -4.42 raw.
    assertEquals(-4.42, Linacre.dewPointDepressionC(0, 8, 4, 4), 1e-9);
    assertEquals(4.0, Linacre.clampedDewPointDepressionC(0, 8, 4, 4), 0);
  }

  @Test
  void clampedDewPointDepression_regressionAboveFour_isUnchanged() {
    assertEquals(Linacre.dewPointDepressionC(500, 22, 14, 8),
        Linacre.clampedDewPointDepressionC(500, 22, 14, 8), 0);
  }

  @Test
  void openWaterEvaporation_coldAndSaturated_isFlooredAtZero() {
    // [D] T -30 °C at sea level with T - Td = 0: (700 * -30 / 100 + 0) / 110 < 0, floored at 0.
    assertEquals(0.0, Linacre.openWaterEvaporationMmPerDay(-30, 0, 0, 0), 0);
    assertEquals(0.0, Linacre.wellWateredEvapotranspirationMmPerDay(-30, 0, 0, 0), 0);
  }

  @ParameterizedTest
  @ValueSource(doubles = {80, 95, Double.NaN, Double.NEGATIVE_INFINITY})
  void openWaterEvaporation_temperatureOutsideFormula_throws(double t) {
    assertThrows(IllegalArgumentException.class,
        () -> Linacre.openWaterEvaporationMmPerDay(t, 0, 0, 10));
  }

  @Test
  void openWaterEvaporation_latitudeBeyondPole_throws() {
    assertThrows(IllegalArgumentException.class,
        () -> Linacre.openWaterEvaporationMmPerDay(20, 0, 100, 10));
  }

  @Test
  void dewPointDepression_negativeRange_throws() {
    assertThrows(IllegalArgumentException.class, () -> Linacre.dewPointDepressionC(0, 20, -1, 8));
    assertThrows(IllegalArgumentException.class,
        () -> Linacre.dewPointDepressionC(0, 20, 10, Double.NaN));
  }
}
