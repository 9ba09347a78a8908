package veldplan.model.climate;

import veldplan.shared.rng.CounterRandom;

/**
 * Makes the weather of one replicate of one climate path.
 *
 * <p><b>Method.</b> For a delta-change path, each simulated year takes the months of one baseline
 * year (a model year: from the first month of the rains to the end of the following dry season)
 * drawn with replacement (one draw per year from the weather stream), so the seasonal cycle,
 * the correlation of rainfall and temperature within a year and the observed year-to-year
 * variability are kept. The year's rainfall total is then stretched away from the baseline mean
 * by the scenario's variability factor (1 keeps it as observed; months keep their shares), and the
 * delta change of that year applied: rainfall times the path's factor, temperatures plus its
 * shift. This is the delta-change method of climate impact studies (e.g. Hay, Wilby &amp; Leavesley
 * 2000, J. Am. Water Resour. Assoc. 36: 387–397, from memory) applied to a bootstrap of years.
 * An explicit path gets the anomalies of a bootstrapped baseline year added to its own months.
 */
public final class WeatherGenerator {
  private WeatherGenerator() {}

  /**
   * @param baseline             observed monthly climate
   * @param path                 the climate path
   * @param variabilityFactor    stretch of annual rainfall about the baseline mean (1 = observed)
   * @param weatherKey           the replicate's weather stream key
   * @param firstMonth           calendar month (0 = January) in which the model year starts
   */
  public static Weather generate(BaselineClimate baseline, ClimatePathModel path,
      double variabilityFactor, long weatherKey, int firstMonth) {
    int years = path.years();
    double[] rain = new double[years * 12];
    double[] tmin = new double[years * 12];
    double[] tmax = new double[years * 12];
    // Whole model years of the baseline, from its first month to the month before it.
    int baselineYears = firstMonth == 0 ? baseline.years : baseline.years - 1;
    if (path.isExplicit()) {
      explicitWithAnomalies(baseline, path, variabilityFactor, weatherKey, firstMonth,
          baselineYears, rain, tmin, tmax);
      return new Weather(rain, tmin, tmax, path.co2Ppm);
    }
    double mean = 0;
    for (int year = 0; year < baselineYears; year++) {
      for (int m = 0; m < 12; m++) {
        mean += baseline.rainfallMm[year * 12 + firstMonth + m];
      }
    }
    mean /= baselineYears;
    for (int year = 0; year < years; year++) {
      int drawn = (int) (CounterRandom.uniform(weatherKey, year, 0) * baselineYears);
      int start = drawn * 12 + firstMonth;
      double total = 0;
      for (int m = 0; m < 12; m++) {
        total += baseline.rainfallMm[start + m];
      }
      double stretched = Math.max(0, mean + variabilityFactor * (total - mean));
      double scale = total > 0 ? stretched / total : 0;
      double factor = Math.max(0, path.rainfallFactor[year]);
      double shift = path.temperatureShiftC[year];
      for (int m = 0; m < 12; m++) {
        int from = start + m;
        int to = year * 12 + m;
        rain[to] = baseline.rainfallMm[from] * scale * factor;
        tmin[to] = baseline.tminC[from] + shift;
        tmax[to] = baseline.tmaxC[from] + shift;
      }
    }
    return new Weather(rain, tmin, tmax, path.co2Ppm);
  }

  /**
   * An explicit path with replicate variability: each model year takes the path's months and
   * adds the anomalies of one baseline year drawn with replacement (rainfall as a ratio to the
   * baseline monthly mean, stretched by the variability factor; temperatures as differences), so
   * replicates vary around the path as the observed years varied around their mean. Months past
   * the end of the path's series repeat the same month of its last year.
   */
  private static void explicitWithAnomalies(BaselineClimate baseline, ClimatePathModel path,
      double variabilityFactor, long weatherKey, int firstMonth, int baselineYears,
      double[] rain, double[] tmin, double[] tmax) {
    double[] meanRain = new double[12];
    double[] meanTmin = new double[12];
    double[] meanTmax = new double[12];
    for (int year = 0; year < baselineYears; year++) {
      for (int m = 0; m < 12; m++) {
        int from = year * 12 + firstMonth + m;
        meanRain[m] += baseline.rainfallMm[from] / baselineYears;
        meanTmin[m] += baseline.tminC[from] / baselineYears;
        meanTmax[m] += baseline.tmaxC[from] / baselineYears;
      }
    }
    int available = path.explicitRainfallMm.length;
    int years = path.years();
    for (int year = 0; year < years; year++) {
      int drawn = (int) (CounterRandom.uniform(weatherKey, year, 0) * baselineYears);
      for (int m = 0; m < 12; m++) {
        int from = year * 12 + firstMonth + m;
        while (from >= available) {
          from -= 12;
        }
        int observed = drawn * 12 + firstMonth + m;
        double ratio = meanRain[m] > 0 ? baseline.rainfallMm[observed] / meanRain[m] : 1;
        int to = year * 12 + m;
        double stretched = Math.max(0, 1 + variabilityFactor * (ratio - 1));
        rain[to] = path.explicitRainfallMm[from] * stretched;
        tmin[to] = path.explicitTminC[from] + baseline.tminC[observed] - meanTmin[m];
        tmax[to] = path.explicitTmaxC[from] + baseline.tmaxC[observed] - meanTmax[m];
      }
    }
  }
}
