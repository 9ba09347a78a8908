package veldplan.optimiser.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;
import static veldplan.optimiser.cli.CliTestSupport.cells;
import static veldplan.optimiser.cli.CliTestSupport.example;
import static veldplan.optimiser.cli.CliTestSupport.resource;
import static veldplan.optimiser.cli.CliTestSupport.run;
import static veldplan.optimiser.cli.CliTestSupport.sha256;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import java.util.stream.Collectors;
import java.util.stream.Stream;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import veldplan.model.ParametersFromScenario;
import veldplan.optimiser.cli.CliTestSupport.Result;
import veldplan.optimiser.report.TrajectoryCsv;
import veldplan.shared.scenario.BurnPlan;
import veldplan.shared.scenario.ClimatePath;
import veldplan.shared.scenario.Policy;
import veldplan.shared.scenario.Scenario;
import veldplan.shared.scenario.ScenarioException;
import veldplan.shared.scenario.ScenarioReader;

/**
 * Guards the contract of {@code veldplan simulate}, run in-process through {@link Main#execute}:
 * <ul>
 *   <li>on the example park it writes {@code trajectories.csv} (header, one row per year x path x
 *       replicate x entity, finite numbers or empty cells) and {@code run.json} (scenario and
 *       policy hashes, seed, replicates, climate paths), and prints the summary and the
 *       cautions;</li>
 *   <li>reproducibility: the CSV does not depend on {@code --threads}, does depend on
 *       {@code --seed}, and adding replicates leaves the earlier ones unchanged;</li>
 *   <li>{@code --policy} replaces the scenario's policy and is recorded;</li>
 *   <li>bad input (scenario, policy, climate file or command line) exits with 2, locates every
 *       problem (file, line, column, JSON pointer) and writes nothing;</li>
 *   <li>an output failure exits with 1, names the path, and shows a stack trace only with
 *       {@code --debug}.</li>
 * </ul>
 * The example's numbers are invented demo data: nothing here pins a simulated value.
 */
class SimulateCommandTest {

  private static final ObjectMapper JSON = new ObjectMapper();

  /** Columns of the CSV that hold text; every other column is numeric. */
  private static final Set<String> TEXT_COLUMNS = Set.of("path", "entity_kind", "entity");

  private static Path exampleFile;
  private static Scenario exampleScenario;

  @TempDir
  Path tmp;

  @BeforeAll
  static void loadExample() throws ScenarioException {
    exampleFile = example("duskveld", "scenario.yaml");
    exampleScenario = ScenarioReader.load(exampleFile).scenario();
  }

  // ---------------------------------------------------------------------------------------------
  // Successful runs

  @Test
  void simulate_exampleMildPathTwoReplicates_writesCsvProvenanceAndSummary() throws IOException {
    Path out = tmp.resolve("out");
    Result r = run("simulate", exampleFile.toString(), "--replicates", "2", "--path", "mild",
        "--out", out.toString());

    assertEquals(ExitCodes.OK, r.exitCode(), r.transcript());
    Path csv = out.resolve("trajectories.csv");
    Path runJson = out.resolve("run.json");
    assertTrue(Files.isRegularFile(csv), "no trajectories.csv in " + out);
    assertTrue(Files.isRegularFile(runJson), "no run.json in " + out);

    // The CSV: header, row count from the scenario, cell structure.
    Scenario sc = exampleScenario;
    int blocks = sc.park().blocks().size();
    int guilds = sc.guilds().size();
    int predators = sc.predators().size();
    int entitiesPerYear = blocks + guilds + 1 + predators + 1;
    int paths = 1;
    int replicates = 2;
    List<String> lines = Files.readAllLines(csv, StandardCharsets.UTF_8);
    assertEquals(TrajectoryCsv.header(ParametersFromScenario.parameters(sc)), lines.get(0),
        "CSV header");
    // The park's costs carry the scenario's currency (USD in the example) in their names.
    String currency = sc.costs().currency().toLowerCase(Locale.ROOT);
    assertEquals("usd", currency, "the example's currency changed; update this test");
    List<String> header = cells(lines.get(0));
    for (String cost : List.of("cost_burning", "cost_elephant_offtake", "cost_contraception",
        "cost_water_points", "cost_total", "cost_present_value")) {
      assertTrue(header.contains(cost + "_" + currency),
          "no column " + cost + "_" + currency + " in " + header);
      assertFalse(header.contains(cost), "column " + cost + " has no currency: " + header);
    }
    assertTrue(header.contains("elephants_removed_head") && header.contains("co2_ppm"),
        "the park's non-cost columns changed: " + header);
    assertEquals(sc.horizonYears() * paths * replicates * entitiesPerYear + 1, lines.size(),
        "rows = years x paths x replicates x entities + header");
    List<Map<String, String>> rows = parseCsv(csv);
    assertAllNumericCellsFiniteOrEmpty(rows, csv);

    Map<String, Integer> perKind = new HashMap<>();
    Set<Integer> years = new TreeSet<>();
    Set<String> replicateLabels = new TreeSet<>();
    for (Map<String, String> row : rows) {
      assertEquals("mild", row.get("path"), "only the requested climate path is written");
      perKind.merge(row.get("entity_kind"), 1, Integer::sum);
      years.add(Integer.parseInt(row.get("calendar_year")));
      replicateLabels.add(row.get("replicate"));
    }
    int runsTimesYears = sc.horizonYears() * paths * replicates;
    assertEquals(Map.of("block", blocks * runsTimesYears, "guild", guilds * runsTimesYears,
        "elephants", runsTimesYears, "predator", predators * runsTimesYears,
        "park", runsTimesYears), perKind, "rows per entity kind");
    assertEquals(sc.horizonYears(), years.size(), "distinct calendar years");
    assertEquals(sc.startYear(), years.iterator().next(), "first calendar year");
    assertEquals(Set.of("1", "2"), replicateLabels, "replicate labels");
    Set<String> blockNames = rows.stream().filter(row -> row.get("entity_kind").equals("block"))
        .map(row -> row.get("entity")).collect(Collectors.toCollection(TreeSet::new));
    Set<String> expectedBlocks = sc.park().blocks().stream().map(b -> b.name())
        .collect(Collectors.toCollection(TreeSet::new));
    assertEquals(expectedBlocks, blockNames, "block names in the CSV");
    if (plansBurning(sc.policy())) {
      assertTrue(maxPlannedBurnt(rows) > 0, "the scenario's policy plans burns, but the "
          + "planned_burnt_fraction column is zero everywhere");
    }

    // run.json: provenance.
    JsonNode json = JSON.readTree(runJson.toFile());
    assertEquals("simulate", json.path("command").asText(), "run.json command");
    assertEquals(sha256(exampleFile), json.path("scenarioSha256").asText(), "scenario SHA-256");
    assertTrue(json.path("seed").canConvertToLong(), "run.json seed: " + json.path("seed"));
    assertEquals(sc.stochastic().seed(), json.path("seed").asLong(), "run.json seed");
    assertEquals(2, json.path("replicates").asInt(-1), "run.json replicates");
    assertEquals(List.of("mild"), textList(json.path("climatePaths")), "run.json climatePaths");
    assertEquals(sc.policy().name(), json.path("policy").asText(), "run.json policy");
    assertFalse(json.has("policyFile"), "no policy file was given");
    assertEquals(sc.horizonYears(), json.path("horizonYears").asInt(-1), "run.json horizon");
    assertEquals(sc.startYear(), json.path("startYear").asInt(-1), "run.json startYear");

    // stdout: the summary's header lines and the cautions.
    int endYear = sc.startYear() + sc.horizonYears() - 1;
    String summaryHeader = String.format(Locale.ROOT,
        "Policy \"%s\": 1 climate path(s) x 2 replicate(s), %d-%d.", sc.policy().name(),
        sc.startYear(), endYear);
    assertTrue(r.out().contains(summaryHeader),
        "stdout lacks the summary header line \"" + summaryHeader + "\"\n" + r.transcript());
    assertTrue(r.out().lines().anyMatch(l -> l.startsWith("indicator") && l.contains("mild")),
        "stdout lacks the summary table header\n" + r.transcript());
    assertTrue(r.out().contains("CAUTION"), "stdout lacks the cautions\n" + r.transcript());
  }

  @Test
  void simulate_oneThreadOrTwo_writesByteIdenticalTrajectories() throws IOException {
    byte[] one = simulateExample(tmp.resolve("t1"), "--replicates", "2", "--threads", "1");
    byte[] two = simulateExample(tmp.resolve("t2"), "--replicates", "2", "--threads", "2");
    String header = TrajectoryCsv.header(ParametersFromScenario.parameters(exampleScenario));
    assertTrue(one.length > header.length(), "trajectories.csv has no rows");
    assertArrayEquals(one, two, "trajectories.csv differs between --threads 1 and --threads 2");
  }

  @Test
  void simulate_otherSeed_writesDifferentTrajectoriesAndRecordsTheSeed() throws IOException {
    long otherSeed = exampleScenario.stochastic().seed() + 1;
    byte[] base = simulateExample(tmp.resolve("a"), "--replicates", "1", "--threads", "2");
    byte[] other = simulateExample(tmp.resolve("b"), "--replicates", "1", "--threads", "2",
        "--seed", Long.toString(otherSeed));
    assertFalse(Arrays.equals(base, other),
        "--seed " + otherSeed + " gives the same trajectories.csv as the scenario's seed");
    JsonNode json = JSON.readTree(tmp.resolve("b").resolve("run.json").toFile());
    assertEquals(otherSeed, json.path("seed").asLong(), "run.json records the --seed value");
  }

  @Test
  void simulate_moreReplicates_leavesEarlierReplicatesUnchanged() throws IOException {
    String path = exampleScenario.climate().paths().get(0).name();
    simulateExample(tmp.resolve("r1"), "--replicates", "1", "--path", path);
    simulateExample(tmp.resolve("r2"), "--replicates", "2", "--path", path);
    List<Map<String, String>> one = parseCsv(tmp.resolve("r1").resolve("trajectories.csv"));
    List<Map<String, String>> firstOfTwo =
        parseCsv(tmp.resolve("r2").resolve("trajectories.csv")).stream()
            .filter(row -> row.get("replicate").equals("1")).toList();
    assertFalse(one.isEmpty(), "no rows");
    assertEquals(one, firstOfTwo,
        "replicate 1 changed when a second replicate was added (common random numbers)");
  }

  @Test
  void simulate_onePathAlone_sameReplicatesAsInAFullRun() throws IOException {
    // The reproducibility contract: a path keeps its random streams when run alone.
    List<ClimatePath> paths = exampleScenario.climate().paths();
    String last = paths.get(paths.size() - 1).name();
    simulateExample(tmp.resolve("alone"), "--replicates", "1", "--path", last);
    simulateExample(tmp.resolve("all"), "--replicates", "1");
    List<Map<String, String>> alone = parseCsv(tmp.resolve("alone").resolve("trajectories.csv"));
    List<Map<String, String>> inFull =
        parseCsv(tmp.resolve("all").resolve("trajectories.csv")).stream()
            .filter(row -> row.get("path").equals(last)).toList();
    assertFalse(alone.isEmpty(), "no rows");
    assertEquals(alone, inFull, "path " + last + " alone differs from the same path in a full run");
  }

  @Test
  void simulate_noInterventionPolicyFile_recordsPolicyAndPlansNoBurns() throws Exception {
    Path policyFile = example("duskveld", "policies", "no-intervention.yaml");
    Policy policy = ScenarioReader.readPolicy(policyFile, exampleScenario);
    Path out = tmp.resolve("out");
    Result r = run("simulate", exampleFile.toString(), "--policy", policyFile.toString(),
        "--replicates", "1", "--out", out.toString());

    assertEquals(ExitCodes.OK, r.exitCode(), r.transcript());
    JsonNode json = JSON.readTree(out.resolve("run.json").toFile());
    assertEquals(policy.name(), json.path("policy").asText(), "run.json policy name");
    assertEquals(sha256(policyFile), json.path("policySha256").asText(), "policy SHA-256");
    assertEquals(sha256(exampleFile), json.path("scenarioSha256").asText(), "scenario SHA-256");
    List<String> pathNames = exampleScenario.climate().paths().stream()
        .map(ClimatePath::name).toList();
    assertEquals(pathNames, textList(json.path("climatePaths")), "all paths by default");

    List<Map<String, String>> rows = parseCsv(out.resolve("trajectories.csv"));
    assertAllNumericCellsFiniteOrEmpty(rows, out.resolve("trajectories.csv"));
    long blockRows = 0;
    for (Map<String, String> row : rows) {
      String planned = row.get("planned_burnt_fraction");
      if (row.get("entity_kind").equals("block")) {
        blockRows++;
        assertEquals(0.0, Double.parseDouble(planned),
            "planned burning under \"" + policy.name() + "\": " + row);
      } else {
        assertEquals("", planned, "planned_burnt_fraction applies to blocks only: " + row);
      }
    }
    assertTrue(blockRows > 0, "no block rows");
    assertTrue(r.out().contains("Policy \"" + policy.name() + "\""),
        "the summary names the policy\n" + r.transcript());
  }

  // ---------------------------------------------------------------------------------------------
  // Bad input: exit 2, problems located, nothing written

  /**
   * One broken input file and the problem it must be reported with.
   *
   * @param fixture  the broken file, under {@code scenarios/invalid/}
   * @param isPolicy whether it is given as {@code --policy} (with the valid scenario)
   * @param line     expected line of the problem
   * @param column   expected column
   * @param pointer  expected JSON pointer
   * @param fragment a text the message must contain
   */
  record BadFile(String fixture, boolean isPolicy, int line, int column, String pointer,
      String fragment) {
    @Override
    public String toString() {
      return fixture;
    }
  }

  static Stream<Arguments> badFiles() {
    List<BadFile> files = List.of(
        new BadFile("unknown-field-nested.yaml", false, 10, 7, "/park/blocks/0/sandFractoin",
            "did you mean \"sandFraction\""),
        new BadFile("wrong-type.yaml", false, 46, 17, "/guilds/1/bodyMassKg",
            "found text \"heavy\""),
        new BadFile("out-of-range.yaml", false, 47, 24, "/guilds/1/grassDietFraction",
            "out of range"),
        new BadFile("csv-missing.yaml", false, 78, 16, "/climate/baselineCsv",
            "no-such-baseline.csv"),
        new BadFile("policy-file-unknown-block.yaml", true, 8, 12, "/burning/1/block",
            "Mopane Rdge"));
    List<Arguments> cases = new ArrayList<>();
    for (BadFile file : files) {
      cases.add(Arguments.of(file, false));
      cases.add(Arguments.of(file, true));
    }
    return cases.stream();
  }

  @ParameterizedTest(name = "{0}, earlier output present: {1}")
  @MethodSource("badFiles")
  void simulate_brokenInputFile_exitsTwoLocatesProblemAndWritesNothing(BadFile bad,
      boolean earlierOutput) throws IOException {
    Path broken = resource("scenarios/invalid/" + bad.fixture());
    Path scenario = bad.isPolicy() ? resource("scenarios/valid/scenario.yaml") : broken;
    Path out = tmp.resolve("out");
    byte[] oldCsv = "old,content\n1,2\n".getBytes(StandardCharsets.UTF_8);
    if (earlierOutput) {
      Files.createDirectories(out);
      Files.write(out.resolve("trajectories.csv"), oldCsv);
    }
    List<String> args = new ArrayList<>(List.of("simulate", scenario.toString()));
    if (bad.isPolicy()) {
      args.addAll(List.of("--policy", broken.toString()));
    }
    args.addAll(List.of("--replicates", "1", "--out", out.toString()));

    Result r = run(args.toArray(String[]::new));

    assertEquals(ExitCodes.BAD_INPUT, r.exitCode(), r.transcript());
    String where = "line " + bad.line() + ", column " + bad.column() + ", " + bad.pointer()
        + ": ";
    assertTrue(r.err().contains(broken.toString()),
        "stderr does not name " + broken + "\n" + r.transcript());
    assertTrue(r.err().lines().anyMatch(l -> l.contains(where) && l.contains(bad.fragment())),
        "stderr lacks a line with \"" + where + "\" and \"" + bad.fragment() + "\"\n"
            + r.transcript());
    assertNoStackTrace(r);
    assertNoSummary(r);
    if (earlierOutput) {
      assertArrayEquals(oldCsv, Files.readAllBytes(out.resolve("trajectories.csv")),
          "the earlier trajectories.csv was changed by a failed run");
      try (Stream<Path> left = Files.list(out)) {
        assertEquals(List.of(out.resolve("trajectories.csv")), left.toList(),
            "a failed run left files in " + out);
      }
    } else {
      assertFalse(Files.exists(out), "a failed run created " + out);
    }
  }

  @Test
  void simulate_soilTheModelCannotUse_exitsTwoNamingFileAndBlockAndWritesNothing()
      throws IOException, ScenarioException {
    // Passes the reader (every value in range) but gives no ordered soil water contents.
    Path scenario = resource("scenarios/unusable-soil/scenario.yaml");
    ScenarioReader.load(scenario);
    Path out = tmp.resolve("out");
    byte[] oldCsv = "old,content\n1,2\n".getBytes(StandardCharsets.UTF_8);
    Files.createDirectories(out);
    Files.write(out.resolve("trajectories.csv"), oldCsv);

    Result r = run("simulate", scenario.toString(), "--replicates", "1", "--out", out.toString());

    assertEquals(ExitCodes.BAD_INPUT, r.exitCode(), r.transcript());
    List<String> lines = r.err().lines().toList();
    assertEquals("error: " + scenario + ": 1 problem", lines.get(0), r.transcript());
    assertTrue(lines.size() > 1 && lines.get(1).startsWith("  /park/blocks/1"),
        "the problem line does not start with the JSON pointer of the second block, "
            + "/park/blocks/1\n" + r.transcript());
    assertNoStackTrace(r);
    assertNoSummary(r);
    assertArrayEquals(oldCsv, Files.readAllBytes(out.resolve("trajectories.csv")),
        "the earlier trajectories.csv was changed by a failed run");
    try (Stream<Path> left = Files.list(out)) {
      assertEquals(List.of(out.resolve("trajectories.csv")), left.toList(),
          "a failed run left files in " + out);
    }
  }

  @Test
  void simulate_unknownPathName_exitsTwoListingValidNames() {
    Path out = tmp.resolve("out");
    Result r = run("simulate", exampleFile.toString(), "--path", "no-such-path",
        "--out", out.toString());

    assertEquals(ExitCodes.BAD_INPUT, r.exitCode(), r.transcript());
    assertTrue(r.err().contains("no-such-path"), "stderr names the bad path\n" + r.transcript());
    for (ClimatePath path : exampleScenario.climate().paths()) {
      assertTrue(r.err().contains(path.name()),
          "stderr does not list the valid path \"" + path.name() + "\"\n" + r.transcript());
    }
    assertNoStackTrace(r);
    assertNoSummary(r);
    assertFalse(Files.exists(out), "a failed run created " + out);
  }

  @Test
  void simulate_zeroReplicates_exitsTwoWritingNothing() {
    Path out = tmp.resolve("out");
    Result r = run("simulate", exampleFile.toString(), "--replicates", "0",
        "--out", out.toString());

    assertEquals(ExitCodes.BAD_INPUT, r.exitCode(), r.transcript());
    assertTrue(r.err().contains("--replicates"), "stderr names the option\n" + r.transcript());
    assertNoSummary(r);
    assertFalse(Files.exists(out), "a failed run created " + out);
  }

  @Test
  void simulate_missingOut_exitsTwoWithUsageError() {
    Result r = run("simulate", exampleFile.toString(), "--replicates", "1");

    assertEquals(ExitCodes.BAD_INPUT, r.exitCode(), r.transcript());
    assertTrue(r.err().contains("--out"), "stderr names the missing option\n" + r.transcript());
    assertTrue(r.err().contains("--help"), "stderr points to --help\n" + r.transcript());
    assertNoStackTrace(r);
    assertNoSummary(r);
  }

  // ---------------------------------------------------------------------------------------------
  // Output failures: exit 1

  @Test
  void simulate_outIsRegularFile_exitsTwoBeforeSimulating() throws IOException {
    // A file where the output folder should be is a command-line problem, found before the
    // (possibly long) simulation runs.
    Path file = Files.writeString(tmp.resolve("not-a-folder"), "keep me\n");
    Result r = run("simulate", resource("scenarios/valid/scenario.yaml").toString(),
        "--replicates", "1", "--out", file.toString());

    assertEquals(ExitCodes.BAD_INPUT, r.exitCode(), r.transcript());
    assertTrue(r.err().contains("--out: " + file), "stderr names " + file + "\n" + r.transcript());
    assertTrue(r.err().contains("not a folder"), r.transcript());
    assertNoStackTrace(r);
    assertNoSummary(r);
    assertEquals("keep me\n", Files.readString(file), "the file given as --out was changed");
  }

  @Test
  void simulate_outInsideARegularFile_exitsOneNamingPathWithoutStackTrace() throws IOException {
    Path file = Files.writeString(tmp.resolve("not-a-folder"), "keep me\n");
    Path out = file.resolve("results");
    Result r = run("simulate", resource("scenarios/valid/scenario.yaml").toString(),
        "--replicates", "1", "--out", out.toString());

    assertEquals(ExitCodes.FAILURE, r.exitCode(), r.transcript());
    assertTrue(r.err().contains(out.toString()), "stderr names " + out + "\n" + r.transcript());
    assertNoStackTrace(r);
    assertNoSummary(r);
    assertEquals("keep me\n", Files.readString(file), "the file in the --out path was changed");
  }

  @Test
  void simulate_outInsideARegularFileWithDebug_exitsOneWithStackTrace() throws IOException {
    Path file = Files.writeString(tmp.resolve("not-a-folder"), "keep me\n");
    Path out = file.resolve("results");
    Result r = run("simulate", resource("scenarios/valid/scenario.yaml").toString(),
        "--replicates", "1", "--out", out.toString(), "--debug");

    assertEquals(ExitCodes.FAILURE, r.exitCode(), r.transcript());
    assertTrue(r.err().contains(out.toString()), "stderr names " + out + "\n" + r.transcript());
    assertTrue(r.err().lines().anyMatch(l -> l.trim().startsWith("at ")),
        "--debug shows no stack trace\n" + r.transcript());
  }

  // ---------------------------------------------------------------------------------------------
  // Helpers

  /** Simulates the example into {@code out} with more options; returns trajectories.csv. */
  private byte[] simulateExample(Path out, String... options) throws IOException {
    List<String> args = new ArrayList<>(List.of("simulate", exampleFile.toString()));
    args.addAll(List.of(options));
    args.addAll(List.of("--out", out.toString()));
    Result r = run(args.toArray(String[]::new));
    assertEquals(ExitCodes.OK, r.exitCode(), r.transcript());
    return Files.readAllBytes(out.resolve("trajectories.csv"));
  }

  /** The CSV as one map per row, column name to cell, checking every row's cell count. */
  private static List<Map<String, String>> parseCsv(Path csv) throws IOException {
    List<String> lines = Files.readAllLines(csv, StandardCharsets.UTF_8);
    List<String> header = cells(lines.get(0));
    List<Map<String, String>> rows = new ArrayList<>();
    for (int i = 1; i < lines.size(); i++) {
      List<String> cells = cells(lines.get(i));
      if (cells.size() != header.size()) {
        fail(csv + " line " + (i + 1) + ": " + cells.size() + " cells, header has "
            + header.size() + ": " + lines.get(i));
      }
      Map<String, String> row = new LinkedHashMap<>();
      for (int c = 0; c < header.size(); c++) {
        row.put(header.get(c), cells.get(c));
      }
      rows.add(row);
    }
    return rows;
  }

  private static void assertAllNumericCellsFiniteOrEmpty(List<Map<String, String>> rows,
      Path csv) {
    for (int i = 0; i < rows.size(); i++) {
      for (Map.Entry<String, String> cell : rows.get(i).entrySet()) {
        if (TEXT_COLUMNS.contains(cell.getKey()) || cell.getValue().isEmpty()) {
          continue;
        }
        double v;
        try {
          v = Double.parseDouble(cell.getValue());
        } catch (NumberFormatException e) {
          throw new AssertionError(csv + " line " + (i + 2) + ", column " + cell.getKey()
              + ": \"" + cell.getValue() + "\" is not a number", e);
        }
        assertTrue(Double.isFinite(v), csv + " line " + (i + 2) + ", column " + cell.getKey()
            + ": " + cell.getValue() + " is not finite");
      }
    }
  }

  private static boolean plansBurning(Policy policy) {
    for (BurnPlan plan : policy.burning()) {
      if (plan.fireReturnIntervalYears() != null && plan.targetFractionBurnt() > 0) {
        return true;
      }
    }
    return false;
  }

  private static double maxPlannedBurnt(List<Map<String, String>> rows) {
    return rows.stream().filter(row -> row.get("entity_kind").equals("block"))
        .mapToDouble(row -> Double.parseDouble(row.get("planned_burnt_fraction")))
        .max().orElse(0);
  }

  private static List<String> textList(JsonNode array) {
    List<String> values = new ArrayList<>();
    array.forEach(node -> values.add(node.asText()));
    return values;
  }

  private static void assertNoSummary(Result r) {
    assertFalse(r.out().contains("climate path(s) x"), "stdout has a summary\n" + r.transcript());
    assertFalse(r.out().lines().anyMatch(l -> l.startsWith("indicator")),
        "stdout has a summary table\n" + r.transcript());
  }

  private static void assertNoStackTrace(Result r) {
    assertFalse(r.err().lines().anyMatch(l -> l.trim().startsWith("at ")),
        "stderr shows a stack trace\n" + r.transcript());
    assertFalse(r.err().contains("Exception"), "stderr names an exception\n" + r.transcript());
  }
}
