package veldplan.shared.check;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.function.DoubleUnaryOperator;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.junit.jupiter.api.Test;

class ChecksTest {

  /** The message names the argument and shows the value. */
  private static void assertRejected(DoubleUnaryOperator check, double value) {
    IllegalArgumentException e =
        assertThrows(IllegalArgumentException.class, () -> check.applyAsDouble(value));
    assertTrue(e.getMessage().startsWith("decayPerYear "), e.getMessage());
    assertTrue(e.getMessage().endsWith(": " + value), e.getMessage());
  }

  @Test
  void probability_boundsInclusive_returnsValue() {
    assertEquals(0.0, Checks.probability(0.0, "p"));
    assertEquals(1.0, Checks.probability(1.0, "p"));
    assertEquals(0.25, Checks.probability(0.25, "p"));
  }

  @ParameterizedTest
  @ValueSource(doubles = {Double.NaN, -1e-300, 1.0000000000000002, Double.POSITIVE_INFINITY})
  void probability_outside_rejectedWithNameAndValue(double value) {
    assertRejected(v -> Checks.probability(v, "decayPerYear"), value);
  }

  @ParameterizedTest
  @ValueSource(doubles = {Double.NaN, -0.5, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY})
  void nonNegative_badValues_rejected(double value) {
    assertRejected(v -> Checks.nonNegative(v, "decayPerYear"), value);
  }

  @ParameterizedTest
  @ValueSource(doubles = {Double.NaN, 0.0, -0.0, -3, Double.POSITIVE_INFINITY})
  void strictlyPositive_badValues_rejected(double value) {
    assertRejected(v -> Checks.strictlyPositive(v, "decayPerYear"), value);
  }

  @ParameterizedTest
  @ValueSource(doubles = {Double.NaN, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY})
  void finite_badValues_rejected(double value) {
    assertRejected(v -> Checks.finite(v, "decayPerYear"), value);
  }

  @ParameterizedTest
  @ValueSource(doubles = {Double.NaN, 1.999, 5.001})
  void inRange_outside_rejected(double value) {
    assertRejected(v -> Checks.inRange(v, 2, 5, "decayPerYear"), value);
  }

  @Test
  void goodValues_returnedUnchanged() {
    assertEquals(0.0, Checks.nonNegative(0.0, "x"));
    assertEquals(1e-300, Checks.strictlyPositive(1e-300, "x"));
    assertEquals(-7.5, Checks.finite(-7.5, "x"));
    assertEquals(2.0, Checks.inRange(2.0, 2, 5, "x"));
    assertEquals(5.0, Checks.inRange(5.0, 2, 5, "x"));
    assertEquals(Double.POSITIVE_INFINITY,
        Checks.inRange(Double.POSITIVE_INFINITY, 0, Double.POSITIVE_INFINITY, "x"));
    assertEquals(0, Checks.nonNegative(0, "n"));
    assertEquals(1, Checks.strictlyPositive(1, "n"));
    assertEquals(12, Checks.inRange(12, 1, 12, "month"));
  }

  @Test
  void intChecks_badValues_rejectedWithNameAndValue() {
    IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
        () -> Checks.inRange(13, 1, 12, "month"));
    assertEquals("month is not in [1, 12]: 13", e.getMessage());
    assertThrows(IllegalArgumentException.class, () -> Checks.nonNegative(-1, "n"));
    assertThrows(IllegalArgumentException.class, () -> Checks.strictlyPositive(0, "n"));
  }

  @Test
  void inRange_invalidBounds_rejected() {
    assertThrows(IllegalArgumentException.class, () -> Checks.inRange(1.0, 2, 1, "x"));
    assertThrows(IllegalArgumentException.class, () -> Checks.inRange(1.0, Double.NaN, 1, "x"));
    assertThrows(IllegalArgumentException.class, () -> Checks.inRange(1, 2, 1, "x"));
  }
}
