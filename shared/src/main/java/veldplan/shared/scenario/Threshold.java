package veldplan.shared.scenario;

/**
 * A threshold a policy must meet, e.g. "guilds persist with probability at least 0.9". Handled
 * as a constraint in the search (constrained domination, Deb et al. 2002). Give {@code atLeast},
 * {@code atMost} or both, in the unit of the measure.
 *
 * @param measure what is constrained
 * @param guild   the guild, for {@code guild-persists} only
 * @param atLeast smallest acceptable value; absent = no lower limit
 * @param atMost  largest acceptable value; absent = no upper limit
 */
public record Threshold(
    Measure measure,
    @Optional String guild,
    @Optional Double atLeast,
    @Optional Double atMost) {}
