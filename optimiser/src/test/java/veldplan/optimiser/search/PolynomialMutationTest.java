package veldplan.optimiser.search;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Tests for {@link PolynomialMutation}. Check values: decision-methods.md §2.5 and §9 [calc],
 * from the bounded formula of the NSGA-II reference code (Deb &amp; Goyal 1996; Deb et al. 2002).
 */
class PolynomialMutationTest {

  @ParameterizedTest
  @CsvSource({
      // y, u, expected: decision-methods §2.5 checks, y in [0,1], eta_m = 20 [calc]
      "0.5, 0.25, 0.4675318",
      "0.5, 0.75, 0.532468",
      "0.5, 0.0,  0.0",
      "0.5, 1.0,  1.0",
      "0.0, 0.25, 0.0",
      "0.0, 0.5,  0.0"})
  void bounded_publishedChecks(double y, double u, double expected) {
    assertEquals(expected, PolynomialMutation.mutate(y, 0, 1, u, 20), 5e-7);
  }

  @Test
  void bounded_consolidatedCheckValue() {
    // decision-methods §9: PM bounded y=0.5, eta=20, u=0.25 -> 0.4675318 [calc].
    assertEquals(0.4675318, PolynomialMutation.mutate(0.5, 0, 1, 0.25, 20), 5e-8);
  }

  @Test
  void unboundedDelta_medianAbsoluteValue() {
    // decision-methods §2.5: unbounded median |dq| = 1 - 0.5^(1/(eta+1)) = 0.032468 for eta=20.
    // |dq| falls from u = 0 to 0.5, so half of the mass lies below |dq(0.25)| = |dq(0.75)|.
    assertEquals(0.032468, -PolynomialMutation.unboundedDelta(0.25, 20), 5e-7);
    assertEquals(0.032468, PolynomialMutation.unboundedDelta(0.75, 20), 5e-7);
  }

  @Test
  void bounded_farFromBounds_isTheUnboundedPerturbation() {
    // With (1 - delta)^(eta+1) negligible the bounded form reduces to the unbounded one.
    double range = 2e6;
    for (double u : new double[] {0.1, 0.25, 0.5, 0.75, 0.9}) {
      double y = PolynomialMutation.mutate(0, -1e6, 1e6, u, 20);
      assertEquals(PolynomialMutation.unboundedDelta(u, 20) * range, y, 1e-4 * range * 1e-2);
    }
  }

  @Test
  void bounded_alwaysInsideTheRange() {
    SplittableRandom random = new SplittableRandom(9);
    for (int i = 0; i < 10_000; i++) {
      double y = PolynomialMutation.mutate(random.nextDouble(), 0, 1, random.nextDouble(),
          random.nextDouble(0, 100));
      assertTrue(y >= 0 && y <= 1, "value " + y);
    }
  }

  @Test
  void mutateVector_probabilityZeroChangesNothing_probabilityOneChangesAlmostAll() {
    double[] genes = new double[1000];
    java.util.Arrays.fill(genes, 0.5);
    double[] copy = genes.clone();
    PolynomialMutation.mutate(copy, 0.0, 20, new SplittableRandom(1));
    assertArrayEquals(genes, copy, 0);
    PolynomialMutation.mutate(copy, 1.0, 20, new SplittableRandom(1));
    int changed = 0;
    for (double g : copy) {
      if (g != 0.5) {
        changed++;
      }
    }
    // Every gene is mutated; only u = 0.5 exactly (probability ~1e-16) leaves one at 0.5.
    assertEquals(1000, changed);
  }
}
