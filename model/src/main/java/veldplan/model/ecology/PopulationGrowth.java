package veldplan.model.ecology;

/**
 * Exact results for the standard single-population growth models.
 *
 * <pre>
 *   continuous logistic:  N(t) = K / (1 + ((K − N0)/N0) exp(−r t))
 *   discrete Ricker [1]:  N(t+1) = N(t) exp(r (1 − N(t)/K))
 *   exponential:          N(t) = N0 exp(r t);  doubling time = ln 2 / r
 * </pre>
 *
 * <p>r is the exponential (instantaneous) rate per year; for a finite annual rate λ use
 * r = ln λ. The logistic closed form is evaluated as K N0 / (N0 + (K − N0) exp(−r t)), which is
 * the same function and stays finite at N0 = 0.
 *
 * <p>References:
 * <ol>
 *   <li>Ricker, W.E. (1954). Stock and recruitment. Journal of the Fisheries Research Board of
 *       Canada 11: 559–623 (citation from memory).</li>
 * </ol>
 */
public final class PopulationGrowth {
  private PopulationGrowth() {}

  /**
   * Solution of the continuous logistic equation dN/dt = r N (1 − N/K).
   *
   * @param n0 abundance at t = 0, N0 (any unit), &ge; 0
   * @param k  carrying capacity K (same unit), &gt; 0
   * @param r  exponential rate r (per year), finite
   * @param t  time since N0 t (years), &ge; 0 (backwards in time the solution from N0 &gt; K
   *           diverges, so negative times are refused)
   * @return N(t) (unit of N0), &ge; 0; {@link Double#POSITIVE_INFINITY} once the solution has
   *     diverged, which happens only for r &lt; 0 with N0 &gt; K (K is then unstable)
   * @throws IllegalArgumentException if an argument is out of range
   */
  public static double logisticClosedForm(double n0, double k, double r, double t) {
    Arguments.nonNegative(n0, "n0");
    Arguments.positive(k, "k");
    Arguments.finite(r, "r");
    Arguments.nonNegative(t, "t");
    if (n0 == 0 || n0 == k) {
      return n0;
    }
    double denominator = n0 + (k - n0) * Math.exp(-r * t);
    if (!(denominator > 0)) {
      return Double.POSITIVE_INFINITY;
    }
    return k * n0 / denominator;
  }

  /**
   * One step of the Ricker map N' = N exp(r (1 − N/K)) [1].
   *
   * @param n abundance this year N (any unit), &ge; 0
   * @param r exponential rate at low density r (per year), finite
   * @param k carrying capacity K (same unit), &gt; 0
   * @return abundance next year (unit of N), &ge; 0
   * @throws IllegalArgumentException if an argument is out of range
   */
  public static double ricker(double n, double r, double k) {
    Arguments.nonNegative(n, "n");
    Arguments.finite(r, "r");
    Arguments.positive(k, "k");
    return n * Math.exp(r * (1 - n / k));
  }

  /**
   * Doubling time of exponential growth, ln 2 / r.
   *
   * @param r exponential rate (per year), &gt; 0; for a finite rate λ pass ln λ
   * @return doubling time (years), &gt; 0
   * @throws IllegalArgumentException if {@code r} is not positive and finite
   */
  public static double doublingTimeYears(double r) {
    Arguments.positive(r, "r");
    return Math.log(2) / r;
  }
}
