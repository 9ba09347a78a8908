package veldplan.objectives;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;

class ReplicateStepTest {

  /** Wilson (1927) 95 % intervals: check values of decision-methods.md §4.5 [calc]. */
  @ParameterizedTest(name = "{0}/{1} -> [{2}, {3}]")
  @CsvSource({
      "0, 10, 0, 0.2775",
      "5, 10, 0.2366, 0.7634",
      "8, 10, 0.4902, 0.9433",
      "10, 10, 0.7225, 1",
      "7, 20, 0.1812, 0.5671",
      "18, 20, 0.6990, 0.9721",
      "45, 50, 0.7864, 0.9565",
      "90, 100, 0.8256, 0.9448",
      "95, 100, 0.8882, 0.9785",
      "0, 100, 0, 0.0370",
      "180, 200, 0.8506, 0.9343"})
  void probabilityHasTheWilsonInterval(int successes, int n, double lower, double upper) {
    double[] runs = new double[n];
    for (int i = 0; i < successes; i++) {
      runs[i] = 1;
    }
    Estimate e = ReplicateStep.PROBABILITY.summarise(runs);
    assertEquals(successes / (double) n, e.value(), 1e-15);
    assertEquals(lower, e.lower(), 5e-5);
    assertEquals(upper, e.upper(), 5e-5);
    assertEquals(n, e.n());
  }

  @Test
  void probabilityRejectsRunsThatAreNotZeroOrOne() {
    assertThrows(IllegalArgumentException.class,
        () -> ReplicateStep.PROBABILITY.summarise(new double[] {1, 0.5}));
  }

  /**
   * Student-t interval of the mean of 1..9: mean 5, s = sqrt(7.5), se = s/3; half-width
   * t(0.975, 8) x se with t(0.975, 8) = 2.306004 (decision-methods.md §4.3 [calc]).
   */
  @Test
  void meanHasTheStudentTInterval() {
    double[] runs = {3, 1, 2, 9, 5, 4, 8, 6, 7};
    Estimate e = ReplicateStep.MEAN.summarise(runs);
    double half = 2.306004 * Math.sqrt(7.5) / 3;
    assertEquals(5, e.value(), 1e-12);
    assertEquals(5 - half, e.lower(), 1e-6);
    assertEquals(5 + half, e.upper(), 1e-6);
  }

  @Test
  void meanOfOneRunHasNoInterval() {
    Estimate e = ReplicateStep.MEAN.summarise(new double[] {4.5});
    assertEquals(4.5, e.value());
    assertTrue(Double.isNaN(e.lower()) && Double.isNaN(e.upper()));
  }

  @Test
  void summarisesASlice() {
    double[] runs = {9, 9, 1, 0, 1, 1, 9};
    Estimate e = ReplicateStep.PROBABILITY.summarise(runs, 2, 4);
    assertEquals(0.75, e.value(), 1e-15);
    assertEquals(4, e.n());
  }
}
