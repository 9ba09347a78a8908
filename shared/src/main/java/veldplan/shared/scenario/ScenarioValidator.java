package veldplan.shared.scenario;

import java.math.BigDecimal;
import java.nio.file.Files;
import java.nio.file.InvalidPathException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.function.Function;

/**
 * Semantic rules of a scenario that involve more than one field, or other files. Each problem has
 * the JSON pointer of the field at fault and, through {@link SourceLocations}, its line and
 * column. Field-level rules (types, required fields, {@link Range}) are checked earlier by
 * {@link ScenarioReader}; the methods here expect a scenario that has passed them, that is with
 * every required field non-null.
 *
 * <p>The rules:
 * <ul>
 *   <li>at least one burn block, one guild and one climate path; names of blocks, guilds,
 *       predators and climate paths are non-blank and unique within their list;</li>
 *   <li>{@code sandFraction + clayFraction <= 1} in every block (within 1e-9, for rounding);</li>
 *   <li>for guilds, predators and elephants, {@code quasiExtinctionAbundance} is below
 *       {@code initialAbundance}; the one exception is a population that starts at zero (absent
 *       at the start), which is legal only with a threshold of 0. A population that starts at
 *       or below a positive threshold would count as quasi-extinct before the first year is
 *       simulated, which is almost certainly a mistake in the file;</li>
 *   <li>each predator has at least one prey guild, each names an existing guild, none twice;</li>
 *   <li>each climate path has exactly one of {@code deltaChange} (at least one anchor, anchor
 *       years strictly increasing) and {@code monthlySeriesCsv}; {@code co2Pathway} is one of
 *       {@link #CO2_PATHWAYS};</li>
 *   <li>the baseline CSV and every {@code monthlySeriesCsv} exist, relative to the scenario
 *       file's directory (their content is checked by {@link ClimateTable});</li>
 *   <li>the policy: see {@link #validatePolicy};</li>
 *   <li>the optimisation section, if any: see {@link OptimisationRules}.</li>
 * </ul>
 */
public final class ScenarioValidator {

  /** The accepted CO2 pathways, as written in files. */
  public static final List<String> CO2_PATHWAYS =
      List.of("SSP1-2.6", "SSP2-4.5", "SSP3-7.0", "SSP5-8.5");

  /** Slack allowed in {@code sandFraction + clayFraction <= 1}, for decimal rounding. */
  static final double FRACTION_SUM_TOLERANCE = 1e-9;

  private ScenarioValidator() {}

  /**
   * Checks the semantic rules of a scenario, including its policy.
   *
   * @param scenario a scenario whose required fields are all present
   * @param where    places in the scenario file; climate CSV names are resolved against the
   *                 directory of {@code where.file()}
   * @return every problem found, empty if none
   */
  public static List<ScenarioProblem> validate(Scenario scenario, SourceLocations where) {
    List<ScenarioProblem> problems = new ArrayList<>();
    park(scenario.park(), where, problems);
    guilds(scenario.guilds(), where, problems);
    predators(scenario.predators(), scenario.guilds(), where, problems);
    Elephants elephants = scenario.elephants();
    threshold(elephants.initialAbundance(), elephants.quasiExtinctionAbundance(), "/elephants",
        where, problems);
    climate(scenario.climate(), where, problems);
    problems.addAll(validatePolicy(scenario.policy(), scenario, "/policy", where));
    if (scenario.optimisation() != null) {
      OptimisationRules.check(scenario, where, problems);
    }
    return problems;
  }

  /**
   * Checks the rules of a policy: each block appears at most once in {@code burning} and at most
   * once in {@code waterPoints}; and, if a scenario is given, each block named exists,
   * {@code openPoints} is at most the block's {@code artificialWaterPoints}, and
   * {@code closureYear} is within {@code [startYear, startYear + horizonYears]}.
   *
   * @param policy   the policy, with its required fields present
   * @param scenario the scenario it will be simulated in, or {@code null} to check only the
   *                 rules that need no scenario
   * @param pointer  JSON pointer of the policy in its file: {@code "/policy"} inside a scenario
   *                 file, {@code ""} for a policy file
   * @param where    places in the file the policy came from
   * @return every problem found, empty if none
   */
  public static List<ScenarioProblem> validatePolicy(Policy policy, Scenario scenario,
      String pointer, SourceLocations where) {
    List<ScenarioProblem> problems = new ArrayList<>();
    Map<String, BurnBlock> blocks = new LinkedHashMap<>();
    if (scenario != null) {
      for (BurnBlock block : scenario.park().blocks()) {
        blocks.putIfAbsent(block.name(), block);
      }
    }
    String burning = Texts.child(pointer, "burning");
    Map<String, Integer> seenBurn = new HashMap<>();
    for (int i = 0; i < policy.burning().size(); i++) {
      String at = Texts.child(Texts.child(burning, i), "block");
      blockReference(policy.burning().get(i).block(), at, scenario, blocks, seenBurn, i,
          burning, where, problems);
    }
    String water = Texts.child(pointer, "waterPoints");
    Map<String, Integer> seenWater = new HashMap<>();
    for (int i = 0; i < policy.waterPoints().size(); i++) {
      WaterPlan plan = policy.waterPoints().get(i);
      String entry = Texts.child(water, i);
      boolean known = blockReference(plan.block(), Texts.child(entry, "block"), scenario, blocks,
          seenWater, i, water, where, problems);
      if (scenario == null) {
        continue;
      }
      if (known) {
        int available = blocks.get(plan.block()).artificialWaterPoints();
        if (plan.openPoints() > available) {
          problems.add(where.at(Texts.child(entry, "openPoints"), plan.openPoints()
              + " is more than block " + Texts.quote(plan.block()) + " has (expected 0 <= value"
              + " <= " + available + ", its artificialWaterPoints)"));
        }
      }
      Integer closure = plan.closureYear();
      int first = scenario.startYear();
      int last = scenario.startYear() + scenario.horizonYears();
      if (closure != null && (closure < first || closure > last)) {
        problems.add(where.at(Texts.child(entry, "closureYear"), closure
            + " is outside the simulated years (expected " + first + " <= value <= " + last
            + ", calendar year: startYear to startYear + horizonYears)"));
      }
    }
    return problems;
  }

  /**
   * Checks one reference to a block by name; returns whether it names a known block (always
   * false without a scenario).
   */
  private static boolean blockReference(String name, String at, Scenario scenario,
      Map<String, BurnBlock> blocks, Map<String, Integer> seen, int index, String list,
      SourceLocations where, List<ScenarioProblem> problems) {
    Integer first = seen.putIfAbsent(name, index);
    if (first != null) {
      problems.add(where.at(at, "block " + Texts.quote(name) + " already has an entry at "
          + Texts.child(list, first) + " (expected at most one entry per block)"));
    }
    if (scenario == null) {
      return false;
    }
    if (!blocks.containsKey(name)) {
      problems.add(where.at(at, "found " + Texts.quote(name) + ", which is not a block "
          + "(expected one of " + Texts.quotedList(blocks.keySet())
          + ")" + Texts.didYouMean(name, blocks.keySet())));
      return false;
    }
    return true;
  }

  private static void park(Park park, SourceLocations where, List<ScenarioProblem> problems) {
    List<BurnBlock> blocks = park.blocks();
    nonEmpty(blocks, "/park/blocks", "burn block", where, problems);
    names(blocks, BurnBlock::name, "/park/blocks", "block", where, problems);
    for (int i = 0; i < blocks.size(); i++) {
      BurnBlock block = blocks.get(i);
      double sum = block.sandFraction() + block.clayFraction();
      if (!(sum <= 1 + FRACTION_SUM_TOLERANCE)) {
        problems.add(where.at(Texts.child(Texts.child("/park/blocks", i), "clayFraction"),
            "sandFraction + clayFraction is " + Texts.number(block.sandFraction()) + " + "
                + Texts.number(block.clayFraction()) + " = " + decimalSum(block.sandFraction(),
                block.clayFraction())
                + " (expected sandFraction + clayFraction <= 1, mass fraction)"));
      }
    }
  }

  private static void guilds(List<Guild> guilds, SourceLocations where,
      List<ScenarioProblem> problems) {
    nonEmpty(guilds, "/guilds", "guild", where, problems);
    names(guilds, Guild::name, "/guilds", "guild", where, problems);
    for (int i = 0; i < guilds.size(); i++) {
      Guild guild = guilds.get(i);
      threshold(guild.initialAbundance(), guild.quasiExtinctionAbundance(),
          Texts.child("/guilds", i), where, problems);
    }
  }

  private static void predators(List<Predator> predators, List<Guild> guilds,
      SourceLocations where, List<ScenarioProblem> problems) {
    names(predators, Predator::name, "/predators", "predator", where, problems);
    List<String> guildNames = guilds.stream().map(Guild::name).toList();
    for (int i = 0; i < predators.size(); i++) {
      Predator predator = predators.get(i);
      String at = Texts.child("/predators", i);
      threshold(predator.initialAbundance(), predator.quasiExtinctionAbundance(), at, where,
          problems);
      String prey = Texts.child(at, "preyGuilds");
      if (predator.preyGuilds().isEmpty()) {
        problems.add(where.at(prey, "found an empty list (expected at least one guild name)"));
      }
      Map<String, Integer> seen = new HashMap<>();
      for (int j = 0; j < predator.preyGuilds().size(); j++) {
        String name = predator.preyGuilds().get(j);
        String item = Texts.child(prey, j);
        Integer first = seen.putIfAbsent(name, j);
        if (first != null) {
          problems.add(where.at(item, "guild " + Texts.quote(name) + " is already listed at "
              + Texts.child(prey, first) + " (expected each prey guild once)"));
        } else if (!guildNames.contains(name)) {
          problems.add(where.at(item, "found " + Texts.quote(name) + ", which is not a guild "
              + "(expected one of " + Texts.quotedList(guildNames) + ")"
              + Texts.didYouMean(name, guildNames)));
        }
      }
    }
  }

  private static void climate(Climate climate, SourceLocations where,
      List<ScenarioProblem> problems) {
    csvExists(climate.baselineCsv(), "/climate/baselineCsv", where, problems);
    List<ClimatePath> paths = climate.paths();
    nonEmpty(paths, "/climate/paths", "climate path", where, problems);
    names(paths, ClimatePath::name, "/climate/paths", "climate path", where, problems);
    for (int i = 0; i < paths.size(); i++) {
      ClimatePath path = paths.get(i);
      String at = Texts.child("/climate/paths", i);
      if (!CO2_PATHWAYS.contains(path.co2Pathway())) {
        problems.add(where.at(Texts.child(at, "co2Pathway"), "found "
            + Texts.quote(path.co2Pathway()) + " (expected one of "
            + Texts.quotedList(CO2_PATHWAYS) + ")"
            + Texts.didYouMean(path.co2Pathway(), CO2_PATHWAYS)));
      }
      boolean delta = path.deltaChange() != null;
      boolean series = path.monthlySeriesCsv() != null;
      if (delta && series) {
        problems.add(where.at(at, "both deltaChange and monthlySeriesCsv are given (expected "
            + "exactly one of them)"));
      } else if (!delta && !series) {
        problems.add(where.at(at, "neither deltaChange nor monthlySeriesCsv is given (expected "
            + "exactly one of them)"));
      }
      if (delta) {
        anchors(path.deltaChange(), Texts.child(at, "deltaChange"), where, problems);
      }
      if (series) {
        csvExists(path.monthlySeriesCsv(), Texts.child(at, "monthlySeriesCsv"), where,
            problems);
      }
    }
  }

  private static void anchors(List<DeltaChange> anchors, String at, SourceLocations where,
      List<ScenarioProblem> problems) {
    if (anchors.isEmpty()) {
      problems.add(where.at(at, "found an empty list (expected at least one anchor year)"));
    }
    for (int k = 1; k < anchors.size(); k++) {
      int previous = anchors.get(k - 1).year();
      int year = anchors.get(k).year();
      if (year <= previous) {
        problems.add(where.at(Texts.child(Texts.child(at, k), "year"), year
            + " is not after the previous anchor year " + previous
            + " (expected strictly increasing anchor years)"));
      }
    }
  }

  /** {@code a + b} as decimals, so that 0.7 + 0.45 shows as 1.15, not 1.1499999999999999. */
  private static String decimalSum(double a, double b) {
    return BigDecimal.valueOf(a).add(BigDecimal.valueOf(b)).stripTrailingZeros().toPlainString();
  }

  /** Adds a problem unless {@code initial > threshold}, or both are 0. */
  private static void threshold(double initial, double threshold, String at,
      SourceLocations where, List<ScenarioProblem> problems) {
    boolean absentAtStart = initial == 0 && threshold == 0;
    if (!(threshold < initial) && !absentAtStart) {
      problems.add(where.at(Texts.child(at, "quasiExtinctionAbundance"),
          Texts.number(threshold) + " is not below initialAbundance " + Texts.number(initial)
              + " (expected quasiExtinctionAbundance < initialAbundance, head; a population "
              + "that starts at zero needs a threshold of 0)"));
    }
  }

  private static void nonEmpty(List<?> list, String at, String what, SourceLocations where,
      List<ScenarioProblem> problems) {
    if (list.isEmpty()) {
      problems.add(where.at(at, "found an empty list (expected at least one " + what + ")"));
    }
  }

  /** Names must be non-blank and unique; a repeat is reported where it repeats. */
  private static <T> void names(List<T> items, Function<T, String> name, String list,
      String what, SourceLocations where, List<ScenarioProblem> problems) {
    Map<String, Integer> seen = new HashMap<>();
    for (int i = 0; i < items.size(); i++) {
      String value = name.apply(items.get(i));
      String at = Texts.child(Texts.child(list, i), "name");
      if (value.isBlank()) {
        problems.add(where.at(at, "found " + Texts.quote(value) + " (expected a " + what
            + " name that is not blank)"));
        continue;
      }
      Integer first = seen.putIfAbsent(value, i);
      if (first != null) {
        problems.add(where.at(at, "duplicate " + what + " name " + Texts.quote(value)
            + " (also at " + Texts.child(Texts.child(list, first), "name")
            + "; names must be unique)"));
      }
    }
  }

  private static void csvExists(String name, String at, SourceLocations where,
      List<ScenarioProblem> problems) {
    if (name.isBlank()) {
      problems.add(where.at(at, "found " + Texts.quote(name) + " (expected a CSV file name)"));
      return;
    }
    Path file = resolve(where.file(), name);
    if (file == null) {
      problems.add(where.at(at, "found " + Texts.quote(name) + ", which is not a valid file "
          + "name on this system"));
    } else if (!Files.isRegularFile(file)) {
      problems.add(where.at(at, (Files.exists(file) ? "not a file: " : "file not found: ")
          + file + " (names are relative to the scenario file's directory)"));
    }
  }

  /**
   * A CSV name from a scenario file, resolved against that file's directory; {@code null} if it
   * is not a valid path on this system.
   */
  static Path resolve(Path scenarioFile, String name) {
    try {
      Path directory = scenarioFile.getParent();
      Path path = directory == null ? Path.of(name) : directory.resolve(name);
      return path.normalize();
    } catch (InvalidPathException e) {
      return null;
    }
  }
}
