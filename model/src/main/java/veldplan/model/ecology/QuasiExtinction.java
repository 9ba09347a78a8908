package veldplan.model.ecology;

import org.apache.commons.statistics.distribution.NormalDistribution;

/**
 * Probability that a population whose log abundance follows Brownian motion with drift falls to
 * a quasi-extinction threshold within a time horizon: the first-passage (inverse Gaussian)
 * probability used for quasi-extinction by Ginzburg et al. (1982) [1] and, as the diffusion
 * approximation of stochastic exponential growth, by Dennis et al. (1991) [2]:
 *
 * <pre>
 *   P(T) = Φ((−d − μT) / (σ√T)) + exp(−2μd/σ²) Φ((−d + μT) / (σ√T))
 * </pre>
 *
 * <p>d = ln(N0/Nq) is the log distance from the current abundance N0 to the threshold Nq; μ and
 * σ² are the mean and variance of the annual log growth ln(N(t+1)/N(t)); Φ is the standard
 * normal distribution function (Apache Commons Statistics). The threshold is monitored
 * continuously; a simulation that checks abundance once a year misses some crossings between
 * years and so gives a lower probability.
 *
 * <p><b>Numerics.</b> For strongly declining populations with little variance, exp(−2μd/σ²)
 * overflows while the Φ factor underflows, although their product is at most 1. The second term
 * is therefore evaluated as exp(−2μd/σ² + ln Φ(z)), with ln Φ(z) from the asymptotic (Mills
 * ratio) series far in the lower tail. The sum is capped at 1 to remove rounding above it.
 * Degenerate cases: d &le; 0 (already at or below the threshold) gives 1; T = 0 with d &gt; 0
 * gives 0; σ² = 0 is deterministic decline, giving 1 when d + μT &le; 0 and 0 otherwise.
 *
 * <p>References:
 * <ol>
 *   <li>Ginzburg, L.R., Slobodkin, L.B., Johnson, K. &amp; Bindman, A.G. (1982). Quasiextinction
 *       probabilities as a measure of impact on population growth. Risk Analysis 2(3): 171–181.
 *       </li>
 *   <li>Dennis, B., Munholland, P.L. &amp; Scott, J.M. (1991). Estimation of growth and extinction
 *       parameters for endangered species. Ecological Monographs 61: 115–143.</li>
 * </ol>
 */
public final class QuasiExtinction {
  private static final NormalDistribution STANDARD_NORMAL = NormalDistribution.of(0, 1);

  /**
   * Below this z, ln Φ(z) comes from the asymptotic series instead of the logarithm of Φ(z),
   * which underflows near z = −38.5. At z = −37 the series' first omitted term, 105/z⁸, is a
   * relative error of about 3e−11.
   */
  private static final double LOWER_TAIL_SWITCH = -37;

  private static final double LOG_SQRT_TWO_PI = 0.5 * Math.log(2 * Math.PI);

  private QuasiExtinction() {}

  /**
   * Probability of reaching the quasi-extinction threshold within {@code years} [1, 2].
   *
   * @param logDistance d = ln(N0/Nq), log distance to the threshold, finite (&le; 0 gives 1)
   * @param mu          μ, mean annual log growth rate (per year), finite
   * @param sigma2      σ², variance of the annual log growth rate (per year), &ge; 0
   * @param years       horizon T (years), &ge; 0
   * @return P(T) (probability), in [0, 1]
   * @throws IllegalArgumentException if an argument is out of range
   */
  public static double probability(double logDistance, double mu, double sigma2, double years) {
    Arguments.finite(logDistance, "logDistance");
    Arguments.finite(mu, "mu");
    Arguments.nonNegative(sigma2, "sigma2");
    Arguments.nonNegative(years, "years");
    double d = logDistance;
    if (d <= 0) {
      return 1;
    }
    if (years == 0) {
      return 0;
    }
    if (sigma2 == 0) {
      return d + mu * years <= 0 ? 1 : 0;
    }
    double spread = Math.sqrt(sigma2 * years);
    double first = STANDARD_NORMAL.cumulativeProbability((-d - mu * years) / spread);
    double second = Math.exp(-2 * mu * d / sigma2
        + logStandardNormalCdf((-d + mu * years) / spread));
    return Math.min(1, first + second);
  }

  /**
   * ln Φ(z). Uses the Commons Statistics normal distribution down to z = −37 and below that the
   * asymptotic series Φ(z) ≈ φ(z)/|z| (1 − 1/z² + 3/z⁴ − 15/z⁶).
   */
  static double logStandardNormalCdf(double z) {
    if (z > LOWER_TAIL_SWITCH) {
      return Math.log(STANDARD_NORMAL.cumulativeProbability(z));
    }
    double inverseZ2 = 1 / (z * z);
    double series = 1 - inverseZ2 * (1 - inverseZ2 * (3 - 15 * inverseZ2));
    return -0.5 * z * z - LOG_SQRT_TWO_PI - Math.log(-z) + Math.log(series);
  }
}
