package veldplan.model.ecology;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Statistical check that {@link QuasiExtinction#probability} is the first-passage probability of
 * a geometric random walk (methods.md §12.1: "the fraction of stochastic replicates with
 * min N(t) &lt; Nq within T must converge to the formula for a pure geometric model").
 *
 * <p>Each path simulates the log distance above the threshold, x(t) = d + μt + σW(t), in
 * Gaussian sub-steps of length Δt. A path that ends a sub-step at or below 0 has hit. Checking
 * only at the ends of sub-steps misses crossings inside them, so the fraction is also computed
 * with the exact Brownian-bridge correction: given both ends above 0, the path crossed 0 inside
 * the sub-step with probability exp(−2 x₀ x₁ / (σ² Δt)), whatever the drift (a standard result
 * for Brownian motion, e.g. Glasserman 2004, Monte Carlo Methods in Financial Engineering, §6.4;
 * from memory). The bridge-corrected fraction is an unbiased estimate of the continuous-time
 * probability, so it is compared with the formula within five binomial standard errors: the
 * probability of a false failure is 2 (1 − Φ(5)) ≈ 5.7e−7 per case. Seeds are fixed so the test
 * is reproducible; their values are arbitrary.
 */
class QuasiExtinctionMonteCarloTest {

  /** Fractions of paths that hit: {checked at sub-step ends only, with bridge correction}. */
  private static double[] hitFractions(double d, double mu, double sigma2, int years,
      int stepsPerYear, int paths, long seed) {
    SplittableRandom random = new SplittableRandom(seed);
    double dt = 1.0 / stepsPerYear;
    double stepSd = Math.sqrt(sigma2 * dt);
    double stepDrift = mu * dt;
    double bridgeScale = 2 / (sigma2 * dt);
    int steps = years * stepsPerYear;
    int discreteHits = 0;
    int bridgeHits = 0;
    for (int path = 0; path < paths; path++) {
      double x = d;
      boolean hitAtStepEnd = false;
      boolean hitInBridge = false;
      for (int step = 0; step < steps; step++) {
        double next = x + stepDrift + stepSd * random.nextGaussian();
        if (next <= 0) {
          hitAtStepEnd = true;
          break;
        }
        // exp(-40) < 5e-18: skip the draw where a crossing inside the sub-step is impossible
        // in practice.
        double exponent = bridgeScale * x * next;
        if (!hitInBridge && exponent < 40 && random.nextDouble() < Math.exp(-exponent)) {
          hitInBridge = true;
        }
        x = next;
      }
      if (hitAtStepEnd) {
        discreteHits++;
      }
      if (hitAtStepEnd || hitInBridge) {
        bridgeHits++;
      }
    }
    return new double[] {(double) discreteHits / paths, (double) bridgeHits / paths};
  }

  @Test
  void probability_workedExampleSimulatedWithFineSteps_matchesFormula() {
    // d 0.5, mu 0, sigma^2 0.01, T 10: 0.113846 [V2, methods §12.1]; 100 sub-steps per year.
    int paths = 50_000;
    double expected = QuasiExtinction.probability(0.5, 0, 0.01, 10);
    double standardError = Math.sqrt(expected * (1 - expected) / paths);
    double[] fractions = hitFractions(0.5, 0, 0.01, 10, 100, paths, 0x5EED_0001L);
    assertEquals(expected, fractions[1], 5 * standardError, "bridge-corrected fraction");
    // Monitoring only at sub-step ends can only miss hits, and at 100 sub-steps per year it
    // misses few: the expected shortfall is about 0.004 here (continuity correction of
    // Broadie, Glasserman & Kou 1997, barrier shifted by 0.5826 sigma sqrt(dt); from memory).
    // The bound 0.012 allows for that plus five standard errors.
    assertTrue(fractions[0] <= fractions[1], "subset of the bridge-corrected hits");
    assertTrue(fractions[0] >= expected - 0.012, "discrete fraction " + fractions[0]);
  }

  @ParameterizedTest(name = "d {0}, mu {1}, sigma2 {2}, T {3}")
  @CsvSource({
      // [D] methods §12.1: 0.176341 and 0.027615. These exercise the drift term
      // exp(-2 mu d / sigma^2), which the mu = 0 case does not. With the bridge correction the
      // estimate is exact for any sub-step, so 10 per year keep the run short.
      "2.302585092994046, -0.01, 0.04, 50",
      "2.302585092994046,  0.02, 0.04, 50"})
  void probability_driftingWalkSimulated_matchesFormula(double d, double mu, double sigma2,
      int years) {
    int paths = 40_000;
    double expected = QuasiExtinction.probability(d, mu, sigma2, years);
    double standardError = Math.sqrt(expected * (1 - expected) / paths);
    double[] fractions = hitFractions(d, mu, sigma2, years, 10, paths, 0x5EED_0002L);
    assertEquals(expected, fractions[1], 5 * standardError, "bridge-corrected fraction");
  }
}
