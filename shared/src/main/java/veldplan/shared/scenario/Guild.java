package veldplan.shared.scenario;

/**
 * A herbivore guild (all herbivores except elephants, which have their own record).
 *
 * @param name                        unique name
 * @param role                        feeding role
 * @param bodyMassKg                  mean adult live mass (kg)
 * @param grassDietFraction           share of grass in the diet (fraction); the rest is browse
 * @param maxDistanceFromWaterKm      how far from drinking water the guild forages in the dry
 *                                    season (km); absent = not water dependent
 * @param initialAbundance            animals in the park at the start (head)
 * @param quasiExtinctionAbundance    quasi-extinction threshold (head)
 * @param maxGrowthRatePerYear        maximum exponential rate of increase r_m (1/yr); absent =
 *                                    Caughley &amp; Krebs (1983), r_m = 1.5 W^-0.36
 * @param environmentalNoiseSd        standard deviation of the yearly log growth rate from
 *                                    environmental noise (on the natural-log scale)
 */
public record Guild(
    String name,
    GuildRole role,
    @Range(min = 1, max = 8000, unit = "kg") double bodyMassKg,
    @Range(min = 0, max = 1, unit = "fraction") double grassDietFraction,
    @Optional @Range(min = 0.1, max = 100, unit = "km") Double maxDistanceFromWaterKm,
    @Range(min = 0, max = 1e7, unit = "head") double initialAbundance,
    @Range(min = 0, max = 1e6, unit = "head") double quasiExtinctionAbundance,
    @Optional @Range(min = 0.001, max = 3, unit = "1/yr") Double maxGrowthRatePerYear,
    @Range(min = 0, max = 2, unit = "log-scale SD per year") double environmentalNoiseSd) {}
