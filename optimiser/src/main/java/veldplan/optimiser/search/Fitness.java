package veldplan.optimiser.search;

/**
 * The fitness type of the Jenetics phenotypes: an evaluated individual.
 *
 * <p>Jenetics needs a {@link Comparable} fitness. The natural order here is lexicographic on
 * (violation, f<sub>1</sub>, …, f<sub>M</sub>), a total order that extends constrained
 * domination (if a constrained-dominates b then a &lt; b), so Jenetics' "best phenotype" under
 * {@code Optimize.MINIMUM} is always non-dominated. NSGA-II's selection itself never uses this
 * order; it uses {@link NonDominatedSorting} and {@link CrowdingDistance}.
 */
record Fitness(Individual individual) implements Comparable<Fitness> {
  @Override
  public int compareTo(Fitness other) {
    Evaluation a = individual.evaluation();
    Evaluation b = other.individual.evaluation();
    int c = Double.compare(a.violation(), b.violation());
    if (c != 0) {
      return c;
    }
    return java.util.Arrays.compare(a.objectives(), b.objectives());
  }
}
