package veldplan.optimiser.report;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.io.Writer;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import veldplan.objectives.Direction;
import veldplan.objectives.Estimate;
import veldplan.objectives.Objective;
import veldplan.objectives.PathStep;
import veldplan.optimiser.park.Limit;
import veldplan.optimiser.park.PolicyScore;
import veldplan.shared.scenario.BurnPlan;
import veldplan.shared.scenario.BurnSeason;
import veldplan.shared.scenario.Policy;
import veldplan.shared.scenario.WaterPlan;

/**
 * The outcome of a policy search as users read it: every policy of the front and the reference
 * policies, their levers in plain words, and every measure with its 95 % interval, over paths
 * and per path, all on validation replicates the search never saw. Also picks the
 * minimum-input policy: the cheapest front policy whose estimates meet every threshold (then the
 * one with fewer interventions), the satisficing rule of Simon (1955) as an epsilon-constraint
 * choice (Haimes, Lasdon &amp; Wismer 1971).
 *
 * @param scenarioName         the scenario's name
 * @param blocks               block names
 * @param waterPoints          artificial water points per block
 * @param paths                climate path names
 * @param measures             every reported measure; the first {@code objectives} are the
 *                             search's objectives
 * @param objectives           how many measures are objectives
 * @param limits               the thresholds
 * @param pathStep             aggregation over paths
 * @param validationReplicates replicates per path behind every estimate
 * @param entries              front policies (role "front") then references
 * @param costMeasure          index of the management-cost measure
 */
public record FrontReport(String scenarioName, List<String> blocks, int[] waterPoints,
    List<String> paths, List<Objective> measures, int objectives, List<Limit> limits,
    PathStep pathStep, int validationReplicates, List<FrontEntry> entries, int costMeasure) {

  /**
   * Builds the entries: whether each meets the thresholds (by estimate and cautiously) and
   * whether another front policy dominates it on the objectives.
   *
   * @param policies front policies then references
   * @param roles    "front" or "reference", one per policy
   * @param scores   validation scores, one per policy
   */
  public static List<FrontEntry> entries(List<Policy> policies, List<String> roles,
      PolicyScore[] scores, List<Objective> measures, int objectives, List<Limit> limits) {
    List<FrontEntry> out = new ArrayList<>();
    for (int i = 0; i < policies.size(); i++) {
      Estimate[] c = scores[i].combined();
      boolean meets = Limit.violation(Limit.values(c), limits, measures) == 0;
      boolean cautious = Limit.violation(Limit.cautious(c, measures), limits, measures) == 0;
      boolean dominated = false;
      if (roles.get(i).equals("front")) {
        for (int j = 0; j < policies.size() && !dominated; j++) {
          dominated = j != i && roles.get(j).equals("front")
              && dominates(scores[j].combined(), c, measures, objectives);
        }
      }
      out.add(new FrontEntry(policies.get(i).name(), roles.get(i), policies.get(i), scores[i],
          meets, cautious, dominated));
    }
    return out;
  }

  private static boolean dominates(Estimate[] a, Estimate[] b, List<Objective> measures,
      int objectives) {
    boolean better = false;
    for (int k = 0; k < objectives; k++) {
      Direction d = measures.get(k).direction();
      if (d.better(b[k].value(), a[k].value())) {
        return false;
      }
      better |= d.better(a[k].value(), b[k].value());
    }
    return better;
  }

  /** Number of distinct interventions of a policy: burnt blocks, elephant actions, closures. */
  public static int interventions(Policy p, int[] waterPoints, List<String> blocks) {
    int n = 0;
    for (BurnPlan burn : p.burning()) {
      n += burn.fireReturnIntervalYears() != null ? 1 : 0;
    }
    n += p.elephants().offtakeFractionPerYear() > 0 ? 1 : 0;
    n += p.elephants().contraceptionCoverage() > 0 ? 1 : 0;
    for (WaterPlan w : p.waterPoints()) {
      int b = blocks.indexOf(w.block());
      n += (b >= 0 && w.openPoints() < waterPoints[b]) || w.closureYear() != null ? 1 : 0;
    }
    return n;
  }

  /** The minimum-input front policy that meets every threshold by its estimates, or null. */
  public FrontEntry pick() {
    return entries.stream()
        .filter(e -> e.role().equals("front") && e.meetsThresholds())
        .min(Comparator.<FrontEntry>comparingDouble(
                e -> e.score().combined()[costMeasure].value())
            .thenComparingInt(e -> interventions(e.policy(), waterPoints, blocks))
            .thenComparing(FrontEntry::id))
        .orElse(null);
  }

  /** Front policies, cheapest first. */
  public List<FrontEntry> front() {
    return entries.stream().filter(e -> e.role().equals("front"))
        .sorted(Comparator.<FrontEntry>comparingDouble(
            e -> e.score().combined()[costMeasure].value()).thenComparing(FrontEntry::id))
        .toList();
  }

  /** The reference policies. */
  public List<FrontEntry> references() {
    return entries.stream().filter(e -> e.role().equals("reference")).toList();
  }

  // ---------------------------------------------------------------- CSV

  /** The header of front.csv. */
  public String csvHeader() {
    List<String> h = new ArrayList<>(List.of("policy", "role", "meets_thresholds",
        "meets_thresholds_cautiously", "dominated_on_validation"));
    for (String block : blocks) {
      String b = Objective.slug(block);
      h.add(b + "_fire_return_interval_years");
      h.add(b + "_burn_season");
      h.add(b + "_target_burnt_percent");
      h.add(b + "_water_points_open");
      h.add(b + "_water_closure_year");
    }
    h.add("elephant_offtake_percent_per_year");
    h.add("contraception_coverage_percent");
    h.add("elephant_trigger_per_km2");
    for (Objective m : measures) {
      h.add(m.column());
      h.add(m.column() + "_lo95");
      h.add(m.column() + "_hi95");
    }
    for (Objective m : measures) {
      for (String path : paths) {
        h.add(m.column() + "_path_" + Objective.slug(path));
      }
    }
    return String.join(",", h);
  }

  /** Writes front.csv: front policies cheapest first, then the references. */
  public void writeCsv(Writer w) throws IOException {
    w.write(csvHeader());
    w.write('\n');
    List<FrontEntry> rows = new ArrayList<>(front());
    rows.addAll(references());
    for (FrontEntry e : rows) {
      List<String> cells = new ArrayList<>();
      cells.add(csv(e.id()));
      cells.add(e.role());
      cells.add(Boolean.toString(e.meetsThresholds()));
      cells.add(Boolean.toString(e.meetsCautiously()));
      cells.add(e.role().equals("front") ? Boolean.toString(e.dominated()) : "");
      Policy p = e.policy();
      for (int b = 0; b < blocks.size(); b++) {
        String name = blocks.get(b);
        BurnPlan burn = p.burning().stream().filter(x -> x.block().equals(name)).findFirst()
            .orElse(null);
        boolean burns = burn != null && burn.fireReturnIntervalYears() != null;
        cells.add(burns ? PolicyWords.number(burn.fireReturnIntervalYears()) : "none");
        cells.add(burns ? (burn.season() == BurnSeason.LATE_DRY ? "late-dry" : "early-dry") : "");
        cells.add(burns ? PolicyWords.number(100 * burn.targetFractionBurnt()) : "");
        WaterPlan water = p.waterPoints().stream().filter(x -> x.block().equals(name))
            .findFirst().orElse(null);
        int open = water == null ? waterPoints[b] : water.openPoints();
        cells.add(Integer.toString(open));
        cells.add(water != null && water.closureYear() != null && open > 0
            ? water.closureYear().toString() : "never");
      }
      cells.add(PolicyWords.number(100 * p.elephants().offtakeFractionPerYear()));
      cells.add(PolicyWords.number(100 * p.elephants().contraceptionCoverage()));
      cells.add(p.elephants().triggerDensityPerKm2() == null ? "always"
          : PolicyWords.number(p.elephants().triggerDensityPerKm2()));
      Estimate[] c = e.score().combined();
      for (Estimate est : c) {
        cells.add(value(est.value()));
        cells.add(value(est.lower()));
        cells.add(value(est.upper()));
      }
      for (Estimate[] perPath : e.score().perPath()) {
        for (Estimate est : perPath) {
          cells.add(value(est.value()));
        }
      }
      w.write(String.join(",", cells));
      w.write('\n');
    }
  }

  private static String csv(String text) {
    if (text.contains(",") || text.contains("\"") || text.contains("\n")) {
      return "\"" + text.replace("\"", "\"\"") + "\"";
    }
    return text;
  }

  /** A number for files: 6 significant digits, "NA" when undefined. */
  static String value(double v) {
    if (Double.isNaN(v)) {
      return "NA";
    }
    if (v == Math.rint(v) && Math.abs(v) < 1e12) {
      return Long.toString((long) v);
    }
    return new java.math.BigDecimal(v).round(new java.math.MathContext(6)).stripTrailingZeros()
        .toPlainString();
  }

  // ---------------------------------------------------------------- JSON

  /** front.json: the same content, with each policy in the policy-file schema. */
  public String json() throws IOException {
    ObjectMapper mapper = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);
    ObjectNode root = mapper.createObjectNode();
    root.put("scenario", scenarioName);
    root.put("validationReplicatesPerPath", validationReplicates);
    root.put("overPaths", pathStep.describe());
    ArrayNode paths = root.putArray("climatePaths");
    this.paths.forEach(paths::add);
    ArrayNode ms = root.putArray("measures");
    for (int k = 0; k < measures.size(); k++) {
      Objective m = measures.get(k);
      ObjectNode n = ms.addObject();
      n.put("name", m.name());
      n.put("column", m.column());
      n.put("label", m.label());
      n.put("unit", m.unit());
      n.put("better", m.direction() == Direction.MAXIMISE ? "higher" : "lower");
      n.put("overReplicates", m.step().name().toLowerCase(Locale.ROOT));
      n.put("objective", k < objectives);
    }
    ArrayNode th = root.putArray("thresholds");
    for (Limit l : limits) {
      ObjectNode n = th.addObject();
      n.put("measure", measures.get(l.measure()).name());
      if (Double.isFinite(l.atLeast())) {
        n.put("atLeast", l.atLeast());
      }
      if (Double.isFinite(l.atMost())) {
        n.put("atMost", l.atMost());
      }
    }
    FrontEntry pick = pick();
    if (pick == null) {
      root.putNull("minimumInputPolicy");
    } else {
      root.put("minimumInputPolicy", pick.id());
    }
    ArrayNode policies = root.putArray("policies");
    List<FrontEntry> rows = new ArrayList<>(front());
    rows.addAll(references());
    for (FrontEntry e : rows) {
      ObjectNode n = policies.addObject();
      n.put("id", e.id());
      n.put("role", e.role());
      n.put("meetsThresholds", e.meetsThresholds());
      n.put("meetsThresholdsCautiously", e.meetsCautiously());
      if (e.role().equals("front")) {
        n.put("dominatedOnValidation", e.dominated());
      }
      ArrayNode words = n.putArray("inWords");
      PolicyWords.lines(e.policy(), blocks, waterPoints).forEach(words::add);
      n.set("policy", mapper.valueToTree(e.policy()));
      ObjectNode scores = n.putObject("scores");
      for (int k = 0; k < measures.size(); k++) {
        ObjectNode s = scores.putObject(measures.get(k).name());
        estimate(s, e.score().combined()[k]);
        ObjectNode per = s.putObject("perPath");
        for (int p = 0; p < this.paths.size(); p++) {
          estimate(per.putObject(this.paths.get(p)), e.score().perPath()[k][p]);
        }
      }
    }
    return mapper.writeValueAsString(root) + "\n";
  }

  private static void estimate(ObjectNode n, Estimate e) {
    n.put("value", e.value());
    if (Double.isNaN(e.lower())) {
      n.putNull("lower95");
      n.putNull("upper95");
    } else {
      n.put("lower95", e.lower());
      n.put("upper95", e.upper());
    }
    n.put("runs", e.n());
  }

  // ---------------------------------------------------------------- text

  /** The table printed at the end of a search, the pick, in plain words. */
  public String text() {
    StringBuilder out = new StringBuilder();
    List<FrontEntry> front = front();
    out.append(String.format(Locale.ROOT, "Pareto front: %d policies, scored on %d fresh"
        + " replicates per climate path (%s); 95 %% intervals in brackets.%n", front.size(),
        validationReplicates, pathStep.describe()));
    List<String> header = new ArrayList<>(List.of("policy"));
    List<String> legend = new ArrayList<>();
    for (int k = 0; k < objectives; k++) {
      Objective m = measures.get(k);
      header.add(m.label());
      legend.add(m.label() + ": " + m.unit() + ", " + (m.direction() == Direction.MAXIMISE
          ? "higher" : "lower") + " is better");
    }
    out.append(String.join("; ", legend)).append('.').append(System.lineSeparator());
    if (!limits.isEmpty()) {
      header.add("meets thresholds");
    }
    List<List<String>> rows = new ArrayList<>();
    List<FrontEntry> all = new ArrayList<>(front);
    all.addAll(references());
    for (FrontEntry e : all) {
      List<String> row = new ArrayList<>();
      row.add(e.id() + (e.dominated() ? " *" : ""));
      for (int k = 0; k < objectives; k++) {
        row.add(shortEstimate(e.score().combined()[k]));
      }
      if (!limits.isEmpty()) {
        row.add(e.meetsThresholds() ? (e.meetsCautiously() ? "yes" : "yes (not with 95 % "
            + "confidence)") : "no");
      }
      rows.add(row);
    }
    out.append(table(header, rows));
    if (front.stream().anyMatch(FrontEntry::dominated)) {
      out.append("* dominated by another front policy on the fresh replicates, though not on"
          + " the search's replicates.").append(System.lineSeparator());
    }
    out.append(System.lineSeparator());
    FrontEntry pick = pick();
    if (limits.isEmpty()) {
      out.append("No thresholds are set; the cheapest front policy is ");
    } else if (pick == null) {
      out.append("No front policy meets every threshold on the fresh replicates.")
          .append(System.lineSeparator());
    } else {
      out.append("Minimum-input policy that meets every threshold: ");
    }
    FrontEntry shown = pick != null ? pick : limits.isEmpty() && !front.isEmpty() ? front.get(0)
        : null;
    if (shown != null) {
      out.append(shown.id()).append(String.format(Locale.ROOT, " (management cost %s)",
          shortEstimate(shown.score().combined()[costMeasure]))).append(System.lineSeparator());
      for (String line : PolicyWords.lines(shown.policy(), blocks, waterPoints)) {
        out.append("  ").append(line).append(System.lineSeparator());
      }
      if (!limits.isEmpty() && !shown.meetsCautiously()) {
        out.append("  Its estimates meet the thresholds, but not the cautious ends of their 95 %"
            + " intervals: more replicates would make it surer.").append(System.lineSeparator());
      }
    }
    return out.toString();
  }

  static String shortEstimate(Estimate e) {
    if (Double.isNaN(e.lower())) {
      return sig(e.value());
    }
    return sig(e.value()) + " [" + sig(e.lower()) + ", " + sig(e.upper()) + "]";
  }

  private static String sig(double v) {
    double a = Math.abs(v);
    if (a >= 1e6) {
      return String.format(Locale.ROOT, "%.2fM", v / 1e6);
    }
    if (a >= 1e4) {
      return String.format(Locale.ROOT, "%.0fk", v / 1e3);
    }
    if (a >= 100) {
      return String.format(Locale.ROOT, "%.0f", v);
    }
    return String.format(Locale.ROOT, "%.2f", v);
  }

  private static String table(List<String> header, List<List<String>> rows) {
    int[] width = new int[header.size()];
    for (int c = 0; c < width.length; c++) {
      width[c] = header.get(c).length();
      for (List<String> r : rows) {
        width[c] = Math.max(width[c], r.get(c).length());
      }
    }
    StringBuilder out = new StringBuilder();
    line(out, header, width);
    StringBuilder rule = new StringBuilder();
    for (int c = 0; c < width.length; c++) {
      rule.append(c == 0 ? "" : "  ").append("-".repeat(width[c]));
    }
    out.append(rule).append(System.lineSeparator());
    for (List<String> r : rows) {
      line(out, r, width);
    }
    return out.toString();
  }

  private static void line(StringBuilder out, List<String> cells, int[] width) {
    StringBuilder l = new StringBuilder();
    for (int c = 0; c < cells.size(); c++) {
      l.append(c == 0 ? "" : "  ").append(String.format("%-" + width[c] + "s", cells.get(c)));
    }
    out.append(l.toString().stripTrailing()).append(System.lineSeparator());
  }
}
