package veldplan.shared.rng;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** Pins and checks the counter-based uniform draws. */
class CounterRandomTest {
  private static final long KEY = 7138415436909018950L;

  @Test
  void uniform_pinnedValues() {
    // Regression pin: values this code produced when written, not an outside check.
    assertEquals(0.7553888514674879, CounterRandom.uniform(KEY, 0, 0), 0.0);
    assertEquals(0.44621019341119594, CounterRandom.uniform(KEY, 0, 1), 0.0);
    assertEquals(0.2434641090880415, CounterRandom.uniform(KEY, 0, 2), 0.0);
    assertEquals(0.7212271120657016, CounterRandom.uniform(KEY, 0, 3), 0.0);
    assertEquals(0.6266013774285287, CounterRandom.openUniform(KEY, 3, 0), 0.0);
  }

  @Test
  void uniform_sameArguments_sameValue() {
    for (int i = 0; i < 1000; i++) {
      assertEquals(CounterRandom.uniform(KEY, i, i * 7), CounterRandom.uniform(KEY, i, i * 7));
    }
  }

  @Test
  void uniform_manyDraws_inRangeAndEvenlySpread() {
    int n = 200_000;
    int bins = 10;
    long[] counts = new long[bins];
    for (int i = 0; i < n; i++) {
      double u = CounterRandom.uniform(KEY, i / 1000, i % 1000);
      double open = CounterRandom.openUniform(KEY, i / 1000, i % 1000);
      assertTrue(u >= 0 && u < 1, "uniform " + u);
      assertTrue(open > 0 && open < 1, "open uniform " + open);
      counts[(int) (u * bins)]++;
    }
    double expected = (double) n / bins;
    double chiSquare = 0;
    for (long c : counts) {
      chiSquare += (c - expected) * (c - expected) / expected;
    }
    // Chi-square with 9 degrees of freedom: mean 9, SD 4.2. A bound of 60 is 12 SD out; the
    // chance that a good generator exceeds it is below 1e-9.
    assertTrue(chiSquare < 60, "chi-square " + chiSquare);
  }

  @Test
  void uniform_neighbouringIndices_uncorrelated() {
    int n = 100_000;
    double sx = 0;
    double sy = 0;
    double sxy = 0;
    double sxx = 0;
    double syy = 0;
    for (int i = 0; i < n; i++) {
      double x = CounterRandom.uniform(KEY, 5, i);
      double y = CounterRandom.uniform(KEY, 5, i + 1);
      sx += x;
      sy += y;
      sxy += x * y;
      sxx += x * x;
      syy += y * y;
    }
    double r = (sxy - sx * sy / n) / Math.sqrt((sxx - sx * sx / n) * (syy - sy * sy / n));
    // Under independence r has SD 1/sqrt(n) = 0.0032; 0.02 is over 6 SD (false failure < 1e-9).
    assertTrue(Math.abs(r) < 0.02, "correlation " + r);
  }
}
