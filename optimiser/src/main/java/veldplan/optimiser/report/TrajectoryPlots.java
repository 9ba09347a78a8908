package veldplan.optimiser.report;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.io.IOException;
import java.io.OutputStream;
import java.text.DecimalFormat;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.function.ToDoubleBiFunction;
import org.jfree.chart.ChartUtils;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.DeviationRenderer;
import org.jfree.chart.title.TextTitle;
import org.jfree.data.xy.YIntervalSeries;
import org.jfree.data.xy.YIntervalSeriesCollection;
import veldplan.model.BlockSeries;
import veldplan.model.ModelParameters;
import veldplan.model.Trajectory;
import veldplan.shared.io.IoConsumer;

/**
 * One PNG chart per indicator: for each climate path, the median over replicates year by year,
 * with a band from the 5th to the 95th percentile. Indicators: every herbivore guild, the
 * elephants, every predator guild, large trees and area burnt.
 */
public final class TrajectoryPlots {
  /** Line colours of the climate paths, in path order (repeats after six). */
  private static final Color[] COLOURS = {new Color(0x1b5e8c), new Color(0xc0761a),
      new Color(0x2e7d32), new Color(0x8e2430), new Color(0x5b4a8b), new Color(0x5f6b6d)};
  private static final int WIDTH = 900;
  private static final int HEIGHT = 520;

  private TrajectoryPlots() {}

  /** Chart files, by file name, and how to write each. Nothing is rendered until written. */
  public static Map<String, IoConsumer<OutputStream>> charts(ModelParameters p,
      List<String> pathNames, Trajectory[][] runs, String policyName) {
    Map<String, IoConsumer<OutputStream>> charts = new LinkedHashMap<>();
    int elephant = p.herbivores().elephantIndex();
    for (int h = 0; h < p.herbivores().count(); h++) {
      int guild = h;
      String name = p.herbivores().name(h);
      charts.put(fileName(h == elephant ? "elephants" : "guild-" + name),
          out -> write(out, name, "head", p, pathNames, runs, policyName,
              (t, year) -> t.abundance(year, guild)));
    }
    for (int q = 0; q < p.predators().count(); q++) {
      int predator = q;
      String name = p.predators().name(q);
      charts.put(fileName("predator-" + name), out -> write(out, name, "head", p, pathNames,
          runs, policyName, (t, year) -> t.predatorAbundance(year, predator)));
    }
    double[] weight = areaWeights(p);
    charts.put("large-trees.png", out -> write(out, "Large trees (above 5 m)", "trees/ha", p,
        pathNames, runs, policyName, (t, year) -> weighted(t, BlockSeries.LARGE_TREES, year,
            weight)));
    charts.put("area-burnt.png", out -> write(out, "Area burnt", "% of park", p, pathNames,
        runs, policyName,
        (t, year) -> 100 * weighted(t, BlockSeries.BURNT_FRACTION, year, weight)));
    return charts;
  }

  /** A file name of lower-case letters, digits and hyphens. */
  static String fileName(String label) {
    String clean = label.toLowerCase(Locale.ROOT).replaceAll("[^a-z0-9]+", "-")
        .replaceAll("(^-+|-+$)", "");
    return (clean.isEmpty() ? "indicator" : clean) + ".png";
  }

  private static double[] areaWeights(ModelParameters p) {
    int blocks = p.blocks().count();
    double[] weight = new double[blocks];
    double total = 0;
    for (int b = 0; b < blocks; b++) {
      total += p.blocks().areaHa(b);
    }
    for (int b = 0; b < blocks; b++) {
      weight[b] = p.blocks().areaHa(b) / total;
    }
    return weight;
  }

  private static double weighted(Trajectory t, BlockSeries series, int year, double[] weight) {
    double sum = 0;
    for (int b = 0; b < weight.length; b++) {
      sum += weight[b] * t.get(series, year, b);
    }
    return sum;
  }

  /** Percentile {@code q} (0..1) of sorted values, linear between order statistics. */
  static double percentile(double[] sorted, double q) {
    double position = q * (sorted.length - 1);
    int below = (int) Math.floor(position);
    int above = Math.min(sorted.length - 1, below + 1);
    return sorted[below] + (position - below) * (sorted[above] - sorted[below]);
  }

  private static void write(OutputStream out, String title, String unit, ModelParameters p,
      List<String> pathNames, Trajectory[][] runs, String policyName,
      ToDoubleBiFunction<Trajectory, Integer> value) throws IOException {
    YIntervalSeriesCollection data = new YIntervalSeriesCollection();
    for (int path = 0; path < runs.length; path++) {
      YIntervalSeries series = new YIntervalSeries(pathNames.get(path));
      double[] values = new double[runs[path].length];
      for (int year = 0; year < p.years(); year++) {
        for (int r = 0; r < values.length; r++) {
          values[r] = value.applyAsDouble(runs[path][r], year);
        }
        Arrays.sort(values);
        series.add(p.startYear() + year, percentile(values, 0.5), percentile(values, 0.05),
            percentile(values, 0.95));
      }
      data.addSeries(series);
    }
    NumberAxis years = new NumberAxis("model year (season starting in)");
    years.setAutoRangeIncludesZero(false);
    years.setNumberFormatOverride(new DecimalFormat("0"));
    NumberAxis values = new NumberAxis(unit);
    DeviationRenderer renderer = new DeviationRenderer(true, false);
    renderer.setAlpha(0.18f);
    for (int path = 0; path < runs.length; path++) {
      Color colour = COLOURS[path % COLOURS.length];
      renderer.setSeriesPaint(path, colour);
      renderer.setSeriesFillPaint(path, colour);
      renderer.setSeriesStroke(path, new BasicStroke(2f));
    }
    XYPlot plot = new XYPlot(data, years, values, renderer);
    plot.setBackgroundPaint(Color.WHITE);
    plot.setDomainGridlinePaint(new Color(0xdddddd));
    plot.setRangeGridlinePaint(new Color(0xdddddd));
    JFreeChart chart = new JFreeChart(title, new Font(Font.SANS_SERIF, Font.BOLD, 16), plot,
        true);
    chart.setBackgroundPaint(Color.WHITE);
    int replicates = runs.length == 0 ? 0 : runs[0].length;
    chart.addSubtitle(new TextTitle(String.format(Locale.ROOT,
        "policy \"%s\": median and 5-95 %% range over %d replicates per climate path",
        policyName, replicates), new Font(Font.SANS_SERIF, Font.PLAIN, 12)));
    chart.addSubtitle(new TextTitle("Decision support only: model output, not a prediction. "
        + "Burning, culling, darting and water closures follow local regulations and permits.",
        new Font(Font.SANS_SERIF, Font.ITALIC, 10)));
    ChartUtils.writeChartAsPNG(out, chart, WIDTH, HEIGHT);
  }
}
