package veldplan.model.ecology;

/**
 * Reference crop evapotranspiration from temperature and extraterrestrial radiation, the
 * Hargreaves–Samani equation [1] in the form of FAO-56 [2, Eq. 52]:
 *
 * <pre>
 *   ET0 = 0.0023 (Tmean + 17.8) (Tmax − Tmin)^0.5 Ra
 * </pre>
 *
 * <p>with Ra expressed as evaporation in mm/day, that is {@link SolarGeometry#MJ_TO_MM_EVAPORATION}
 * × Ra in MJ m⁻² day⁻¹, and Tmean = (Tmax + Tmin)/2. FAO-56 recommends it only when radiation,
 * humidity and wind data are missing [2]. The result is not floored: it turns negative only below
 * Tmean = −17.8 °C, far outside the savanna range.
 *
 * <p>References:
 * <ol>
 *   <li>Hargreaves, G.H. &amp; Samani, Z.A. (1985). Reference crop evapotranspiration from
 *       temperature. Applied Engineering in Agriculture 1(2): 96–99.</li>
 *   <li>Allen, R.G., Pereira, L.S., Raes, D. &amp; Smith, M. (1998). Crop evapotranspiration:
 *       guidelines for computing crop water requirements. FAO Irrigation and Drainage Paper 56.
 *       FAO, Rome.</li>
 * </ol>
 */
public final class HargreavesSamani {
  private HargreavesSamani() {}

  /**
   * Reference evapotranspiration ET0 [2, Eq. 52].
   *
   * @param tmaxC         mean daily maximum air temperature (°C), &ge; {@code tminC}
   * @param tminC         mean daily minimum air temperature (°C), finite
   * @param raMJPerM2Day  extraterrestrial radiation Ra (MJ m⁻² day⁻¹), &ge; 0
   * @return ET0 (mm/day)
   * @throws IllegalArgumentException if an argument is out of range
   */
  public static double referenceEvapotranspirationMmPerDay(double tmaxC, double tminC,
      double raMJPerM2Day) {
    Arguments.finite(tmaxC, "tmaxC");
    Arguments.finite(tminC, "tminC");
    Arguments.nonNegative(tmaxC - tminC, "tmaxC - tminC");
    Arguments.nonNegative(raMJPerM2Day, "raMJPerM2Day");
    double meanC = 0.5 * (tmaxC + tminC);
    return 0.0023 * (meanC + 17.8) * Math.sqrt(tmaxC - tminC)
        * SolarGeometry.MJ_TO_MM_EVAPORATION * raMJPerM2Day;
  }
}
