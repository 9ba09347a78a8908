package veldplan.optimiser.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.StringWriter;
import java.util.List;
import org.junit.jupiter.api.Test;
import veldplan.objectives.Direction;
import veldplan.objectives.Estimate;
import veldplan.objectives.Objective;
import veldplan.objectives.PathStep;
import veldplan.objectives.ReplicateStep;
import veldplan.optimiser.park.Limit;
import veldplan.optimiser.park.PolicyScore;
import veldplan.shared.scenario.BurnPlan;
import veldplan.shared.scenario.BurnSeason;
import veldplan.shared.scenario.ElephantPlan;
import veldplan.shared.scenario.Policy;
import veldplan.shared.scenario.WaterPlan;

/** The front report's bookkeeping on made-up scores: thresholds, dominance, the pick, files. */
class FrontReportTest {
  private static final Objective PERSIST = new Objective("guilds-persist", "all guilds persist",
      "probability", Direction.MAXIMISE, ReplicateStep.PROBABILITY, 1, 0, run -> 1);
  private static final Objective COST = new Objective("management-cost", "management cost",
      "USD present value", Direction.MINIMISE, ReplicateStep.MEAN, 0, 1e6, run -> 0);
  private static final List<Objective> MEASURES = List.of(PERSIST, COST);
  private static final List<Limit> AT_LEAST_08 = List.of(new Limit(0, 0.8,
      Double.POSITIVE_INFINITY));
  private static final List<String> BLOCKS = List.of("North", "South");
  private static final int[] POINTS = {3, 0};

  private static PolicyScore score(double persist, double lo, double cost) {
    Estimate p = new Estimate(persist, lo, Math.min(1, persist + 0.1), 20);
    Estimate c = new Estimate(cost, cost - 10, cost + 10, 20);
    return new PolicyScore(new Estimate[][] {{p}, {c}}, new Estimate[] {p, c});
  }

  private static Policy policy(String name, double offtake) {
    return new Policy(name, List.of(new BurnPlan("North", 4.0, BurnSeason.LATE_DRY, 0.6)),
        new ElephantPlan(offtake, 0, null), List.of(new WaterPlan("North", 2, 2040)));
  }

  private static FrontReport report() {
    List<Policy> policies = List.of(policy("P01", 0.01), policy("P02", 0.02),
        policy("P03", 0.03), policy("P04", 0.04), policy("status quo", 0));
    List<String> roles = List.of("front", "front", "front", "front", "reference");
    PolicyScore[] scores = {
        score(0.70, 0.5, 100),   // cheapest, misses 0.8
        score(0.85, 0.7, 200),   // meets by estimate, not cautiously
        score(0.95, 0.85, 300),  // meets cautiously
        score(0.90, 0.80, 350),  // dominated by P03 (worse and dearer)
        score(0.75, 0.6, 50)};
    List<FrontEntry> entries = FrontReport.entries(policies, roles, scores, MEASURES, 2,
        AT_LEAST_08);
    return new FrontReport("test park", BLOCKS, POINTS, List.of("only path"), MEASURES, 2,
        AT_LEAST_08, PathStep.WORST, 20, entries, 1);
  }

  @Test
  void marksThresholdsAndDominance() {
    List<FrontEntry> e = report().entries();
    assertFalse(e.get(0).meetsThresholds());
    assertTrue(e.get(1).meetsThresholds());
    assertFalse(e.get(1).meetsCautiously());
    assertTrue(e.get(2).meetsCautiously());
    assertTrue(e.get(3).dominated());
    assertFalse(e.get(2).dominated());
    assertFalse(e.get(4).dominated(), "references are not compared");
  }

  @Test
  void picksTheCheapestThatMeetsTheThresholds() {
    assertEquals("P02", report().pick().id());
  }

  @Test
  void noPickWhenNothingMeetsTheThresholds() {
    FrontReport r = report();
    List<Limit> impossible = List.of(new Limit(0, 0.99, Double.POSITIVE_INFINITY));
    List<FrontEntry> entries = FrontReport.entries(
        r.entries().stream().map(FrontEntry::policy).toList(),
        r.entries().stream().map(FrontEntry::role).toList(),
        r.entries().stream().map(FrontEntry::score).toArray(PolicyScore[]::new), MEASURES, 2,
        impossible);
    FrontReport none = new FrontReport("test park", BLOCKS, POINTS, List.of("only path"),
        MEASURES, 2, impossible, PathStep.WORST, 20, entries, 1);
    assertNull(none.pick());
    assertTrue(none.text().contains("No front policy meets every threshold"), none.text());
  }

  @Test
  void csvHasLeversInWordsAndIntervals() throws Exception {
    StringWriter w = new StringWriter();
    report().writeCsv(w);
    String[] lines = w.toString().split("\n");
    assertTrue(lines[0].startsWith("policy,role,meets_thresholds,meets_thresholds_cautiously,"
        + "dominated_on_validation,north_fire_return_interval_years,north_burn_season,"
        + "north_target_burnt_percent,north_water_points_open,north_water_closure_year,"
        + "south_fire_return_interval_years"), lines[0]);
    assertTrue(lines[0].contains(",guilds_persist_probability,guilds_persist_probability_lo95,"
        + "guilds_persist_probability_hi95,"), lines[0]);
    assertTrue(lines[0].endsWith(",management_cost_usd_pv_path_only_path"), lines[0]);
    // Cheapest first, then the reference.
    assertTrue(lines[1].startsWith("P01,front,false,false,false,4,late-dry,60,2,2040,none,,,0,"
        + "never,1,0,always,0.7,0.5,0.8,100,90,110,0.7,100"), lines[1]);
    assertTrue(lines[5].startsWith("status quo,reference,"), lines[5]);
    assertEquals(6, lines.length);
  }

  @Test
  void textNamesThePickInWords() {
    String text = report().text();
    assertTrue(text.contains("Minimum-input policy that meets every threshold: P02"), text);
    assertTrue(text.contains("North: burn every 4 years, late dry season, aim 60 %; 2 of 3 water"
        + " points open, closed in 2040"), text);
    assertTrue(text.contains("Elephants: remove 2 % a year, every year"), text);
    assertTrue(text.contains("not the cautious ends of their 95 % intervals"), text);
  }
}
