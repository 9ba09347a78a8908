package veldplan.model.ecology;

/**
 * Response of plant production to the atmospheric CO2 concentration, as a multiplier that is 1 at
 * a reference concentration C0.
 *
 * <pre>
 *   logarithmic ("beta factor"):  f(C) = 1 + β ln(C / C0)                    [1]
 *   saturating (Michaelis–Menten): f(C) = C (C0 + K) / (C0 (C + K))
 * </pre>
 *
 * <p>The logarithmic form goes back to Bacastow &amp; Keeling (1973) [1] (citation details from
 * memory); β is a scenario parameter, not a constant: values of about 0.3–0.7 are used for C3 or
 * global vegetation and much smaller ones for C4 grasses (from memory). The logarithmic factor
 * falls below 0 for C &lt; C0 exp(−1/β); it is returned as computed, so a caller using it far below
 * C0 must decide what that means. The saturating form is the standard rectangular hyperbola in C
 * normalised to 1 at C0, with the half-saturation constant K; it approaches (C0 + K)/C0 as C grows.
 *
 * <p>References:
 * <ol>
 *   <li>Bacastow, R. &amp; Keeling, C.D. (1973). Atmospheric carbon dioxide and radiocarbon in the
 *       natural carbon cycle: II. Changes from A.D. 1700 to 2070 as deduced from a geochemical
 *       model. In: Woodwell, G.M. &amp; Pecan, E.V. (eds), Carbon and the Biosphere, pp. 86–135.
 *       US Atomic Energy Commission.</li>
 * </ol>
 */
public final class Co2Response {
  private Co2Response() {}

  /**
   * Logarithmic CO2 factor 1 + β ln(C / C0) [1].
   *
   * @param co2Ppm       CO2 concentration C (ppm), &gt; 0
   * @param referencePpm reference concentration C0 (ppm), &gt; 0
   * @param beta         β (dimensionless), finite
   * @return the factor (dimensionless); 1 at C = C0
   * @throws IllegalArgumentException if an argument is out of range
   */
  public static double logarithmicBeta(double co2Ppm, double referencePpm, double beta) {
    Arguments.positive(co2Ppm, "co2Ppm");
    Arguments.positive(referencePpm, "referencePpm");
    Arguments.finite(beta, "beta");
    return 1 + beta * Math.log(co2Ppm / referencePpm);
  }

  /**
   * Saturating (Michaelis–Menten) CO2 factor C (C0 + K) / (C0 (C + K)).
   *
   * @param co2Ppm            CO2 concentration C (ppm), &ge; 0
   * @param referencePpm      reference concentration C0 (ppm), &gt; 0
   * @param halfSaturationPpm half-saturation constant K (ppm), &gt; 0
   * @return the factor (dimensionless), in [0, (C0 + K)/C0); 1 at C = C0
   * @throws IllegalArgumentException if an argument is out of range
   */
  public static double michaelisMenten(double co2Ppm, double referencePpm,
      double halfSaturationPpm) {
    Arguments.nonNegative(co2Ppm, "co2Ppm");
    Arguments.positive(referencePpm, "referencePpm");
    Arguments.positive(halfSaturationPpm, "halfSaturationPpm");
    return co2Ppm * (referencePpm + halfSaturationPpm)
        / (referencePpm * (co2Ppm + halfSaturationPpm));
  }
}
