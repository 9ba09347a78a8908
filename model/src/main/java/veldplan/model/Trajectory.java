package veldplan.model;

import static veldplan.model.LaneState.LANES;
import static veldplan.model.LaneState.SPECIES;

import jdk.incubator.vector.DoubleVector;
import jdk.incubator.vector.VectorOperators;

/**
 * What one run records: every year's state at the end of the year and the year's flows, in
 * flat columnar arrays allocated once and overwritten by each run. Objectives and reports read
 * it; tests can fill one by hand through {@link #set}.
 *
 * <p>The runs of a lockstep batch ({@link #batch}) share their arrays, lane-innermost: value i
 * of lane r at {@code i * stride + r}, so that recording a year writes one vector per value. A
 * trajectory made with a constructor has arrays of its own (stride 1).
 */
public final class Trajectory {
  final int years;
  final int blocks;
  final int herbivores;
  final int predators;
  /** Spacing of one run's values in the arrays (1, or the lanes of a batch) and its lane. */
  final int stride;
  final int lane;
  final double[] block;
  final double[] herbivore;
  final double[] predator;
  final double[] park;
  final double[] initialHerbivore;
  final double[] initialPredator;
  final double[] initialLargeTreesPerHa;
  /** The forcing of the run recorded last: its climate series are this run's. */
  private Forcing forcing;

  /** An empty trajectory of this shape, with arrays of its own. */
  public Trajectory(int years, int blocks, int herbivores, int predators) {
    this(years, blocks, herbivores, predators, 1, 0, null);
  }

  /** An empty trajectory shaped for these parameters, with arrays of its own. */
  public Trajectory(ModelParameters p) {
    this(p.years(), p.blocks().count, p.herbivores().count, p.predators().count);
  }

  /** Lane {@code lane} of {@code stride} runs sharing {@code shareWith}'s arrays (or new ones). */
  private Trajectory(int years, int blocks, int herbivores, int predators, int stride, int lane,
      Trajectory shareWith) {
    this.years = years;
    this.blocks = blocks;
    this.herbivores = herbivores;
    this.predators = predators;
    this.stride = stride;
    this.lane = lane;
    if (shareWith == null) {
      block = new double[years * blocks * BlockSeries.COUNT * stride];
      herbivore = new double[years * herbivores * stride];
      predator = new double[years * predators * stride];
      park = new double[years * ParkSeries.COUNT * stride];
      initialHerbivore = new double[herbivores * stride];
      initialPredator = new double[predators * stride];
      initialLargeTreesPerHa = new double[blocks * stride];
    } else {
      block = shareWith.block;
      herbivore = shareWith.herbivore;
      predator = shareWith.predator;
      park = shareWith.park;
      initialHerbivore = shareWith.initialHerbivore;
      initialPredator = shareWith.initialPredator;
      initialLargeTreesPerHa = shareWith.initialLargeTreesPerHa;
    }
  }

  /**
   * The trajectories of one lockstep batch of {@link LaneSimulator#lanes()} runs, sharing their
   * arrays; what {@link LaneSimulator} records into.
   */
  public static Trajectory[] batch(ModelParameters p) {
    Trajectory[] lanes = new Trajectory[LANES];
    for (int r = 0; r < LANES; r++) {
      lanes[r] = new Trajectory(p.years(), p.blocks().count, p.herbivores().count,
          p.predators().count, LANES, r, r == 0 ? null : lanes[0]);
    }
    return lanes;
  }

  /** Whether {@code lanes} is a whole batch made by {@link #batch}, in lane order. */
  static boolean isBatch(Trajectory[] lanes) {
    if (lanes.length != LANES) {
      return false;
    }
    for (int r = 0; r < LANES; r++) {
      if (lanes[r].stride != LANES || lanes[r].lane != r || lanes[r].block != lanes[0].block) {
        return false;
      }
    }
    return true;
  }

  /**
   * Every value of this run through the accessors, in a fixed order (block series by year and
   * block, abundances, predators, park series, start values): for comparing runs in tests.
   */
  double[] values() {
    int n = years * (blocks * BlockSeries.COUNT + herbivores + predators + ParkSeries.COUNT)
        + herbivores + predators + blocks;
    double[] out = new double[n];
    int i = 0;
    for (int year = 0; year < years; year++) {
      for (int b = 0; b < blocks; b++) {
        for (BlockSeries series : BlockSeries.values()) {
          out[i++] = get(series, year, b);
        }
      }
      for (int h = 0; h < herbivores; h++) {
        out[i++] = abundance(year, h);
      }
      for (int q = 0; q < predators; q++) {
        out[i++] = predatorAbundance(year, q);
      }
      for (ParkSeries series : ParkSeries.values()) {
        out[i++] = get(series, year);
      }
    }
    for (int h = 0; h < herbivores; h++) {
      out[i++] = initialAbundance(h);
    }
    for (int q = 0; q < predators; q++) {
      out[i++] = initialPredatorAbundance(q);
    }
    for (int b = 0; b < blocks; b++) {
      out[i++] = initialLargeTreesPerHa(b);
    }
    return out;
  }

  /** Index of this run's value {@code i}. */
  private int at(int i) {
    return i * stride + lane;
  }

  public int years() {
    return years;
  }

  /** Number of blocks. */
  public int blocks() {
    return blocks;
  }

  /** Number of herbivores, elephants last. */
  public int herbivores() {
    return herbivores;
  }

  /** Number of predator guilds. */
  public int predators() {
    return predators;
  }

  /** Value of a block series at the end of {@code year}. */
  public double get(BlockSeries series, int year, int b) {
    if (forcing != null) {
      int at = year * blocks + b;
      switch (series) {
        case RAINFALL:
          return forcing.rainfallMm[at];
        case POTENTIAL_EVAPOTRANSPIRATION:
          return forcing.petMm[at];
        case OPEN_WATER_EVAPORATION:
          return forcing.openWaterEvaporationMm[at];
        case ACTUAL_EVAPOTRANSPIRATION:
          return forcing.aetMm[at];
        case GROWING_DAYS:
          return forcing.growingDays[at];
        default:
          break;
      }
    }
    return block[at((year * blocks + b) * BlockSeries.COUNT + series.ordinal())];
  }

  /**
   * Sets a block series value (for building trajectories in tests and tools).
   *
   * @throws IllegalStateException for a climate series (rainfall to growing days) of a
   *     simulated run: those are read from the run's forcing
   */
  public void set(BlockSeries series, int year, int b, double value) {
    if (forcing != null && series.ordinal() <= BlockSeries.GROWING_DAYS.ordinal()) {
      throw new IllegalStateException(series + " of a simulated run comes from its forcing");
    }
    block[at((year * blocks + b) * BlockSeries.COUNT + series.ordinal())] = value;
  }

  /** Abundance of herbivore {@code h} at the end of {@code year} (head). */
  public double abundance(int year, int h) {
    return herbivore[at(year * herbivores + h)];
  }

  /** Sets a herbivore abundance. */
  public void setAbundance(int year, int h, double value) {
    herbivore[at(year * herbivores + h)] = value;
  }

  /** Abundance of predator {@code p} at the end of {@code year} (head). */
  public double predatorAbundance(int year, int p) {
    return predator[at(year * predators + p)];
  }

  /** Sets a predator abundance. */
  public void setPredatorAbundance(int year, int p, double value) {
    predator[at(year * predators + p)] = value;
  }

  /** Value of a park series in {@code year}. */
  public double get(ParkSeries series, int year) {
    return park[at(year * ParkSeries.COUNT + series.ordinal())];
  }

  /** Sets a park series value. */
  public void set(ParkSeries series, int year, double value) {
    park[at(year * ParkSeries.COUNT + series.ordinal())] = value;
  }

  /** Abundance of herbivore {@code h} at the start of the run (head). */
  public double initialAbundance(int h) {
    return initialHerbivore[at(h)];
  }

  /** Abundance of predator {@code p} at the start of the run (head). */
  public double initialPredatorAbundance(int p) {
    return initialPredator[at(p)];
  }

  /** Trees above 5 m per ha in {@code block} at the start of the run. */
  public double initialLargeTreesPerHa(int b) {
    return initialLargeTreesPerHa[at(b)];
  }

  /** Sets the start values (for building trajectories in tests). */
  public void setInitial(double[] herbivores, double[] predators, double[] largeTreesPerHa) {
    for (int h = 0; h < this.herbivores; h++) {
      initialHerbivore[at(h)] = herbivores[h];
    }
    for (int q = 0; q < this.predators; q++) {
      initialPredator[at(q)] = predators[q];
    }
    for (int b = 0; b < blocks; b++) {
      initialLargeTreesPerHa[at(b)] = largeTreesPerHa[b];
    }
  }

  /** Records the start of a run from the state just reset. */
  void recordStart(EcosystemState s) {
    recordStart(s.recorded, 0);
  }

  private void recordStart(RecordedState s, int stateLane) {
    int stride = s.stride;
    for (int h = 0; h < herbivores; h++) {
      initialHerbivore[at(h)] = s.abundance[h * stride + stateLane];
    }
    for (int q = 0; q < predators; q++) {
      initialPredator[at(q)] = s.predatorAbundance[q * stride + stateLane];
    }
    for (int b = 0; b < blocks; b++) {
      initialLargeTreesPerHa[at(b)] = largeTrees(s, stateLane, b);
    }
  }

  private static double largeTrees(RecordedState s, int lane, int b) {
    double sum = 0;
    for (int k = TreeClass.FIRST_LARGE; k < TreeClass.COUNT; k++) {
      sum += s.treesPerHa[(b * TreeClass.COUNT + k) * s.stride + lane];
    }
    return sum;
  }

  /** Records the end of year {@code year}. Allocates nothing. */
  void record(int year, EcosystemState s, Forcing f, double discountFactor) {
    recordState(year, s.recorded, 0, s.waterPointsOpen, f);
    recordPark(year, s.costBurning, s.costOfftake, s.costContraception, s.costWater,
        s.elephantsRemoved, s.femalesTreated, f, discountFactor);
  }

  private void recordState(int year, RecordedState s, int stateLane, int[] waterPointsOpen,
      Forcing f) {
    // The climate series (rainfall to growing days) are read from the forcing, not copied.
    forcing = f;
    int nb = BlockSeries.COUNT;
    int stride = s.stride;
    for (int b = 0; b < blocks; b++) {
      int row = (year * blocks + b) * nb;
      int i = b * stride + stateLane;
      block[at(row + BlockSeries.GRASS_PRODUCTION.ordinal())] = s.grassProductionKgPerHa[i];
      block[at(row + BlockSeries.FUEL.ordinal())] = s.fuelKgPerHa[i];
      double planned = s.plannedBurntFraction[i];
      double wild = s.wildBurntFraction[i];
      block[at(row + BlockSeries.BURNT_FRACTION.ordinal())] = planned + wild;
      block[at(row + BlockSeries.PLANNED_BURNT_FRACTION.ordinal())] = planned;
      block[at(row + BlockSeries.FIRE_INTENSITY.ordinal())] = planned + wild > 0
          ? (planned * s.plannedIntensityKwPerM[i] + wild * s.wildIntensityKwPerM[i])
              / (planned + wild)
          : 0;
      block[at(row + BlockSeries.BASAL_AREA.ordinal())] = s.basalAreaM2PerHa[i];
      int trees = b * TreeClass.COUNT;
      for (int k = 0; k < TreeClass.COUNT; k++) {
        block[at(row + BlockSeries.TREES_BELOW_0_5M.ordinal() + k)] =
            s.treesPerHa[(trees + k) * stride + stateLane];
      }
      block[at(row + BlockSeries.LARGE_TREES.ordinal())] = largeTrees(s, stateLane, b);
      block[at(row + BlockSeries.BROWSE_PRESSURE.ordinal())] = s.browsePressure[i];
      block[at(row + BlockSeries.ELEPHANT_DENSITY.ordinal())] = s.elephantsPerKm2[i];
      block[at(row + BlockSeries.WATER_POINTS_OPEN.ordinal())] = waterPointsOpen[b];
    }
    for (int h = 0; h < herbivores; h++) {
      herbivore[at(year * herbivores + h)] = s.abundance[h * stride + stateLane];
    }
    for (int q = 0; q < predators; q++) {
      predator[at(year * predators + q)] = s.predatorAbundance[q * stride + stateLane];
    }
  }

  private void recordPark(int year, double costBurning, double costOfftake,
      double costContraception, double costWater, double elephantsRemoved,
      double femalesTreated, Forcing f, double discountFactor) {
    int row = year * ParkSeries.COUNT;
    double total = costBurning + costOfftake + costContraception + costWater;
    park[at(row + ParkSeries.COST_BURNING.ordinal())] = costBurning;
    park[at(row + ParkSeries.COST_ELEPHANT_OFFTAKE.ordinal())] = costOfftake;
    park[at(row + ParkSeries.COST_CONTRACEPTION.ordinal())] = costContraception;
    park[at(row + ParkSeries.COST_WATER_POINTS.ordinal())] = costWater;
    park[at(row + ParkSeries.COST_TOTAL.ordinal())] = total;
    park[at(row + ParkSeries.COST_DISCOUNTED.ordinal())] = total * discountFactor;
    park[at(row + ParkSeries.ELEPHANTS_REMOVED.ordinal())] = elephantsRemoved;
    park[at(row + ParkSeries.FEMALES_TREATED.ordinal())] = femalesTreated;
    park[at(row + ParkSeries.CO2.ordinal())] = f.co2Ppm[year];
  }

  /** Records the start of every lane's run of a batch from the lockstep state just reset. */
  static void recordStart(Trajectory[] batch, LaneState s) {
    for (int r = 0; r < LANES; r++) {
      batch[r].recordStart(s.recorded, r);
    }
  }

  /**
   * Records the end of year {@code year} of every lane into a batch made by {@link #batch}: one
   * vector store per value, the same values as {@link #recordState} and {@link #recordPark}.
   */
  static void record(Trajectory[] batch, int year, LaneState s, LaneForcing f,
      double discountFactor) {
    Trajectory t = batch[0];
    for (int r = 0; r < LANES; r++) {
      batch[r].forcing = f.replicates[r];
    }
    for (int b = 0; b < t.blocks; b++) {
      t.recordBlock(year, s, b);
    }
    for (int h = 0; h < t.herbivores; h++) {
      DoubleVector.fromArray(SPECIES, s.abundance, h * LANES)
          .intoArray(t.herbivore, (year * t.herbivores + h) * LANES);
    }
    for (int q = 0; q < t.predators; q++) {
      DoubleVector.fromArray(SPECIES, s.predatorAbundance, q * LANES)
          .intoArray(t.predator, (year * t.predators + q) * LANES);
    }
    t.recordParkLanes(year, s, f, discountFactor);
  }

  private void recordBlock(int year, LaneState s, int b) {
    int row = (year * blocks + b) * BlockSeries.COUNT;
    int at = b * LANES;
    DoubleVector.fromArray(SPECIES, s.grassProductionKgPerHa, at)
        .intoArray(block, (row + BlockSeries.GRASS_PRODUCTION.ordinal()) * LANES);
    DoubleVector.fromArray(SPECIES, s.fuelKgPerHa, at)
        .intoArray(block, (row + BlockSeries.FUEL.ordinal()) * LANES);
    DoubleVector planned = DoubleVector.fromArray(SPECIES, s.plannedBurntFraction, at);
    DoubleVector wild = DoubleVector.fromArray(SPECIES, s.wildBurntFraction, at);
    DoubleVector burnt = planned.add(wild);
    burnt.intoArray(block, (row + BlockSeries.BURNT_FRACTION.ordinal()) * LANES);
    planned.intoArray(block, (row + BlockSeries.PLANNED_BURNT_FRACTION.ordinal()) * LANES);
    DoubleVector.zero(SPECIES).blend(
            planned.mul(DoubleVector.fromArray(SPECIES, s.plannedIntensityKwPerM, at))
                .add(wild.mul(DoubleVector.fromArray(SPECIES, s.wildIntensityKwPerM, at)))
                .div(burnt),
            burnt.compare(VectorOperators.GT, 0))
        .intoArray(block, (row + BlockSeries.FIRE_INTENSITY.ordinal()) * LANES);
    DoubleVector.fromArray(SPECIES, s.basalAreaM2PerHa, at)
        .intoArray(block, (row + BlockSeries.BASAL_AREA.ordinal()) * LANES);
    int trees = b * TreeClass.COUNT;
    System.arraycopy(s.treesPerHa, trees * LANES, block,
        (row + BlockSeries.TREES_BELOW_0_5M.ordinal()) * LANES, TreeClass.COUNT * LANES);
    DoubleVector large = DoubleVector.zero(SPECIES);
    for (int k = TreeClass.FIRST_LARGE; k < TreeClass.COUNT; k++) {
      large = large.add(DoubleVector.fromArray(SPECIES, s.treesPerHa, (trees + k) * LANES));
    }
    large.intoArray(block, (row + BlockSeries.LARGE_TREES.ordinal()) * LANES);
    DoubleVector.fromArray(SPECIES, s.browsePressure, at)
        .intoArray(block, (row + BlockSeries.BROWSE_PRESSURE.ordinal()) * LANES);
    DoubleVector.fromArray(SPECIES, s.elephantsPerKm2, at)
        .intoArray(block, (row + BlockSeries.ELEPHANT_DENSITY.ordinal()) * LANES);
    DoubleVector.broadcast(SPECIES, (double) s.shared.waterPointsOpen[b])
        .intoArray(block, (row + BlockSeries.WATER_POINTS_OPEN.ordinal()) * LANES);
  }

  private void recordParkLanes(int year, LaneState s, LaneForcing f, double discountFactor) {
    int row = year * ParkSeries.COUNT;
    DoubleVector burning = DoubleVector.fromArray(SPECIES, s.costBurning, 0);
    DoubleVector offtake = DoubleVector.fromArray(SPECIES, s.costOfftake, 0);
    DoubleVector contraception = DoubleVector.fromArray(SPECIES, s.costContraception, 0);
    DoubleVector water = DoubleVector.fromArray(SPECIES, s.costWater, 0);
    DoubleVector total = burning.add(offtake).add(contraception).add(water);
    burning.intoArray(park, (row + ParkSeries.COST_BURNING.ordinal()) * LANES);
    offtake.intoArray(park, (row + ParkSeries.COST_ELEPHANT_OFFTAKE.ordinal()) * LANES);
    contraception.intoArray(park, (row + ParkSeries.COST_CONTRACEPTION.ordinal()) * LANES);
    water.intoArray(park, (row + ParkSeries.COST_WATER_POINTS.ordinal()) * LANES);
    total.intoArray(park, (row + ParkSeries.COST_TOTAL.ordinal()) * LANES);
    total.mul(discountFactor).intoArray(park, (row + ParkSeries.COST_DISCOUNTED.ordinal()) * LANES);
    DoubleVector.fromArray(SPECIES, s.elephantsRemoved, 0)
        .intoArray(park, (row + ParkSeries.ELEPHANTS_REMOVED.ordinal()) * LANES);
    DoubleVector.fromArray(SPECIES, s.femalesTreated, 0)
        .intoArray(park, (row + ParkSeries.FEMALES_TREATED.ordinal()) * LANES);
    for (int r = 0; r < LANES; r++) {
      park[(row + ParkSeries.CO2.ordinal()) * LANES + r] = f.replicates[r].co2Ppm[year];
    }
  }
}
