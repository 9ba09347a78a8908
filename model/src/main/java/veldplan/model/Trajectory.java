package veldplan.model;

/**
 * What one run records: every year's state at the end of the year and the year's flows, in
 * flat columnar arrays allocated once and overwritten by each run. Objectives and reports read
 * it; tests can fill one by hand through {@link #set}.
 */
public final class Trajectory {
  final int years;
  final int blocks;
  final int herbivores;
  final int predators;
  final double[] block;
  final double[] herbivore;
  final double[] predator;
  final double[] park;
  final double[] initialHerbivore;
  final double[] initialPredator;
  final double[] initialLargeTreesPerHa;
  /** The forcing of the run recorded last: its climate series are this run's. */
  private Forcing forcing;

  /** Allocates a trajectory sized for {@code years} years of a park with these dimensions. */
  public Trajectory(int years, int blocks, int herbivores, int predators) {
    this.years = years;
    this.blocks = blocks;
    this.herbivores = herbivores;
    this.predators = predators;
    block = new double[years * blocks * BlockSeries.COUNT];
    herbivore = new double[years * herbivores];
    predator = new double[years * predators];
    park = new double[years * ParkSeries.COUNT];
    initialHerbivore = new double[herbivores];
    initialPredator = new double[predators];
    initialLargeTreesPerHa = new double[blocks];
  }

  /** A trajectory sized for parameters {@code p}. */
  public Trajectory(ModelParameters p) {
    this(p.years(), p.blocks().count, p.herbivores().count, p.predators().count);
  }

  /** Number of years recorded. */
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
    return block[(year * blocks + b) * BlockSeries.COUNT + series.ordinal()];
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
    block[(year * blocks + b) * BlockSeries.COUNT + series.ordinal()] = value;
  }

  /** Abundance of herbivore {@code h} at the end of {@code year} (head). */
  public double abundance(int year, int h) {
    return herbivore[year * herbivores + h];
  }

  /** Sets a herbivore abundance. */
  public void setAbundance(int year, int h, double value) {
    herbivore[year * herbivores + h] = value;
  }

  /** Abundance of predator {@code p} at the end of {@code year} (head). */
  public double predatorAbundance(int year, int p) {
    return predator[year * predators + p];
  }

  /** Sets a predator abundance. */
  public void setPredatorAbundance(int year, int p, double value) {
    predator[year * predators + p] = value;
  }

  /** Value of a park series in {@code year}. */
  public double get(ParkSeries series, int year) {
    return park[year * ParkSeries.COUNT + series.ordinal()];
  }

  /** Sets a park series value. */
  public void set(ParkSeries series, int year, double value) {
    park[year * ParkSeries.COUNT + series.ordinal()] = value;
  }

  /** Abundance of herbivore {@code h} at the start of the run (head). */
  public double initialAbundance(int h) {
    return initialHerbivore[h];
  }

  /** Abundance of predator {@code p} at the start of the run (head). */
  public double initialPredatorAbundance(int p) {
    return initialPredator[p];
  }

  /** Trees above 5 m per ha in {@code block} at the start of the run. */
  public double initialLargeTreesPerHa(int b) {
    return initialLargeTreesPerHa[b];
  }

  /** Sets the start values (for building trajectories in tests). */
  public void setInitial(double[] herbivores, double[] predators, double[] largeTreesPerHa) {
    System.arraycopy(herbivores, 0, initialHerbivore, 0, this.herbivores);
    System.arraycopy(predators, 0, initialPredator, 0, this.predators);
    System.arraycopy(largeTreesPerHa, 0, initialLargeTreesPerHa, 0, blocks);
  }

  /** Records the start of a run from the state just reset. */
  void recordStart(EcosystemState s) {
    recordStart(s.recorded, 0);
  }

  /** Records the start of lane {@code lane}'s run from the lockstep state just reset. */
  void recordStart(LaneState s, int lane) {
    recordStart(s.recorded, lane);
  }

  private void recordStart(RecordedState s, int lane) {
    int stride = s.stride;
    for (int h = 0; h < herbivores; h++) {
      initialHerbivore[h] = s.abundance[h * stride + lane];
    }
    for (int q = 0; q < predators; q++) {
      initialPredator[q] = s.predatorAbundance[q * stride + lane];
    }
    for (int b = 0; b < blocks; b++) {
      initialLargeTreesPerHa[b] = largeTrees(s, lane, b);
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

  /** Records the end of year {@code year} of lane {@code lane}. Allocates nothing. */
  void record(int year, LaneState s, int lane, Forcing f, double discountFactor) {
    recordState(year, s.recorded, lane, s.shared.waterPointsOpen, f);
    recordPark(year, s.costBurning[lane], s.costOfftake[lane], s.costContraception[lane],
        s.costWater[lane], s.elephantsRemoved[lane], s.femalesTreated[lane], f, discountFactor);
  }

  private void recordState(int year, RecordedState s, int lane, int[] waterPointsOpen,
      Forcing f) {
    // The climate series (rainfall to growing days) are read from the forcing, not copied.
    forcing = f;
    int nb = BlockSeries.COUNT;
    int stride = s.stride;
    for (int b = 0; b < blocks; b++) {
      int at = (year * blocks + b) * nb;
      int i = b * stride + lane;
      block[at + BlockSeries.GRASS_PRODUCTION.ordinal()] = s.grassProductionKgPerHa[i];
      block[at + BlockSeries.FUEL.ordinal()] = s.fuelKgPerHa[i];
      double planned = s.plannedBurntFraction[i];
      double wild = s.wildBurntFraction[i];
      block[at + BlockSeries.BURNT_FRACTION.ordinal()] = planned + wild;
      block[at + BlockSeries.PLANNED_BURNT_FRACTION.ordinal()] = planned;
      block[at + BlockSeries.FIRE_INTENSITY.ordinal()] = planned + wild > 0
          ? (planned * s.plannedIntensityKwPerM[i] + wild * s.wildIntensityKwPerM[i])
              / (planned + wild)
          : 0;
      block[at + BlockSeries.BASAL_AREA.ordinal()] = s.basalAreaM2PerHa[i];
      int trees = b * TreeClass.COUNT;
      for (int k = 0; k < TreeClass.COUNT; k++) {
        block[at + BlockSeries.TREES_BELOW_0_5M.ordinal() + k] =
            s.treesPerHa[(trees + k) * stride + lane];
      }
      block[at + BlockSeries.LARGE_TREES.ordinal()] = largeTrees(s, lane, b);
      block[at + BlockSeries.BROWSE_PRESSURE.ordinal()] = s.browsePressure[i];
      block[at + BlockSeries.ELEPHANT_DENSITY.ordinal()] = s.elephantsPerKm2[i];
      block[at + BlockSeries.WATER_POINTS_OPEN.ordinal()] = waterPointsOpen[b];
    }
    for (int h = 0; h < herbivores; h++) {
      herbivore[year * herbivores + h] = s.abundance[h * stride + lane];
    }
    for (int q = 0; q < predators; q++) {
      predator[year * predators + q] = s.predatorAbundance[q * stride + lane];
    }
  }

  private void recordPark(int year, double costBurning, double costOfftake,
      double costContraception, double costWater, double elephantsRemoved,
      double femalesTreated, Forcing f, double discountFactor) {
    int at = year * ParkSeries.COUNT;
    double total = costBurning + costOfftake + costContraception + costWater;
    park[at + ParkSeries.COST_BURNING.ordinal()] = costBurning;
    park[at + ParkSeries.COST_ELEPHANT_OFFTAKE.ordinal()] = costOfftake;
    park[at + ParkSeries.COST_CONTRACEPTION.ordinal()] = costContraception;
    park[at + ParkSeries.COST_WATER_POINTS.ordinal()] = costWater;
    park[at + ParkSeries.COST_TOTAL.ordinal()] = total;
    park[at + ParkSeries.COST_DISCOUNTED.ordinal()] = total * discountFactor;
    park[at + ParkSeries.ELEPHANTS_REMOVED.ordinal()] = elephantsRemoved;
    park[at + ParkSeries.FEMALES_TREATED.ordinal()] = femalesTreated;
    park[at + ParkSeries.CO2.ordinal()] = f.co2Ppm[year];
  }
}
