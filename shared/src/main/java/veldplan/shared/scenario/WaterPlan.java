package veldplan.shared.scenario;

/**
 * Artificial water points in one block.
 *
 * @param block        the block's name
 * @param openPoints   points kept open from the start (at most the block's artificialWaterPoints)
 * @param closureYear  calendar year in which all the block's remaining points are closed;
 *                     absent = never
 */
public record WaterPlan(
    String block,
    @Range(min = 0, max = 1000, unit = "water points") int openPoints,
    @Optional @Range(min = 1800, max = 2300, unit = "calendar year") Integer closureYear) {}
