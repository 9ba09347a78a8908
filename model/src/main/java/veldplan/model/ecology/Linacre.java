package veldplan.model.ecology;

/**
 * Evaporation from temperature data alone, after Linacre (1977) [1].
 *
 * <pre>
 *   Tm      = T + 0.006 h
 *   E0      = [700 Tm / (100 − A) + 15 (T − Td)] / (80 − T)      open water (lake), mm/day
 *   Et      = [500 Tm / (100 − A) + 15 (T − Td)] / (80 − T)      well-watered vegetation, mm/day
 *   T − Td  = 0.0023 h + 0.37 T + 0.53 R + 0.35 Rann − 10.9      dew-point depression, °C
 * </pre>
 *
 * <p>T is the mean air temperature (°C), taken as (Tmax + Tmin)/2; Td the mean dew point (°C); h
 * the elevation (m); A the latitude in degrees, used as |A| because the formula is symmetric about
 * the equator; R the mean daily range Tmax − Tmin (°C); Rann the mean temperature of the hottest
 * month minus that of the coldest month (°C). The vegetation form (coefficient 500, albedo about
 * 0.25) is taken from compilations of evapotranspiration methods that reproduce it; its equation
 * number in [1] has not been checked, so none is cited here.
 *
 * <p><b>Validity</b> [1]: the formulas are meant for monthly (or longer) means. Linacre gives
 * errors of about 0.3 mm/day for annual means, 0.5 mm/day for monthly means, 0.9 mm/day for a
 * week and 1.7 mm/day for a single day. The dew-point regression applies to monthly means only
 * where precipitation is at least 5 mm/month and T − Td is at least 4 °C. Below 4 °C the
 * regression is outside its range; {@link #clampedDewPointDepressionC} applies that floor, and
 * {@link #dewPointDepressionC} returns the raw regression so a caller can flag the case
 * instead.
 * The evaporation formulas require T &lt; 80 °C (the denominator); |A| &lt; 100 holds for every
 * latitude. Negative results (possible with a very low temperature and a small dew-point
 * depression) are returned as 0, since a negative evaporative demand has no meaning here.
 *
 * <p>References:
 * <ol>
 *   <li>Linacre, E.T. (1977). A simple formula for estimating evaporation rates in various
 *       climates, using temperature data alone. Agricultural Meteorology 18: 409–424.
 *       doi:10.1016/0002-1571(77)90007-3</li>
 * </ol>
 */
public final class Linacre {
  /** Floor of the dew-point depression, below which the regression is outside its range (°C). */
  public static final double MIN_DEW_POINT_DEPRESSION_C = 4.0;

  /** Radiation coefficient of the open-water (lake) formula [1]. */
  private static final double OPEN_WATER_COEFFICIENT = 700;

  /** Radiation coefficient of the well-watered vegetation formula (albedo about 0.25). */
  private static final double VEGETATION_COEFFICIENT = 500;

  private Linacre() {}

  /**
   * Mean dew-point depression T − Td from Linacre's regression, without any floor [1].
   *
   * @param altitudeM     elevation h (m), finite
   * @param meanTempC     mean air temperature T (°C), finite
   * @param dailyRangeC   mean daily temperature range R = Tmax − Tmin (°C), &ge; 0
   * @param annualRangeC  hottest-month minus coldest-month mean temperature Rann (°C), &ge; 0
   * @return T − Td (°C); may fall below 4 °C (outside the regression's range) or below 0
   * @throws IllegalArgumentException if an argument is out of range
   */
  public static double dewPointDepressionC(double altitudeM, double meanTempC, double dailyRangeC,
      double annualRangeC) {
    Arguments.finite(altitudeM, "altitudeM");
    Arguments.finite(meanTempC, "meanTempC");
    Arguments.nonNegative(dailyRangeC, "dailyRangeC");
    Arguments.nonNegative(annualRangeC, "annualRangeC");
    return 0.0023 * altitudeM + 0.37 * meanTempC + 0.53 * dailyRangeC + 0.35 * annualRangeC
        - 10.9;
  }

  /**
   * The dew-point depression of {@link #dewPointDepressionC}, floored at
   * {@link #MIN_DEW_POINT_DEPRESSION_C} = 4 °C, the lower limit of the regression's validity [1].
   *
   * @param altitudeM     elevation h (m), finite
   * @param meanTempC     mean air temperature T (°C), finite
   * @param dailyRangeC   mean daily temperature range R (°C), &ge; 0
   * @param annualRangeC  hottest-month minus coldest-month mean temperature Rann (°C), &ge; 0
   * @return max(4, T − Td) (°C)
   * @throws IllegalArgumentException if an argument is out of range
   */
  public static double clampedDewPointDepressionC(double altitudeM, double meanTempC,
      double dailyRangeC, double annualRangeC) {
    return Math.max(MIN_DEW_POINT_DEPRESSION_C,
        dewPointDepressionC(altitudeM, meanTempC, dailyRangeC, annualRangeC));
  }

  /**
   * Open-water (lake) evaporation E0 with the coefficient 700 [1], floored at 0.
   *
   * @param meanTempC           mean air temperature T (°C), &lt; 80
   * @param altitudeM           elevation h (m), finite
   * @param latitudeDeg         latitude A (decimal degrees, either sign), in [−90, 90]
   * @param dewPointDepressionC mean dew-point depression T − Td (°C), finite
   * @return E0 (mm/day), &ge; 0
   * @throws IllegalArgumentException if an argument is out of range
   */
  public static double openWaterEvaporationMmPerDay(double meanTempC, double altitudeM,
      double latitudeDeg, double dewPointDepressionC) {
    return evaporation(OPEN_WATER_COEFFICIENT, meanTempC, altitudeM, latitudeDeg,
        dewPointDepressionC);
  }

  /**
   * Evapotranspiration of well-watered vegetation (albedo about 0.25) Et, with the coefficient 500
   * in place of 700 [1], floored at 0.
   *
   * @param meanTempC           mean air temperature T (°C), &lt; 80
   * @param altitudeM           elevation h (m), finite
   * @param latitudeDeg         latitude A (decimal degrees, either sign), in [−90, 90]
   * @param dewPointDepressionC mean dew-point depression T − Td (°C), finite
   * @return Et (mm/day), &ge; 0
   * @throws IllegalArgumentException if an argument is out of range
   */
  public static double wellWateredEvapotranspirationMmPerDay(double meanTempC, double altitudeM,
      double latitudeDeg, double dewPointDepressionC) {
    return evaporation(VEGETATION_COEFFICIENT, meanTempC, altitudeM, latitudeDeg,
        dewPointDepressionC);
  }

  private static double evaporation(double coefficient, double meanTempC, double altitudeM,
      double latitudeDeg, double dewPointDepressionC) {
    if (!(meanTempC < 80 && meanTempC >= -Double.MAX_VALUE)) {
      throw new IllegalArgumentException("meanTempC is not a finite value < 80: " + meanTempC);
    }
    Arguments.finite(altitudeM, "altitudeM");
    Arguments.inClosedRange(latitudeDeg, -90, 90, "latitudeDeg");
    Arguments.finite(dewPointDepressionC, "dewPointDepressionC");
    double tm = meanTempC + 0.006 * altitudeM;
    double rate = (coefficient * tm / (100 - Math.abs(latitudeDeg))
        + 15 * dewPointDepressionC) / (80 - meanTempC);
    return Math.max(0, rate);
  }
}
