package veldplan.shared.scenario;

import com.fasterxml.jackson.annotation.JsonProperty;

/**
 * What an optimisation can score a policy on, as written in the {@code optimisation} section of a
 * scenario file. The objectives module gives each its unit, direction and computation; the
 * table in {@code examples/README.md} describes them for users.
 */
public enum Measure {
  /** Probability that every guild (herbivores, elephants, predators) stays above its
   * quasi-extinction threshold for the whole horizon. */
  @JsonProperty("guilds-persist") GUILDS_PERSIST,
  /** The same for one named guild (needs {@code guild}). */
  @JsonProperty("guild-persists") GUILD_PERSISTS,
  /** Density of trees above 5 m at the horizon relative to the start, area-weighted. */
  @JsonProperty("large-trees-kept") LARGE_TREES_KEPT,
  /** Probability of ending with at least {@code largeTreeTargetPerHa} trees above 5 m. */
  @JsonProperty("large-tree-target-met") LARGE_TREE_TARGET_MET,
  /** Expected present value of management costs. */
  @JsonProperty("management-cost") MANAGEMENT_COST,
  /** Mean share of the park burnt per year, planned and unplanned fires. */
  @JsonProperty("area-burnt") AREA_BURNT,
  /** Share of years with the park's elephant density inside {@code elephantBandPerKm2}. */
  @JsonProperty("elephants-in-band") ELEPHANTS_IN_BAND,
  /** Trees of 2-5 m at the horizon relative to the start, area-weighted: escape from the
   * 0.5-2 m fire trap. */
  @JsonProperty("fire-trap-escape") FIRE_TRAP_ESCAPE
}
