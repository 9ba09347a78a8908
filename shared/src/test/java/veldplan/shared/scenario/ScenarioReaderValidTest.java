package veldplan.shared.scenario;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.net.URISyntaxException;
import java.net.URL;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Reading the valid fixtures in {@code scenarios/valid/}. The fixture values are invented; the
 * assertions check that what is in the file arrives in the records, not that it is realistic.
 */
class ScenarioReaderValidTest {

  /** A fixture file on the test classpath, as a path (the reader resolves CSVs next to it). */
  static Path resource(String name) {
    URL url = ScenarioReaderValidTest.class.getResource("/scenarios/" + name);
    if (url == null) {
      throw new IllegalStateException("missing test resource: scenarios/" + name);
    }
    try {
      return Path.of(url.toURI());
    } catch (URISyntaxException e) {
      throw new IllegalStateException(e);
    }
  }

  @Test
  void read_validYaml_fieldsArriveInRecords() throws ScenarioException {
    Scenario s = ScenarioReader.read(resource("valid/scenario.yaml"));

    assertEquals("fixture reserve, baseline plan", s.name());
    assertEquals(2030, s.startYear());
    assertEquals(5, s.horizonYears());
    assertEquals("Sandveld Fixture Reserve", s.park().name());
    assertEquals(2, s.park().blocks().size());
    BurnBlock ridge = s.park().blocks().get(1);
    assertEquals("Mopane Ridge", ridge.name());
    assertEquals(8500.5, ridge.areaHa());
    assertEquals(1, ridge.artificialWaterPoints());
    assertEquals(650, ridge.initialTreesPerHa().from0_5to2m());
    assertEquals(List.of(GuildRole.MIXED_FEEDER, GuildRole.BULK_GRAZER, GuildRole.BROWSER),
        s.guilds().stream().map(Guild::role).toList());
    assertEquals(List.of("impala", "buffalo"), s.predators().get(0).preyGuilds());
    assertEquals(2.0, s.predators().get(0).switchingExponent());
    assertEquals(0.9, s.elephants().contraceptionEfficacy());
    assertEquals(20240611L, s.stochastic().seed());
    ClimatePath mild = s.climate().paths().get(0);
    assertEquals(2, mild.deltaChange().size());
    assertEquals(2060, mild.deltaChange().get(1).year());
    assertEquals(-8, mild.deltaChange().get(1).rainfallChangePercent());
    assertEquals("series-hot-dry.csv", s.climate().paths().get(1).monthlySeriesCsv());
    assertEquals(BurnSeason.EARLY_DRY, s.policy().burning().get(0).season());
    assertEquals(BurnSeason.LATE_DRY, s.policy().burning().get(1).season());
    assertEquals(2032, s.policy().waterPoints().get(0).closureYear());
    assertEquals("XTS", s.costs().currency());
    assertEquals(3, s.costs().discountRatePercent());
  }

  @Test
  void read_optionalFieldsLeftOut_areNull() throws ScenarioException {
    Scenario s = ScenarioReader.read(resource("valid/scenario.yaml"));

    assertNull(s.guilds().get(1).maxGrowthRatePerYear(), "buffalo has no maxGrowthRatePerYear");
    assertNull(s.guilds().get(2).maxDistanceFromWaterKm(), "kudu has no maxDistanceFromWaterKm");
    assertNull(s.policy().burning().get(1).fireReturnIntervalYears(), "no planned burning");
    assertNull(s.policy().elephants().triggerDensityPerKm2(), "act every year");
    assertNull(s.climate().paths().get(0).monthlySeriesCsv());
    assertNull(s.climate().paths().get(1).deltaChange());
  }

  @Test
  void read_sameScenarioAsYamlAndJson_equalRecords() throws ScenarioException {
    assertEquals(ScenarioReader.read(resource("valid/scenario.yaml")),
        ScenarioReader.read(resource("valid/scenario.json")));
  }

  @Test
  void load_validYaml_climateTablesFromCsvFiles() throws ScenarioException {
    LoadedScenario loaded = ScenarioReader.load(resource("valid/scenario.yaml"));

    ClimateTable baseline = loaded.baseline();
    assertEquals(2000, baseline.firstYear());
    assertEquals(10, baseline.years());
    // First and last data rows of valid/baseline.csv.
    assertEquals(103.0, baseline.rainfallMm(0, 0));
    assertEquals(18.7, baseline.tminC(0, 0));
    assertEquals(30.6, baseline.tmaxC(0, 0));
    assertEquals(List.of("hot-dry"), List.copyOf(loaded.pathSeries().keySet()));
    ClimateTable hotDry = loaded.pathSeries().get("hot-dry");
    assertEquals(2030, hotDry.firstYear());
    assertEquals(2034, hotDry.lastYear());
  }

  @Test
  void load_validYaml_sha256OfFileBytes() throws ScenarioException, IOException {
    Path file = resource("valid/scenario.yaml");
    LoadedScenario loaded = ScenarioReader.load(file);

    assertEquals(ScenarioReader.sha256(Files.readAllBytes(file)), loaded.sha256());
    assertEquals(64, loaded.sha256().length());
  }

  @Test
  void sha256_abc_matchesFips180Vector() {
    // FIPS 180-2, Appendix B.1: SHA-256("abc").
    assertEquals("ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad",
        ScenarioReader.sha256("abc".getBytes(StandardCharsets.US_ASCII)));
  }

  @Test
  void readPolicy_validFile_fieldsArrive() throws ScenarioException {
    Scenario scenario = ScenarioReader.read(resource("valid/scenario.yaml"));
    Policy policy = ScenarioReader.readPolicy(resource("valid/policy.yaml"), scenario);

    assertEquals(2, policy.burning().size());
    assertEquals(4.5, policy.burning().get(1).fireReturnIntervalYears());
    assertEquals(0.5, policy.elephants().triggerDensityPerKm2());
    assertTrue(policy.waterPoints().isEmpty());
    assertEquals(policy, scenario.withPolicy(policy).policy());
  }

  @Test
  void read_missingFile_problemNamesFile(@TempDir Path dir) {
    Path file = dir.resolve("absent.yaml");
    ScenarioException e = assertThrows(ScenarioException.class, () -> ScenarioReader.read(file));

    assertEquals(List.of(ScenarioProblem.ofFile(file, "file not found")), e.problems());
    assertEquals("error: " + file + ": 1 problem\n  file not found", e.report());
  }

  @Test
  void read_directory_problemNamesFile(@TempDir Path dir) {
    ScenarioException e = assertThrows(ScenarioException.class, () -> ScenarioReader.read(dir));

    assertEquals(1, e.problems().size());
    assertTrue(e.problems().get(0).message().startsWith("is a directory"), e.report());
  }

  @Test
  void read_unsupportedExtension_problem(@TempDir Path dir) throws IOException {
    Path file = dir.resolve("scenario.txt");
    Files.copy(resource("valid/scenario.yaml"), file);
    ScenarioException e = assertThrows(ScenarioException.class, () -> ScenarioReader.read(file));

    assertEquals(1, e.problems().size());
    assertTrue(e.problems().get(0).message().contains(".yaml, .yml or .json"), e.report());
  }

  @Test
  void read_extensionInUpperCase_accepted(@TempDir Path dir) throws IOException,
      ScenarioException {
    Path valid = resource("valid/scenario.yaml");
    Path file = dir.resolve("SCENARIO.YML");
    Files.copy(valid, file);
    Files.copy(valid.resolveSibling("baseline.csv"), dir.resolve("baseline.csv"));
    Files.copy(valid.resolveSibling("series-hot-dry.csv"), dir.resolve("series-hot-dry.csv"));

    assertEquals(ScenarioReader.read(valid), ScenarioReader.read(file));
  }

  @Test
  void report_severalProblems_headerAndOneLineEach() {
    Path file = Path.of("examples", "x", "scenario.yaml");
    Path csv = Path.of("examples", "x", "baseline.csv");
    ScenarioException e = new ScenarioException(file, List.of(
        new ScenarioProblem(csv, 5, 9, "rainfall_mm", "found \"n/a\" (expected a number, mm)"),
        new ScenarioProblem(file, 20, 18, "/guilds/1/grassDietFraction",
            "1.3 is out of range (expected 0 <= value <= 1, fraction)"),
        new ScenarioProblem(file, 14, 7, "/park/blocks/0/sandFractoin",
            "unknown field; did you mean \"sandFraction\"?"),
        new ScenarioProblem(file, 9, 0, "", "a problem without column or pointer")));

    String expected = String.join("\n",
        "error: " + file + ": 4 problems",
        "  line 9: a problem without column or pointer",
        "  line 14, column 7, /park/blocks/0/sandFractoin: unknown field; did you mean "
            + "\"sandFraction\"?",
        "  line 20, column 18, /guilds/1/grassDietFraction: 1.3 is out of range (expected 0 <= "
            + "value <= 1, fraction)",
        "  " + csv + ": line 5, column 9, rainfall_mm: found \"n/a\" (expected a number, mm)");
    assertEquals(expected, e.report());
    assertEquals(expected, e.getMessage());
  }

  @Test
  void exception_noProblems_rejected() {
    assertThrows(IllegalArgumentException.class,
        () -> new ScenarioException(Path.of("x.yaml"), List.of()));
  }

  @Test
  void problem_negativeLine_rejected() {
    assertThrows(IllegalArgumentException.class,
        () -> new ScenarioProblem(Path.of("x.yaml"), -1, 0, "", "m"));
  }

  @Test
  void validate_scenarioBuiltInCode_noProblemsAndNoPlaces() throws ScenarioException {
    Path file = resource("valid/scenario.yaml");
    Scenario s = ScenarioReader.read(file);

    assertTrue(ScenarioValidator.validate(s, SourceLocations.none(file)).isEmpty());
    Policy twice = new Policy("twice", List.of(s.policy().burning().get(0),
        s.policy().burning().get(0)), s.policy().elephants(), List.of());
    List<ScenarioProblem> problems =
        ScenarioValidator.validatePolicy(twice, s, "/policy", SourceLocations.none(file));
    assertEquals(1, problems.size());
    assertEquals("/policy/burning/1/block", problems.get(0).pointer());
    assertEquals(0, problems.get(0).line());
    assertFalse(problems.get(0).message().isEmpty());
  }
}
