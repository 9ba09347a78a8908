package veldplan.model.ecology;

/**
 * Fraction of an area within reach of surface water, from the coverage formula of a Boolean model
 * (Hall 1988 [1], from memory): water points and river reaches placed independently and uniformly
 * at random over the area, each covering the ground within the reach distance d.
 *
 * <pre>
 *   covered = 1 − exp(−(n π d² + 2 d L) / A)
 * </pre>
 *
 * <p>n is the number of water points, each covering a disc of area π d²; L the total length of
 * rivers, each kilometre covering a strip of width 2d (the discs at the ends of a river are
 * neglected, which is right for rivers much longer than d); A the area. The exponential is the
 * probability that a given place lies in none of the independently placed discs and strips,
 * exp(−expected covered area / A) (the Poisson limit). Overlaps are thereby counted correctly on
 * average, so the result never exceeds 1. Edge effects at the park boundary are neglected.
 *
 * <p>This is a summary for planning, not a map: real water points are placed deliberately and
 * rivers follow valleys, so the actual coverage of a given layout can differ. Use a distance map
 * where the layout is known.
 *
 * <p>References:
 * <ol>
 *   <li>Hall, P. (1988). Introduction to the Theory of Coverage Processes. Wiley, New York
 *       (from memory).</li>
 * </ol>
 */
public final class WaterCoverage {
  private WaterCoverage() {}

  /**
   * Fraction of the area within {@code reachKm} of a water point or a river [1].
   *
   * @param areaKm2     area A (km²), &gt; 0
   * @param waterPoints number of water points n, &ge; 0
   * @param riverKm     total length of rivers L (km), &ge; 0
   * @param reachKm     reach distance d (km), &ge; 0
   * @return covered fraction, in [0, 1]
   * @throws IllegalArgumentException if an argument is out of range
   */
  public static double fractionWithinReach(double areaKm2, int waterPoints, double riverKm,
      double reachKm) {
    Arguments.positive(areaKm2, "areaKm2");
    Arguments.nonNegative(waterPoints, "waterPoints");
    Arguments.nonNegative(riverKm, "riverKm");
    Arguments.nonNegative(reachKm, "reachKm");
    double coveredAreaKm2 = waterPoints * Math.PI * reachKm * reachKm + 2 * reachKm * riverKm;
    return -Math.expm1(-coveredAreaKm2 / areaKm2);
  }
}
