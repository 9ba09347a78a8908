package veldplan.shared.scenario;

import java.util.List;

/**
 * Which levers of a policy the search may move, and within which bounds. The bounds apply to
 * every burn block. A lever left out is not searched: it keeps the value it has in the
 * scenario's {@code policy}.
 *
 * @param fireReturnIntervalYears   planned-burn interval, whole years between {@code min} and
 *                                  {@code max}
 * @param allowNoPlannedBurning     whether "no planned burning" is also a choice for a block
 *                                  (only with {@code fireReturnIntervalYears}); absent = false
 * @param burnSeasons               the seasons a block's planned burns may be lit in
 * @param targetFractionBurnt       share of a block the managers aim to burn in a planned burn
 * @param elephantOfftakeFractionPerYear  share of the elephants removed a year
 * @param contraceptionCoverage     share of breeding females treated a year
 * @param triggerDensityPerKm2      density above which elephant actions apply (0 = every year)
 * @param waterPointsOpen           whether the number of artificial water points kept open in
 *                                  each block is searched (from none to all the block has);
 *                                  absent = false
 * @param waterPointClosureYears    calendar years in which a block's remaining points may be
 *                                  closed ("never" is always a choice); absent = no closure
 *                                  years are searched
 */
public record Levers(
    @Optional YearsRange fireReturnIntervalYears,
    @Optional Boolean allowNoPlannedBurning,
    @Optional List<BurnSeason> burnSeasons,
    @Optional FractionRange targetFractionBurnt,
    @Optional OfftakeRange elephantOfftakeFractionPerYear,
    @Optional FractionRange contraceptionCoverage,
    @Optional DensityRange triggerDensityPerKm2,
    @Optional Boolean waterPointsOpen,
    @Optional CalendarYearRange waterPointClosureYears) {

  /** Whole years between planned burns. */
  public record YearsRange(
      @Range(min = 1, max = 50, unit = "years") int min,
      @Range(min = 1, max = 50, unit = "years") int max) {}

  /** A range of fractions. */
  public record FractionRange(
      @Range(min = 0, max = 1, unit = "fraction") double min,
      @Range(min = 0, max = 1, unit = "fraction") double max) {}

  /** A range of elephant offtake rates (as allowed in a policy). */
  public record OfftakeRange(
      @Range(min = 0, max = 0.5, unit = "fraction per year") double min,
      @Range(min = 0, max = 0.5, unit = "fraction per year") double max) {}

  /** A range of elephant densities. */
  public record DensityRange(
      @Range(min = 0, max = 20, unit = "elephants/km2") double min,
      @Range(min = 0, max = 20, unit = "elephants/km2") double max) {}

  /** A range of calendar years. */
  public record CalendarYearRange(
      @Range(min = 1800, max = 2300, unit = "calendar year") int min,
      @Range(min = 1800, max = 2300, unit = "calendar year") int max) {}
}
