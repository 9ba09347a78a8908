package veldplan.model.climate;

/**
 * Monthly park weather of one replicate of one climate path over the horizon, before block
 * rainfall multipliers. Arrays are indexed [year * 12 + month], where year is the model year and
 * month its month counted from the model year's first month (see the model's Seasons); CO2 by
 * year.
 */
public final class Weather {
  final int years;
  final double[] rainfallMm;
  final double[] tminC;
  final double[] tmaxC;
  final double[] co2Ppm;

  /**
   * @param rainfallMm monthly rainfall (mm) [year * 12 + month0]
   * @param tminC      monthly mean daily minimum temperature (°C)
   * @param tmaxC      monthly mean daily maximum temperature (°C)
   * @param co2Ppm     CO2 concentration per year (ppm)
   */
  public Weather(double[] rainfallMm, double[] tminC, double[] tmaxC, double[] co2Ppm) {
    this.years = co2Ppm.length;
    if (rainfallMm.length != years * 12 || tminC.length != years * 12
        || tmaxC.length != years * 12) {
      throw new IllegalArgumentException("monthly arrays need 12 x " + years + " values");
    }
    this.rainfallMm = rainfallMm.clone();
    this.tminC = tminC.clone();
    this.tmaxC = tmaxC.clone();
    this.co2Ppm = co2Ppm.clone();
  }

  /** Number of years. */
  public int years() {
    return years;
  }

  /** Rainfall of month {@code month0} of model year {@code year} (mm). */
  public double rainfallMm(int year, int month0) {
    return rainfallMm[year * 12 + month0];
  }

  /** Mean daily minimum temperature (°C). */
  public double tminC(int year, int month0) {
    return tminC[year * 12 + month0];
  }

  /** Mean daily maximum temperature (°C). */
  public double tmaxC(int year, int month0) {
    return tmaxC[year * 12 + month0];
  }

  /** CO2 concentration in {@code year} (ppm). */
  public double co2Ppm(int year) {
    return co2Ppm[year];
  }

  /** Annual park rainfall in {@code year} (mm). */
  public double annualRainfallMm(int year) {
    double sum = 0;
    for (int m = 0; m < 12; m++) {
      sum += rainfallMm[year * 12 + m];
    }
    return sum;
  }
}
