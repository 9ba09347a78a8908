package veldplan.model.ecology;

/**
 * Soil water characteristics from texture and organic matter, after Saxton &amp; Rawls (2006)
 * [1], for normal density, no gravel and no salinity.
 *
 * <pre>
 *   θ1500t = −0.024 S + 0.487 C + 0.006 OM + 0.005 S·OM − 0.013 C·OM + 0.068 S·C + 0.031
 *   θ1500  = θ1500t + (0.14 θ1500t − 0.02)
 *   θ33t   = −0.251 S + 0.195 C + 0.011 OM + 0.006 S·OM − 0.027 C·OM + 0.452 S·C + 0.299
 *   θ33    = θ33t + (1.283 θ33t² − 0.374 θ33t − 0.015)
 *   θS−33t = 0.278 S + 0.034 C + 0.022 OM − 0.018 S·OM − 0.027 C·OM − 0.584 S·C + 0.078
 *   θS−33  = θS−33t + (0.636 θS−33t − 0.107)
 *   θS     = θ33 + θS−33 − 0.097 S + 0.043
 *   ρN     = (1 − θS) 2.65
 *   B      = [ln 1500 − ln 33] / [ln θ33 − ln θ1500],   λ = 1/B
 *   Ks     = 1930 (θS − θ33)^(3 − λ)    (mm/h)
 * </pre>
 *
 * <p><b>Mixed units, as in the paper</b>: sand S and clay C are decimal mass fractions (0.40, not
 * 40), organic matter OM is in percent by mass (2.5, not 0.025). The coefficient of θ33t² is
 * 1.283; a public code copy with 1.238 does not reproduce the published class table. Equation
 * numbers are not cited because they were not checked against the paper; the coefficients were
 * checked by reproducing the paper's table of texture classes (see the test).
 *
 * <p><b>Range.</b> The regressions were fitted on agricultural soils; the authors give clay up to
 * about 60 % and organic matter up to about 8 % as their range (from memory, not re-checked).
 * Outside it, and for nearly pure sand with little organic matter, the regressions can give a
 * wilting point at or below 0 or unordered water contents: {@link #of} then throws rather than
 * return a meaningless soil.
 *
 * <p>References:
 * <ol>
 *   <li>Saxton, K.E. &amp; Rawls, W.J. (2006). Soil water characteristic estimates by texture and
 *       organic matter for hydrologic solutions. Soil Science Society of America Journal 70:
 *       1569–1578. doi:10.2136/sssaj2005.0117</li>
 * </ol>
 */
public final class SaxtonRawls {
  /** Particle density of mineral soil used for the normal bulk density ρN (g/cm³) [1]. */
  private static final double PARTICLE_DENSITY_G_PER_CM3 = 2.65;

  private SaxtonRawls() {}

  /**
   * Estimates the water characteristics of a soil from its texture and organic matter [1].
   *
   * @param sandFraction         sand S (decimal mass fraction), in [0, 1]
   * @param clayFraction         clay C (decimal mass fraction), in [0, 1], S + C &le; 1
   * @param organicMatterPercent organic matter OM (percent by mass), &ge; 0
   * @return the wilting point, field capacity, saturation, available water, saturated
   *     conductivity and normal bulk density
   * @throws IllegalArgumentException if an argument is out of range, or if the texture lies
   *     where the regressions give unordered water contents (see the class comment)
   */
  public static SoilWaterCharacteristics of(double sandFraction, double clayFraction,
      double organicMatterPercent) {
    double s = Arguments.inClosedRange(sandFraction, 0, 1, "sandFraction");
    double c = Arguments.inClosedRange(clayFraction, 0, 1, "clayFraction");
    Arguments.inClosedRange(s + c, 0, 1, "sandFraction + clayFraction");
    double om = Arguments.nonNegative(organicMatterPercent, "organicMatterPercent");

    double th1500t = -0.024 * s + 0.487 * c + 0.006 * om + 0.005 * s * om - 0.013 * c * om
        + 0.068 * s * c + 0.031;
    double th1500 = th1500t + (0.14 * th1500t - 0.02);
    double th33t = -0.251 * s + 0.195 * c + 0.011 * om + 0.006 * s * om - 0.027 * c * om
        + 0.452 * s * c + 0.299;
    double th33 = th33t + (1.283 * th33t * th33t - 0.374 * th33t - 0.015);
    double ths33t = 0.278 * s + 0.034 * c + 0.022 * om - 0.018 * s * om - 0.027 * c * om
        - 0.584 * s * c + 0.078;
    double ths33 = ths33t + (0.636 * ths33t - 0.107);
    double thS = th33 + ths33 - 0.097 * s + 0.043;

    if (!(th1500 > 0 && th33 > th1500 && thS > th33 && thS < 1)) {
      throw new IllegalArgumentException("Saxton-Rawls regressions give unordered water contents"
          + " for sand " + sandFraction + ", clay " + clayFraction + ", organic matter "
          + organicMatterPercent + " %: wilting point " + th1500 + ", field capacity " + th33
          + ", saturation " + thS);
    }
    double bulkDensity = (1 - thS) * PARTICLE_DENSITY_G_PER_CM3;
    double b = (Math.log(1500) - Math.log(33)) / (Math.log(th33) - Math.log(th1500));
    double lambda = 1 / b;
    double ks = 1930 * Math.pow(thS - th33, 3 - lambda);
    return new SoilWaterCharacteristics(th1500, th33, thS, th33 - th1500, ks, bulkDensity);
  }
}
