package veldplan.model.climate;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import org.junit.jupiter.api.Test;

/** Replicate weather around delta-change and explicit climate paths. */
class WeatherGeneratorTest {
  private static final int YEARS = 20;

  /** A baseline whose years differ: annual rainfall 300, 400, ..., and warmer with more rain. */
  private static BaselineClimate baseline() {
    int years = 12;
    double[] rain = new double[years * 12];
    double[] tmin = new double[years * 12];
    double[] tmax = new double[years * 12];
    for (int y = 0; y < years; y++) {
      for (int m = 0; m < 12; m++) {
        rain[y * 12 + m] = (300 + 100 * (y % 6)) / 12.0;
        tmin[y * 12 + m] = 12 + 0.2 * y;
        tmax[y * 12 + m] = 28 + 0.2 * y;
      }
    }
    return new BaselineClimate(2000, rain, tmin, tmax);
  }

  private static ClimatePathModel explicit() {
    double[] rain = new double[YEARS * 12];
    double[] tmin = new double[YEARS * 12];
    double[] tmax = new double[YEARS * 12];
    double[] co2 = new double[YEARS];
    Arrays.fill(rain, 50);
    Arrays.fill(tmin, 15);
    Arrays.fill(tmax, 31);
    Arrays.fill(co2, 420);
    return ClimatePathModel.explicit("series", 0, rain, tmin, tmax, co2);
  }

  @Test
  void explicitPath_differentReplicates_varyAroundTheSeries() {
    BaselineClimate base = baseline();
    double sumRain = 0;
    double sumTmax = 0;
    int n = 0;
    double[] first = null;
    boolean differs = false;
    for (long key = 1; key <= 200; key++) {
      Weather w = WeatherGenerator.generate(base, explicit(), 1.0, key, 0);
      double[] annual = new double[YEARS];
      for (int y = 0; y < YEARS; y++) {
        annual[y] = w.annualRainfallMm(y);
        sumRain += annual[y];
        sumTmax += w.tmaxC(y, 0);
        n++;
      }
      if (first == null) {
        first = annual;
      } else if (!Arrays.equals(first, annual)) {
        differs = true;
      }
    }
    assertTrue(differs, "every replicate had the same weather");
    // The anomalies average to zero over the baseline, so the replicate mean approaches the
    // series (600 mm a year, 31 °C). 4000 draws of 6 equally likely ratios: the sampling SD of
    // the mean ratio is about 0.005, so 2 % is about 4 SD (false failure well below 1e-4).
    assertEquals(600, sumRain / n, 12);
    assertEquals(31, sumTmax / n, 0.1);
  }

  @Test
  void explicitPath_noVariability_isTheSeriesItself() {
    Weather w = WeatherGenerator.generate(baseline(), explicit(), 0.0, 7, 0);
    for (int y = 0; y < YEARS; y++) {
      assertEquals(600, w.annualRainfallMm(y), 1e-9);
    }
  }

  @Test
  void deltaChangePath_modelYearFromJuly_takesWholeBaselineSeasons() {
    double[] ones = new double[YEARS];
    double[] zeros = new double[YEARS];
    double[] co2 = new double[YEARS];
    Arrays.fill(ones, 1);
    Arrays.fill(co2, 420);
    ClimatePathModel path = ClimatePathModel.deltaChange("steady", 0, ones, zeros, co2);
    Weather w = WeatherGenerator.generate(baseline(), path, 1.0, 3, 6);
    for (int y = 0; y < YEARS; y++) {
      // A July-June year straddles two baseline years: half of each year's rainfall.
      double annual = w.annualRainfallMm(y);
      double fractionalPart = (annual - 300) / 50 - Math.floor((annual - 300) / 50);
      assertTrue(annual >= 350 - 1e-9 && annual <= 750 + 1e-9, "annual " + annual);
      assertEquals(0, Math.min(fractionalPart, 1 - fractionalPart), 1e-9,
          "not half of two baseline years: " + annual);
    }
  }
}
