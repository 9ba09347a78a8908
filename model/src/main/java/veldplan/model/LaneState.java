package veldplan.model;

import jdk.incubator.vector.DoubleVector;
import jdk.incubator.vector.VectorSpecies;

/**
 * The state of {@link #LANES} replicates of one policy, simulated in lockstep: every quantity of
 * {@link EcosystemState} that differs between replicates is stored lane-innermost, entry i of
 * lane r at {@code i * LANES + r}, so that one vector holds entry i of every replicate.
 *
 * <p>What depends on the policy only — the water points open, each herbivore's reach and the
 * weights derived from it — is the same in every lane and is kept once, in {@link #shared}, and
 * computed by the scalar code ({@link Herbivory#updateReach}).
 *
 * <p>{@link #pack} and {@link #unpack} copy one lane from and to an {@link EcosystemState}, for
 * the end-of-run check of each lane's state and for testing the lockstep processes against the
 * scalar ones.
 */
final class LaneState {
  /** The vector shape: the widest this machine computes natively (8 doubles with AVX-512). */
  static final VectorSpecies<Double> SPECIES = DoubleVector.SPECIES_PREFERRED;
  /** Replicates per lockstep batch: one per vector lane. */
  static final int LANES = SPECIES.length();

  final int blocks;
  final int herbivores;
  final int predators;
  final int lagSlots;
  /** Policy-only state (water points, reach, overlap weights), the same in every lane. */
  final EcosystemState shared;
  /** One lane at a time, unpacked for the end-of-run check (see {@link #unpack}). */
  final EcosystemState view;

  // ---- carried from year to year, lane-innermost
  final double[] treesPerHa;
  final double[] leftoverGrassKgPerHa;
  final double[] abundance;
  final double[] predatorAbundance;
  final double[] coverageHistory;
  final double[] grazedFraction;

  // ---- this year's flows, lane-innermost
  final double[] basalAreaM2PerHa;
  final double[] grassProductionKgPerHa;
  final double[] fuelKgPerHa;
  final double[] lowBrowseKgPerHa;
  final double[] highBrowseKgPerHa;
  final double[] browsePressure;
  final double[] plannedBurntFraction;
  final double[] plannedIntensityKwPerM;
  final double[] wildBurntFraction;
  final double[] wildIntensityKwPerM;
  final double[] elephantsPerKm2;
  final double[] grassDiet;
  final double[] forageKg;
  final double[] pressureKg;
  final double[] predationHazard;
  final double[] categorySupplyKg;
  final double[] preyKg;
  final double[] preyBiomassKg;
  final double[] tallShare;
  final double[] costBurning = new double[LANES];
  final double[] costOfftake = new double[LANES];
  final double[] costContraception = new double[LANES];
  final double[] costWater = new double[LANES];
  final double[] elephantsRemoved = new double[LANES];
  final double[] femalesTreated = new double[LANES];

  // ---- scratch, lane-innermost
  /** Next-year numbers carried between tree classes (see LaneTrees.treeClasses). */
  final double[] treeCarry = new double[3 * LANES];
  /** One vector's worth of scratch for {@link VectorMath}. */
  final double[] math = new double[LANES];
  /** One vector per block, for exponentials taken for every block at once. */
  final double[] blockScratch;
  /** One vector per herbivore and predator, for their growth exponentials. */
  final double[] animalScratch;
  /** Elephants per km2 within reach of each block this year (0 without reach). */
  final double[] elephantsInReach;
  /**
   * The trees' exponentials of a year, taken at once: one vector per block and tree class that
   * elephants break (breakage), then two per block (topkill intensity factors of the planned
   * and the unplanned fire; see LaneTrees).
   */
  final double[] treeExponentials;
  /** Per tree class, its index among the classes elephants break (rate &gt; 0), or -1. */
  final int[] breakingIndex = new int[TreeClass.COUNT];
  /** Number of tree classes elephants break. */
  final int breakingClasses;
  /** Fire.spreadFactor of each block's fuel this year. */
  final double[] fireSpread;
  /** The elephants' grass and browse within reach, summed over blocks. */
  final double[] dietSums = new double[2 * LANES];
  final double[][] categoryForageKg;
  final double[] inverseForage;
  final double[] sharedDemandKg;
  final double[] demandPerUnitSupply;
  final double[][] depletion;

  /** What a trajectory records, lane by lane (stride LANES). */
  final RecordedState recorded;
  /** The lane arrays, in the order of {@link #scalarArrays}. */
  private final double[][] lanes;
  /** {@link #shared}'s arrays in the same order (the reset state of every lane). */
  private final double[][] sharedArrays;

  LaneState(ModelParameters p) {
    shared = new EcosystemState(p);
    view = new EcosystemState(p);
    blocks = shared.blocks;
    herbivores = shared.herbivores;
    predators = shared.predators;
    lagSlots = shared.lagSlots;
    treesPerHa = lanes(blocks * TreeClass.COUNT);
    leftoverGrassKgPerHa = lanes(blocks);
    abundance = lanes(herbivores);
    predatorAbundance = lanes(predators);
    coverageHistory = lanes(lagSlots);
    grazedFraction = lanes(blocks);
    basalAreaM2PerHa = lanes(blocks);
    grassProductionKgPerHa = lanes(blocks);
    fuelKgPerHa = lanes(blocks);
    lowBrowseKgPerHa = lanes(blocks);
    highBrowseKgPerHa = lanes(blocks);
    browsePressure = lanes(blocks);
    plannedBurntFraction = lanes(blocks);
    plannedIntensityKwPerM = lanes(blocks);
    wildBurntFraction = lanes(blocks);
    wildIntensityKwPerM = lanes(blocks);
    elephantsPerKm2 = lanes(blocks);
    grassDiet = lanes(herbivores);
    forageKg = lanes(herbivores);
    pressureKg = lanes(herbivores);
    predationHazard = lanes(herbivores);
    categorySupplyKg = lanes(blocks * Herbivory.CATEGORIES_PER_BLOCK);
    preyKg = lanes(herbivores);
    preyBiomassKg = lanes(predators);
    tallShare = lanes(blocks);
    fireSpread = lanes(blocks);
    blockScratch = lanes(blocks);
    elephantsInReach = lanes(blocks);
    animalScratch = lanes(herbivores + predators);
    int breaking = 0;
    for (int k = 0; k < TreeClass.COUNT; k++) {
      breakingIndex[k] = p.trees().elephantBreakageKm2PerElephant[k] > 0 ? breaking++ : -1;
    }
    breakingClasses = breaking;
    treeExponentials = lanes(blocks * (breaking + 2));
    int pooled = herbivores * blocks * Herbivory.KINDS_PER_POOL;
    categoryForageKg = new double[][] {lanes(pooled), lanes(pooled)};
    inverseForage = lanes(herbivores);
    sharedDemandKg = lanes(herbivores);
    demandPerUnitSupply = lanes(herbivores * Herbivory.POOLS);
    depletion = new double[][] {lanes(pooled), lanes(pooled)};
    recorded = new RecordedState(LANES, grassProductionKgPerHa, fuelKgPerHa,
        plannedBurntFraction, wildBurntFraction, plannedIntensityKwPerM, wildIntensityKwPerM,
        basalAreaM2PerHa, treesPerHa, browsePressure, elephantsPerKm2, abundance,
        predatorAbundance);
    lanes = new double[][] {treesPerHa, leftoverGrassKgPerHa, abundance, predatorAbundance,
        coverageHistory, grazedFraction, basalAreaM2PerHa, grassProductionKgPerHa, fuelKgPerHa,
        lowBrowseKgPerHa, highBrowseKgPerHa, browsePressure, plannedBurntFraction,
        plannedIntensityKwPerM, wildBurntFraction, wildIntensityKwPerM, elephantsPerKm2,
        grassDiet, forageKg, pressureKg, predationHazard, categorySupplyKg, preyKg,
        preyBiomassKg, tallShare};
    sharedArrays = scalarArrays(shared);
  }

  private static double[] lanes(int entries) {
    return new double[entries * LANES];
  }

  /** The scalar arrays of {@code s} that {@link #lanes} hold, in the same order. */
  private static double[][] scalarArrays(EcosystemState s) {
    return new double[][] {s.treesPerHa, s.leftoverGrassKgPerHa, s.abundance,
        s.predatorAbundance, s.coverageHistory, s.grazedFraction, s.basalAreaM2PerHa,
        s.grassProductionKgPerHa, s.fuelKgPerHa, s.lowBrowseKgPerHa, s.highBrowseKgPerHa,
        s.browsePressure, s.plannedBurntFraction, s.plannedIntensityKwPerM,
        s.wildBurntFraction, s.wildIntensityKwPerM, s.elephantsPerKm2, s.grassDiet, s.forageKg,
        s.pressureKg, s.predationHazard, s.categorySupplyKg, s.preyKg, s.preyBiomassKg,
        s.tallShare};
  }

  /** Resets every lane to the start of a run, as {@link EcosystemState#reset} does. */
  void reset(ModelParameters p) {
    shared.reset(p);
    for (int a = 0; a < lanes.length; a++) {
      double[] from = sharedArrays[a];
      double[] to = lanes[a];
      for (int i = 0; i < from.length; i++) {
        java.util.Arrays.fill(to, i * LANES, (i + 1) * LANES, from[i]);
      }
    }
    java.util.Arrays.fill(costBurning, shared.costBurning);
    java.util.Arrays.fill(costOfftake, shared.costOfftake);
    java.util.Arrays.fill(costContraception, shared.costContraception);
    java.util.Arrays.fill(costWater, shared.costWater);
    java.util.Arrays.fill(elephantsRemoved, shared.elephantsRemoved);
    java.util.Arrays.fill(femalesTreated, shared.femalesTreated);
  }

  /** Copies {@code s} into lane {@code lane}. */
  void pack(int lane, EcosystemState s) {
    double[][] scalar = scalarArrays(s);
    for (int a = 0; a < lanes.length; a++) {
      double[] from = scalar[a];
      double[] to = lanes[a];
      for (int i = 0; i < from.length; i++) {
        to[i * LANES + lane] = from[i];
      }
    }
    costBurning[lane] = s.costBurning;
    costOfftake[lane] = s.costOfftake;
    costContraception[lane] = s.costContraception;
    costWater[lane] = s.costWater;
    elephantsRemoved[lane] = s.elephantsRemoved;
    femalesTreated[lane] = s.femalesTreated;
  }

  /**
   * Copies lane {@code lane} into {@code s}, with the policy-only state of {@link #shared} and
   * the year.
   */
  void unpack(int lane, EcosystemState s) {
    double[][] scalar = scalarArrays(s);
    for (int a = 0; a < lanes.length; a++) {
      double[] from = lanes[a];
      double[] to = scalar[a];
      for (int i = 0; i < to.length; i++) {
        to[i] = from[i * LANES + lane];
      }
    }
    s.costBurning = costBurning[lane];
    s.costOfftake = costOfftake[lane];
    s.costContraception = costContraception[lane];
    s.costWater = costWater[lane];
    s.elephantsRemoved = elephantsRemoved[lane];
    s.femalesTreated = femalesTreated[lane];
    s.year = shared.year;
    System.arraycopy(shared.waterPointsOpen, 0, s.waterPointsOpen, 0, blocks);
    System.arraycopy(shared.reach, 0, s.reach, 0, s.reach.length);
  }
}
