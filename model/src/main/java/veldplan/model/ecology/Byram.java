package veldplan.model.ecology;

/**
 * Fireline intensity and flame length after Byram (1959) [1].
 *
 * <pre>
 *   I  = H w r             fireline intensity (kW/m = kJ s⁻¹ m⁻¹)
 *   Lf = 0.0775 I^0.46     flame length (m)
 * </pre>
 *
 * <p>H is the heat yield of the fuel (kJ/kg), w the mass of fuel consumed per unit area (kg/m²)
 * and r the rate of spread of the fire front (m/s). The flame-length relation is taken as
 * reproduced in fire-behaviour texts (secondary source). Heat yields of about 18,000–18,600 kJ/kg
 * are common in fire-behaviour code; about 16,890 kJ/kg has been used for South African savanna
 * grass (from memory).
 *
 * <p>References:
 * <ol>
 *   <li>Byram, G.M. (1959). Combustion of forest fuels. In: Davis, K.P. (ed.), Forest Fire:
 *       Control and Use, pp. 61–89. McGraw-Hill, New York.</li>
 * </ol>
 */
public final class Byram {
  private Byram() {}

  /**
   * Byram's fireline intensity I = H w r [1].
   *
   * @param heatYieldKJPerKg   heat yield H (kJ/kg), &ge; 0
   * @param fuelConsumedKgPerM2 fuel consumed w (kg/m²; 1 kg/m² = 10 t/ha), &ge; 0
   * @param spreadRateMPerS    rate of spread r (m/s), &ge; 0
   * @return I (kW/m), &ge; 0
   * @throws IllegalArgumentException if an argument is out of range
   */
  public static double firelineIntensityKwPerM(double heatYieldKJPerKg,
      double fuelConsumedKgPerM2, double spreadRateMPerS) {
    Arguments.nonNegative(heatYieldKJPerKg, "heatYieldKJPerKg");
    Arguments.nonNegative(fuelConsumedKgPerM2, "fuelConsumedKgPerM2");
    Arguments.nonNegative(spreadRateMPerS, "spreadRateMPerS");
    return heatYieldKJPerKg * fuelConsumedKgPerM2 * spreadRateMPerS;
  }

  /**
   * Byram's flame length Lf = 0.0775 I^0.46 [1].
   *
   * @param intensityKwPerM fireline intensity I (kW/m), &ge; 0
   * @return Lf (m), &ge; 0
   * @throws IllegalArgumentException if the intensity is negative or not finite
   */
  public static double flameLengthM(double intensityKwPerM) {
    Arguments.nonNegative(intensityKwPerM, "intensityKwPerM");
    return 0.0775 * Math.pow(intensityKwPerM, 0.46);
  }
}
