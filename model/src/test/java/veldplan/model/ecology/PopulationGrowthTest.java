package veldplan.model.ecology;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.SplittableRandom;
import java.util.stream.LongStream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/** Tests for {@link PopulationGrowth} against methods.md §9.5 and the defining equations. */
class PopulationGrowthTest {

  static LongStream seeds() {
    return LongStream.range(0, 100);
  }

  @Test
  void logisticClosedForm_sheetCase1_is575point120851() {
    // [D] methods §9.5, tolerance 1e-9 relative as the sheet says.
    assertEquals(575.120851, PopulationGrowth.logisticClosedForm(100, 1000, 0.5, 5),
        575.120851 * 1e-9);
  }

  @Test
  void logisticClosedForm_sheetCase2_is1831point691415() {
    // [D] methods §9.5, tolerance 1e-9 relative.
    assertEquals(1831.691415, PopulationGrowth.logisticClosedForm(1000, 20_000, 0.065, 10),
        1831.691415 * 1e-9);
  }

  @Test
  void doublingTime_sheetCases_match() {
    // [D] methods §9.5 (and §11.1): r 0.065 gives 10.664 yr; lambda 1.065 gives 11.007 yr.
    // Printed to three decimals, so half the last digit.
    assertEquals(10.664, PopulationGrowth.doublingTimeYears(0.065), 5e-4);
    assertEquals(11.007, PopulationGrowth.doublingTimeYears(Math.log(1.065)), 5e-4);
  }

  @ParameterizedTest
  @MethodSource("seeds")
  void logisticClosedForm_anyParameters_solvesTheLogisticEquation(long seed) {
    // [D] dN/dt = r N (1 - N/K), checked by a central difference (arbitrary parameters).
    SplittableRandom random = new SplittableRandom(seed);
    double k = 10 + 1e4 * random.nextDouble();
    double n0 = k * 2 * random.nextDouble();
    double r = random.nextDouble();
    double t = 0.01 + 20 * random.nextDouble();
    double h = 1e-4;
    double n = PopulationGrowth.logisticClosedForm(n0, k, r, t);
    double slope = (PopulationGrowth.logisticClosedForm(n0, k, r, t + h)
        - PopulationGrowth.logisticClosedForm(n0, k, r, t - h)) / (2 * h);
    assertEquals(r * n * (1 - n / k), slope, 1e-6 * (1 + Math.abs(r) * k));
  }

  @Test
  void logisticClosedForm_startAndLongRun_giveN0AndK() {
    assertEquals(123, PopulationGrowth.logisticClosedForm(123, 1000, 0.3, 0), 1e-12);
    assertEquals(1000, PopulationGrowth.logisticClosedForm(123, 1000, 0.3, 500), 1e-9);
    assertEquals(1000, PopulationGrowth.logisticClosedForm(1000, 1000, 0.3, 7), 0);
    assertEquals(0, PopulationGrowth.logisticClosedForm(0, 1000, 0.3, 7), 0);
  }

  @Test
  void logisticClosedForm_negativeRateBelowCapacity_decaysAndAboveDiverges() {
    // [D] with r < 0, N0 < K decays toward 0; N0 > K diverges where N0 + (K - N0) e^(-rt) = 0,
    // here at t = ln 2 / 0.5 = 1.386 years for N0 = 2K.
    assertEquals(1000 * 100 / (100 + 900 * Math.exp(1.0)),
        PopulationGrowth.logisticClosedForm(100, 1000, -0.5, 2), 1e-9);
    assertEquals(Double.POSITIVE_INFINITY,
        PopulationGrowth.logisticClosedForm(2000, 1000, -0.5, 2), 0);
  }

  @Test
  void ricker_atCarryingCapacity_staysThere() {
    // [D] N = K gives exp(0) = 1.
    assertEquals(800, PopulationGrowth.ricker(800, 0.4, 800), 0);
  }

  @Test
  void ricker_belowAndAboveCapacity_movesTowardIt() {
    // [D] N exp(r (1 - N/K)) with r 0.2: 400 -> 400 e^0.1; 1200 -> 1200 e^-0.1.
    assertEquals(400 * Math.exp(0.1), PopulationGrowth.ricker(400, 0.2, 800), 1e-9);
    assertEquals(1200 * Math.exp(-0.1), PopulationGrowth.ricker(1200, 0.2, 800), 1e-9);
  }

  @Test
  void invalidArguments_throw() {
    assertThrows(IllegalArgumentException.class,
        () -> PopulationGrowth.logisticClosedForm(-1, 1000, 0.3, 1));
    assertThrows(IllegalArgumentException.class,
        () -> PopulationGrowth.logisticClosedForm(10, 1000, 0.3, -1));
    assertThrows(IllegalArgumentException.class, () -> PopulationGrowth.ricker(10, 0.3, 0));
    assertThrows(IllegalArgumentException.class, () -> PopulationGrowth.doublingTimeYears(0));
  }
}
