package veldplan.optimiser.park;

import veldplan.objectives.Estimate;

/**
 * What a policy scored on a set of replicates: for each measure, an estimate per climate path
 * (step 1, over replicates) and one over paths (step 2).
 *
 * @param perPath  [measure][path]
 * @param combined [measure]
 */
public record PolicyScore(Estimate[][] perPath, Estimate[] combined) {}
