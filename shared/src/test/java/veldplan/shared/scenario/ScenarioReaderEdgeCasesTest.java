package veldplan.shared.scenario;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.lang.reflect.ParameterizedType;
import java.lang.reflect.RecordComponent;
import java.lang.reflect.Type;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayDeque;
import java.util.Deque;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Reader behaviour on variations of the valid fixture written to a temporary directory, for
 * cases that need no fixture file of their own.
 */
class ScenarioReaderEdgeCasesTest {

  @TempDir
  Path dir;

  private String validYaml;

  @BeforeEach
  void copyCsvFiles() throws IOException {
    Path valid = ScenarioReaderValidTest.resource("valid/scenario.yaml");
    validYaml = Files.readString(valid, StandardCharsets.UTF_8);
    Files.copy(valid.resolveSibling("baseline.csv"), dir.resolve("baseline.csv"));
    Files.copy(valid.resolveSibling("series-hot-dry.csv"), dir.resolve("series-hot-dry.csv"));
  }

  /** The valid YAML with {@code from} replaced by {@code to}, which must occur exactly once. */
  private Path variant(String from, String to) throws IOException {
    int at = validYaml.indexOf(from);
    if (at < 0 || validYaml.indexOf(from, at + 1) >= 0) {
      throw new IllegalArgumentException("not exactly once in the fixture: " + from);
    }
    Path file = dir.resolve("variant.yaml");
    Files.writeString(file, validYaml.replace(from, to), StandardCharsets.UTF_8);
    return file;
  }

  private List<ScenarioProblem> problems(Path file) {
    return assertThrows(ScenarioException.class, () -> ScenarioReader.load(file)).problems();
  }

  @Test
  void read_optionalFieldExplicitlyNull_acceptedAsAbsent() throws IOException,
      ScenarioException {
    Scenario s = ScenarioReader.read(variant("    maxGrowthRatePerYear: 0.5",
        "    maxGrowthRatePerYear: null"));

    assertNull(s.guilds().get(0).maxGrowthRatePerYear());
  }

  @Test
  void read_booleanLikeWordAsText_staysText() throws IOException, ScenarioException {
    Scenario s = ScenarioReader.read(variant("currency: XTS", "currency: no"));

    assertEquals("no", s.costs().currency());
  }

  @Test
  void read_numberWhereTextExpected_problemSuggestsQuotes() throws IOException {
    List<ScenarioProblem> problems = problems(variant("currency: XTS", "currency: 978"));

    assertEquals(1, problems.size());
    assertEquals("/costs/currency", problems.get(0).pointer());
    assertEquals("found 978 (expected text; put it in quotes)", problems.get(0).message());
  }

  @Test
  void read_twoDuplicateKeys_bothReportedWithOtherProblems() throws IOException {
    Path file = variant("      areaHa: 8500.5\n",
        "      areaHa: 8500.5\n      areaHa: 1\n      altitudeM: 1\n      bogus: 1\n");
    List<ScenarioProblem> problems = problems(file);

    assertEquals(3, problems.size(), problems.toString());
    assertEquals("/park/blocks/1/areaHa", problems.get(0).pointer());
    assertEquals(23, problems.get(0).line());
    assertTrue(problems.get(0).message().contains("first given on line 22"));
    assertEquals("/park/blocks/1/bogus", problems.get(1).pointer());
    assertTrue(problems.get(1).message().startsWith("unknown field (expected one of \"name\""),
        problems.get(1).message());
    // The inserted altitudeM comes first, so the fixture's own altitudeM is the repeat.
    assertEquals("/park/blocks/1/altitudeM", problems.get(2).pointer());
    assertEquals(30, problems.get(2).line());
    assertTrue(problems.get(2).message().contains("first given on line 24"));
  }

  @Test
  void read_negativeInfinityInYaml_notFinite() throws IOException {
    List<ScenarioProblem> problems = problems(variant("  altitudeM: 520", "  altitudeM: -.inf"));

    assertEquals(1, problems.size());
    assertEquals("found -.inf (expected a finite number, m)", problems.get(0).message());
  }

  @Test
  void read_secondYamlDocument_reported() throws IOException {
    Path file = dir.resolve("two.yaml");
    Files.writeString(file, validYaml + "---\nname: again\n", StandardCharsets.UTF_8);
    List<ScenarioProblem> problems = problems(file);

    assertEquals(1, problems.size());
    assertEquals(118, problems.get(0).line());
    assertTrue(problems.get(0).message().contains("expected a single YAML document"));
  }

  @Test
  void read_tabIndentation_syntaxErrorAtTheTab() throws IOException {
    List<ScenarioProblem> problems = problems(variant("\n  replicates: 20", "\n\treplicates: 20"));

    assertEquals(1, problems.size());
    assertEquals(89, problems.get(0).line());
    assertEquals(1, problems.get(0).column());
    assertTrue(problems.get(0).message().startsWith("invalid YAML: "));
  }

  @Test
  void read_nanInJson_syntaxError() throws IOException {
    Path valid = ScenarioReaderValidTest.resource("valid/scenario.json");
    Path file = dir.resolve("nan.json");
    Files.writeString(file, Files.readString(valid).replace("\"bodyMassKg\": 2800",
        "\"bodyMassKg\": NaN"));
    List<ScenarioProblem> problems = problems(file);

    assertEquals(1, problems.size());
    assertTrue(problems.get(0).message().startsWith("invalid JSON: "));
    assertTrue(problems.get(0).line() > 0);
  }

  @Test
  void read_wholeNumberForSeedBeyondLong_problem() throws IOException {
    List<ScenarioProblem> problems = problems(variant("seed: 20240611",
        "seed: 99999999999999999999"));

    assertEquals(1, problems.size());
    assertEquals("found 99999999999999999999 (expected a whole number from "
        + Long.MIN_VALUE + " to " + Long.MAX_VALUE + ")", problems.get(0).message());
  }

  @Test
  void read_structureAndSemanticProblems_semanticWaitForStructure() throws IOException {
    // A negative area (structure) and a block named twice (semantics): only the first is
    // reported until it is fixed, because the rules across fields need the records.
    Path file = variant("    - name: Mopane Ridge\n      areaHa: 8500.5",
        "    - name: North Flats\n      areaHa: -1");
    List<ScenarioProblem> problems = problems(file);

    assertEquals(1, problems.size());
    assertEquals("/park/blocks/1/areaHa", problems.get(0).pointer());
  }

  @Test
  void validator_populationAbsentAtStart_legalOnlyWithZeroThreshold() throws IOException,
      ScenarioException {
    String noKudu = "    initialAbundance: 150\n    quasiExtinctionAbundance: 10";
    Scenario s = ScenarioReader.read(variant(noKudu,
        "    initialAbundance: 0\n    quasiExtinctionAbundance: 0"));
    assertEquals(0, s.guilds().get(2).initialAbundance());

    List<ScenarioProblem> problems = problems(variant(noKudu,
        "    initialAbundance: 0\n    quasiExtinctionAbundance: 1"));
    assertEquals(1, problems.size());
    assertEquals("/guilds/2/quasiExtinctionAbundance", problems.get(0).pointer());
  }

  @Test
  void records_everyRangeAnnotation_hasOrderedBoundsAndAUnit() {
    // Walks every record reachable from Scenario: a bad annotation would make the reader's
    // messages wrong or reject every value.
    Deque<Class<?>> todo = new ArrayDeque<>(List.of(Scenario.class));
    Set<Class<?>> seen = new HashSet<>();
    int ranges = 0;
    while (!todo.isEmpty()) {
      Class<?> type = todo.pop();
      if (!type.isRecord() || !seen.add(type)) {
        continue;
      }
      for (RecordComponent component : type.getRecordComponents()) {
        Range range = component.getAnnotation(Range.class);
        if (range != null) {
          ranges++;
          assertTrue(range.min() <= range.max(), type.getSimpleName() + "." + component.getName());
          assertTrue(!range.unit().isBlank(), type.getSimpleName() + "." + component.getName());
        }
        Type generic = component.getGenericType();
        todo.push(generic instanceof ParameterizedType
            ? (Class<?>) ((ParameterizedType) generic).getActualTypeArguments()[0]
            : component.getType());
      }
    }
    assertTrue(ranges > 50, "found only " + ranges + " @Range annotations");
  }
}
