package veldplan.shared.scenario;

import java.util.List;

/**
 * A scenario file as written by the user: the park, its animals, the climate paths, the
 * stochastic settings, one management policy, unit costs and the horizon. Records in this package
 * mirror the file one to one; the field table with units, valid ranges and sources is in
 * {@code examples/README.md}.
 *
 * @param name          label used in reports
 * @param startYear     first simulated calendar year
 * @param horizonYears  number of simulated years
 * @param park          the park and its burn blocks
 * @param guilds        herbivore guilds other than elephants (at least one)
 * @param predators     large predators (may be empty)
 * @param elephants     the elephant population
 * @param climate       baseline climate and the climate paths
 * @param stochastic    replicates, seed and weather variability
 * @param policy        the management policy simulated unless {@code --policy} gives another
 * @param costs         unit costs of management actions and the discount rate
 * @param optimisation  how {@code optimise} searches policies; absent = the scenario can be
 *                      simulated but not optimised
 */
public record Scenario(
    String name,
    @Range(min = 1800, max = 2300, unit = "calendar year") int startYear,
    @Range(min = 1, max = 500, unit = "years") int horizonYears,
    Park park,
    List<Guild> guilds,
    List<Predator> predators,
    Elephants elephants,
    Climate climate,
    Stochastic stochastic,
    Policy policy,
    Costs costs,
    @Optional Optimisation optimisation) {

  public Scenario {
    guilds = List.copyOf(guilds);
    predators = List.copyOf(predators);
  }

  /** A scenario without an {@code optimisation} section. */
  public Scenario(String name, int startYear, int horizonYears, Park park, List<Guild> guilds,
      List<Predator> predators, Elephants elephants, Climate climate, Stochastic stochastic,
      Policy policy, Costs costs) {
    this(name, startYear, horizonYears, park, guilds, predators, elephants, climate, stochastic,
        policy, costs, null);
  }

  /** The same scenario with another policy (used by {@code --policy}). */
  public Scenario withPolicy(Policy other) {
    return new Scenario(name, startYear, horizonYears, park, guilds, predators, elephants,
        climate, stochastic, other, costs, optimisation);
  }

  /** The same scenario with other stochastic settings (used by {@code --replicates}, {@code --seed}). */
  public Scenario withStochastic(Stochastic other) {
    return new Scenario(name, startYear, horizonYears, park, guilds, predators, elephants,
        climate, other, policy, costs, optimisation);
  }

  /** The same scenario with another optimisation section (command-line overrides). */
  public Scenario withOptimisation(Optimisation other) {
    return new Scenario(name, startYear, horizonYears, park, guilds, predators, elephants,
        climate, stochastic, policy, costs, other);
  }
}
