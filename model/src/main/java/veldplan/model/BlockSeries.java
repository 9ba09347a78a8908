package veldplan.model;

/**
 * The per-block series a {@link Trajectory} records each year, with their output column names
 * (units in the name).
 */
public enum BlockSeries {
  RAINFALL("rainfall_mm"),
  POTENTIAL_EVAPOTRANSPIRATION("pet_linacre_mm"),
  OPEN_WATER_EVAPORATION("open_water_evaporation_mm"),
  ACTUAL_EVAPOTRANSPIRATION("aet_mm"),
  GROWING_DAYS("growing_days"),
  GRASS_PRODUCTION("grass_production_kg_per_ha"),
  FUEL("fuel_kg_per_ha"),
  BURNT_FRACTION("burnt_fraction"),
  PLANNED_BURNT_FRACTION("planned_burnt_fraction"),
  FIRE_INTENSITY("fire_intensity_kw_per_m"),
  BASAL_AREA("tree_basal_area_m2_per_ha"),
  TREES_BELOW_0_5M("trees_h0_0.5m_per_ha"),
  TREES_0_5_TO_2M("trees_h0.5_2m_per_ha"),
  TREES_2_TO_5M("trees_h2_5m_per_ha"),
  TREES_5_TO_9M("trees_h5_9m_per_ha"),
  TREES_ABOVE_9M("trees_h9m_plus_per_ha"),
  LARGE_TREES("large_trees_per_ha"),
  BROWSE_PRESSURE("browse_eaten_fraction"),
  ELEPHANT_DENSITY("elephants_per_km2"),
  WATER_POINTS_OPEN("water_points_open");

  /** Number of series. */
  public static final int COUNT = 20;
  private static final BlockSeries[] ALL = values();

  private final String column;

  BlockSeries(String column) {
    this.column = column;
  }

  /** Output column name, with the unit. */
  public String column() {
    return column;
  }

  /** The series with ordinal {@code i}, without copying {@code values()}. */
  public static BlockSeries of(int i) {
    return ALL[i];
  }
}
