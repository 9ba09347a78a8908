package veldplan.model.ecology;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.Arrays;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** Tests for {@link Discounting}: exact arithmetic of methods.md §12.2 [D], 1e-9 relative. */
class DiscountingTest {

  @ParameterizedTest(name = "C {0}, i {1}, T {2} -> {3}")
  @CsvSource({
      // [D] methods §12.2.
      "100, 0.05, 10, 772.173493",
      "100, 0.08, 30, 1125.778334"})
  void annuity_sheetCases_matchHandArithmetic(double cost, double rate, int years,
      double expected) {
    assertEquals(expected, Discounting.annuity(cost, rate, years), expected * 1e-9);
  }

  @Test
  void presentValue_single1000In20YearsAt3Percent_is553point675754() {
    // [D] methods §12.2.
    assertEquals(553.675754, Discounting.presentValue(1000, 0.03, 20), 553.675754 * 1e-9);
  }

  @ParameterizedTest
  @CsvSource({"100, 0.05, 10", "100, 0.08, 30", "250, 0.03, 50", "40, 0.0, 12"})
  void annuity_sumOfYearlyPresentValues_isTheSame(double cost, double rate, int years) {
    // [D] the annuity formula is the closed form of sum_{t=1..T} C / (1 + i)^t.
    double sum = 0;
    for (int t = 1; t <= years; t++) {
      sum += Discounting.presentValue(cost, rate, t);
    }
    double[] costs = new double[years];
    Arrays.fill(costs, cost);
    assertEquals(sum, Discounting.annuity(cost, rate, years), 1e-9 * sum);
    assertEquals(sum, Discounting.presentValueOfSeries(costs, rate), 1e-9 * sum);
  }

  @Test
  void presentValueOfSeries_costsInDifferentYears_discountsEachByItsYear() {
    // [D] 100 at the end of year 1 and 200 at the end of year 3, at 10 %.
    assertEquals(100 / 1.1 + 0 + 200 / (1.1 * 1.1 * 1.1),
        Discounting.presentValueOfSeries(new double[] {100, 0, 200}, 0.10), 1e-9);
    assertEquals(0, Discounting.presentValueOfSeries(new double[0], 0.10), 0);
  }

  @Test
  void annuity_zeroRate_isCostTimesYears() {
    assertEquals(1200, Discounting.annuity(100, 0, 12), 0);
  }

  @Test
  void invalidArguments_throw() {
    assertThrows(IllegalArgumentException.class, () -> Discounting.presentValue(100, -1, 5));
    assertThrows(IllegalArgumentException.class, () -> Discounting.presentValue(100, 0.05, -1));
    assertThrows(IllegalArgumentException.class, () -> Discounting.annuity(100, Double.NaN, 5));
    assertThrows(IllegalArgumentException.class,
        () -> Discounting.presentValueOfSeries(new double[] {1, Double.NaN}, 0.05));
  }
}
