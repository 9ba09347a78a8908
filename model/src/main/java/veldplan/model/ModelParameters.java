package veldplan.model;

import veldplan.shared.scenario.Costs;

/**
 * Everything the yearly loop needs that does not change during a run. Immutable and shared
 * freely between threads. Built from a scenario by {@link ParametersFromScenario}.
 *
 * @param startYear   first simulated calendar year
 * @param years       simulated years
 * @param blocks      burn blocks
 * @param herbivores  herbivore guilds, elephants last
 * @param elephants   elephant demography and diet
 * @param predators   predator guilds
 * @param grass       grass sub-model
 * @param trees       tree sub-model
 * @param fire        fire sub-model
 * @param costs       unit costs and discount rate
 */
public record ModelParameters(
    int startYear,
    int years,
    BlockParameters blocks,
    HerbivoreParameters herbivores,
    ElephantParameters elephants,
    PredatorParameters predators,
    GrassParameters grass,
    TreeParameters trees,
    FireParameters fire,
    Costs costs) {

  public ModelParameters {
    if (years < 1) {
      throw new IllegalArgumentException("years must be >= 1: " + years);
    }
  }
}
