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
    return block[(year * blocks + b) * BlockSeries.COUNT + series.ordinal()];
  }

  /** Sets a block series value (for building trajectories in tests and tools). */
  public void set(BlockSeries series, int year, int b, double value) {
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
    System.arraycopy(s.abundance, 0, initialHerbivore, 0, herbivores);
    System.arraycopy(s.predatorAbundance, 0, initialPredator, 0, predators);
    for (int b = 0; b < blocks; b++) {
      initialLargeTreesPerHa[b] = largeTrees(s, b);
    }
  }

  private static double largeTrees(EcosystemState s, int b) {
    double sum = 0;
    for (int k = TreeClass.FIRST_LARGE; k < TreeClass.COUNT; k++) {
      sum += s.treesPerHa[b * TreeClass.COUNT + k];
    }
    return sum;
  }

  /** Records the end of year {@code year}. Allocates nothing. */
  void record(int year, EcosystemState s, Forcing f, double discountFactor) {
    int nb = BlockSeries.COUNT;
    for (int b = 0; b < blocks; b++) {
      int at = (year * blocks + b) * nb;
      int fa = year * blocks + b;
      block[at + BlockSeries.RAINFALL.ordinal()] = f.rainfallMm[fa];
      block[at + BlockSeries.POTENTIAL_EVAPOTRANSPIRATION.ordinal()] = f.petMm[fa];
      block[at + BlockSeries.OPEN_WATER_EVAPORATION.ordinal()] = f.openWaterEvaporationMm[fa];
      block[at + BlockSeries.ACTUAL_EVAPOTRANSPIRATION.ordinal()] = f.aetMm[fa];
      block[at + BlockSeries.GROWING_DAYS.ordinal()] = f.growingDays[fa];
      block[at + BlockSeries.GRASS_PRODUCTION.ordinal()] = s.grassProductionKgPerHa[b];
      block[at + BlockSeries.FUEL.ordinal()] = s.fuelKgPerHa[b];
      double planned = s.plannedBurntFraction[b];
      double wild = s.wildBurntFraction[b];
      block[at + BlockSeries.BURNT_FRACTION.ordinal()] = planned + wild;
      block[at + BlockSeries.PLANNED_BURNT_FRACTION.ordinal()] = planned;
      block[at + BlockSeries.FIRE_INTENSITY.ordinal()] = planned + wild > 0
          ? (planned * s.plannedIntensityKwPerM[b] + wild * s.wildIntensityKwPerM[b])
              / (planned + wild)
          : 0;
      block[at + BlockSeries.BASAL_AREA.ordinal()] = s.basalAreaM2PerHa[b];
      int trees = b * TreeClass.COUNT;
      for (int k = 0; k < TreeClass.COUNT; k++) {
        block[at + BlockSeries.TREES_BELOW_0_5M.ordinal() + k] = s.treesPerHa[trees + k];
      }
      block[at + BlockSeries.LARGE_TREES.ordinal()] = largeTrees(s, b);
      block[at + BlockSeries.BROWSE_PRESSURE.ordinal()] = s.browsePressure[b];
      block[at + BlockSeries.ELEPHANT_DENSITY.ordinal()] = s.elephantsPerKm2[b];
      block[at + BlockSeries.WATER_POINTS_OPEN.ordinal()] = s.waterPointsOpen[b];
    }
    System.arraycopy(s.abundance, 0, herbivore, year * herbivores, herbivores);
    System.arraycopy(s.predatorAbundance, 0, predator, year * predators, predators);
    int at = year * ParkSeries.COUNT;
    double total = s.costBurning + s.costOfftake + s.costContraception + s.costWater;
    park[at + ParkSeries.COST_BURNING.ordinal()] = s.costBurning;
    park[at + ParkSeries.COST_ELEPHANT_OFFTAKE.ordinal()] = s.costOfftake;
    park[at + ParkSeries.COST_CONTRACEPTION.ordinal()] = s.costContraception;
    park[at + ParkSeries.COST_WATER_POINTS.ordinal()] = s.costWater;
    park[at + ParkSeries.COST_TOTAL.ordinal()] = total;
    park[at + ParkSeries.COST_DISCOUNTED.ordinal()] = total * discountFactor;
    park[at + ParkSeries.ELEPHANTS_REMOVED.ordinal()] = s.elephantsRemoved;
    park[at + ParkSeries.FEMALES_TREATED.ordinal()] = s.femalesTreated;
    park[at + ParkSeries.CO2.ordinal()] = f.co2Ppm[year];
  }
}
