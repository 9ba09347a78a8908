package veldplan.optimiser.search;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class ComparisonsTest {
  /** decision-methods.md §3.7 [calc]: X = {1,2,3}, Y = {2,3,4} -> A12 = 2/9, U = 2.0. */
  @Test
  void a12AndUOfTheWorkedExample() {
    double[] x = {1, 2, 3};
    double[] y = {2, 3, 4};
    assertEquals(2.0 / 9, Comparisons.a12(x, y), 1e-15);
    assertEquals(2.0, Comparisons.mannWhitneyU(x, y), 1e-12);
    assertEquals(1 - 2.0 / 9, Comparisons.a12(y, x), 1e-15);
  }

  @Test
  void identicalSamplesShowNoDifference() {
    double[] x = {0.1, 0.2, 0.3, 0.4};
    assertEquals(0.5, Comparisons.a12(x, x), 1e-15);
    assertTrue(Comparisons.mannWhitneyP(x, x) > 0.99);
  }

  @Test
  void separatedSamplesAreSignificant() {
    double[] x = {10, 11, 12, 13, 14, 15, 16, 17};
    double[] y = {1, 2, 3, 4, 5, 6, 7, 8};
    assertEquals(1, Comparisons.a12(x, y), 1e-15);
    assertTrue(Comparisons.mannWhitneyP(x, y) < 0.01);
  }
}
