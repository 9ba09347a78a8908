package veldplan.shared.scenario;

/**
 * One objective of an optimisation.
 *
 * @param measure what is scored
 * @param guild   the guild, for {@code guild-persists} only (a herbivore guild, a predator, or
 *                "elephants")
 */
public record ObjectiveChoice(Measure measure, @Optional String guild) {}
