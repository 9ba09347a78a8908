package veldplan.optimiser.search;

/**
 * Progress after one generation, for progress bars and logs.
 *
 * @param generation            the completed generation (0 = the initial population)
 * @param generations           the last generation of the run
 * @param evaluations           evaluations requested so far (cache hits included)
 * @param simulatedEvaluations  gene vectors actually passed to {@link SearchProblem#evaluate}
 * @param archiveSize           members of the external archive
 * @param feasibleArchiveSize   feasible members of the archive (0 or {@code archiveSize})
 * @param hypervolume           hypervolume of the feasible archive, objectives normalised by the
 *                              problem's ideal and nadir, reference point 1.1 in each
 *                              (decision-methods §3.2); 0 while nothing feasible was found
 * @param populationHypervolume the same for the feasible members of the current population
 * @param evaluateNanos         wall time spent in {@link SearchProblem#evaluate} so far (ns)
 * @param elapsedNanos          wall time of the run so far (ns)
 */
public record GenerationReport(int generation, int generations, long evaluations,
    long simulatedEvaluations, int archiveSize, int feasibleArchiveSize, double hypervolume,
    double populationHypervolume, long evaluateNanos, long elapsedNanos) {
}
