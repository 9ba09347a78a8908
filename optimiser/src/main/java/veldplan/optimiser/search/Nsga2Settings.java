package veldplan.optimiser.search;

/**
 * Parameters of one NSGA-II run.
 *
 * <p>Generation 0 is the random initial population; each later generation creates
 * {@code populationSize} offspring, so a complete run requests
 * {@code populationSize × (generations + 1)} evaluations (e.g. 100 × 250 = 25,000 for
 * {@code generations = 249}).
 *
 * @param populationSize       N, even and &ge; 4 (parents are paired for crossover)
 * @param generations          number of offspring generations after generation 0, &ge; 0
 * @param crossoverProbability probability that a parent pair is recombined by SBX, in [0, 1]
 * @param crossoverEta         SBX distribution index &eta;<sub>c</sub>, &ge; 0 (larger: children
 *                             nearer their parents)
 * @param mutationProbability  probability that a gene is mutated, in [0, 1]; {@code NaN} means
 *                             1/n for n genes
 * @param mutationEta          polynomial-mutation distribution index &eta;<sub>m</sub>, &ge; 0
 * @param seed                 the run's seed; generation g draws from a generator derived from
 *                             (seed, g) only
 */
public record Nsga2Settings(int populationSize, int generations, double crossoverProbability,
    double crossoverEta, double mutationProbability, double mutationEta, long seed) {

  /** p<sub>c</sub> = 0.9 of Deb et al. (2002) for real-coded NSGA-II (decision-methods §2.6). */
  public static final double DEB_CROSSOVER_PROBABILITY = 0.9;
  /** &eta;<sub>c</sub> = 20 of Deb et al. (2002) (decision-methods §2.6). */
  public static final double DEB_CROSSOVER_ETA = 20;
  /** &eta;<sub>m</sub> = 20 of Deb et al. (2002) (decision-methods §2.6). */
  public static final double DEB_MUTATION_ETA = 20;

  /**
   * Checks the values.
   *
   * @throws IllegalArgumentException if a value is out of range
   */
  public Nsga2Settings {
    if (populationSize < 4 || populationSize % 2 != 0) {
      throw new IllegalArgumentException(
          "populationSize must be even and >= 4: " + populationSize);
    }
    if (generations < 0) {
      throw new IllegalArgumentException("generations must be >= 0: " + generations);
    }
    if (!(crossoverProbability >= 0 && crossoverProbability <= 1)) {
      throw new IllegalArgumentException(
          "crossoverProbability must be in [0, 1]: " + crossoverProbability);
    }
    if (!(crossoverEta >= 0) || Double.isInfinite(crossoverEta)) {
      throw new IllegalArgumentException("crossoverEta must be finite and >= 0: " + crossoverEta);
    }
    if (!Double.isNaN(mutationProbability)
        && !(mutationProbability >= 0 && mutationProbability <= 1)) {
      throw new IllegalArgumentException(
          "mutationProbability must be in [0, 1] or NaN (= 1/n): " + mutationProbability);
    }
    if (!(mutationEta >= 0) || Double.isInfinite(mutationEta)) {
      throw new IllegalArgumentException("mutationEta must be finite and >= 0: " + mutationEta);
    }
  }

  /**
   * The real-coded NSGA-II parameters of Deb et al. (2002): p<sub>c</sub> = 0.9,
   * &eta;<sub>c</sub> = 20, p<sub>m</sub> = 1/n, &eta;<sub>m</sub> = 20 (decision-methods §2.6).
   *
   * @param populationSize N, even and &ge; 4
   * @param generations    offspring generations after generation 0
   * @param seed           the run's seed
   */
  public static Nsga2Settings defaults(int populationSize, int generations, long seed) {
    return new Nsga2Settings(populationSize, generations, DEB_CROSSOVER_PROBABILITY,
        DEB_CROSSOVER_ETA, Double.NaN, DEB_MUTATION_ETA, seed);
  }

  /** The same settings with another number of generations (for continuing a run further). */
  public Nsga2Settings withGenerations(int newGenerations) {
    return new Nsga2Settings(populationSize, newGenerations, crossoverProbability, crossoverEta,
        mutationProbability, mutationEta, seed);
  }

  /** The per-gene mutation probability for n genes: the setting, or 1/n if it is NaN. */
  public double mutationProbability(int variables) {
    return Double.isNaN(mutationProbability) ? 1.0 / variables : mutationProbability;
  }

  /** Requested evaluations of a complete run: N × (generations + 1). */
  public long totalEvaluations() {
    return (long) populationSize * (generations + 1L);
  }
}
