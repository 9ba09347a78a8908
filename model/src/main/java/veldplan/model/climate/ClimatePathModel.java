package veldplan.model.climate;

/**
 * A climate path as the weather generator uses it: per simulated year, a rainfall factor and a
 * temperature shift relative to the baseline (delta change), or explicit monthly series; and the
 * CO2 concentration.
 */
public final class ClimatePathModel {
  final String name;
  final int seedIndex;
  final double[] rainfallFactor;
  final double[] temperatureShiftC;
  final double[] co2Ppm;
  final double[] explicitRainfallMm;
  final double[] explicitTminC;
  final double[] explicitTmaxC;

  private ClimatePathModel(String name, int seedIndex, double[] rainfallFactor,
      double[] temperatureShiftC, double[] co2Ppm, double[] explicitRainfallMm,
      double[] explicitTminC, double[] explicitTmaxC) {
    if (seedIndex < 0) {
      throw new IllegalArgumentException("seedIndex must be >= 0: " + seedIndex);
    }
    this.name = name;
    this.seedIndex = seedIndex;
    this.rainfallFactor = rainfallFactor;
    this.temperatureShiftC = temperatureShiftC;
    this.co2Ppm = co2Ppm.clone();
    this.explicitRainfallMm = explicitRainfallMm;
    this.explicitTminC = explicitTminC;
    this.explicitTmaxC = explicitTmaxC;
  }

  /**
   * A delta-change path: baseline years are resampled, their rainfall multiplied by
   * {@code rainfallFactor[year]} and temperatures shifted by {@code temperatureShiftC[year]}.
   *
   * @param seedIndex the path's position in its scenario, which picks its random streams, so
   *     that a path gets the same replicates whether it is simulated alone or with the others
   */
  public static ClimatePathModel deltaChange(String name, int seedIndex,
      double[] rainfallFactor, double[] temperatureShiftC, double[] co2Ppm) {
    if (rainfallFactor.length != co2Ppm.length || temperatureShiftC.length != co2Ppm.length) {
      throw new IllegalArgumentException("delta arrays need one value per year");
    }
    return new ClimatePathModel(name, seedIndex, rainfallFactor.clone(),
        temperatureShiftC.clone(), co2Ppm, null, null, null);
  }

  /**
   * An explicit path: its monthly series, with each replicate's weather anomalies added by the
   * weather generator; see {@link #deltaChange} for {@code seedIndex}.
   */
  public static ClimatePathModel explicit(String name, int seedIndex, double[] rainfallMm,
      double[] tminC, double[] tmaxC, double[] co2Ppm) {
    if (rainfallMm.length != co2Ppm.length * 12) {
      throw new IllegalArgumentException("explicit series needs 12 months per year");
    }
    return new ClimatePathModel(name, seedIndex, null, null, co2Ppm, rainfallMm.clone(),
        tminC.clone(), tmaxC.clone());
  }

  /** The path's position in its scenario, which picks its random streams. */
  public int seedIndex() {
    return seedIndex;
  }

  /** The path's name. */
  public String name() {
    return name;
  }

  /** Number of simulated years covered. */
  public int years() {
    return co2Ppm.length;
  }

  /** True when the path gives explicit monthly series. */
  public boolean isExplicit() {
    return explicitRainfallMm != null;
  }

  /** CO2 in simulated year {@code year} (ppm). */
  public double co2Ppm(int year) {
    return co2Ppm[year];
  }
}
