package veldplan.model.climate;

/**
 * Observed monthly park climate for a run of whole years, arrays [year * 12 + month0].
 */
public final class BaselineClimate {
  final int firstYear;
  final int years;
  final double[] rainfallMm;
  final double[] tminC;
  final double[] tmaxC;
  final double meanAnnualRainfallMm;

  /**
   * @param firstYear  calendar year of the first row
   * @param rainfallMm monthly rainfall (mm)
   * @param tminC      monthly mean daily minimum temperature (°C)
   * @param tmaxC      monthly mean daily maximum temperature (°C)
   */
  public BaselineClimate(int firstYear, double[] rainfallMm, double[] tminC, double[] tmaxC) {
    if (rainfallMm.length == 0 || rainfallMm.length % 12 != 0
        || tminC.length != rainfallMm.length || tmaxC.length != rainfallMm.length) {
      throw new IllegalArgumentException("baseline needs whole years of 12 months");
    }
    this.firstYear = firstYear;
    this.years = rainfallMm.length / 12;
    this.rainfallMm = rainfallMm.clone();
    this.tminC = tminC.clone();
    this.tmaxC = tmaxC.clone();
    double total = 0;
    for (double r : rainfallMm) {
      total += r;
    }
    this.meanAnnualRainfallMm = total / years;
  }

  /** Number of whole years. */
  public int years() {
    return years;
  }

  /** Calendar year of the first row. */
  public int firstYear() {
    return firstYear;
  }

  /** Mean annual rainfall over the baseline (mm/yr). */
  public double meanAnnualRainfallMm() {
    return meanAnnualRainfallMm;
  }

  /** Mean rainfall of calendar month {@code month0} over the baseline (mm). */
  public double meanMonthlyRainfallMm(int month0) {
    double sum = 0;
    for (int y = 0; y < years; y++) {
      sum += rainfallMm[y * 12 + month0];
    }
    return sum / years;
  }

  /** Mean of the daily mean temperature (Tmin+Tmax)/2 in month {@code month0} (°C). */
  public double meanMonthlyTemperatureC(int month0) {
    double sum = 0;
    for (int y = 0; y < years; y++) {
      sum += 0.5 * (tminC[y * 12 + month0] + tmaxC[y * 12 + month0]);
    }
    return sum / years;
  }

  /** Mean of the daily maximum temperature in month {@code month0} (°C). */
  public double meanMonthlyTmaxC(int month0) {
    double sum = 0;
    for (int y = 0; y < years; y++) {
      sum += tmaxC[y * 12 + month0];
    }
    return sum / years;
  }

  /** Mean of the daily minimum temperature in month {@code month0} (°C). */
  public double meanMonthlyTminC(int month0) {
    double sum = 0;
    for (int y = 0; y < years; y++) {
      sum += tminC[y * 12 + month0];
    }
    return sum / years;
  }
}
