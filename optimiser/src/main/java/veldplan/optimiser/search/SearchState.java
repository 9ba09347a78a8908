package veldplan.optimiser.search;

import java.util.Arrays;
import java.util.List;
import java.util.Objects;

/**
 * Everything needed to continue an {@link Nsga2} run exactly: a checkpoint.
 *
 * <p>Made of records, lists and arrays of primitives only, so Jackson writes and reads it as is;
 * Jackson writes doubles in their shortest round-trip form, so they come back bit for bit.
 * {@code Nsga2.resume(state, …)} then ends with the same population and archive as an
 * uninterrupted run: generation g + 1 depends only on the population of generation g, the
 * archive and (seed, g + 1).
 *
 * @param generation           the last completed generation (0 = the initial population)
 * @param evaluations          evaluations requested so far (cache hits included)
 * @param simulatedEvaluations gene vectors actually passed to {@link SearchProblem#evaluate}
 * @param population           the population of that generation, in the order the next
 *                             generation reads it
 * @param crowding             the crowding distance of each member of {@code population}, as
 *                             computed when it survived (on whole fronts of P ∪ Q, see
 *                             {@link Nsga2}); used for mating; +&infin; at front boundaries
 * @param archive              the external archive, in its order (sorted by the first objective)
 * @param evaluateNanos        wall time spent inside {@link SearchProblem#evaluate} so far (ns)
 * @param elapsedNanos         wall time of the run so far (ns), across resumptions
 * @param settings             the run's settings; a resumed run must use the same ones, except
 *                             that {@code generations} may differ
 */
public record SearchState(int generation, long evaluations, long simulatedEvaluations,
    List<Individual> population, double[] crowding, List<Individual> archive,
    long evaluateNanos, long elapsedNanos, Nsga2Settings settings) {

  /** Copies the lists and the array. */
  public SearchState {
    population = List.copyOf(population);
    crowding = crowding.clone();
    archive = List.copyOf(archive);
    Objects.requireNonNull(settings, "settings");
    if (generation < 0 || evaluations < 0 || simulatedEvaluations < 0) {
      throw new IllegalArgumentException("negative generation or evaluation count");
    }
  }

  @Override
  public boolean equals(Object o) {
    return o instanceof SearchState s
        && generation == s.generation
        && evaluations == s.evaluations
        && simulatedEvaluations == s.simulatedEvaluations
        && population.equals(s.population)
        && Arrays.equals(crowding, s.crowding)
        && archive.equals(s.archive)
        && evaluateNanos == s.evaluateNanos
        && elapsedNanos == s.elapsedNanos
        && settings.equals(s.settings);
  }

  @Override
  public int hashCode() {
    return Objects.hash(generation, evaluations, simulatedEvaluations, population,
        Arrays.hashCode(crowding), archive, evaluateNanos, elapsedNanos, settings);
  }

  @Override
  public String toString() {
    return "SearchState[generation=" + generation + ", evaluations=" + evaluations
        + ", simulatedEvaluations=" + simulatedEvaluations + ", population="
        + population.size() + " individuals, archive=" + archive.size() + " individuals]";
  }
}
