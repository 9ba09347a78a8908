package veldplan.model;

import java.util.ArrayList;
import java.util.List;
import veldplan.model.climate.BaselineClimate;
import veldplan.model.climate.ClimatePathModel;
import veldplan.model.climate.Co2Pathways;
import veldplan.model.ecology.MaximumGrowthRate;
import veldplan.model.ecology.Metabolism;
import veldplan.model.ecology.SaxtonRawls;
import veldplan.model.ecology.SoilWaterCharacteristics;
import veldplan.shared.scenario.BurnBlock;
import veldplan.shared.scenario.ClimatePath;
import veldplan.shared.scenario.ClimateTable;
import veldplan.shared.scenario.DeltaChange;
import veldplan.shared.scenario.Guild;
import veldplan.shared.scenario.LoadedScenario;
import veldplan.shared.scenario.Policy;
import veldplan.shared.scenario.Predator;
import veldplan.shared.scenario.Scenario;

/**
 * Turns a checked scenario into model parameters, climate paths and a {@link Study}: units,
 * soil physics and allometry are worked out here, once, so the yearly loop only multiplies.
 */
public final class ParametersFromScenario {
  /** Field metabolic rate as a multiple of Kleiber's basal rate: 2–3 (methods §9.2, from memory). */
  static final double FIELD_METABOLIC_MULTIPLE = 2.5;
  /** Metabolisable energy of savanna forage: 7–9 MJ/kg DM (methods §9.2, from memory). */
  static final double FORAGE_ENERGY_MJ_PER_KG = 8.0;
  /**
   * Energy a carnivore gains per kg of live prey killed (kJ/kg): about 60 % of a carcass is eaten
   * at roughly 8 MJ/kg (from memory; our assumption).
   */
  static final double PREY_ENERGY_KJ_PER_KG = 5000;
  /** Prey biomass density at which kills are half their maximum (kg/km2); our calibration. */
  static final double PREDATION_HALF_SATURATION_KG_PER_KM2 = 2000;
  /** Predators' maximum rate of increase relative to a herbivore of the same mass. */
  static final double PREDATOR_RATE_FACTOR = 0.5;
  /** Prey switching exponent when the scenario gives none: m = 2 (methods §10.2, from memory). */
  static final double DEFAULT_SWITCHING_EXPONENT = 2;
  /** Depth of the soil surface layer that dries by evaporation, Ze (m): FAO-56, 0.10–0.15 m. */
  static final double SURFACE_LAYER_M = 0.10;
  /**
   * Share of the surface layer's total evaporable water (FAO-56 Eq. 73) lost to evaporation
   * after each storm before grass roots take it: 0.15, about 1 mm on sand and 3 mm on loam, is
   * our calibration (with {@link ForcingBuilder#STORM_DEPTH_MM}) to the inverse-texture
   * crossover of Sala et al. (1988). It is below FAO-56's bare-soil readily evaporable water
   * (2–12 mm, from memory) because under a grass cover roots share the surface water.
   */
  static final double READILY_EVAPORABLE_SHARE = 0.15;
  /** Elephants' preference of browse over grass (our calibration). */
  static final double ELEPHANT_BROWSE_PREFERENCE = 1.5;
  /** Years from the start of contraception to fewer births (gestation about 22 months). */
  static final int GESTATION_LAG_YEARS = 2;

  /**
   * Share of tall grass, short grass, low browse (below 2 m) and high browse each feeding role
   * accepts, in GuildRole order. Our calibration after the qualitative literature: bulk grazers
   * take any grass, short swards a little less; selective grazers need tall
   * grass of particular species and condition, a small part of the tall grass (roan and sable
   * avoid short, heavily grazed swards, Harrington et al. 1999, from memory); small mixed feeders crop short grass and low shrubs (small animals subsist on
   * shorter swards, Illius &amp; Gordon 1987); browsers take low and some high browse.
   */
  static final double[][] ACCEPTANCE = {
      {1.0, 0.8, 1.0, 0.1}, // bulk grazer
      {0.15, 0.0, 1.0, 0.1}, // selective grazer
      {0.2, 0.2, 1.0, 0.3}, // browser
      {0.1, 1.0, 1.0, 0.1}, // mixed feeder
  };
  /**
   * Elephants pull up tall grass more easily than they crop short grass, and feed mostly above
   * the reach of other browsers (our calibration; Owen-Smith 1988, from memory).
   */
  static final double[] ELEPHANT_ACCEPTANCE = {1.0, 0.2, 0.2, 1.0};

  private ParametersFromScenario() {}

  /** Model parameters for a scenario. */
  public static ModelParameters parameters(Scenario sc) {
    List<BurnBlock> blocks = sc.park().blocks();
    int nb = blocks.size();
    String[] names = new String[nb];
    double[] area = new double[nb];
    double[] bucket = new double[nb];
    double[] surface = new double[nb];
    double[] altitude = new double[nb];
    double[] latitude = new double[nb];
    double[] multiplier = new double[nb];
    int[] points = new int[nb];
    double[] river = new double[nb];
    double[] grass = new double[nb];
    double[] trees = new double[nb * TreeClass.COUNT];
    for (int b = 0; b < nb; b++) {
      BurnBlock block = blocks.get(b);
      SoilWaterCharacteristics soil;
      try {
        soil = SaxtonRawls.of(block.sandFraction(), block.clayFraction(),
            block.organicMatterPercent());
      } catch (IllegalArgumentException e) {
        throw new IllegalArgumentException("/park/blocks/" + b + ": sand "
            + block.sandFraction() + ", clay " + block.clayFraction() + " and organic matter "
            + block.organicMatterPercent() + " % give no usable soil water contents in the "
            + "Saxton & Rawls (2006) equations (" + e.getMessage() + "); expected a texture "
            + "they cover, e.g. a little more clay or organic matter", e);
      }
      names[b] = block.name();
      area[b] = block.areaHa();
      bucket[b] = 1000 * soil.availableWater() * block.rootingDepthM();
      // FAO-56 Eq. 73: TEW = 1000 (thetaFC - 0.5 thetaWP) Ze.
      double tew = 1000 * (soil.fieldCapacity() - 0.5 * soil.wiltingPoint()) * SURFACE_LAYER_M;
      surface[b] = READILY_EVAPORABLE_SHARE * tew;
      altitude[b] = block.altitudeM();
      latitude[b] = block.latitudeDeg();
      multiplier[b] = block.rainfallMultiplier();
      points[b] = block.artificialWaterPoints();
      river[b] = block.perennialRiverKm();
      grass[b] = block.initialGrassKgPerHa();
      System.arraycopy(block.initialTreesPerHa().toArray(), 0, trees, b * TreeClass.COUNT,
          TreeClass.COUNT);
    }
    BlockParameters bp = new BlockParameters(names, area, bucket, surface, altitude, latitude,
        multiplier, points, river, grass, trees);
    return new ModelParameters(sc.startYear(), sc.horizonYears(), bp, herbivores(sc),
        new ElephantParameters(sc.elephants().breedingFemaleFraction(),
            sc.elephants().calvesPerFemalePerYear(), sc.elephants().mortalityPerYear(),
            sc.elephants().contraceptionEfficacy(), GESTATION_LAG_YEARS,
            ELEPHANT_BROWSE_PREFERENCE),
        predators(sc), GrassParameters.defaults(), TreeParameters.defaults(),
        FireParameters.defaults(), sc.costs());
  }

  private static HerbivoreParameters herbivores(Scenario sc) {
    List<Guild> guilds = sc.guilds();
    int n = guilds.size() + 1;
    String[] names = new String[n];
    double[] mass = new double[n];
    double[] intake = new double[n];
    double[] grassDiet = new double[n];
    double[] reach = new double[n];
    double[] rate = new double[n];
    double[] noise = new double[n];
    double[] initial = new double[n];
    double[] threshold = new double[n];
    int[] role = new int[n];
    double[] acceptance = new double[n * Herbivory.CATEGORIES_PER_BLOCK];
    for (int h = 0; h < guilds.size(); h++) {
      Guild g = guilds.get(h);
      names[h] = g.name();
      mass[h] = g.bodyMassKg();
      grassDiet[h] = g.grassDietFraction();
      reach[h] = g.maxDistanceFromWaterKm() == null ? Double.POSITIVE_INFINITY
          : g.maxDistanceFromWaterKm();
      rate[h] = g.maxGrowthRatePerYear() == null ? MaximumGrowthRate.caughleyKrebs(mass[h])
          : g.maxGrowthRatePerYear();
      noise[h] = g.environmentalNoiseSd();
      initial[h] = g.initialAbundance();
      threshold[h] = g.quasiExtinctionAbundance();
      role[h] = g.role().ordinal();
      System.arraycopy(ACCEPTANCE[role[h]], 0, acceptance, h * Herbivory.CATEGORIES_PER_BLOCK,
          Herbivory.CATEGORIES_PER_BLOCK);
    }
    int e = n - 1;
    var el = sc.elephants();
    names[e] = "elephants";
    mass[e] = el.bodyMassKg();
    grassDiet[e] = 0.5;
    reach[e] = el.maxDistanceFromWaterKm();
    // The elephants' rate of increase without contraception, from their demography.
    rate[e] = Math.log(Math.max(1e-9, 1 + el.breedingFemaleFraction()
        * el.calvesPerFemalePerYear() - el.mortalityPerYear()));
    noise[e] = el.environmentalNoiseSd();
    initial[e] = el.initialAbundance();
    threshold[e] = el.quasiExtinctionAbundance();
    role[e] = -1;
    System.arraycopy(ELEPHANT_ACCEPTANCE, 0, acceptance, e * Herbivory.CATEGORIES_PER_BLOCK,
        Herbivory.CATEGORIES_PER_BLOCK);
    for (int h = 0; h < n; h++) {
      intake[h] = 365 * Metabolism.dryMatterIntakeKgPerDay(mass[h], FIELD_METABOLIC_MULTIPLE,
          FORAGE_ENERGY_MJ_PER_KG);
    }
    return new HerbivoreParameters(names, mass, intake, grassDiet, reach, rate, noise, initial,
        threshold, role, acceptance);
  }

  private static PredatorParameters predators(Scenario sc) {
    List<Predator> list = sc.predators();
    int n = list.size();
    int herbivores = sc.guilds().size() + 1;
    String[] names = new String[n];
    double[] mass = new double[n];
    double[] kill = new double[n];
    double[] half = new double[n];
    double[] rate = new double[n];
    double[] switching = new double[n];
    double[] noise = new double[n];
    double[] initial = new double[n];
    double[] threshold = new double[n];
    double[] hunts = new double[n * herbivores];
    int[] responseType = new int[n];
    List<String> guildNames = new ArrayList<>();
    sc.guilds().forEach(g -> guildNames.add(g.name()));
    for (int q = 0; q < n; q++) {
      Predator pr = list.get(q);
      names[q] = pr.name();
      mass[q] = pr.bodyMassKg();
      // Kleiber: basal 293 W^0.75 kJ/day times the field multiple, met by live prey.
      kill[q] = 365 * FIELD_METABOLIC_MULTIPLE * 293 * Math.pow(mass[q], 0.75)
          / PREY_ENERGY_KJ_PER_KG;
      half[q] = PREDATION_HALF_SATURATION_KG_PER_KM2;
      rate[q] = PREDATOR_RATE_FACTOR * MaximumGrowthRate.caughleyKrebs(mass[q]);
      switching[q] = pr.switchingExponent() == null ? DEFAULT_SWITCHING_EXPONENT
          : pr.switchingExponent();
      noise[q] = pr.environmentalNoiseSd();
      initial[q] = pr.initialAbundance();
      threshold[q] = pr.quasiExtinctionAbundance();
      responseType[q] = pr.functionalResponseType() == null ? 2 : pr.functionalResponseType();
      for (String prey : pr.preyGuilds()) {
        int h = guildNames.indexOf(prey);
        if (h < 0) {
          throw new IllegalArgumentException("predator " + pr.name() + " hunts unknown guild "
              + prey);
        }
        hunts[q * herbivores + h] = 1;
      }
    }
    double parkKm2 = 0;
    for (BurnBlock block : sc.park().blocks()) {
      parkKm2 += block.areaHa() / 100;
    }
    return new PredatorParameters(names, mass, kill, half, rate, switching, noise, initial,
        threshold, hunts, responseType, parkKm2);
  }

  /** The baseline climate of a loaded scenario. */
  public static BaselineClimate baseline(ClimateTable table) {
    int months = table.years() * 12;
    double[] rain = new double[months];
    double[] tmin = new double[months];
    double[] tmax = new double[months];
    for (int y = 0; y < table.years(); y++) {
      for (int m = 0; m < 12; m++) {
        rain[y * 12 + m] = table.rainfallMm(y, m);
        tmin[y * 12 + m] = table.tminC(y, m);
        tmax[y * 12 + m] = table.tmaxC(y, m);
      }
    }
    return new BaselineClimate(table.firstYear(), rain, tmin, tmax);
  }

  /** The climate paths of a loaded scenario, each over the horizon. */
  public static List<ClimatePathModel> paths(LoadedScenario loaded) {
    Scenario sc = loaded.scenario();
    Co2Pathways co2 = Co2Pathways.load();
    int years = sc.horizonYears();
    List<ClimatePathModel> out = new ArrayList<>();
    List<ClimatePath> all = sc.climate().paths();
    for (int index = 0; index < all.size(); index++) {
      ClimatePath path = all.get(index);
      double[] ppm = new double[years];
      for (int y = 0; y < years; y++) {
        ppm[y] = co2.ppm(path.co2Pathway(), sc.startYear() + y);
      }
      if (path.monthlySeriesCsv() != null) {
        ClimateTable table = loaded.pathSeries().get(path.name());
        int first = sc.startYear() - table.firstYear();
        double[] rain = new double[years * 12];
        double[] tmin = new double[years * 12];
        double[] tmax = new double[years * 12];
        for (int y = 0; y < years; y++) {
          for (int m = 0; m < 12; m++) {
            rain[y * 12 + m] = table.rainfallMm(first + y, m);
            tmin[y * 12 + m] = table.tminC(first + y, m);
            tmax[y * 12 + m] = table.tmaxC(first + y, m);
          }
        }
        out.add(ClimatePathModel.explicit(path.name(), index, rain, tmin, tmax, ppm));
      } else {
        double[] factor = new double[years];
        double[] shift = new double[years];
        for (int y = 0; y < years; y++) {
          int year = sc.startYear() + y;
          factor[y] = 1 + interpolate(path.deltaChange(), year, true) / 100;
          shift[y] = interpolate(path.deltaChange(), year, false);
        }
        out.add(ClimatePathModel.deltaChange(path.name(), index, factor, shift, ppm));
      }
    }
    return out;
  }

  /** Linear interpolation between anchors, constant outside them. */
  static double interpolate(List<DeltaChange> anchors, int year, boolean rainfall) {
    DeltaChange first = anchors.get(0);
    if (year <= first.year()) {
      return rainfall ? first.rainfallChangePercent() : first.temperatureChangeC();
    }
    for (int i = 1; i < anchors.size(); i++) {
      DeltaChange a = anchors.get(i - 1);
      DeltaChange b = anchors.get(i);
      if (year <= b.year()) {
        double w = (year - a.year()) / (double) (b.year() - a.year());
        return rainfall
            ? a.rainfallChangePercent() + w * (b.rainfallChangePercent() - a.rainfallChangePercent())
            : a.temperatureChangeC() + w * (b.temperatureChangeC() - a.temperatureChangeC());
      }
    }
    DeltaChange last = anchors.get(anchors.size() - 1);
    return rainfall ? last.rainfallChangePercent() : last.temperatureChangeC();
  }

  /** A study of a loaded scenario: every path and replicate, forcing computed. */
  public static Study study(LoadedScenario loaded) {
    return study(loaded, null);
  }

  /**
   * A study of some of a scenario's climate paths. Each path keeps the random streams it has in
   * the whole scenario, so its replicates are the same whether it is run alone or with others.
   *
   * @param pathNames the paths to include, in scenario order; null = all
   * @throws IllegalArgumentException if a name is not a path of the scenario
   */
  public static Study study(LoadedScenario loaded, List<String> pathNames) {
    Scenario sc = loaded.scenario();
    ModelParameters params = parameters(sc);
    List<ClimatePathModel> paths = paths(loaded);
    if (pathNames != null) {
      for (String name : pathNames) {
        if (paths.stream().noneMatch(p -> p.name().equals(name))) {
          throw new IllegalArgumentException("no climate path named " + name);
        }
      }
      paths = paths.stream().filter(p -> pathNames.contains(p.name())).toList();
    }
    BaselineClimate baseline = baseline(loaded.baseline());
    BurnBlock reference = sc.park().blocks().get(0);
    Seasons seasons = ForcingBuilder.seasons(baseline, reference.altitudeM(),
        reference.latitudeDeg());
    return new Study(params, baseline, paths, sc.stochastic().replicates(),
        sc.stochastic().seed(), sc.stochastic().interannualVariabilityFactor(), seasons);
  }

  /** A management plan for a policy, against the scenario's blocks. */
  public static ManagementPlan plan(Policy policy, Scenario sc) {
    List<String> names = new ArrayList<>();
    int[] points = new int[sc.park().blocks().size()];
    for (int b = 0; b < points.length; b++) {
      names.add(sc.park().blocks().get(b).name());
      points[b] = sc.park().blocks().get(b).artificialWaterPoints();
    }
    return ManagementPlan.fromPolicy(policy, names, points, sc.startYear());
  }
}
