package veldplan.model;

import veldplan.model.ecology.Topkill;

/**
 * Mutable state of one run. Confined to one thread; reset, never reallocated, between runs.
 * Indexing: [block], [block * TreeClass.COUNT + k], [herbivore] (elephants last),
 * [herbivore * blocks + block], [predator]. Units in the field comments.
 *
 * <p>Besides the state carried from year to year (trees, animals, fuel carried over), it holds
 * this year's flows and scratch arrays, so that the yearly loop allocates nothing.
 */
public final class EcosystemState {
  final int blocks;
  final int herbivores;
  final int predators;
  final int lagSlots;

  int year;

  // ---- carried from year to year
  /** Trees per ha [block * K + k]. */
  final double[] treesPerHa;
  /** Unburnt, uneaten grass left at the end of the year (kg DM/ha) [block]. */
  final double[] leftoverGrassKgPerHa;
  /** Animals [herbivore], elephants last (head). */
  final double[] abundance;
  /** Predators [predator] (head). */
  final double[] predatorAbundance;
  /** Contraception coverage applied in past years, a ring buffer of lag + 1 years. */
  final double[] coverageHistory;
  /** Water points open last year [block]. */
  final int[] waterPointsOpen;
  /** Share of last year's grass production eaten [block]: sets this year's tall-grass share. */
  final double[] grazedFraction;

  // ---- this year's flows
  final double[] basalAreaM2PerHa;
  final double[] grassProductionKgPerHa;
  final double[] fuelKgPerHa;
  /** Leaf production below 2 m (kg DM/ha/yr) [block]. */
  final double[] lowBrowseKgPerHa;
  /** Leaf production above 2 m (kg DM/ha/yr) [block]. */
  final double[] highBrowseKgPerHa;
  /** Share of low browse eaten this year [block]. */
  final double[] browsePressure;
  final double[] plannedBurntFraction;
  final double[] plannedIntensityKwPerM;
  final double[] wildBurntFraction;
  final double[] wildIntensityKwPerM;
  final double[] elephantsPerKm2;
  /** Share of each block within reach of water for each herbivore [herbivore * blocks + block]. */
  final double[] reach;
  final double[] grassDiet;
  final double[] forageKg;
  final double[] pressureKg;
  final double[] predationHazard;
  /** Usable forage per category this year (kg DM) [block * 4 + category]. */
  final double[] categorySupplyKg;
  /** Biomass of each herbivore (kg) [herbivore], scratch for predation. */
  final double[] preyKg;
  /** Biomass of the prey each predator hunts (kg) [predator]. */
  final double[] preyBiomassKg;
  double costBurning;
  double costOfftake;
  double costContraception;
  double costWater;
  double elephantsRemoved;
  double femalesTreated;

  // ---- scratch
  /** Tall-grass share of this year's production [block]. */
  final double[] tallShare;
  /**
   * Usable forage of each herbivore in each category (kg DM) [pool][(herbivore * blocks + block)
   * * 2 + kind of the pool]; times {@link #inverseForage} it is the resource share p_hk.
   */
  final double[][] categoryForageKg;
  /** 1 / forageKg, or 1 where the forage is 0 [herbivore] (Herbivory.usableForage). */
  final double[] inverseForage;
  /** Reach x acceptance, same indexing, kept by Herbivory.updateReach. */
  final double[][] usableWeight;
  /** This year's demand on forage shared with others, head x intake / coarse factor (kg). */
  final double[] sharedDemandKg;
  /** o's demand per unit of usable supply in each pool [o * POOLS + pool] (Herbivory.compete). */
  final double[] demandPerUnitSupply;
  /**
   * Overlap weights [o * POOLS + pool][(h * blocks + block) * 2 + kind], kept by
   * Herbivory.updateReach (see {@link Herbivory}).
   */
  final double[][] overlap;
  /** Depletion each herbivore meets [pool][(h * blocks + block) * 2 + kind]. */
  final double[][] depletion;
  final double[] nextClasses = new double[TreeClass.COUNT];
  /**
   * Topkill height factor of each tree class, {@code Topkill.heightFactor} of its height with
   * the fire parameters' coefficients; depends on the parameters only, set by the constructor
   * and {@link #reset}.
   */
  final double[] topkillHeightFactor = new double[TreeClass.COUNT];

  /** Names of the arrays {@link #violation()} checks, in the order of {@link #checked}. */
  private static final String[] CHECKED_NAMES = {"treesPerHa", "leftoverGrassKgPerHa",
      "abundance", "predatorAbundance", "fuelKgPerHa", "grassProductionKgPerHa",
      "plannedBurntFraction", "wildBurntFraction", "reach", "plannedIntensityKwPerM",
      "wildIntensityKwPerM", "basalAreaM2PerHa", "lowBrowseKgPerHa", "highBrowseKgPerHa",
      "browsePressure", "elephantsPerKm2", "grazedFraction", "tallShare", "grassDiet",
      "forageKg", "pressureKg", "predationHazard", "preyBiomassKg", "coverageHistory"};
  /** The state arrays that must stay finite and non-negative. */
  private final double[][] checked;
  /** What a trajectory records, as one run (stride 1). */
  final RecordedState recorded;

  /** Allocates every array once for parameters {@code p}. */
  public EcosystemState(ModelParameters p) {
    blocks = p.blocks().count;
    herbivores = p.herbivores().count;
    predators = p.predators().count;
    lagSlots = p.elephants().gestationLagYears() + 1;
    treesPerHa = new double[blocks * TreeClass.COUNT];
    leftoverGrassKgPerHa = new double[blocks];
    abundance = new double[herbivores];
    predatorAbundance = new double[predators];
    coverageHistory = new double[lagSlots];
    waterPointsOpen = new int[blocks];
    grazedFraction = new double[blocks];
    basalAreaM2PerHa = new double[blocks];
    grassProductionKgPerHa = new double[blocks];
    fuelKgPerHa = new double[blocks];
    lowBrowseKgPerHa = new double[blocks];
    highBrowseKgPerHa = new double[blocks];
    browsePressure = new double[blocks];
    plannedBurntFraction = new double[blocks];
    plannedIntensityKwPerM = new double[blocks];
    wildBurntFraction = new double[blocks];
    wildIntensityKwPerM = new double[blocks];
    elephantsPerKm2 = new double[blocks];
    reach = new double[herbivores * blocks];
    grassDiet = new double[herbivores];
    forageKg = new double[herbivores];
    pressureKg = new double[herbivores];
    predationHazard = new double[herbivores];
    categorySupplyKg = new double[blocks * Herbivory.CATEGORIES_PER_BLOCK];
    preyBiomassKg = new double[predators];
    preyKg = new double[herbivores];
    tallShare = new double[blocks];
    sharedDemandKg = new double[herbivores];
    demandPerUnitSupply = new double[herbivores * Herbivory.POOLS];
    checked = new double[][] {treesPerHa, leftoverGrassKgPerHa, abundance, predatorAbundance,
        fuelKgPerHa, grassProductionKgPerHa, plannedBurntFraction, wildBurntFraction, reach,
        plannedIntensityKwPerM, wildIntensityKwPerM, basalAreaM2PerHa, lowBrowseKgPerHa,
        highBrowseKgPerHa, browsePressure, elephantsPerKm2, grazedFraction, tallShare,
        grassDiet, forageKg, pressureKg, predationHazard, preyBiomassKg, coverageHistory};
    int pooled = herbivores * blocks * Herbivory.KINDS_PER_POOL;
    categoryForageKg = new double[Herbivory.POOLS][pooled];
    inverseForage = new double[herbivores];
    usableWeight = new double[Herbivory.POOLS][pooled];
    overlap = new double[herbivores * Herbivory.POOLS][pooled];
    depletion = new double[Herbivory.POOLS][pooled];
    recorded = new RecordedState(1, grassProductionKgPerHa, fuelKgPerHa, plannedBurntFraction,
        wildBurntFraction, plannedIntensityKwPerM, wildIntensityKwPerM, basalAreaM2PerHa,
        treesPerHa, browsePressure, elephantsPerKm2, abundance, predatorAbundance);
    setRunConstants(p);
  }

  /** Sets the state to the scenario's initial conditions. */
  public void reset(ModelParameters p) {
    year = 0;
    BlockParameters bp = p.blocks();
    System.arraycopy(bp.initialTreesPerHa, 0, treesPerHa, 0, treesPerHa.length);
    System.arraycopy(bp.initialGrassKgPerHa, 0, leftoverGrassKgPerHa, 0, blocks);
    System.arraycopy(p.herbivores().initialAbundance, 0, abundance, 0, herbivores);
    System.arraycopy(p.predators().initialAbundance, 0, predatorAbundance, 0, predators);
    System.arraycopy(bp.artificialWaterPoints, 0, waterPointsOpen, 0, blocks);
    java.util.Arrays.fill(coverageHistory, 0);
    java.util.Arrays.fill(grazedFraction, 0);
    setRunConstants(p);
  }

  /** The state's constants that depend on the parameters only. */
  private void setRunConstants(ModelParameters p) {
    FireParameters fp = p.fire();
    for (int k = 0; k < TreeClass.COUNT; k++) {
      topkillHeightFactor[k] = Topkill.heightFactor(p.trees().lnHeight[k],
          fp.topkillIntercept(), fp.topkillLnHeight());
    }
  }

  /** Trees per ha of class {@code k} in {@code block}. */
  public double treesPerHa(int block, int k) {
    return treesPerHa[block * TreeClass.COUNT + k];
  }

  /** Abundance of herbivore {@code h} (head), elephants last. */
  public double abundance(int h) {
    return abundance[h];
  }

  /** Abundance of predator {@code p} (head). */
  public double predatorAbundance(int p) {
    return predatorAbundance[p];
  }

  /** Share of {@code block} within reach of water for herbivore {@code h}. */
  public double reach(int h, int block) {
    return reach[h * blocks + block];
  }

  /**
   * Checks the invariants every process must keep: all state finite and non-negative.
   *
   * @return null if they hold, else a description of the first violation
   */
  public String violation() {
    for (int i = 0; i < checked.length; i++) {
      String bad = firstBad(CHECKED_NAMES[i], checked[i]);
      if (bad != null) {
        return bad;
      }
    }
    double cost = costBurning + costOfftake + costContraception + costWater;
    if (!(cost >= 0) || Double.isInfinite(cost)) {
      return "cost = " + cost;
    }
    for (int b = 0; b < blocks; b++) {
      double burnt = plannedBurntFraction[b] + wildBurntFraction[b];
      if (burnt > 1 + 1e-12) {
        return "burnt fraction in block " + b + " = " + burnt;
      }
    }
    return null;
  }

  private static String firstBad(String name, double[] values) {
    for (int i = 0; i < values.length; i++) {
      double x = values[i];
      if (!(x >= 0) || Double.isInfinite(x)) {
        return name + "[" + i + "] = " + x;
      }
    }
    return null;
  }
}
