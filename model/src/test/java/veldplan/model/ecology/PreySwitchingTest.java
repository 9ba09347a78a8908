package veldplan.model.ecology;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;
import java.util.stream.LongStream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/** Tests for {@link PreySwitching} against methods.md §10.2. */
class PreySwitchingTest {

  static LongStream seeds() {
    return LongStream.range(0, 100);
  }

  private static double share(int type, double[] c, double[] n, double m) {
    double denominator = PreySwitching.denominator(c, n, m);
    return PreySwitching.share(c[type], n[type], m, denominator);
  }

  @Test
  void share_equalPreferenceThreeToOne_is0point75WithoutSwitching() {
    // [D] methods §10.2: c = 1, N1/N2 = 3, m = 1 gives P1 = 0.75.
    assertEquals(0.75, share(0, new double[] {1, 1}, new double[] {3, 1}, 1), 1e-12);
  }

  @Test
  void share_equalPreferenceThreeToOne_is0point90WithSquareSwitching() {
    // [D] methods §10.2: m = 2 gives 9 / 10 = 0.90.
    assertEquals(0.90, share(0, new double[] {1, 1}, new double[] {3, 1}, 2), 1e-12);
  }

  @ParameterizedTest
  @MethodSource("seeds")
  void share_withoutSwitching_followsMurdochsRatio(long seed) {
    // Murdoch (1969) [V, methods §10.2]: P1/P2 = c N1/N2, c the relative preference.
    SplittableRandom random = new SplittableRandom(seed);
    double[] c = {0.1 + random.nextDouble(), 0.1 + random.nextDouble()};
    double[] n = {0.1 + 100 * random.nextDouble(), 0.1 + 100 * random.nextDouble()};
    double ratio = share(0, c, n, 1) / share(1, c, n, 1);
    assertEquals(c[0] / c[1] * n[0] / n[1], ratio, 1e-9 * ratio);
  }

  @ParameterizedTest
  @MethodSource("seeds")
  void share_anyPreyCommunity_sumsToOne(long seed) {
    // [D] the shares are normalised (arbitrary inputs, not data).
    SplittableRandom random = new SplittableRandom(seed);
    int types = 2 + random.nextInt(6);
    double[] c = new double[types];
    double[] n = new double[types];
    for (int i = 0; i < types; i++) {
      c[i] = random.nextDouble();
      n[i] = random.nextDouble() < 0.2 ? 0 : 50 * random.nextDouble();
    }
    n[0] += 1;
    c[0] += 0.1;
    double m = 0.5 + 2.5 * random.nextDouble();
    double denominator = PreySwitching.denominator(c, n, m);
    double sum = 0;
    for (int i = 0; i < types; i++) {
      double s = PreySwitching.share(c[i], n[i], m, denominator);
      assertTrue(s >= 0 && s <= 1, "share " + s);
      sum += s;
    }
    assertEquals(1, sum, 1e-12);
  }

  @Test
  void share_strongerSwitching_favoursTheCommonerPrey() {
    // [D] with equal preferences, a larger exponent raises the share of the more abundant type.
    double[] c = {1, 1, 1};
    double[] n = {10, 4, 1};
    double previous = 0;
    for (double m = 1; m <= 3; m += 0.5) {
      double s = share(0, c, n, m);
      assertTrue(s > previous, "m " + m);
      previous = s;
    }
  }

  @Test
  void share_noPreyAtAll_isZero() {
    double denominator = PreySwitching.denominator(new double[] {1, 1}, new double[] {0, 0}, 2);
    assertEquals(0, denominator, 0);
    assertEquals(0, PreySwitching.share(1, 0, 2, denominator), 0);
  }

  @Test
  void denominator_arraysOfDifferentLength_throws() {
    assertThrows(IllegalArgumentException.class,
        () -> PreySwitching.denominator(new double[] {1, 1}, new double[] {1}, 1));
    assertThrows(IllegalArgumentException.class,
        () -> PreySwitching.denominator(new double[] {1}, new double[] {-1}, 1));
    assertThrows(IllegalArgumentException.class, () -> PreySwitching.share(1, 1, 0, 1));
  }
}
