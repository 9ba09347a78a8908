package veldplan.shared.scenario;

/**
 * Planned burning in one block.
 *
 * @param block                    the block's name
 * @param fireReturnIntervalYears  years between planned burns; absent = no planned burning
 * @param season                   early- or late-dry-season burning
 * @param targetFractionBurnt      share of the block the managers aim to burn in a planned burn
 */
public record BurnPlan(
    String block,
    @Optional @Range(min = 1, max = 50, unit = "years") Double fireReturnIntervalYears,
    BurnSeason season,
    @Range(min = 0, max = 1, unit = "fraction of block area") double targetFractionBurnt) {}
