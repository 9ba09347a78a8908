package veldplan.model;

import veldplan.model.ecology.Trollope;

/**
 * Everything about one replicate of one climate path that does not depend on the management
 * policy, computed once and shared read-only by every policy evaluated on it (common random
 * numbers). Arrays are indexed [year * blocks + block].
 *
 * <p>The random draws of the fire and demography streams are here too: they are a function of
 * the replicate's keys, the year and an index only, so they are the same for every policy.
 *
 * <p>The soil water balance does not depend on the vegetation in this model (the trees and grass
 * divide the transpired water between them; they do not change how much is transpired), so the
 * whole water balance (monthly, stepped daily within each month) is done here and the yearly
 * loop only reads its results.
 */
public final class Forcing {
  final int years;
  final int blocks;
  final long fireKey;
  final long demographyKey;
  final double[] rainfallMm;
  final double[] petMm;
  final double[] openWaterEvaporationMm;
  final double[] aetMm;
  final double[] growingDays;
  final double[] grassPotentialKgPerHa;
  final double[] treeGrowthIndex;
  /** Afternoon relative humidity in the early-dry burning month (%). */
  final double[] humidityEarlyPercent;
  /** Afternoon relative humidity in the late-dry burning month (%). */
  final double[] humidityLatePercent;
  /** Grass fuel moisture in the early-dry burning month (%). */
  final double fuelMoistureEarlyPercent;
  /** Grass fuel moisture in the late-dry burning month (%). */
  final double fuelMoistureLatePercent;
  final double[] co2Ppm;
  /**
   * Trollope's fuel-moisture term 530 sqrt(FM) of the early- and late-dry fuel moisture
   * ({@code Trollope.moistureTerm}), computed once so that the yearly loop only adds the fuel.
   */
  final double moistureTermEarly;
  final double moistureTermLate;
  /** Trollope's humidity term 0.1907 RH^2 of {@link #humidityEarlyPercent} (kW/m). */
  final double[] humidityTermEarly;
  /** Trollope's humidity term 0.1907 RH^2 of {@link #humidityLatePercent} (kW/m). */
  final double[] humidityTermLate;
  /** Chance-of-unplanned-fire factor from the length of the dry season (0..1). */
  final double[] curedSeasonFactor;
  /** Uniform draw deciding an unplanned ignition (fire stream, index block * 4). */
  final double[] ignitionDraw;
  /**
   * Bounds on the yearly ignition rate that decide the ignition test without an exponential
   * ({@link Fire#ignitionBounds}): above {@code ignitionLitAbove} a fire is surely lit, below
   * {@code ignitionUnlitBelow} surely not; in between the exact test is made.
   */
  final double[] ignitionLitAbove;
  final double[] ignitionUnlitBelow;
  /** Uniform draw setting an unplanned fire's extent (fire stream, index block * 4 + 1). */
  final double[] extentDraw;
  /** Animals with a noise draw per year: herbivores, then predators. */
  final int noiseSlots;
  /** Standard normal draws [year * noiseSlots + slot] (demography stream, index = slot). */
  final double[] demographicNoise;

  Forcing(int years, int blocks, int noiseSlots, long fireKey, long demographyKey,
      double[] co2Ppm, double fuelMoistureEarlyPercent, double fuelMoistureLatePercent) {
    this.years = years;
    this.blocks = blocks;
    this.fireKey = fireKey;
    this.demographyKey = demographyKey;
    int n = years * blocks;
    this.rainfallMm = new double[n];
    this.petMm = new double[n];
    this.openWaterEvaporationMm = new double[n];
    this.aetMm = new double[n];
    this.growingDays = new double[n];
    this.grassPotentialKgPerHa = new double[n];
    this.treeGrowthIndex = new double[n];
    this.humidityEarlyPercent = new double[n];
    this.humidityLatePercent = new double[n];
    this.fuelMoistureEarlyPercent = fuelMoistureEarlyPercent;
    this.fuelMoistureLatePercent = fuelMoistureLatePercent;
    this.co2Ppm = co2Ppm.clone();
    this.moistureTermEarly = Trollope.moistureTerm(fuelMoistureEarlyPercent);
    this.moistureTermLate = Trollope.moistureTerm(fuelMoistureLatePercent);
    this.humidityTermEarly = new double[n];
    this.humidityTermLate = new double[n];
    this.ignitionLitAbove = new double[n];
    this.ignitionUnlitBelow = new double[n];
    this.curedSeasonFactor = new double[n];
    this.ignitionDraw = new double[n];
    this.extentDraw = new double[n];
    this.noiseSlots = noiseSlots;
    this.demographicNoise = new double[years * noiseSlots];
  }

  /** Number of years. */
  public int years() {
    return years;
  }

  /** Number of blocks. */
  public int blocks() {
    return blocks;
  }

  /** Key of the fire stream. */
  public long fireKey() {
    return fireKey;
  }

  /** Key of the demography stream. */
  public long demographyKey() {
    return demographyKey;
  }

  /** Block rainfall in the year (mm). */
  public double rainfallMm(int year, int block) {
    return rainfallMm[year * blocks + block];
  }

  /** Potential evapotranspiration of well-watered vegetation, Linacre (1977) (mm/yr). */
  public double petMm(int year, int block) {
    return petMm[year * blocks + block];
  }

  /** Open-water evaporation, Linacre (1977) (mm/yr). */
  public double openWaterEvaporationMm(int year, int block) {
    return openWaterEvaporationMm[year * blocks + block];
  }

  /** Actual evapotranspiration, surface evaporation plus transpiration (mm/yr). */
  public double aetMm(int year, int block) {
    return aetMm[year * blocks + block];
  }

  /** Length of growing period (days/yr). */
  public double growingDays(int year, int block) {
    return growingDays[year * blocks + block];
  }

  /** Grass production with no trees and no grazing (kg DM/ha/yr). */
  public double grassPotentialKgPerHa(int year, int block) {
    return grassPotentialKgPerHa[year * blocks + block];
  }

  /** Tree growth index (1 = the calibration's reference conditions). */
  public double treeGrowthIndex(int year, int block) {
    return treeGrowthIndex[year * blocks + block];
  }

  /** Afternoon relative humidity in the early-dry burning month (%). */
  public double humidityEarlyPercent(int year, int block) {
    return humidityEarlyPercent[year * blocks + block];
  }

  /** Afternoon relative humidity in the late-dry burning month (%). */
  public double humidityLatePercent(int year, int block) {
    return humidityLatePercent[year * blocks + block];
  }

  /** CO2 in the year (ppm). */
  public double co2Ppm(int year) {
    return co2Ppm[year];
  }
}
