package veldplan.shared.scenario;

/**
 * Size of a policy search. The command line can override each.
 *
 * @param population            policies per generation of the genetic algorithm
 * @param generations           generations of the genetic algorithm
 * @param replicates            stochastic replicates per climate path for every policy in the
 *                              search (the same replicates for all: common random numbers)
 * @param validationReplicates  fresh replicates per climate path, never used in the search, on
 *                              which the final front is re-evaluated and reported
 */
public record SearchSettings(
    @Range(min = 4, max = 100000, unit = "policies") int population,
    @Range(min = 1, max = 100000, unit = "generations") int generations,
    @Range(min = 1, max = 100000, unit = "replicates per path") int replicates,
    @Range(min = 1, max = 100000, unit = "replicates per path") int validationReplicates) {}
