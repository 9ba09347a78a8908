package veldplan.optimiser.report;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Rectangle2D;
import java.io.IOException;
import java.io.OutputStream;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.jfree.chart.ChartUtils;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.labels.XYItemLabelGenerator;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYErrorRenderer;
import org.jfree.chart.title.TextTitle;
import org.jfree.chart.ui.RectangleAnchor;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.data.xy.XYDataset;
import org.jfree.data.xy.XYIntervalSeries;
import org.jfree.data.xy.XYIntervalSeriesCollection;
import veldplan.objectives.Direction;
import veldplan.objectives.Estimate;
import veldplan.objectives.Objective;
import veldplan.optimiser.park.Limit;
import veldplan.shared.io.IoConsumer;

/**
 * Charts of a front for a room to read on one screen: for each pair of objectives, every front
 * policy as a labelled point with its 95 % intervals as whiskers on both axes, and the
 * reference policies (the scenario's own, no intervention) as differently drawn points, and
 * each threshold on a plotted objective as a dashed line. Axis
 * titles say which way is better. 2-D projections hide dominance in the other objectives: the
 * subtitle says so.
 */
public final class FrontPlots {
  private static final Color FRONT = new Color(0x1b5e8c);
  private static final Color PICK = new Color(0x2e7d32);
  private static final Color REFERENCE = new Color(0xc0761a);
  private static final Color THRESHOLD = new Color(0x8e2430);
  private static final int WIDTH = 900;
  private static final int HEIGHT = 640;

  private FrontPlots() {}

  /** Chart files by name (front-X-vs-Y.png), written only when called. */
  public static Map<String, IoConsumer<OutputStream>> charts(FrontReport report) {
    Map<String, IoConsumer<OutputStream>> out = new LinkedHashMap<>();
    int m = report.objectives();
    List<Objective> measures = report.measures();
    if (m == 1) {
      // One objective: plot it against management cost, which every report carries.
      int cost = report.costMeasure();
      if (cost != 0) {
        out.put(name(measures.get(cost), measures.get(0)), o -> write(o, report, cost, 0));
      }
      return out;
    }
    for (int x = 0; x < m; x++) {
      for (int y = x + 1; y < m; y++) {
        int a = x;
        int b = y;
        out.put(name(measures.get(a), measures.get(b)), o -> write(o, report, a, b));
      }
    }
    return out;
  }

  private static String name(Objective x, Objective y) {
    return "front-" + TrajectoryPlots.fileName(y.name()).replace(".png", "") + "-vs-"
        + TrajectoryPlots.fileName(x.name());
  }

  private static void write(OutputStream out, FrontReport report, int x, int y)
      throws IOException {
    FrontEntry pick = report.pick();
    XYIntervalSeries front = new XYIntervalSeries("front policies");
    XYIntervalSeries chosen = new XYIntervalSeries("minimum-input policy meeting the thresholds");
    XYIntervalSeries references = new XYIntervalSeries("reference policies");
    XYIntervalSeriesCollection data = new XYIntervalSeriesCollection();
    java.util.List<String> frontIds = new java.util.ArrayList<>();
    java.util.List<String> refIds = new java.util.ArrayList<>();
    for (FrontEntry e : report.front()) {
      if (pick != null && e.id().equals(pick.id())) {
        add(chosen, e, x, y);
      } else {
        add(front, e, x, y);
        frontIds.add(e.id());
      }
    }
    for (FrontEntry e : report.references()) {
      add(references, e, x, y);
      refIds.add(e.id());
    }
    data.addSeries(front);
    data.addSeries(chosen);
    data.addSeries(references);
    String pickId = pick == null ? "" : pick.id();

    Objective ox = report.measures().get(x);
    Objective oy = report.measures().get(y);
    NumberAxis xAxis = new NumberAxis(axis(ox));
    NumberAxis yAxis = new NumberAxis(axis(oy));
    xAxis.setAutoRangeIncludesZero(false);
    yAxis.setAutoRangeIncludesZero(false);
    XYErrorRenderer renderer = new XYErrorRenderer();
    renderer.setDefaultLinesVisible(false);
    renderer.setDefaultShapesVisible(true);
    renderer.setErrorStroke(new BasicStroke(1f));
    renderer.setSeriesPaint(0, FRONT);
    renderer.setSeriesPaint(1, PICK);
    renderer.setSeriesPaint(2, REFERENCE);
    renderer.setSeriesShape(0, new Ellipse2D.Double(-4, -4, 8, 8));
    renderer.setSeriesShape(1, new Ellipse2D.Double(-6, -6, 12, 12));
    renderer.setSeriesShape(2, new Rectangle2D.Double(-5, -5, 10, 10));
    XYItemLabelGenerator labels = (XYDataset d, int series, int item) -> series == 0
        ? frontIds.get(item) : series == 1 ? pickId : refIds.get(item);
    renderer.setDefaultItemLabelGenerator(labels);
    renderer.setDefaultItemLabelsVisible(true);
    renderer.setDefaultItemLabelFont(new Font(Font.SANS_SERIF, Font.PLAIN, 10));
    XYPlot plot = new XYPlot(data, xAxis, yAxis, renderer);
    plot.setBackgroundPaint(Color.WHITE);
    plot.setDomainGridlinePaint(new Color(0xdddddd));
    plot.setRangeGridlinePaint(new Color(0xdddddd));
    for (Limit limit : report.limits()) {
      for (double edge : new double[] {limit.atLeast(), limit.atMost()}) {
        if (!Double.isFinite(edge)) {
          continue;
        }
        ValueMarker marker = new ValueMarker(edge, THRESHOLD, new BasicStroke(1.5f,
            BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f, new float[] {6f, 4f}, 0f));
        marker.setLabel("threshold " + PolicyWords.number(edge));
        marker.setLabelFont(new Font(Font.SANS_SERIF, Font.PLAIN, 10));
        marker.setLabelPaint(THRESHOLD);
        if (limit.measure() == x) {
          marker.setLabelAnchor(RectangleAnchor.TOP_RIGHT);
          marker.setLabelTextAnchor(TextAnchor.TOP_LEFT);
          plot.addDomainMarker(marker);
        } else if (limit.measure() == y) {
          marker.setLabelAnchor(RectangleAnchor.TOP_LEFT);
          marker.setLabelTextAnchor(TextAnchor.BOTTOM_LEFT);
          plot.addRangeMarker(marker);
        }
      }
    }
    JFreeChart chart = new JFreeChart(oy.label() + " against " + ox.label(),
        new Font(Font.SANS_SERIF, Font.BOLD, 16), plot, true);
    chart.setBackgroundPaint(Color.WHITE);
    chart.addSubtitle(new TextTitle(String.format(Locale.ROOT, "\"%s\": %d front policies on %d"
        + " fresh replicates per climate path (%s); whiskers: 95 %% intervals. A point may be"
        + " dominated here and not in the other objectives.", report.scenarioName(),
        report.front().size(), report.validationReplicates(), report.pathStep().describe()),
        new Font(Font.SANS_SERIF, Font.PLAIN, 11)));
    chart.addSubtitle(new TextTitle("Decision support only: model output, not a prediction. "
        + "Burning, culling, darting and water closures follow local regulations and permits.",
        new Font(Font.SANS_SERIF, Font.ITALIC, 10)));
    ChartUtils.writeChartAsPNG(out, chart, WIDTH, HEIGHT);
  }

  private static String axis(Objective o) {
    return o.label() + " (" + o.unit() + "; " + (o.direction() == Direction.MAXIMISE ? "higher"
        : "lower") + " is better)";
  }

  private static void add(XYIntervalSeries series, FrontEntry e, int x, int y) {
    Estimate ex = e.score().combined()[x];
    Estimate ey = e.score().combined()[y];
    series.add(ex.value(), lo(ex), hi(ex), ey.value(), lo(ey), hi(ey));
  }

  private static double lo(Estimate e) {
    return Double.isNaN(e.lower()) ? e.value() : e.lower();
  }

  private static double hi(Estimate e) {
    return Double.isNaN(e.upper()) ? e.value() : e.upper();
  }
}
