package veldplan.shared.scenario;

import com.fasterxml.jackson.annotation.JsonProperty;

/** The feeding role of a herbivore guild. Written in files in lower case with hyphens. */
public enum GuildRole {
  /** Eats large amounts of grass of any height (buffalo, zebra, wildebeest). */
  @JsonProperty("bulk-grazer") BULK_GRAZER,
  /** Needs medium to tall grass of good quality; typically rare (sable, roan). */
  @JsonProperty("selective-grazer") SELECTIVE_GRAZER,
  /** Eats mostly leaves and shoots of woody plants (kudu, giraffe). */
  @JsonProperty("browser") BROWSER,
  /** Switches between grass and browse (impala, eland). */
  @JsonProperty("mixed-feeder") MIXED_FEEDER
}
