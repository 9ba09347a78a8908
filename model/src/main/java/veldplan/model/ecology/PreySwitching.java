package veldplan.model.ecology;

/**
 * Shares of prey types in a generalist predator's diet, with switching, after Murdoch (1969) [1].
 *
 * <p>Murdoch's two-prey relation is P1/P2 = c N1/N2, where P1 and P2 are the proportions of the
 * prey types in the diet, N1 and N2 their abundances and c the preference for type 1 when both
 * are equally abundant; switching means the preference rises with N1/N2. We use the common
 * multi-prey generalisation (our choice of form; from memory, not a published equation checked
 * here):
 *
 * <pre>
 *   share_i = c_i N_i^m / Σ_j c_j N_j^m
 * </pre>
 *
 * <p>m = 1 is Murdoch's relation without switching; m &gt; 1 is switching (m ≈ 2 is often used).
 * The denominator is computed once per predator and year with {@link #denominator} and then
 * shared by the calls to {@link #share}, so the yearly loop allocates nothing.
 *
 * <p>References:
 * <ol>
 *   <li>Murdoch, W.W. (1969). Switching in general predators: experiments on predator specificity
 *       and stability of prey populations. Ecological Monographs 39: 335–354.</li>
 * </ol>
 */
public final class PreySwitching {
  private PreySwitching() {}

  /**
   * Share of one prey type in the diet, c N^m / denominator. When every prey type is absent (the
   * denominator is 0) the share is 0.
   *
   * @param preference  preference c of this prey type (dimensionless), &ge; 0
   * @param abundance   abundance N of this prey type (any unit, the same for all types), &ge; 0
   * @param exponent    switching exponent m, &gt; 0
   * @param denominator Σ c_j N_j^m over all prey types, from {@link #denominator}, &ge; 0
   * @return share (fraction of the diet), in [0, 1] when the denominator includes this type
   * @throws IllegalArgumentException if an argument is out of range
   */
  public static double share(double preference, double abundance, double exponent,
      double denominator) {
    Arguments.nonNegative(preference, "preference");
    Arguments.nonNegative(abundance, "abundance");
    Arguments.positive(exponent, "exponent");
    Arguments.nonNegative(denominator, "denominator");
    if (denominator == 0) {
      return 0;
    }
    return preference * power(abundance, exponent) / denominator;
  }

  /**
   * The denominator Σ c_j N_j^m of {@link #share}. Allocates nothing.
   *
   * @param preference preferences c_j of the prey types, each &ge; 0
   * @param abundance  abundances N_j of the prey types, each &ge; 0, as many as preferences
   * @param exponent   switching exponent m, &gt; 0
   * @return the sum (dimensionless × abundance^m), &ge; 0
   * @throws IllegalArgumentException if an argument is out of range or the lengths differ
   * @throws NullPointerException     if an array is null
   */
  public static double denominator(double[] preference, double[] abundance, double exponent) {
    Arguments.length(abundance, preference.length, "abundance");
    Arguments.positive(exponent, "exponent");
    double sum = 0;
    for (int i = 0; i < preference.length; i++) {
      double c = preference[i];
      double n = abundance[i];
      if (!(c >= 0 && c <= Double.MAX_VALUE && n >= 0 && n <= Double.MAX_VALUE)) {
        throw new IllegalArgumentException("preference[" + i + "] or abundance[" + i
            + "] is not a finite value >= 0: " + c + ", " + n);
      }
      sum += c * power(n, exponent);
    }
    return sum;
  }

  /** N^m, with the common exponents 1 and 2 done without {@code Math.pow}. */
  private static double power(double n, double m) {
    if (m == 1) {
      return n;
    }
    if (m == 2) {
      return n * n;
    }
    return Math.pow(n, m);
  }
}
