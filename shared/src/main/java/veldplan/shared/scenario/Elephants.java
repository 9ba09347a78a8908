package veldplan.shared.scenario;

/**
 * The elephant population (a megaherbivore that prefers browse and breaks trees).
 *
 * @param initialAbundance             elephants at the start (head)
 * @param bodyMassKg                   mean live mass over the population (kg)
 * @param maxDistanceFromWaterKm       dry-season foraging distance from water (km)
 * @param breedingFemaleFraction       share of the population that are breeding females
 * @param calvesPerFemalePerYear       calving rate of breeding females at good condition (1/yr);
 *                                     0.25 is an inter-calving interval of 4 years
 * @param mortalityPerYear             background annual mortality (fraction/yr)
 * @param quasiExtinctionAbundance     quasi-extinction threshold (head)
 * @param contraceptionEfficacy        share of treated females that do not conceive (fraction)
 * @param environmentalNoiseSd         SD of the yearly log growth rate from environmental noise
 */
public record Elephants(
    @Range(min = 0, max = 1e6, unit = "head") double initialAbundance,
    @Range(min = 500, max = 8000, unit = "kg") double bodyMassKg,
    @Range(min = 0.1, max = 100, unit = "km") double maxDistanceFromWaterKm,
    @Range(min = 0, max = 1, unit = "fraction") double breedingFemaleFraction,
    @Range(min = 0, max = 1, unit = "calves per female per year") double calvesPerFemalePerYear,
    @Range(min = 0, max = 1, unit = "fraction per year") double mortalityPerYear,
    @Range(min = 0, max = 1e5, unit = "head") double quasiExtinctionAbundance,
    @Range(min = 0, max = 1, unit = "fraction") double contraceptionEfficacy,
    @Range(min = 0, max = 2, unit = "log-scale SD per year") double environmentalNoiseSd) {}
