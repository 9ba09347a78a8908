package veldplan.model;

/**
 * Parameters of every herbivore that eats forage: the scenario's guilds first, then elephants as
 * the last index ({@link #elephant}). Arrays are indexed by herbivore.
 */
public final class HerbivoreParameters {
  /** Mass of the reference large stock unit (kg), Meissner (1982), methods sheet §9.2. */
  static final double LARGE_STOCK_UNIT_KG = 450;

  /** Number of herbivores including elephants. */
  final int count;
  /** Index of the elephants (the last one). */
  final int elephant;
  final String[] names;
  final double[] bodyMassKg;
  /** Dry-matter intake per head per year (kg DM/yr), Kleiber scaling (methods sheet §9.2). */
  final double[] intakeKgPerYear;
  /** Share of grass in the diet; for elephants the share when browse is plentiful. */
  final double[] grassDietFraction;
  /** Dry-season foraging distance from water (km); +infinity = not water dependent. */
  final double[] reachKm;
  final double[] maxGrowthRatePerYear;
  final double[] noiseSd;
  final double[] initialAbundance;
  final double[] quasiExtinctionAbundance;
  /** Feeding role per guild (ordinal of GuildRole); -1 for elephants. */
  final int[] role;
  /**
   * Share of each forage category the herbivore accepts (0..1), [herbivore * 4 + category] in
   * the order tall grass, short grass, low browse, high browse ({@link Herbivory}).
   */
  final double[] acceptance;
  /** theta = max(1, sqrt(W / 450)): shape of density dependence (theta-Ricker), see Animals. */
  final double[] densityShape;
  /** Intake from forage shared with others, intake / coarse-forage factor (kg DM/yr). */
  final double[] sharedIntakeKgPerYear;
  /** f = max(1, (W/450)^0.25): a large herbivore takes 1/f of its intake from shared forage. */
  final double[] coarseForageFactor;

  HerbivoreParameters(String[] names, double[] bodyMassKg, double[] intakeKgPerYear,
      double[] grassDietFraction, double[] reachKm, double[] maxGrowthRatePerYear,
      double[] noiseSd, double[] initialAbundance, double[] quasiExtinctionAbundance,
      int[] role, double[] acceptance) {
    this.count = names.length;
    this.elephant = count - 1;
    this.names = names.clone();
    this.bodyMassKg = bodyMassKg.clone();
    this.intakeKgPerYear = intakeKgPerYear.clone();
    this.grassDietFraction = grassDietFraction.clone();
    this.reachKm = reachKm.clone();
    this.maxGrowthRatePerYear = maxGrowthRatePerYear.clone();
    this.noiseSd = noiseSd.clone();
    this.initialAbundance = initialAbundance.clone();
    this.quasiExtinctionAbundance = quasiExtinctionAbundance.clone();
    this.role = role.clone();
    if (acceptance.length != count * Herbivory.CATEGORIES_PER_BLOCK) {
      throw new IllegalArgumentException("acceptance needs " + Herbivory.CATEGORIES_PER_BLOCK
          + " values per herbivore");
    }
    this.acceptance = acceptance.clone();
    this.coarseForageFactor = new double[count];
    this.densityShape = new double[count];
    this.sharedIntakeKgPerYear = new double[count];
    for (int h = 0; h < count; h++) {
      densityShape[h] = Math.max(1, Math.sqrt(bodyMassKg[h] / LARGE_STOCK_UNIT_KG));
      coarseForageFactor[h] = Math.max(1, Math.pow(bodyMassKg[h] / LARGE_STOCK_UNIT_KG, 0.25));
      sharedIntakeKgPerYear[h] = intakeKgPerYear[h] / coarseForageFactor[h];
    }
  }

  /** Number of herbivores including elephants. */
  public int count() {
    return count;
  }

  /** Index of the elephants. */
  public int elephantIndex() {
    return elephant;
  }

  /** Name of herbivore {@code h}. */
  public String name(int h) {
    return names[h];
  }

  /** Quasi-extinction threshold of herbivore {@code h} (head). */
  public double quasiExtinctionAbundance(int h) {
    return quasiExtinctionAbundance[h];
  }

  /** Body mass of herbivore {@code h} (kg). */
  public double bodyMassKg(int h) {
    return bodyMassKg[h];
  }

  /** Feeding role of guild {@code h} (ordinal of GuildRole), or -1 for the elephants. */
  public int role(int h) {
    return role[h];
  }

  /** Maximum rate of increase of herbivore {@code h} (1/yr). */
  public double maxGrowthRatePerYear(int h) {
    return maxGrowthRatePerYear[h];
  }
}
