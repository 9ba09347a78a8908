package veldplan.model.ecology;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Tests for {@link Co2Response}. Values are the sheet's arithmetic from the two forms [D,
 * methods.md §7.1]. The sheet asks for 1e-9 relative but prints seven significant figures, so the
 * tolerance is half the last printed digit.
 */
class Co2ResponseTest {

  @ParameterizedTest(name = "beta {2}, C {0}, C0 {1} -> {3}")
  @CsvSource({
      // [D] methods §7.1.
      "560, 280, 0.6, 1.415888",
      "560, 280, 0.4, 1.277259",
      "560, 280, 0.2, 1.138629",
      "550, 400, 0.6, 1.191072"})
  void logarithmicBeta_sheetCases_matchHandArithmetic(double co2, double reference, double beta,
      double expected) {
    assertEquals(expected, Co2Response.logarithmicBeta(co2, reference, beta), 5e-7);
  }

  @Test
  void michaelisMenten_sheetCase_is1point348837() {
    // [D] methods §7.1: K 300, C0 280, C 560 gives 560 * 580 / (280 * 860) = 1.348837.
    assertEquals(1.348837, Co2Response.michaelisMenten(560, 280, 300), 5e-7);
  }

  @Test
  void bothForms_referenceConcentration_areOne() {
    assertEquals(1.0, Co2Response.logarithmicBeta(400, 400, 0.6), 0);
    assertEquals(1.0, Co2Response.michaelisMenten(400, 400, 300), 1e-15);
  }

  @Test
  void michaelisMenten_veryHighConcentration_approachesSaturation() {
    // [D] the limit C -> infinity of C (C0 + K) / (C0 (C + K)) is (C0 + K)/C0.
    double limit = (280.0 + 300) / 280;
    double high = Co2Response.michaelisMenten(1e9, 280, 300);
    assertTrue(high < limit);
    assertEquals(limit, high, 1e-6);
  }

  @Test
  void logarithmicBeta_doublingTwice_addsBetaLn2Twice() {
    // [D] the factor is linear in ln C.
    double once = Co2Response.logarithmicBeta(560, 280, 0.5);
    double twice = Co2Response.logarithmicBeta(1120, 280, 0.5);
    assertEquals(2 * (once - 1), twice - 1, 1e-12);
  }

  @Test
  void logarithmicBeta_zeroConcentration_throws() {
    assertThrows(IllegalArgumentException.class, () -> Co2Response.logarithmicBeta(0, 280, 0.5));
    assertThrows(IllegalArgumentException.class,
        () -> Co2Response.logarithmicBeta(400, 280, Double.NaN));
  }

  @Test
  void michaelisMenten_nonPositiveHalfSaturation_throws() {
    assertThrows(IllegalArgumentException.class, () -> Co2Response.michaelisMenten(400, 280, 0));
    assertThrows(IllegalArgumentException.class, () -> Co2Response.michaelisMenten(-1, 280, 300));
  }
}
