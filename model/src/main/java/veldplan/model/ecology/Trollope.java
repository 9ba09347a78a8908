package veldplan.model.ecology;

/**
 * Fire intensity of African savanna grass fuels from fuel load, fuel moisture, relative humidity
 * and wind speed: the regression attributed to Trollope (2002) [1]:
 *
 * <pre>
 *   FI = 2729 + 0.8684 FL − 530 √FM − 0.1907 RH² − 596 / W
 * </pre>
 *
 * <p>FI is fireline intensity (kJ s⁻¹ m⁻¹ = kW/m), FL the fuel load (kg/ha), FM the fuel moisture
 * (% of dry mass), RH the relative humidity (%) and W the wind speed (m/s). The coefficients are
 * taken from a public research script that attributes them to Trollope (2002) (secondary source;
 * the publication below is the probable original, from memory). Two guards are applied, both
 * documented here: the wind speed is floored at {@link #MIN_WIND_SPEED_M_PER_S} because the
 * 1/W term diverges in calm air, and the result is floored at 0 because the regression turns
 * negative at low fuel loads or high moisture, where no fire would carry.
 *
 * <p>References:
 * <ol>
 *   <li>Trollope, W.S.W., Trollope, L.A. &amp; Hartnett, D.C. (2002). Fire behaviour: a key factor
 *       in the fire ecology of African grasslands and savannas. In: Viegas, D.X. (ed.), Forest
 *       Fire Research &amp; Wildland Fire Safety. Millpress, Rotterdam.</li>
 * </ol>
 */
public final class Trollope {
  /** Wind speed below which the regression's 1/W term is held constant (m/s). */
  public static final double MIN_WIND_SPEED_M_PER_S = 0.5;

  private Trollope() {}

  /**
   * Fire intensity FI from the regression of [1], floored at 0, with W floored at 0.5 m/s.
   *
   * @param fuelLoadKgPerHa          fuel load FL (kg/ha), &ge; 0
   * @param fuelMoisturePercent      fuel moisture FM (% of dry mass), &ge; 0
   * @param relativeHumidityPercent  relative humidity RH (%), in [0, 100]
   * @param windSpeedMPerS           wind speed W (m/s), &ge; 0
   * @return FI (kW/m), &ge; 0
   * @throws IllegalArgumentException if an argument is out of range
   */
  public static double fireIntensityKwPerM(double fuelLoadKgPerHa, double fuelMoisturePercent,
      double relativeHumidityPercent, double windSpeedMPerS) {
    Arguments.nonNegative(fuelLoadKgPerHa, "fuelLoadKgPerHa");
    Arguments.nonNegative(fuelMoisturePercent, "fuelMoisturePercent");
    Arguments.inClosedRange(relativeHumidityPercent, 0, 100, "relativeHumidityPercent");
    Arguments.nonNegative(windSpeedMPerS, "windSpeedMPerS");
    double wind = Math.max(MIN_WIND_SPEED_M_PER_S, windSpeedMPerS);
    double intensity = 2729 + 0.8684 * fuelLoadKgPerHa - 530 * Math.sqrt(fuelMoisturePercent)
        - 0.1907 * relativeHumidityPercent * relativeHumidityPercent - 596 / wind;
    return Math.max(0, intensity);
  }

  // ---- The same regression split into its terms, for a caller that evaluates it for many fuel
  // loads under weather known in advance (the model: the weather terms once per replicate, the
  // fuel term every year). fireIntensityOfTerms(FL, moistureTerm(FM), humidityTerm(RH),
  // windTerm(W)) performs the same operations in the same order as fireIntensityKwPerM(FL, FM,
  // RH, W), so the two give the same bits (TrollopeTest checks this over a grid).

  /**
   * The fuel-moisture term of the regression, 530 √FM [1].
   *
   * @param fuelMoisturePercent fuel moisture FM (% of dry mass), &ge; 0
   * @return 530 √FM (kW/m)
   * @throws IllegalArgumentException if the moisture is negative or not finite
   */
  public static double moistureTerm(double fuelMoisturePercent) {
    Arguments.nonNegative(fuelMoisturePercent, "fuelMoisturePercent");
    return 530 * Math.sqrt(fuelMoisturePercent);
  }

  /**
   * The relative-humidity term of the regression, 0.1907 RH² [1].
   *
   * @param relativeHumidityPercent relative humidity RH (%), in [0, 100]
   * @return 0.1907 RH² (kW/m)
   * @throws IllegalArgumentException if the humidity is out of range
   */
  public static double humidityTerm(double relativeHumidityPercent) {
    Arguments.inClosedRange(relativeHumidityPercent, 0, 100, "relativeHumidityPercent");
    return 0.1907 * relativeHumidityPercent * relativeHumidityPercent;
  }

  /**
   * The wind term of the regression, 596 / W with W floored at {@link #MIN_WIND_SPEED_M_PER_S}
   * [1].
   *
   * @param windSpeedMPerS wind speed W (m/s), &ge; 0
   * @return 596 / max(0.5, W) (kW/m)
   * @throws IllegalArgumentException if the wind speed is negative or not finite
   */
  public static double windTerm(double windSpeedMPerS) {
    Arguments.nonNegative(windSpeedMPerS, "windSpeedMPerS");
    return 596 / Math.max(MIN_WIND_SPEED_M_PER_S, windSpeedMPerS);
  }

  /**
   * Fire intensity from the fuel load and the three weather terms already computed:
   * max(0, 2729 + 0.8684 FL − moisture − humidity − wind), the same as
   * {@link #fireIntensityKwPerM} to the last bit when the terms come from {@link #moistureTerm},
   * {@link #humidityTerm} and {@link #windTerm}. No argument checks: the terms were checked
   * where they were computed, and the caller guarantees FL &ge; 0.
   *
   * @param fuelLoadKgPerHa fuel load FL (kg/ha), &ge; 0
   * @param moistureTerm    {@link #moistureTerm} of the fuel moisture
   * @param humidityTerm    {@link #humidityTerm} of the relative humidity
   * @param windTerm        {@link #windTerm} of the wind speed
   * @return FI (kW/m), &ge; 0
   */
  public static double fireIntensityOfTerms(double fuelLoadKgPerHa, double moistureTerm,
      double humidityTerm, double windTerm) {
    double intensity = 2729 + 0.8684 * fuelLoadKgPerHa - moistureTerm - humidityTerm - windTerm;
    return Math.max(0, intensity);
  }
}
