package veldplan.shared.scenario;

import java.util.List;

/**
 * A large-predator guild.
 *
 * @param name                     unique name
 * @param bodyMassKg               mean adult live mass (kg)
 * @param initialAbundance         animals at the start (head)
 * @param quasiExtinctionAbundance quasi-extinction threshold (head)
 * @param preyGuilds               names of the guilds it hunts (elephants are not prey)
 * @param switchingExponent        prey-switching exponent m in share_i = B_i^m / sum B_j^m over
 *                                 the guilds hunted, B the prey biomass (1 = no switching);
 *                                 absent = 2, the value commonly used (Murdoch 1969 form)
 * @param environmentalNoiseSd     SD of the yearly log growth rate from environmental noise
 * @param functionalResponseType   Holling type of the kill rate's response to prey density: 2
 *                                 (saturating) or 3 (sigmoid, prey scarce are spared); absent = 2
 */
public record Predator(
    String name,
    @Range(min = 1, max = 1000, unit = "kg") double bodyMassKg,
    @Range(min = 0, max = 1e6, unit = "head") double initialAbundance,
    @Range(min = 0, max = 1e5, unit = "head") double quasiExtinctionAbundance,
    List<String> preyGuilds,
    @Optional @Range(min = 1, max = 4, unit = "dimensionless") Double switchingExponent,
    @Range(min = 0, max = 2, unit = "log-scale SD per year") double environmentalNoiseSd,
    @Optional @Range(min = 2, max = 3, unit = "Holling type") Integer functionalResponseType) {

  public Predator {
    preyGuilds = List.copyOf(preyGuilds);
  }
}
