package veldplan.shared.scenario;

import com.fasterxml.jackson.annotation.JsonProperty;

/** When in the dry season a planned burn is lit. Written in files as "early-dry" or "late-dry". */
public enum BurnSeason {
  /** Soon after the rains, with moist fuel and humid air: cooler fires. */
  @JsonProperty("early-dry") EARLY_DRY,
  /** At the end of the dry season, with cured fuel and dry air: hotter fires. */
  @JsonProperty("late-dry") LATE_DRY
}
