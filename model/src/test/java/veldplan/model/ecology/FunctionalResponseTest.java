package veldplan.model.ecology;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** Tests for {@link FunctionalResponse} against methods.md §10.1. */
class FunctionalResponseTest {

  @Test
  void typeII_sheetCase_is2point5() {
    // [D] methods §10.1: a 0.5, h 0.2, N 10 gives 5 / 2 = 2.5.
    assertEquals(2.5, FunctionalResponse.typeII(0.5, 0.2, 10), 1e-12);
  }

  @Test
  void typeIII_sheetCase_is4point545455() {
    // [D] methods §10.1: 50 / 11 = 4.545455 (half the last printed digit).
    assertEquals(4.545455, FunctionalResponse.typeIII(0.5, 0.2, 10), 5e-7);
  }

  @Test
  void bothTypes_veryHighDensity_approachOneOverHandlingTime() {
    // Holling (1959) [V, methods §10.1]: asymptote 1/h = 5.
    assertEquals(5, FunctionalResponse.typeII(0.5, 0.2, 1e12), 1e-9);
    assertEquals(5, FunctionalResponse.typeIII(0.5, 0.2, 1e12), 1e-9);
  }

  @ParameterizedTest
  @CsvSource({"0.5, 0.2, 10", "0.01, 3, 250", "2, 0.05, 0.3"})
  void typeII_halfSaturationForm_isTheSameFunction(double a, double h, double n) {
    // [D] methods §10.1: Imax N / (N + N_half) with Imax = 1/h, N_half = 1/(a h).
    double halfSaturation = 1 / (a * h);
    assertEquals(n / h / (n + halfSaturation), FunctionalResponse.typeII(a, h, n), 1e-12);
  }

  @Test
  void bothTypes_noPreyOrNoHandling_giveZeroAndLinear() {
    assertEquals(0, FunctionalResponse.typeII(0.5, 0.2, 0), 0);
    assertEquals(0, FunctionalResponse.typeIII(0.5, 0.2, 0), 0);
    assertEquals(5, FunctionalResponse.typeII(0.5, 0, 10), 0);
    assertEquals(50, FunctionalResponse.typeIII(0.5, 0, 10), 0);
  }

  @Test
  void typeII_negativeDensity_throws() {
    assertThrows(IllegalArgumentException.class, () -> FunctionalResponse.typeII(0.5, 0.2, -1));
    assertThrows(IllegalArgumentException.class,
        () -> FunctionalResponse.typeIII(Double.NaN, 0.2, 1));
  }
}
