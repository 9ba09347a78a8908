package veldplan.shared.scenario;

/**
 * Stochastic settings. Weather years are drawn from the baseline (whole years, with replacement)
 * and then moved along the climate path; fire and demography have their own random streams.
 *
 * @param replicates                  stochastic replicates per climate path
 * @param seed                        the scenario seed; every random stream derives from it
 * @param interannualVariabilityFactor stretches each year's rainfall away from the baseline mean:
 *                                     1 keeps the observed variability, 1.5 makes it 50 % larger
 */
public record Stochastic(
    @Range(min = 1, max = 100000, unit = "replicates") int replicates,
    long seed,
    @Range(min = 0, max = 3, unit = "multiple of observed variability") double interannualVariabilityFactor) {}
