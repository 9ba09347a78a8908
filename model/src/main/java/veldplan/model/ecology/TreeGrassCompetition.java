package veldplan.model.ecology;

/**
 * Grass production as a declining function of woody abundance: the functional forms fitted in
 * tree–grass competition studies of southern African savannas (for example the exponential
 * regression of grass yield on tree biomass reported by Smit (2005) [1]).
 *
 * <pre>
 *   negative exponential:  G = G0 exp(−k X)              half-yield at X = ln 2 / k
 *   hyperbolic:            G = G0 / (1 + k X)            half-yield at X = 1 / k
 *   linear to a floor:     G = max(Gmin, G0 (1 − X/Xmax))
 * </pre>
 *
 * <p>G0 is grass production without trees (for example kg DM/ha/yr) and X the woody abundance in
 * whatever measure k is calibrated for (tree basal area m²/ha, canopy cover, or
 * evapotranspiration tree equivalents per ha); k has the reciprocal unit of X. No published
 * coefficients are given here: calibrate k against a thinning data set. The monotone forms
 * simplify low tree densities, where a few trees can raise grass production above the treeless
 * level (Stuart-Hill, Tainton &amp; Barnard; from the abstract).
 *
 * <p>References:
 * <ol>
 *   <li>Smit, G.N. (2005). Tree thinning as an option to increase herbaceous yield of an encroached
 *       semi-arid savanna in South Africa. BMC Ecology 5: 4.</li>
 * </ol>
 */
public final class TreeGrassCompetition {
  private TreeGrassCompetition() {}

  /**
   * Negative-exponential form G0 exp(−k X).
   *
   * @param g0 grass production without trees G0 (any unit), &ge; 0
   * @param k  competition coefficient (1/unit of X), &ge; 0
   * @param x  woody abundance X (unit of 1/k), &ge; 0
   * @return G (unit of G0), in (0, G0]
   * @throws IllegalArgumentException if an argument is out of range
   */
  public static double negativeExponential(double g0, double k, double x) {
    check(g0, k, x);
    return g0 * Math.exp(-k * x);
  }

  /**
   * Hyperbolic form G0 / (1 + k X).
   *
   * @param g0 grass production without trees G0 (any unit), &ge; 0
   * @param k  competition coefficient (1/unit of X), &ge; 0
   * @param x  woody abundance X (unit of 1/k), &ge; 0
   * @return G (unit of G0), in (0, G0]
   * @throws IllegalArgumentException if an argument is out of range
   */
  public static double hyperbolic(double g0, double k, double x) {
    check(g0, k, x);
    return g0 / (1 + k * x);
  }

  /**
   * Linear decline to a floor, max(Gmin, G0 (1 − X/Xmax)).
   *
   * @param g0   grass production without trees G0 (any unit), &ge; 0
   * @param gMin floor Gmin (unit of G0), in [0, G0]
   * @param xMax woody abundance at which the line reaches 0 (unit of X), &gt; 0
   * @param x    woody abundance X, &ge; 0
   * @return G (unit of G0), in [Gmin, G0]
   * @throws IllegalArgumentException if an argument is out of range
   */
  public static double linearToFloor(double g0, double gMin, double xMax, double x) {
    Arguments.nonNegative(g0, "g0");
    Arguments.inClosedRange(gMin, 0, g0, "gMin");
    Arguments.positive(xMax, "xMax");
    Arguments.nonNegative(x, "x");
    return Math.max(gMin, g0 * (1 - x / xMax));
  }

  /**
   * Woody abundance that halves grass production in the negative-exponential form, ln 2 / k.
   *
   * @param k competition coefficient (1/unit of X), &gt; 0
   * @return X at G = G0/2 (unit of X)
   * @throws IllegalArgumentException if {@code k} is not positive and finite
   */
  public static double halfYieldNegativeExponential(double k) {
    Arguments.positive(k, "k");
    return Math.log(2) / k;
  }

  /**
   * Woody abundance that halves grass production in the hyperbolic form, 1 / k.
   *
   * @param k competition coefficient (1/unit of X), &gt; 0
   * @return X at G = G0/2 (unit of X)
   * @throws IllegalArgumentException if {@code k} is not positive and finite
   */
  public static double halfYieldHyperbolic(double k) {
    Arguments.positive(k, "k");
    return 1 / k;
  }

  private static void check(double g0, double k, double x) {
    Arguments.nonNegative(g0, "g0");
    Arguments.nonNegative(k, "k");
    Arguments.nonNegative(x, "x");
  }
}
