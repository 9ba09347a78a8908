package veldplan.model.ecology;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

/** Tests for {@link Byram}; values are the sheet's arithmetic from Byram (1959) [D, §8.1]. */
class ByramTest {

  @Test
  void firelineIntensity_sheetCase_is3600KwPerM() {
    // [D] methods §8.1: H 18,000 kJ/kg, w 0.4 kg/m2 (4 t/ha), r 0.5 m/s gives 3600 kW/m.
    assertEquals(3600, Byram.firelineIntensityKwPerM(18_000, 0.4, 0.5), 1e-9);
  }

  @Test
  void flameLength_3600KwPerM_is3point351M() {
    // [D] methods §8.1: 0.0775 x 3600^0.46 = 3.351 m (half the last printed digit).
    assertEquals(3.351, Byram.flameLengthM(3600), 5e-4);
  }

  @Test
  void flameLength_noFire_isZero() {
    assertEquals(0, Byram.flameLengthM(0), 0);
  }

  @Test
  void flameLength_tenfoldIntensity_scalesBy10ToThe0point46() {
    // [D] power law: Lf(10 I) / Lf(I) = 10^0.46.
    assertEquals(Math.pow(10, 0.46), Byram.flameLengthM(5000) / Byram.flameLengthM(500), 1e-12);
  }

  @Test
  void firelineIntensity_negativeArgument_throws() {
    assertThrows(IllegalArgumentException.class,
        () -> Byram.firelineIntensityKwPerM(18_000, -0.1, 0.5));
    assertThrows(IllegalArgumentException.class, () -> Byram.flameLengthM(Double.NaN));
  }
}
