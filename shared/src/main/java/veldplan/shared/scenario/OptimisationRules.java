package veldplan.shared.scenario;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Semantic rules of a scenario's {@code optimisation} section (field-level rules are checked by
 * the reader):
 * <ul>
 *   <li>one to four objectives, none twice;</li>
 *   <li>{@code guild} is given for {@code guild-persists} and only there, and names a herbivore
 *       guild, a predator or "elephants";</li>
 *   <li>{@code large-tree-target-met} needs {@code largeTreeTargetPerHa};
 *       {@code elephants-in-band} needs {@code elephantBandPerKm2}, whose min is below its
 *       max;</li>
 *   <li>{@code pathPercentile} is given with {@code overPaths: percentile} and only then;</li>
 *   <li>each threshold has {@code atLeast}, {@code atMost} or both, with atLeast &lt;= atMost;</li>
 *   <li>each lever range has min &lt;= max; {@code burnSeasons} is not empty and has no season
 *       twice; {@code allowNoPlannedBurning} goes with {@code fireReturnIntervalYears};
 *       closure years lie within the simulated years; at least one lever is searched.</li>
 * </ul>
 */
final class OptimisationRules {
  /** The name by which thresholds and objectives refer to the elephants. */
  static final String ELEPHANTS = "elephants";

  private OptimisationRules() {}

  static void check(Scenario sc, SourceLocations where, List<ScenarioProblem> problems) {
    Optimisation o = sc.optimisation();
    String at = "/optimisation";
    List<String> guildNames = new ArrayList<>();
    sc.guilds().forEach(g -> guildNames.add(g.name()));
    sc.predators().forEach(p -> guildNames.add(p.name()));
    guildNames.add(ELEPHANTS);

    String objectives = Texts.child(at, "objectives");
    if (o.objectives().isEmpty() || o.objectives().size() > 4) {
      problems.add(where.at(objectives, "found " + o.objectives().size()
          + " objectives (expected 1 to 4)"));
    }
    Map<String, Integer> seen = new HashMap<>();
    for (int i = 0; i < o.objectives().size(); i++) {
      ObjectiveChoice choice = o.objectives().get(i);
      String item = Texts.child(objectives, i);
      String key = choice.measure() + "/" + choice.guild();
      Integer first = seen.putIfAbsent(key, i);
      if (first != null) {
        problems.add(where.at(item, "the same objective as " + Texts.child(objectives, first)
            + " (expected each objective once)"));
      }
      measure(choice.measure(), choice.guild(), item, o, guildNames, where, problems);
    }

    boolean percentile = o.overPaths() == OverPaths.PERCENTILE;
    if (percentile && o.pathPercentile() == null) {
      problems.add(where.at(Texts.child(at, "overPaths"), "found \"percentile\" without"
          + " pathPercentile (expected pathPercentile, 0 to 100, beside it)"));
    } else if (!percentile && o.pathPercentile() != null) {
      problems.add(where.at(Texts.child(at, "pathPercentile"), "found a percentile with"
          + " overPaths other than \"percentile\" (expected no pathPercentile, or overPaths:"
          + " percentile)"));
    }

    String constraints = Texts.child(at, "constraints");
    for (int i = 0; i < o.constraints().size(); i++) {
      Threshold t = o.constraints().get(i);
      String item = Texts.child(constraints, i);
      measure(t.measure(), t.guild(), item, o, guildNames, where, problems);
      if (t.atLeast() == null && t.atMost() == null) {
        problems.add(where.at(item, "found a threshold with no limit (expected atLeast,"
            + " atMost or both)"));
      } else if (t.atLeast() != null && t.atMost() != null && t.atLeast() > t.atMost()) {
        problems.add(where.at(Texts.child(item, "atMost"), Texts.number(t.atMost())
            + " is below atLeast " + Texts.number(t.atLeast()) + " (expected atLeast <= atMost)"));
      }
    }

    ElephantBand band = o.elephantBandPerKm2();
    if (band != null && !(band.min() < band.max())) {
      problems.add(where.at(Texts.child(Texts.child(at, "elephantBandPerKm2"), "max"),
          Texts.number(band.max()) + " is not above min " + Texts.number(band.min())
              + " (expected min < max, elephants/km2)"));
    }
    levers(sc, o.levers(), Texts.child(at, "levers"), where, problems);
  }

  private static void measure(Measure measure, String guild, String item, Optimisation o,
      List<String> guildNames, SourceLocations where, List<ScenarioProblem> problems) {
    if (measure == Measure.GUILD_PERSISTS) {
      if (guild == null) {
        problems.add(where.at(item, "guild-persists without a guild (expected guild: one of "
            + Texts.quotedList(guildNames) + ")"));
      } else if (!guildNames.contains(guild)) {
        problems.add(where.at(Texts.child(item, "guild"), "found " + Texts.quote(guild)
            + ", which is not a guild (expected one of " + Texts.quotedList(guildNames) + ")"
            + Texts.didYouMean(guild, guildNames)));
      }
    } else if (guild != null) {
      problems.add(where.at(Texts.child(item, "guild"), "found a guild for a measure that"
          + " covers the whole park (expected guild only with guild-persists)"));
    }
    if (measure == Measure.LARGE_TREE_TARGET_MET && o.largeTreeTargetPerHa() == null) {
      problems.add(where.at(item, "large-tree-target-met needs a target (expected"
          + " /optimisation/largeTreeTargetPerHa, trees/ha)"));
    }
    if (measure == Measure.ELEPHANTS_IN_BAND && o.elephantBandPerKm2() == null) {
      problems.add(where.at(item, "elephants-in-band needs a band (expected"
          + " /optimisation/elephantBandPerKm2 with min and max, elephants/km2)"));
    }
  }

  private static void levers(Scenario sc, Levers l, String at, SourceLocations where,
      List<ScenarioProblem> problems) {
    if (l.fireReturnIntervalYears() != null) {
      order(l.fireReturnIntervalYears().min(), l.fireReturnIntervalYears().max(),
          Texts.child(at, "fireReturnIntervalYears"), "years", where, problems);
    } else if (Boolean.TRUE.equals(l.allowNoPlannedBurning())) {
      problems.add(where.at(Texts.child(at, "allowNoPlannedBurning"), "found true without"
          + " fireReturnIntervalYears (expected the interval range beside it, years)"));
    }
    if (l.burnSeasons() != null) {
      String seasons = Texts.child(at, "burnSeasons");
      if (l.burnSeasons().isEmpty()) {
        problems.add(where.at(seasons, "found an empty list (expected early-dry, late-dry or"
            + " both)"));
      } else if (l.burnSeasons().stream().distinct().count() < l.burnSeasons().size()) {
        problems.add(where.at(seasons, "a season is listed twice (expected each season once)"));
      }
    }
    if (l.targetFractionBurnt() != null) {
      order(l.targetFractionBurnt().min(), l.targetFractionBurnt().max(),
          Texts.child(at, "targetFractionBurnt"), "fraction", where, problems);
    }
    if (l.elephantOfftakeFractionPerYear() != null) {
      order(l.elephantOfftakeFractionPerYear().min(), l.elephantOfftakeFractionPerYear().max(),
          Texts.child(at, "elephantOfftakeFractionPerYear"), "fraction per year", where,
          problems);
    }
    if (l.contraceptionCoverage() != null) {
      order(l.contraceptionCoverage().min(), l.contraceptionCoverage().max(),
          Texts.child(at, "contraceptionCoverage"), "fraction", where, problems);
    }
    if (l.triggerDensityPerKm2() != null) {
      order(l.triggerDensityPerKm2().min(), l.triggerDensityPerKm2().max(),
          Texts.child(at, "triggerDensityPerKm2"), "elephants/km2", where, problems);
    }
    Levers.CalendarYearRange years = l.waterPointClosureYears();
    if (years != null) {
      String range = Texts.child(at, "waterPointClosureYears");
      order(years.min(), years.max(), range, "calendar year", where, problems);
      int first = sc.startYear();
      int last = sc.startYear() + sc.horizonYears();
      if (years.min() < first || years.max() > last) {
        problems.add(where.at(range, years.min() + " to " + years.max() + " leaves the"
            + " simulated years (expected " + first + " <= min <= max <= " + last
            + ", calendar year: startYear to startYear + horizonYears)"));
      }
    }
    boolean any = l.fireReturnIntervalYears() != null || l.burnSeasons() != null
        || l.targetFractionBurnt() != null || l.elephantOfftakeFractionPerYear() != null
        || l.contraceptionCoverage() != null || l.triggerDensityPerKm2() != null
        || Boolean.TRUE.equals(l.waterPointsOpen()) || years != null;
    if (!any) {
      problems.add(where.at(at, "no lever is searched (expected at least one of"
          + " fireReturnIntervalYears, burnSeasons, targetFractionBurnt,"
          + " elephantOfftakeFractionPerYear, contraceptionCoverage, triggerDensityPerKm2,"
          + " waterPointsOpen: true, waterPointClosureYears)"));
    }
  }

  private static void order(double min, double max, String at, String unit,
      SourceLocations where, List<ScenarioProblem> problems) {
    if (min > max) {
      problems.add(where.at(Texts.child(at, "max"), Texts.number(max) + " is below min "
          + Texts.number(min) + " (expected min <= max, " + unit + ")"));
    }
  }
}
