package veldplan.model;

import veldplan.model.climate.BaselineClimate;
import veldplan.model.climate.Weather;
import veldplan.model.ecology.Co2Response;
import veldplan.model.ecology.GrowingPeriod;
import veldplan.model.ecology.Linacre;
import veldplan.model.ecology.ThornthwaiteMather;
import veldplan.model.ecology.Trollope;
import veldplan.model.ecology.YanHunt;
import veldplan.shared.rng.CounterRandom;

/**
 * Computes a replicate's {@link Forcing}: the monthly water balance of every block and what the
 * yearly loop needs from it.
 *
 * <h2>Water balance, month by month</h2>
 * <ol>
 *   <li>Potential evapotranspiration of well-watered vegetation from temperatures, altitude and
 *       latitude: Linacre (1977), with his dew-point regression (clamped at T - Td &gt;= 4 °C as
 *       he advises). Open-water evaporation (his lake formula) is reported alongside.</li>
 *   <li>Within the month, daily steps: the month's rain falls in equal storms of about
 *       {@value #STORM_DEPTH_MM} mm on consecutive days, one wet spell in mid-month. Each storm
 *       first tops up the water the surface layer loses to evaporation before roots can use it,
 *       a share of the total evaporable water TEW = 1000 (θFC - 0.5 θWP) Ze (FAO-56 Eq. 73,
 *       Allen et al. 1998; θ from Saxton &amp; Rawls 2006), so it grows with the fine fraction;
 *       that water evaporates at the day's demand. In a wet spell the surface stays moist and loses only the day's
 *       demand, whatever the texture. The rest infiltrates into a Thornthwaite–Mather (1955) bucket of
 *       capacity AW x rooting depth, stepped daily with the same equations; what overfills it
 *       drains below the roots; transpiration is its actual evapotranspiration. Fine soils
 *       lose more to the surface, sands more to drainage: together these give the inverse-texture
 *       effect (Noy-Meir 1973; Sala et al. 1988) without hard-coding it.</li>
 *   <li>Growing days: FAO (1978) length of growing period from monthly rainfall and PET, with the
 *       stored-water reserve capped at 100 mm.</li>
 * </ol>
 *
 * <h2>Production potentials</h2>
 * Grass: transpiration x water-use efficiency x the C4 temperature response (Yan &amp; Hunt 1999)
 * of each month's mean temperature, summed over months, times the C4 CO2 factor. Trees: the same
 * with the C3 response, divided by the reference transpiration, as a growth index.
 *
 * <h2>Fire weather</h2>
 * For the early- and late-dry-season burning months, relative humidity at the afternoon maximum
 * temperature from Linacre's dew point and the FAO-56 saturation vapour pressure (Eq. 11), and
 * fuel moisture drying from the green value to the cured value with months since the growing
 * season ended; with fuel load and wind these are the inputs of the Trollope regression.
 */
public final class ForcingBuilder {
  private static final int[] DAYS = {31, 28, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31};
  /** FAO (1978): at most 100 mm of stored water extends the growing period. */
  private static final double LGP_RESERVE_CAP_MM = 100;
  /**
   * Rain per rain day within a month's wet spell (mm). Savanna rain falls in convective storms,
   * most of its volume in storms of 20 mm and more (from memory). 30 mm is our calibration: with
   * {@link ParametersFromScenario#READILY_EVAPORABLE_SHARE} it puts the crossover of grass
   * production on sand and on loam between 300 and 600 mm a year, around the 370 mm of Sala et
   * al. (1988).
   */
  static final double STORM_DEPTH_MM = 30;
  /** Share of the bucket filled at the start of the first year (our choice; a spin-up). */
  private static final double INITIAL_BUCKET_FILL = 0.5;

  private ForcingBuilder() {}

  /**
   * The park's seasons from the baseline climatology. Early and late planned burns are lit in
   * the first and the last month of the longest run of months in which mean rainfall is below
   * half of PET (FAO 1978's start/end criterion); the model year starts the month after the late
   * burns, with the rains.
   */
  public static Seasons seasons(BaselineClimate baseline, double altitudeM,
      double latitudeDeg) {
    boolean[] dry = new boolean[12];
    double hottest = -1e9;
    double coldest = 1e9;
    for (int m = 0; m < 12; m++) {
      double t = baseline.meanMonthlyTemperatureC(m);
      hottest = Math.max(hottest, t);
      coldest = Math.min(coldest, t);
    }
    for (int m = 0; m < 12; m++) {
      double tmax = baseline.meanMonthlyTmaxC(m);
      double tmin = baseline.meanMonthlyTminC(m);
      double pet = monthlyPet(0.5 * (tmax + tmin), tmax - tmin, hottest - coldest, altitudeM,
          latitudeDeg, m);
      dry[m] = baseline.meanMonthlyRainfallMm(m) < 0.5 * pet;
    }
    int bestStart = -1;
    int bestLength = 0;
    for (int start = 0; start < 12; start++) {
      if (!dry[start] || dry[(start + 11) % 12]) {
        continue;
      }
      int length = 0;
      while (length < 12 && dry[(start + length) % 12]) {
        length++;
      }
      if (length > bestLength) {
        bestLength = length;
        bestStart = start;
      }
    }
    if (bestStart < 0) {
      // All months dry, or none: burn in the driest months with fuel as cured as it gets.
      int driest = 0;
      for (int m = 1; m < 12; m++) {
        if (baseline.meanMonthlyRainfallMm(m) < baseline.meanMonthlyRainfallMm(driest)) {
          driest = m;
        }
      }
      int cured = dry[0] ? 12 : 1;
      return new Seasons((driest + 1) % 12, driest, driest, cured, cured);
    }
    int late = (bestStart + bestLength - 1) % 12;
    return new Seasons((late + 1) % 12, bestStart, late, 1, bestLength);
  }

  static double monthlyPet(double meanTempC, double dailyRangeC, double annualRangeC,
      double altitudeM, double latitudeDeg, int month0) {
    double depression =
        Linacre.clampedDewPointDepressionC(altitudeM, meanTempC, dailyRangeC, annualRangeC);
    return DAYS[month0] * Linacre.wellWateredEvapotranspirationMmPerDay(meanTempC, altitudeM,
        latitudeDeg, depression);
  }

  /** Saturation vapour pressure (kPa), FAO-56 Eq. 11 (Tetens form). */
  static double saturationVapourPressureKPa(double tempC) {
    return 0.6108 * Math.exp(17.27 * tempC / (tempC + 237.3));
  }

  /**
   * Builds the forcing of one replicate.
   *
   * @param p             model parameters
   * @param weather       the replicate's park weather
   * @param seasons       the park's seasons, from {@link #seasons}
   * @param fireKey       fire stream key
   * @param demographyKey demography stream key
   */
  public static Forcing build(ModelParameters p, Weather weather, Seasons seasons,
      long fireKey, long demographyKey) {
    BlockParameters bp = p.blocks();
    GrassParameters g = p.grass();
    TreeParameters t = p.trees();
    FireParameters f = p.fire();
    int years = p.years();
    int blocks = bp.count;
    double[] co2 = new double[years];
    for (int y = 0; y < years; y++) {
      co2[y] = weather.co2Ppm(y);
    }
    int noiseSlots = p.herbivores().count + p.predators().count;
    double moistureEarly = f.curedFuelMoisturePercent() + (f.greenFuelMoisturePercent()
        - f.curedFuelMoisturePercent()) * Math.exp(-seasons.curedMonthsEarly() / f.curingMonths());
    double moistureLate = f.curedFuelMoisturePercent() + (f.greenFuelMoisturePercent()
        - f.curedFuelMoisturePercent()) * Math.exp(-seasons.curedMonthsLate() / f.curingMonths());
    Forcing out = new Forcing(years, blocks, noiseSlots, fireKey, demographyKey, co2,
        moistureEarly, moistureLate);
    for (int y = 0; y < years; y++) {
      for (int slot = 0; slot < noiseSlots; slot++) {
        out.demographicNoise[y * noiseSlots + slot] =
            Animals.standardNormal(demographyKey, y, slot);
      }
      for (int b = 0; b < blocks; b++) {
        out.ignitionDraw[y * blocks + b] = CounterRandom.uniform(fireKey, y, b * 4);
        out.extentDraw[y * blocks + b] = CounterRandom.uniform(fireKey, y, b * 4 + 1);
        Fire.ignitionBounds(out.ignitionDraw[y * blocks + b], out.ignitionLitAbove,
            out.ignitionUnlitBelow, y * blocks + b);
      }
    }
    double[] rain = new double[12];
    double[] pet = new double[12];
    double[] meanT = new double[12];
    double[] range = new double[12];
    for (int b = 0; b < blocks; b++) {
      double capacity = bp.bucketCapacityMm[b];
      double storage = INITIAL_BUCKET_FILL * capacity;
      double surfaceWater = 0;
      for (int y = 0; y < years; y++) {
        double hottest = -1e9;
        double coldest = 1e9;
        for (int m = 0; m < 12; m++) {
          meanT[m] = 0.5 * (weather.tminC(y, m) + weather.tmaxC(y, m));
          range[m] = weather.tmaxC(y, m) - weather.tminC(y, m);
          hottest = Math.max(hottest, meanT[m]);
          coldest = Math.min(coldest, meanT[m]);
          rain[m] = weather.rainfallMm(y, m) * bp.rainfallMultiplier[b];
        }
        double annualRange = hottest - coldest;
        double aet = 0;
        double petSum = 0;
        double e0Sum = 0;
        double grassWater = 0;
        double treeWater = 0;
        double rainSum = 0;
        for (int m = 0; m < 12; m++) {
          double depression = Linacre.clampedDewPointDepressionC(bp.altitudeM[b], meanT[m],
              range[m], annualRange);
          int calendarMonth = seasons.calendarMonth(m);
          pet[m] = monthlyPet(meanT[m], range[m], annualRange, bp.altitudeM[b],
              bp.latitudeDeg[b], calendarMonth);
          e0Sum += DAYS[calendarMonth] * Linacre.openWaterEvaporationMmPerDay(meanT[m], bp.altitudeM[b],
              bp.latitudeDeg[b], depression);
          // Daily steps within the month: the month's rain falls in equal storms of about
          // STORM_DEPTH_MM on consecutive days, one wet spell in mid-month. Each storm wets the
          // surface layer, whose readily evaporable water dries at the day's demand before
          // roots get it; the rest infiltrates into the bucket, and what overfills it drains.
          int days = DAYS[calendarMonth];
          double petDay = pet[m] / days;
          int storms = rain[m] > 0 ? (int) Math.ceil(rain[m] / STORM_DEPTH_MM) : 0;
          storms = Math.min(storms, days);
          double stormMm = storms > 0 ? rain[m] / storms : 0;
          int firstStormDay = (days - storms) / 2;
          double surface = 0;
          double transpiration = 0;
          for (int day = 0; day < days; day++) {
            double todayMm = day >= firstStormDay && day < firstStormDay + storms ? stormMm : 0;
            double wetted = Math.min(todayMm, bp.evaporableWaterMm[b] - surfaceWater);
            surfaceWater += wetted;
            double infiltrated = todayMm - wetted;
            double evaporated = Math.min(surfaceWater, petDay);
            surfaceWater -= evaporated;
            surface += evaporated;
            double demand = petDay - evaporated;
            double after = ThornthwaiteMather.storageAfterMonth(capacity, storage, infiltrated,
                demand);
            transpiration += ThornthwaiteMather.actualEvapotranspirationMm(storage, after,
                infiltrated, demand);
            storage = after;
          }
          aet += surface + transpiration;
          petSum += pet[m];
          rainSum += rain[m];
          grassWater += transpiration
              * YanHunt.relativeRate(meanT[m], g.c4TminC(), g.c4ToptC(), g.c4TmaxC());
          treeWater += transpiration
              * YanHunt.relativeRate(meanT[m], t.c3TminC, t.c3ToptC, t.c3TmaxC);
        }
        double c3 = Co2Response.michaelisMenten(co2[y], t.co2ReferencePpm,
            t.co2HalfSaturationPpm);
        double c4 = 1 + g.c4Co2Share() * (c3 - 1);
        int at = y * blocks + b;
        out.rainfallMm[at] = rainSum;
        out.petMm[at] = petSum;
        out.openWaterEvaporationMm[at] = e0Sum;
        out.aetMm[at] = aet;
        out.growingDays[at] = GrowingPeriod.lengthOfGrowingPeriodDays(rain, pet,
            LGP_RESERVE_CAP_MM);
        out.curedSeasonFactor[at] = Fire.curedSeasonFactor(f, out.growingDays[at]);
        out.grassPotentialKgPerHa[at] = grassWater * g.waterUseEfficiencyKgPerHaPerMm() * c4;
        out.treeGrowthIndex[at] = treeWater * c3 / t.referenceAetMm;
        out.humidityEarlyPercent[at] = afternoonHumidityPercent(weather, y,
            seasons.indexInYear(seasons.earlyBurnMonth()), bp.altitudeM[b], annualRange);
        out.humidityLatePercent[at] = afternoonHumidityPercent(weather, y,
            seasons.indexInYear(seasons.lateBurnMonth()), bp.altitudeM[b], annualRange);
        out.humidityTermEarly[at] = Trollope.humidityTerm(out.humidityEarlyPercent[at]);
        out.humidityTermLate[at] = Trollope.humidityTerm(out.humidityLatePercent[at]);
      }
    }
    return out;
  }

  /**
   * Relative humidity at the afternoon maximum temperature of a month (%): the dew point from
   * Linacre's (1977) regression, vapour pressures from FAO-56 Eq. 11.
   */
  private static double afternoonHumidityPercent(Weather weather, int year, int monthOfYear,
      double altitudeM, double annualRangeC) {
    double tmax = weather.tmaxC(year, monthOfYear);
    double tmin = weather.tminC(year, monthOfYear);
    double mean = 0.5 * (tmax + tmin);
    double depression =
        Linacre.clampedDewPointDepressionC(altitudeM, mean, tmax - tmin, annualRangeC);
    return 100 * Math.min(1, saturationVapourPressureKPa(mean - depression)
        / saturationVapourPressureKPa(tmax));
  }
}
