package veldplan.model;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import veldplan.model.climate.BaselineClimate;
import veldplan.model.climate.ClimatePathModel;
import veldplan.shared.scenario.BurnBlock;
import veldplan.shared.scenario.BurnPlan;
import veldplan.shared.scenario.BurnSeason;
import veldplan.shared.scenario.Climate;
import veldplan.shared.scenario.ClimatePath;
import veldplan.shared.scenario.ClimateTable;
import veldplan.shared.scenario.Costs;
import veldplan.shared.scenario.DeltaChange;
import veldplan.shared.scenario.ElephantPlan;
import veldplan.shared.scenario.Elephants;
import veldplan.shared.scenario.Guild;
import veldplan.shared.scenario.GuildRole;
import veldplan.shared.scenario.LoadedScenario;
import veldplan.shared.scenario.Park;
import veldplan.shared.scenario.Policy;
import veldplan.shared.scenario.Predator;
import veldplan.shared.scenario.Scenario;
import veldplan.shared.scenario.Stochastic;
import veldplan.shared.scenario.TreeClasses;
import veldplan.shared.scenario.WaterPlan;

/**
 * Builds small parks for model tests, with every setting a test may want to change in one
 * mutable builder. The numbers are test fixtures, not check values.
 */
final class TestParks {
  /** Share of annual rainfall per month: a southern-hemisphere summer-rainfall pattern. */
  static final double[] SUMMER_RAIN = {0.18, 0.16, 0.12, 0.06, 0.02, 0.01, 0.0, 0.01, 0.03, 0.08,
      0.15, 0.18};

  double rainfallMm = 600;
  /** Share of annual rainfall per month, January first. */
  double[] rainPattern = SUMMER_RAIN;
  double tmaxC = 30;
  double tminC = 15;
  /** Seasonal temperature amplitude (°C) around the means above. */
  double seasonalAmplitudeC = 4;
  double co2Ppm = 400;
  double sand = 0.6;
  double clay = 0.15;
  double rootingDepthM = 1.2;
  int blocks = 1;
  double areaHa = 20000;
  int waterPoints = 3;
  double riverKm = 0;
  double grassKgPerHa = 1500;
  double[] treesPerHa = {500, 250, 100, 30, 8};
  int years = 50;
  int replicates = 4;
  long seed = 42;
  double noiseSd = 0.1;
  double elephants = 300;
  double elephantMortality = 0.03;
  double predatorsPerGuild = 20;
  boolean withPredators = true;
  double grazers = 2000;
  double rareGrazers = 150;
  double browsers = 800;
  double mixedFeeders = 4000;
  Double fireReturnIntervalYears = 3.0;
  BurnSeason season = BurnSeason.LATE_DRY;
  double targetFractionBurnt = 0.7;
  double offtake = 0;
  double contraception = 0;
  Double triggerDensity = null;
  int openPoints = -1;
  Integer closureYear = null;

  /** Rain spread evenly over {@code months} months centred on January. */
  static double[] wetSeason(int months) {
    double[] pattern = new double[12];
    for (int i = 0; i < months; i++) {
      pattern[Math.floorMod(i - months / 2, 12)] = 1.0 / months;
    }
    return pattern;
  }

  Scenario scenario() {
    List<BurnBlock> blockList = new ArrayList<>();
    List<BurnPlan> burning = new ArrayList<>();
    List<WaterPlan> water = new ArrayList<>();
    for (int b = 0; b < blocks; b++) {
      String name = "block" + b;
      blockList.add(new BurnBlock(name, areaHa, sand, clay, 1.0, rootingDepthM, 400, -24, 1.0,
          waterPoints, riverKm, grassKgPerHa, new TreeClasses(treesPerHa[0], treesPerHa[1],
              treesPerHa[2], treesPerHa[3], treesPerHa[4])));
      burning.add(new BurnPlan(name, fireReturnIntervalYears, season, targetFractionBurnt));
      water.add(new WaterPlan(name, openPoints < 0 ? waterPoints : openPoints, closureYear));
    }
    List<Guild> guilds = List.of(
        new Guild("grazers", GuildRole.BULK_GRAZER, 400, 0.95, 8.0, grazers, 0, null, noiseSd),
        new Guild("rare", GuildRole.SELECTIVE_GRAZER, 220, 0.9, 14.0, rareGrazers, 0, null,
            noiseSd),
        new Guild("browsers", GuildRole.BROWSER, 170, 0.1, 10.0, browsers, 0, null, noiseSd),
        new Guild("mixed", GuildRole.MIXED_FEEDER, 45, 0.55, 6.0, mixedFeeders, 0, null,
            noiseSd));
    List<Predator> predators = withPredators
        ? List.of(new Predator("cats", 150, predatorsPerGuild, 0,
            List.of("grazers", "rare", "mixed"), null, noiseSd, null))
        : List.of();
    Policy policy = new Policy("test", burning,
        new ElephantPlan(offtake, contraception, triggerDensity), water);
    return new Scenario("test park", 2030, years,
        new Park("test park", blockList), guilds, predators,
        new Elephants(elephants, 2500, 15, 0.3, 0.25, elephantMortality, 0, 0.95, noiseSd),
        new Climate("baseline.csv", List.of(new ClimatePath("steady", "SSP2-4.5",
            List.of(new DeltaChange(2030, 0, 0)), null))),
        new Stochastic(replicates, seed, 1.0), policy,
        new Costs("USD", 2, 1000, 100, 2000, 5000, 5));
  }

  /** A baseline of 20 identical years of this builder's climate. */
  ClimateTable baselineTable() {
    int yearsOfData = 20;
    double[] rain = new double[yearsOfData * 12];
    double[] tmin = new double[yearsOfData * 12];
    double[] tmax = new double[yearsOfData * 12];
    for (int y = 0; y < yearsOfData; y++) {
      for (int m = 0; m < 12; m++) {
        // Warmest in January (southern summer), coolest in July.
        double season = seasonalAmplitudeC * Math.cos(2 * Math.PI * m / 12.0);
        rain[y * 12 + m] = rainfallMm * rainPattern[m];
        tmin[y * 12 + m] = tminC + season;
        tmax[y * 12 + m] = tmaxC + season;
      }
    }
    return ClimateTable.of(1990, rain, tmin, tmax);
  }

  LoadedScenario loaded() {
    return new LoadedScenario(Path.of("test.yaml"), scenario(), baselineTable(), Map.of(), "0");
  }

  ModelParameters parameters() {
    return ParametersFromScenario.parameters(scenario());
  }

  /** A study with one steady path at this builder's CO2, using {@code params}. */
  Study study(ModelParameters params) {
    BaselineClimate baseline = ParametersFromScenario.baseline(baselineTable());
    double[] ones = new double[years];
    double[] zeros = new double[years];
    double[] co2 = new double[years];
    java.util.Arrays.fill(ones, 1);
    java.util.Arrays.fill(co2, co2Ppm);
    ClimatePathModel path = ClimatePathModel.deltaChange("steady", 0, ones, zeros, co2);
    Seasons seasons = ForcingBuilder.seasons(baseline, 400, -24);
    return new Study(params, baseline, List.of(path), replicates, seed, 1.0, seasons);
  }

  Study study() {
    return study(parameters());
  }

  ManagementPlan plan() {
    Scenario sc = scenario();
    return ParametersFromScenario.plan(sc.policy(), sc);
  }

  /** Runs every replicate of the plan; trajectories [replicate]. */
  Trajectory[] run(ModelParameters params) {
    return Ensemble.run(study(params), plan(), 1, () -> { })[0];
  }

  Trajectory[] run() {
    return run(parameters());
  }

  /** Fire parameters with unplanned fires switched off. */
  static ModelParameters withoutWildfire(ModelParameters p) {
    FireParameters f = p.fire();
    FireParameters none = new FireParameters(f.windSpeedMPerS(), f.curedFuelMoisturePercent(),
        f.greenFuelMoisturePercent(), f.curingMonths(), f.minimumFuelKgPerHa(),
        f.fuelSpreadScaleKgPerHa(), 0, f.curedSeasonMidDays(), f.curedSeasonScaleDays(),
        f.topkillIntercept(), f.topkillLnHeight(), f.topkillSqrtIntensity(),
        f.topkillDeathFraction());
    return new ModelParameters(p.startYear(), p.years(), p.blocks(), p.herbivores(),
        p.elephants(), p.predators(), p.grass(), p.trees(), none, p.costs());
  }

  /** Mean over replicates of a block series in the last year, block 0. */
  static double meanAtEnd(Trajectory[] runs, BlockSeries series) {
    double sum = 0;
    for (Trajectory t : runs) {
      sum += t.get(series, t.years() - 1, 0);
    }
    return sum / runs.length;
  }
}
