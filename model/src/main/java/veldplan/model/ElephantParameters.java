package veldplan.model;

import veldplan.shared.check.Checks;

/**
 * Elephant-specific parameters (their forage and body mass are in {@link HerbivoreParameters}).
 *
 * @param breedingFemaleFraction share of breeding females in the population
 * @param calvesPerFemalePerYear calving rate of breeding females in good condition (1/yr)
 * @param mortalityPerYear background annual mortality (fraction/yr)
 * @param contraceptionEfficacy share of treated females that do not conceive; 18 of 18 treated
 *     females did not calve in Delsink et al. (2006)
 * @param gestationLagYears years between the start of contraception and fewer births; gestation
 *     is about 22 months (methods sheet §11.3, from memory), so 2 years
 * @param browsePreference Chesson-type selection of browse over grass: the diet's browse:grass
 *     ratio is this times the ratio of what is available (our calibration; elephants prefer
 *     browse, Owen-Smith 1988)
 */
public record ElephantParameters(
    double breedingFemaleFraction,
    double calvesPerFemalePerYear,
    double mortalityPerYear,
    double contraceptionEfficacy,
    int gestationLagYears,
    double browsePreference) {

  public ElephantParameters {
    Checks.probability(breedingFemaleFraction, "breedingFemaleFraction");
    Checks.probability(calvesPerFemalePerYear, "calvesPerFemalePerYear");
    Checks.probability(mortalityPerYear, "mortalityPerYear");
    Checks.probability(contraceptionEfficacy, "contraceptionEfficacy");
    Checks.inRange(gestationLagYears, 0, 10, "gestationLagYears");
    Checks.strictlyPositive(browsePreference, "browsePreference");
  }
}
