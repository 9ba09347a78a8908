/**
 * Scenario files: the records that mirror them, and reading and checking them.
 *
 * <p>A scenario file (YAML or JSON) describes an invented or real protected area as burn blocks,
 * its herbivore guilds, elephants and predators, the climate paths, stochastic settings, one
 * management policy and unit costs. {@link veldplan.shared.scenario.ScenarioReader} reads it
 * into {@link veldplan.shared.scenario.Scenario} and reports every problem at once, each with
 * file, line, column and JSON pointer, in a {@link veldplan.shared.scenario.ScenarioException}.
 * Each numeric field carries its valid range and unit in a
 * {@link veldplan.shared.scenario.Range} annotation; fields that may be left out carry
 * {@link veldplan.shared.scenario.Optional}; every other field is required.
 *
 * <p>Monthly climate (baseline and explicit series) is read from CSV files into
 * {@link veldplan.shared.scenario.ClimateTable}.
 */
package veldplan.shared.scenario;
