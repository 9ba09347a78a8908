package veldplan.shared.scenario;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;
import java.util.function.Function;
import java.util.stream.Collectors;
import java.util.stream.Stream;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Every malformed file in {@code scenarios/invalid/} against the problems it must produce: the
 * pointer, the line and column, and fragments of the message. Each file must produce exactly the
 * problems listed, so a fixture that grows an unintended second problem fails too.
 *
 * <p>Lines and columns are 1-based and refer to the fixture files; each fixture is a copy of
 * {@code scenarios/valid/scenario.yaml} (or {@code .json}, or {@code policy.yaml}) with the
 * change its first-line comment describes. A column of 0 in an expectation means "not checked".
 */
class InvalidScenarioFilesTest {

  /** How a fixture is read. */
  enum Kind {
    /** {@link ScenarioReader#load(Path)}. */
    SCENARIO,
    /** {@link ScenarioReader#readPolicy(Path, Scenario)} against the valid scenario. */
    POLICY
  }

  /**
   * One expected problem.
   *
   * @param otherFile  the file the problem is in, relative to {@code invalid/}, or {@code null}
   *                   for the fixture itself
   * @param pointer    expected pointer (JSON pointer, or CSV column name)
   * @param line       expected line
   * @param column     expected column, or 0 for "not checked"
   * @param fragments  texts the message must contain
   */
  record Expected(String otherFile, String pointer, int line, int column, List<String> fragments) {
    @Override
    public String toString() {
      return (otherFile == null ? "" : otherFile + ": ") + "line " + line + ", column " + column
          + ", " + pointer + ": " + fragments;
    }
  }

  private static Path invalidDir;
  private static Scenario validScenario;

  @BeforeAll
  static void setUp() throws ScenarioException {
    invalidDir = ScenarioReaderValidTest.resource("invalid");
    validScenario = ScenarioReader.read(ScenarioReaderValidTest.resource("valid/scenario.yaml"));
  }

  static Expected at(String pointer, int line, int column, String... fragments) {
    return new Expected(null, pointer, line, column, List.of(fragments));
  }

  static Expected inFile(String file, String pointer, int line, int column,
      String... fragments) {
    return new Expected(file, pointer, line, column, List.of(fragments));
  }

  static Arguments scenario(String file, Expected... expected) {
    return Arguments.of(file, Kind.SCENARIO, List.of(expected));
  }

  static Arguments policy(String file, Expected... expected) {
    return Arguments.of(file, Kind.POLICY, List.of(expected));
  }

  static Stream<Arguments> cases() {
    return Stream.of(
        // Structure: fields, types, ranges (TreeChecker).
        scenario("unknown-field-top.yaml",
            at("/horizonYear", 4, 1, "unknown field; did you mean \"horizonYears\"?"),
            at("", 2, 1, "missing required field \"horizonYears\" (years)")),
        scenario("unknown-field-nested.yaml",
            at("/park/blocks/0/sandFractoin", 10, 7,
                "unknown field; did you mean \"sandFraction\"?"),
            at("/park/blocks/0", 8, 7, "missing required field \"sandFraction\" (mass fraction)")),
        scenario("unknown-field.json",
            at("/park/blocks/0/clayFractoin", 12, 9,
                "unknown field; did you mean \"clayFraction\"?"),
            at("/park/blocks/0", 8, 7, "missing required field \"clayFraction\" (mass fraction)")),
        scenario("missing-required.yaml",
            at("/park/blocks/1", 21, 7, "missing required field \"areaHa\" (ha)")),
        scenario("explicit-null.yaml",
            at("/park/blocks/0/areaHa", 9, 14, "found null (expected a number, ha)")),
        scenario("wrong-type.yaml",
            at("/guilds/1/bodyMassKg", 46, 17, "found text \"heavy\" (expected a number, kg)")),
        scenario("wrong-type.json",
            at("/horizonYears", 4, 19, "found text \"five\" (expected a whole number, years)")),
        scenario("wrong-container.yaml",
            at("/predators/0/preyGuilds", 64, 17, "found text \"impala\" (expected a list)")),
        scenario("root-list.yaml",
            at("", 2, 1, "found a list (expected an object)")),
        scenario("non-integer.yaml",
            at("/park/blocks/0/artificialWaterPoints", 17, 30,
                "found 2.5 (expected a whole number, water points)")),
        scenario("int-overflow.yaml",
            at("/stochastic/replicates", 89, 15,
                "3000000000 is out of range (expected 1 <= value <= 100000, replicates)")),
        scenario("enum-typo.yaml",
            at("/policy/burning/1/season", 100, 15,
                "found \"late_dry\" (expected one of \"early-dry\", \"late-dry\"); "
                    + "did you mean \"late-dry\"?")),
        scenario("out-of-range.yaml",
            at("/guilds/1/grassDietFraction", 47, 24,
                "1.3 is out of range (expected 0 <= value <= 1, fraction)")),
        scenario("negative-area.yaml",
            at("/park/blocks/0/areaHa", 9, 15,
                "-50 is out of range (expected 1 <= value <= 10000000, ha)")),
        scenario("not-finite.yaml",
            at("/elephants/bodyMassKg", 69, 15, "found .nan (expected a finite number, kg)")),
        scenario("not-finite.json",
            at("/elephants/bodyMassKg", 100, 19, "found 1e400 (expected a finite number, kg)")),
        scenario("yaml-alias.yaml",
            at("/guilds/1/bodyMassKg", 46, 17, "found the YAML alias *mass",
                "aliases are not supported")),
        scenario("several-problems.yaml",
            at("/horizonYears", 4, 15, "found text \"five\" (expected a whole number, years)"),
            at("/park/blocks/0", 8, 7, "missing required field \"sandFraction\""),
            at("/park/blocks/0/sandFractoin", 10, 7, "did you mean \"sandFraction\"?"),
            at("/guilds/0/grassDietFraction", 38, 24, "1.3 is out of range"),
            at("/policy/burning/0/season", 97, 15,
                "found \"early\" (expected one of \"early-dry\", \"late-dry\"); "
                    + "did you mean \"early-dry\"?")),

        // The optimisation section (OptimisationRules, TreeChecker).
        scenario("optimisation-typos.yaml",
            at("/optimisation/objectives/0/measure", 119, 18, "found \"guild-persist\"",
                "did you mean \"guilds-persist\"?"),
            at("/optimisation/levers/elephantOfftakeFractionPerYer", 123, 5,
                "unknown field; did you mean \"elephantOfftakeFractionPerYear\"?")),
        scenario("optimisation-no-lever.yaml",
            at("/optimisation/pathPercentile", 121, 19, "found a percentile with overPaths"
                + " other than \"percentile\""),
            at("/optimisation/levers", 124, 5, "no lever is searched")),
        scenario("optimisation-rules.yaml",
            at("/optimisation/objectives", 119, 5, "found 5 objectives (expected 1 to 4)"),
            at("/optimisation/objectives/0", 119, 7, "guild-persists without a guild"),
            at("/optimisation/objectives/1/guild", 120, 41, "found \"kuduu\", which is not a"
                + " guild", "did you mean \"kudu\"?"),
            at("/optimisation/objectives/2/guild", 121, 42, "expected guild only with"
                + " guild-persists"),
            at("/optimisation/objectives/3", 122, 7, "large-tree-target-met needs a target"),
            at("/optimisation/overPaths", 124, 14, "found \"percentile\" without"
                + " pathPercentile"),
            at("/optimisation/constraints/0", 126, 7, "found a threshold with no limit"),
            at("/optimisation/constraints/1/atMost", 127, 58, "0.8 is below atLeast 1.2"),
            at("/optimisation/elephantBandPerKm2/max", 128, 40, "0.5 is not above min 1.5"),
            at("/optimisation/levers/allowNoPlannedBurning", 130, 28, "found true without"
                + " fireReturnIntervalYears"),
            at("/optimisation/levers/burnSeasons", 131, 18, "a season is listed twice"),
            at("/optimisation/levers/targetFractionBurnt/max", 132, 43, "0.2 is below min 0.8"),
            at("/optimisation/levers/waterPointClosureYears", 133, 29, "2031 to 2040 leaves the"
                + " simulated years (expected 2030 <= min <= max <= 2035")),

        // Syntax (DocumentParser).
        scenario("duplicate-key.yaml",
            at("/park/blocks/0/areaHa", 10, 7,
                "duplicate field \"areaHa\" (first given on line 9)")),
        scenario("syntax-error.yaml",
            at("", 65, 22, "invalid YAML", "flow sequence")),
        scenario("syntax-error.json",
            at("", 4, 3, "invalid JSON", "expecting comma")),
        scenario("trailing-content.json",
            at("", 177, 1, "found more content after the end of the document")),
        scenario("empty.yaml",
            at("", 1, 1, "the file is empty")),

        // Rules across fields (ScenarioValidator).
        scenario("sand-clay-over-one.yaml",
            at("/park/blocks/0/clayFraction", 11, 21, "sandFraction + clayFraction is 0.7 + "
                + "0.45 = 1.15 (expected sandFraction + clayFraction <= 1, mass fraction)")),
        scenario("duplicate-block-names.yaml",
            at("/park/blocks/1/name", 21, 13,
                "duplicate block name \"North Flats\" (also at /park/blocks/0/name"),
            // The policy's entry for the block that was renamed away now names no block.
            at("/policy/burning/1/block", 99, 14, "found \"Mopane Ridge\", which is not a block")),
        scenario("quasi-extinction-threshold.yaml",
            at("/guilds/1/quasiExtinctionAbundance", 50, 31,
                "400 is not below initialAbundance 400")),
        scenario("prey-unknown.yaml",
            at("/predators/0/preyGuilds/1", 64, 26, "found \"bufalo\", which is not a guild "
                + "(expected one of \"impala\", \"buffalo\", \"kudu\"); "
                + "did you mean \"buffalo\"?")),
        scenario("policy-unknown-block.yaml",
            at("/policy/burning/0/block", 95, 14, "found \"Nort Flats\", which is not a block "
                + "(expected one of \"North Flats\", \"Mopane Ridge\"); "
                + "did you mean \"North Flats\"?")),
        scenario("policy-duplicate-block.yaml",
            at("/policy/burning/1/block", 99, 14, "block \"North Flats\" already has an entry "
                + "at /policy/burning/0 (expected at most one entry per block)")),
        scenario("open-points-too-many.yaml",
            at("/policy/waterPoints/0/openPoints", 107, 19,
                "5 is more than block \"North Flats\" has (expected 0 <= value <= 3")),
        scenario("closure-year-outside.yaml",
            at("/policy/waterPoints/0/closureYear", 108, 20,
                "2036 is outside the simulated years (expected 2030 <= value <= 2035")),
        scenario("climate-path-both.yaml",
            at("/climate/paths/0", 80, 7, "both deltaChange and monthlySeriesCsv are given")),
        scenario("climate-path-neither.yaml",
            at("/climate/paths/1", 85, 7, "neither deltaChange nor monthlySeriesCsv is given")),
        scenario("climate-no-paths.yaml",
            at("/climate/paths", 79, 10,
                "found an empty list (expected at least one climate path)")),
        scenario("anchors-not-increasing.yaml",
            at("/climate/paths/0/deltaChange/1/year", 84, 18,
                "2030 is not after the previous anchor year 2030")),
        scenario("co2-unknown.yaml",
            at("/climate/paths/0/co2Pathway", 81, 19, "found \"SSP2-45\" (expected one of "
                + "\"SSP1-2.6\", \"SSP2-4.5\", \"SSP3-7.0\", \"SSP5-8.5\"); "
                + "did you mean \"SSP2-4.5\"?")),

        // Climate CSV files (ClimateTable, via the scenario).
        scenario("csv-missing.yaml",
            at("/climate/baselineCsv", 78, 16, "file not found: ", "no-such-baseline.csv")),
        scenario("csv-bad-header.yaml",
            inFile("csv/bad-header.csv", "", 2, 12,
                "found the header \"year,month,rainfall,tmin_c,tmax_c\" "
                    + "(expected \"year,month,rainfall_mm,tmin_c,tmax_c\")")),
        scenario("csv-not-a-number.yaml",
            inFile("csv/not-a-number.csv", "rainfall_mm", 17, 8,
                "found \"n/a\" (expected a number, mm)")),
        scenario("csv-tmin-above-tmax.yaml",
            inFile("csv/tmin-above-tmax.csv", "tmin_c", 33, 12,
                "tmin_c 25.0 is above tmax_c 20.0 (expected tmin_c <= tmax_c, degrees C)")),
        scenario("csv-missing-month.yaml",
            inFile("csv/missing-month.csv", "month", 43, 6,
                "found year 2003, month 6 (expected year 2003, month 5")),
        scenario("series-too-short.yaml",
            at("/climate/paths/1/monthlySeriesCsv", 87, 25, "the series covers 2030 to 2032 "
                + "(expected at least the simulated years 2030 to 2034)")),

        // Policy files.
        policy("policy-file-unknown-field.yaml",
            at("/burning/0/fireReturnIntervalYear", 5, 5,
                "unknown field; did you mean \"fireReturnIntervalYears\"?")),
        policy("policy-file-unknown-block.yaml",
            at("/burning/1/block", 8, 12, "found \"Mopane Rdge\", which is not a block",
                "did you mean \"Mopane Ridge\"?")));
  }

  @ParameterizedTest(name = "{0}")
  @MethodSource("cases")
  void read_invalidFile_reportsExactlyTheExpectedProblems(String name, Kind kind,
      List<Expected> expected) {
    Path file = invalidDir.resolve(name);
    ScenarioException e = assertThrows(ScenarioException.class, () -> {
      if (kind == Kind.SCENARIO) {
        ScenarioReader.load(file);
      } else {
        ScenarioReader.readPolicy(file, validScenario);
      }
    });
    String report = e.report();
    assertEquals(file, e.file());
    List<ScenarioProblem> unmatched = new ArrayList<>(e.problems());
    for (Expected want : expected) {
      Path wantFile = want.otherFile() == null ? file
          : invalidDir.resolve(want.otherFile()).normalize();
      ScenarioProblem match = unmatched.stream()
          .filter(p -> p.file().normalize().equals(wantFile.normalize())
              && p.pointer().equals(want.pointer())
              && p.line() == want.line()
              && (want.column() == 0 || p.column() == want.column())
              && want.fragments().stream().allMatch(p.message()::contains))
          .findFirst()
          .orElse(null);
      if (match == null) {
        fail("no problem matches " + want + "\n" + report);
      }
      unmatched.remove(match);
    }
    assertTrue(unmatched.isEmpty(), "unexpected problems " + unmatched + "\n" + report);
  }

  @Test
  void invalidDirectory_everyFixtureHasACase_atLeast25() throws IOException {
    Set<String> covered = cases().map(a -> (String) a.get()[0])
        .collect(Collectors.toCollection(TreeSet::new));
    Set<String> present;
    try (Stream<Path> files = Files.list(invalidDir)) {
      present = files.filter(Files::isRegularFile)
          .map(p -> p.getFileName().toString())
          .collect(Collectors.toCollection(TreeSet::new));
    }
    assertEquals(present, covered, "every invalid fixture needs a case, and every case a file");
    assertTrue(present.size() >= 25, "at least 25 invalid fixtures: " + present.size());
  }

  @Test
  void read_severalProblems_reportHasOneLinePerProblemInLineOrder() {
    Path file = invalidDir.resolve("several-problems.yaml");
    ScenarioException e = assertThrows(ScenarioException.class, () -> ScenarioReader.read(file));
    List<String> lines = e.report().lines().collect(Collectors.toList());

    assertEquals("error: " + file + ": 5 problems", lines.get(0));
    assertEquals(6, lines.size(), e.report());
    Function<String, Integer> lineOf = text -> Integer.parseInt(
        text.substring("  line ".length(), text.indexOf(',')));
    List<Integer> order = lines.subList(1, 6).stream().map(lineOf).collect(Collectors.toList());
    assertEquals(List.of(4, 8, 10, 38, 97), order, e.report());
    assertEquals("  line 10, column 7, /park/blocks/0/sandFractoin: unknown field; "
        + "did you mean \"sandFraction\"?", lines.get(3));
  }

  @Test
  void climateTable_invalidCsvFixtures_eachReportsItsProblemDirectly() {
    for (String name : List.of("bad-header.csv", "not-a-number.csv", "tmin-above-tmax.csv",
        "missing-month.csv")) {
      Path csv = invalidDir.resolve("csv").resolve(name);
      ScenarioException e = assertThrows(ScenarioException.class, () -> ClimateTable.read(csv),
          name);
      assertEquals(1, e.problems().size(), e.report());
      assertEquals(csv, e.problems().get(0).file());
    }
  }
}
