package veldplan.optimiser.search;

import java.util.List;

/**
 * The outcome of an {@link Nsga2} run.
 *
 * @param population           the final population (N individuals)
 * @param archive              every non-dominated individual found during the run, under
 *                             constrained domination, one per objective vector, sorted by the
 *                             first objective
 * @param evaluations          evaluations requested (N × (generations + 1))
 * @param simulatedEvaluations gene vectors actually passed to {@link SearchProblem#evaluate}
 *                             (requests minus cache hits)
 * @param generation           the last generation
 * @param evaluateNanos        wall time inside {@link SearchProblem#evaluate} (ns), across
 *                             resumptions
 * @param totalNanos           wall time of the whole run (ns), across resumptions; the
 *                             difference is the search's own bookkeeping
 */
public record SearchResult(List<Individual> population, List<Individual> archive,
    long evaluations, long simulatedEvaluations, int generation, long evaluateNanos,
    long totalNanos) {

  /** Copies the lists. */
  public SearchResult {
    population = List.copyOf(population);
    archive = List.copyOf(archive);
  }

  /** Share of the wall time spent outside {@link SearchProblem#evaluate}, in [0, 1]. */
  public double bookkeepingShare() {
    return totalNanos <= 0 ? 0.0 : Math.max(0.0, 1.0 - (double) evaluateNanos / totalNanos);
  }
}
