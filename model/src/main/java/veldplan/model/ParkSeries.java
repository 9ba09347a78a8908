package veldplan.model;

/** Park-wide series a {@link Trajectory} records each year, with output column names. */
public enum ParkSeries {
  COST_BURNING("cost_burning"),
  COST_ELEPHANT_OFFTAKE("cost_elephant_offtake"),
  COST_CONTRACEPTION("cost_contraception"),
  COST_WATER_POINTS("cost_water_points"),
  COST_TOTAL("cost_total"),
  COST_DISCOUNTED("cost_present_value"),
  ELEPHANTS_REMOVED("elephants_removed_head"),
  FEMALES_TREATED("elephant_females_treated_head"),
  CO2("co2_ppm");

  /** Number of series. */
  public static final int COUNT = 9;
  private static final ParkSeries[] ALL = values();

  private final String column;

  ParkSeries(String column) {
    this.column = column;
  }

  /** Output column name; the CSV writer appends the currency to the cost columns. */
  public String column() {
    return column;
  }

  /** The series with ordinal {@code i}. */
  public static ParkSeries of(int i) {
    return ALL[i];
  }
}
