package veldplan.optimiser.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import veldplan.model.BlockSeries;
import veldplan.model.ModelParameters;
import veldplan.model.ParkSeries;
import veldplan.model.Trajectory;

/**
 * The short table {@code simulate} prints: for each indicator its value at the start and, per
 * climate path, the mean over replicates at the end of the horizon (or over the horizon for
 * flows such as area burnt and cost).
 */
public final class SimulationSummary {
  private SimulationSummary() {}

  /** One indicator row: label, unit, start value (NaN = not shown), value per path. */
  record Row(String label, String unit, double start, double[] perPath) {}

  /** Computes the rows. */
  static List<Row> rows(ModelParameters p, Trajectory[][] runs) {
    int paths = runs.length;
    int years = p.years();
    int last = years - 1;
    List<Row> rows = new ArrayList<>();
    for (int h = 0; h < p.herbivores().count(); h++) {
      double[] end = new double[paths];
      for (int path = 0; path < paths; path++) {
        for (Trajectory t : runs[path]) {
          end[path] += t.abundance(last, h) / runs[path].length;
        }
      }
      rows.add(new Row(p.herbivores().name(h), "head", runs[0][0].initialAbundance(h), end));
    }
    for (int q = 0; q < p.predators().count(); q++) {
      double[] end = new double[paths];
      for (int path = 0; path < paths; path++) {
        for (Trajectory t : runs[path]) {
          end[path] += t.predatorAbundance(last, q) / runs[path].length;
        }
      }
      rows.add(new Row(p.predators().name(q), "head", runs[0][0].initialPredatorAbundance(q),
          end));
    }
    int blocks = p.blocks().count();
    double parkHa = 0;
    for (int b = 0; b < blocks; b++) {
      parkHa += p.blocks().areaHa(b);
    }
    double largeStart = 0;
    for (int b = 0; b < blocks; b++) {
      largeStart += runs[0][0].initialLargeTreesPerHa(b) * p.blocks().areaHa(b) / parkHa;
    }
    double[] largeEnd = new double[paths];
    double[] burnt = new double[paths];
    double[] cost = new double[paths];
    for (int path = 0; path < paths; path++) {
      int reps = runs[path].length;
      for (Trajectory t : runs[path]) {
        for (int b = 0; b < blocks; b++) {
          double w = p.blocks().areaHa(b) / parkHa;
          largeEnd[path] += t.get(BlockSeries.LARGE_TREES, last, b) * w / reps;
          for (int y = 0; y < years; y++) {
            burnt[path] += 100 * t.get(BlockSeries.BURNT_FRACTION, y, b) * w / reps / years;
          }
        }
        for (int y = 0; y < years; y++) {
          cost[path] += t.get(ParkSeries.COST_DISCOUNTED, y) / reps;
        }
      }
    }
    rows.add(new Row("large trees (above 5 m)", "trees/ha", largeStart, largeEnd));
    for (int h = 0; h < p.herbivores().count(); h++) {
      double threshold = p.herbivores().quasiExtinctionAbundance(h);
      double[] risk = new double[paths];
      for (int path = 0; path < paths; path++) {
        for (Trajectory t : runs[path]) {
          risk[path] += fellBelow(t, h, threshold) ? 100.0 / runs[path].length : 0;
        }
      }
      rows.add(new Row(p.herbivores().name(h) + " below threshold", "% of runs", Double.NaN,
          risk));
    }
    rows.add(new Row("area burnt per year", "% of park", Double.NaN, burnt));
    rows.add(new Row("management cost, present value", p.costs().currency(), Double.NaN, cost));
    return rows;
  }

  /**
   * True if herbivore {@code h} fell below its quasi-extinction threshold in any year of the
   * run (a threshold of 0 counts as reached only when the guild dies out).
   */
  static boolean fellBelow(Trajectory t, int h, double threshold) {
    for (int y = 0; y < t.years(); y++) {
      double n = t.abundance(y, h);
      if (threshold > 0 ? n < threshold : n == 0) {
        return true;
      }
    }
    return false;
  }

  /** The table as text. */
  public static String format(ModelParameters p, List<String> pathNames, Trajectory[][] runs,
      String policyName) {
    List<Row> rows = rows(p, runs);
    int endYear = p.startYear() + p.years() - 1;
    StringBuilder out = new StringBuilder();
    out.append(String.format(Locale.ROOT,
        "Policy \"%s\": %d climate path(s) x %d replicate(s), %d-%d.%n", policyName,
        pathNames.size(), runs[0].length, p.startYear(), endYear));
    out.append(String.format(Locale.ROOT,
        "start = the scenario's initial value; each path = mean over its replicates at the end "
            + "of %d;%narea burnt = mean over the years; cost = discounted at %s %%/yr and summed; "
            + "below threshold = share of%nruns in which the guild fell below its "
            + "quasi-extinction threshold in some year.%n",
        endYear, trim(p.costs().discountRatePercent())));
    int labelWidth = 32;
    int unitWidth = 10;
    int width = 12;
    for (String name : pathNames) {
      width = Math.max(width, name.length() + 2);
    }
    out.append(pad("indicator", labelWidth)).append(pad("unit", unitWidth))
        .append(left("start", width));
    for (String name : pathNames) {
      out.append(left(name, width));
    }
    out.append(System.lineSeparator());
    for (Row row : rows) {
      out.append(pad(row.label(), labelWidth)).append(pad(row.unit(), unitWidth))
          .append(left(Double.isNaN(row.start()) ? "-" : value(row.start()), width));
      for (double v : row.perPath()) {
        out.append(left(value(v), width));
      }
      out.append(System.lineSeparator());
    }
    return out.toString();
  }

  private static String trim(double v) {
    return v == Math.rint(v) ? Long.toString((long) v) : Double.toString(v);
  }

  private static String value(double v) {
    double a = Math.abs(v);
    if (a >= 1e6) {
      return String.format(Locale.ROOT, "%.3g", v);
    }
    if (a >= 100) {
      return String.format(Locale.ROOT, "%,.0f", v);
    }
    if (a >= 10) {
      return String.format(Locale.ROOT, "%.1f", v);
    }
    return String.format(Locale.ROOT, "%.2f", v);
  }

  private static String pad(String s, int width) {
    String cut = s.length() > width - 1 ? s.substring(0, width - 2) + "…" : s;
    return cut + " ".repeat(Math.max(1, width - cut.length()));
  }

  private static String left(String s, int width) {
    return " ".repeat(Math.max(1, width - s.length())) + s;
  }
}
