package veldplan.optimiser.report;

import java.io.IOException;
import java.io.Writer;
import java.util.List;
import java.util.Locale;
import veldplan.model.BlockSeries;
import veldplan.model.ModelParameters;
import veldplan.model.ParkSeries;
import veldplan.model.Trajectory;

/**
 * Writes trajectories as one tidy CSV: one row per year x climate path x replicate x entity
 * (a block, a guild, the elephants, a predator, or the park as a whole), units in the column
 * names (the scenario's currency in the park's cost columns), empty cells where a column does
 * not apply to the entity. R's {@code read.csv} and pandas' {@code read_csv} read it as is.
 */
public final class TrajectoryCsv {
  /** Start of the names of the park's cost columns, which get the currency appended. */
  private static final String COST_PREFIX = "cost_";

  private TrajectoryCsv() {}

  /**
   * The header line's columns. The park's cost columns end with the scenario's currency code in
   * lower case ({@code cost_total_usd}); see {@link #currencySuffix}.
   *
   * @param p model parameters (for the currency)
   * @return the header, without a line break
   */
  public static String header(ModelParameters p) {
    String currency = currencySuffix(p.costs().currency());
    StringBuilder h = new StringBuilder("path,replicate,calendar_year,entity_kind,entity");
    for (int v = 0; v < BlockSeries.COUNT; v++) {
      h.append(',').append(BlockSeries.of(v).column());
    }
    h.append(",abundance_head,density_per_km2");
    for (int v = 0; v < ParkSeries.COUNT; v++) {
      String column = ParkSeries.of(v).column();
      h.append(',').append(column);
      if (column.startsWith(COST_PREFIX)) {
        h.append('_').append(currency);
      }
    }
    return h.toString();
  }

  /**
   * A currency code as a column-name suffix: lower case, with every character outside
   * {@code [a-z0-9]} removed ({@code "USD"} gives {@code "usd"}); {@code "currency"} if nothing
   * is left, so that a cost column never looks unitless.
   *
   * @param currency the scenario's currency code
   * @return the suffix, without the separating underscore
   */
  public static String currencySuffix(String currency) {
    String suffix = currency == null ? ""
        : currency.toLowerCase(Locale.ROOT).replaceAll("[^a-z0-9]", "");
    return suffix.isEmpty() ? "currency" : suffix;
  }

  /**
   * Writes all trajectories.
   *
   * @param out          destination
   * @param p            model parameters (names, areas, start year, currency)
   * @param pathNames    climate path names, in trajectory order
   * @param trajectories [path][replicate]
   */
  public static void write(Writer out, ModelParameters p, List<String> pathNames,
      Trajectory[][] trajectories) throws IOException {
    out.write(header(p));
    out.write('\n');
    int blocks = p.blocks().count();
    int herbivores = p.herbivores().count();
    int elephant = p.herbivores().elephantIndex();
    int predators = p.predators().count();
    double parkKm2 = p.blocks().totalAreaKm2();
    String blockGap = ",".repeat(BlockSeries.COUNT);
    String animalGap = ",,";
    String parkGap = ",".repeat(ParkSeries.COUNT);
    StringBuilder row = new StringBuilder(512);
    for (int path = 0; path < trajectories.length; path++) {
      String pathName = csv(pathNames.get(path));
      for (int rep = 0; rep < trajectories[path].length; rep++) {
        Trajectory t = trajectories[path][rep];
        for (int year = 0; year < t.years(); year++) {
          String lead = pathName + ',' + (rep + 1) + ',' + (p.startYear() + year) + ',';
          for (int b = 0; b < blocks; b++) {
            row.setLength(0);
            row.append(lead).append("block,").append(csv(p.blocks().name(b)));
            for (int v = 0; v < BlockSeries.COUNT; v++) {
              row.append(',');
              number(row, t.get(BlockSeries.of(v), year, b));
            }
            row.append(animalGap).append(parkGap).append('\n');
            out.append(row);
          }
          for (int h = 0; h < herbivores; h++) {
            row.setLength(0);
            row.append(lead).append(h == elephant ? "elephants," : "guild,")
                .append(csv(p.herbivores().name(h))).append(blockGap).append(',');
            number(row, t.abundance(year, h));
            row.append(',');
            number(row, t.abundance(year, h) / parkKm2);
            row.append(parkGap).append('\n');
            out.append(row);
          }
          for (int q = 0; q < predators; q++) {
            row.setLength(0);
            row.append(lead).append("predator,").append(csv(p.predators().name(q)))
                .append(blockGap).append(',');
            number(row, t.predatorAbundance(year, q));
            row.append(',');
            number(row, t.predatorAbundance(year, q) / parkKm2);
            row.append(parkGap).append('\n');
            out.append(row);
          }
          row.setLength(0);
          row.append(lead).append("park,park").append(blockGap).append(animalGap);
          for (int v = 0; v < ParkSeries.COUNT; v++) {
            row.append(',');
            number(row, t.get(ParkSeries.of(v), year));
          }
          row.append('\n');
          out.append(row);
        }
      }
    }
  }

  /** Appends a number: integers without a decimal point, others in Java's shortest form. */
  static void number(StringBuilder row, double v) {
    if (v == Math.rint(v) && Math.abs(v) < 1e15) {
      row.append((long) v);
    } else {
      row.append(v);
    }
  }

  /** Quotes a text cell if it needs it (RFC 4180). */
  static String csv(String text) {
    if (text.indexOf(',') < 0 && text.indexOf('"') < 0 && text.indexOf('\n') < 0) {
      return text;
    }
    return '"' + text.replace("\"", "\"\"") + '"';
  }
}
