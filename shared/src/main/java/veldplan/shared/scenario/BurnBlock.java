package veldplan.shared.scenario;

/**
 * One burn block: the unit of fire management, with its own soil, water and vegetation.
 *
 * @param name                    unique name, used by the policy
 * @param areaHa                  area (ha)
 * @param sandFraction            sand, mass fraction of the fine earth (Saxton &amp; Rawls 2006)
 * @param clayFraction            clay, mass fraction; sand + clay &lt;= 1
 * @param organicMatterPercent    soil organic matter (% by mass)
 * @param rootingDepthM           depth of the root zone that holds plant-available water (m)
 * @param altitudeM               altitude above sea level (m), for Linacre's evaporation
 * @param latitudeDeg             latitude (degrees, negative south)
 * @param rainfallMultiplier      this block's rainfall as a multiple of the park baseline
 * @param artificialWaterPoints   artificial water points in the block at the start
 * @param perennialRiverKm        length of perennial natural water (rivers, springs) in the block (km)
 * @param initialGrassKgPerHa     standing grass at the start (kg DM/ha)
 * @param initialTreesPerHa       trees per height class at the start (trees/ha)
 */
public record BurnBlock(
    String name,
    @Range(min = 1, max = 1e7, unit = "ha") double areaHa,
    @Range(min = 0, max = 1, unit = "mass fraction") double sandFraction,
    @Range(min = 0, max = 1, unit = "mass fraction") double clayFraction,
    @Range(min = 0, max = 8, unit = "% by mass") double organicMatterPercent,
    @Range(min = 0.1, max = 10, unit = "m") double rootingDepthM,
    @Range(min = -100, max = 4000, unit = "m") double altitudeM,
    @Range(min = -40, max = 40, unit = "degrees") double latitudeDeg,
    @Range(min = 0.2, max = 5, unit = "multiple of baseline rainfall") double rainfallMultiplier,
    @Range(min = 0, max = 1000, unit = "water points") int artificialWaterPoints,
    @Range(min = 0, max = 10000, unit = "km") double perennialRiverKm,
    @Range(min = 0, max = 20000, unit = "kg DM/ha") double initialGrassKgPerHa,
    TreeClasses initialTreesPerHa) {}
