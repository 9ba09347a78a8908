package veldplan.optimiser.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import veldplan.shared.scenario.BurnPlan;
import veldplan.shared.scenario.BurnSeason;
import veldplan.shared.scenario.ElephantPlan;
import veldplan.shared.scenario.Policy;
import veldplan.shared.scenario.WaterPlan;

/** A policy in plain words, one line per block and one for the elephants. */
public final class PolicyWords {
  private PolicyWords() {}

  /** Planned burning of one block, e.g. "burn every 4 years, late dry season, aim 60 %". */
  public static String burning(BurnPlan burn) {
    if (burn == null || burn.fireReturnIntervalYears() == null) {
      return "no planned burning";
    }
    return String.format(Locale.ROOT, "burn every %s years, %s season, aim %s %%",
        number(burn.fireReturnIntervalYears()), season(burn.season()),
        number(100 * burn.targetFractionBurnt()));
  }

  /** Water points of one block, e.g. "3 of 5 water points open, closed in 2040". */
  public static String water(WaterPlan water, int available) {
    if (available == 0) {
      return "no artificial water points";
    }
    int open = water == null ? available : water.openPoints();
    String text = open + " of " + available + " water points open";
    if (water != null && water.closureYear() != null && open > 0) {
      text += ", closed in " + water.closureYear();
    }
    return text;
  }

  /** Elephant management, e.g. "remove 3.5 %/yr, contraception for 40 % of breeding females,
   * only above 0.8 elephants/km2". */
  public static String elephants(ElephantPlan e) {
    if (e.offtakeFractionPerYear() == 0 && e.contraceptionCoverage() == 0) {
      return "elephants left alone";
    }
    List<String> parts = new ArrayList<>();
    if (e.offtakeFractionPerYear() > 0) {
      parts.add("remove " + number(100 * e.offtakeFractionPerYear()) + " % a year");
    }
    if (e.contraceptionCoverage() > 0) {
      parts.add("contraception for " + number(100 * e.contraceptionCoverage())
          + " % of breeding females");
    }
    parts.add(e.triggerDensityPerKm2() == null ? "every year"
        : "only when above " + number(e.triggerDensityPerKm2()) + " elephants/km2");
    return String.join(", ", parts);
  }

  /** Every line of a policy: one per block (burning; water) and the elephants. */
  public static List<String> lines(Policy policy, List<String> blocks, int[] waterPoints) {
    List<String> out = new ArrayList<>();
    for (int b = 0; b < blocks.size(); b++) {
      String name = blocks.get(b);
      BurnPlan burn = policy.burning().stream().filter(p -> p.block().equals(name)).findFirst()
          .orElse(null);
      WaterPlan water = policy.waterPoints().stream().filter(p -> p.block().equals(name))
          .findFirst().orElse(null);
      out.add(name + ": " + burning(burn) + "; " + water(water, waterPoints[b]));
    }
    out.add("Elephants: " + elephants(policy.elephants()));
    return out;
  }

  static String season(BurnSeason s) {
    return s == BurnSeason.LATE_DRY ? "late dry" : "early dry";
  }

  /** A number without trailing zeros: 4, 0.35, 62.5. */
  static String number(double v) {
    if (v == Math.rint(v) && Math.abs(v) < 1e15) {
      return Long.toString((long) v);
    }
    String s = String.format(Locale.ROOT, "%.4f", v);
    return s.replaceAll("0+$", "").replaceAll("\\.$", "");
  }
}
