package veldplan.shared.scenario;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.StreamReadFeature;
import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.JsonMappingException;
import com.fasterxml.jackson.databind.MapperFeature;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.json.JsonMapper;
import java.io.IOException;
import java.nio.file.AccessDeniedException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Reads scenario and policy files (YAML for {@code .yaml}/{@code .yml}, JSON for {@code .json})
 * into the records of this package, reporting every problem at once.
 *
 * <p>How it works, in three steps, with no per-field code:
 * <ol>
 *   <li>{@link DocumentParser} streams the tokens, builds a tree and records the line and column
 *       of every field name and value by JSON pointer; syntax errors stop here;</li>
 *   <li>{@link TreeChecker} walks the tree against the record classes by reflection: unknown and
 *       missing fields, JSON types, whole numbers, enum spellings, finiteness, {@link Range};</li>
 *   <li>only if there was no problem, Jackson converts the tree into records, and
 *       {@link ScenarioValidator} checks the rules across fields; {@link #load} also reads the
 *       climate CSV files with {@link ClimateTable}.</li>
 * </ol>
 * So structural problems (step 1 and 2) are all reported together; semantic problems (step 3)
 * appear once the structure is right, since they need the records.
 */
public final class ScenarioReader {

  /**
   * Converts the checked tree into records. The tree check has already rejected everything
   * these features guard against; they stay on as a second line of defence.
   */
  private static final ObjectMapper MAPPER = JsonMapper.builder()
      .enable(DeserializationFeature.FAIL_ON_UNKNOWN_PROPERTIES)
      .enable(DeserializationFeature.FAIL_ON_NULL_FOR_PRIMITIVES)
      .enable(DeserializationFeature.FAIL_ON_NUMBERS_FOR_ENUMS)
      .enable(DeserializationFeature.FAIL_ON_TRAILING_TOKENS)
      .disable(DeserializationFeature.ACCEPT_FLOAT_AS_INT)
      .disable(MapperFeature.ALLOW_COERCION_OF_SCALARS)
      .enable(StreamReadFeature.STRICT_DUPLICATE_DETECTION)
      .enable(StreamReadFeature.INCLUDE_SOURCE_IN_LOCATION)
      .build();

  /** Fewest whole years in the baseline climate (see {@link Climate#baselineCsv()}). */
  public static final int MIN_BASELINE_YEARS = 10;

  private ScenarioReader() {}

  /**
   * Reads and checks a scenario file and the climate CSV files it names.
   *
   * @throws ScenarioException with every problem in the file and the CSV files
   */
  public static Scenario read(Path file) throws ScenarioException {
    return load(file).scenario();
  }

  /**
   * Reads and checks a scenario file, loads its baseline climate and every climate path's
   * monthly series, and hashes the file for provenance.
   *
   * <p>A monthly series must cover the simulated years {@code startYear} to
   * {@code startYear + horizonYears - 1}; it may extend beyond them. The baseline must have at
   * least {@link #MIN_BASELINE_YEARS} whole years.
   *
   * @throws ScenarioException with every problem in the file and the CSV files
   */
  public static LoadedScenario load(Path file) throws ScenarioException {
    List<ScenarioProblem> problems = new ArrayList<>();
    byte[] bytes = readBytes(file, problems);
    Parsed<Scenario> parsed = bytes == null ? null : parse(file, bytes, Scenario.class, problems);
    if (parsed == null) {
      throw new ScenarioException(file, problems);
    }
    Scenario scenario = parsed.value();
    SourceLocations where = parsed.where();
    problems.addAll(ScenarioValidator.validate(scenario, where));

    ClimateTable baseline = table(file, scenario.climate().baselineCsv(), problems);
    if (baseline != null && baseline.years() < MIN_BASELINE_YEARS) {
      problems.add(where.at("/climate/baselineCsv", "the baseline has " + baseline.years()
          + " whole years, " + baseline.firstYear() + " to " + baseline.lastYear()
          + " (expected at least " + MIN_BASELINE_YEARS + ")"));
    }
    Map<String, ClimateTable> series = new LinkedHashMap<>();
    int first = scenario.startYear();
    int last = scenario.startYear() + scenario.horizonYears() - 1;
    List<ClimatePath> paths = scenario.climate().paths();
    for (int i = 0; i < paths.size(); i++) {
      ClimatePath path = paths.get(i);
      if (path.monthlySeriesCsv() == null) {
        continue;
      }
      ClimateTable table = table(file, path.monthlySeriesCsv(), problems);
      if (table == null) {
        continue;
      }
      if (table.firstYear() > first || table.lastYear() < last) {
        problems.add(where.at(Texts.child(Texts.child("/climate/paths", i), "monthlySeriesCsv"),
            "the series covers " + table.firstYear() + " to " + table.lastYear()
                + " (expected at least the simulated years " + first + " to " + last + ")"));
      }
      series.putIfAbsent(path.name(), table);
    }
    if (!problems.isEmpty()) {
      throw new ScenarioException(file, problems);
    }
    return new LoadedScenario(file, scenario, baseline, series, sha256(bytes));
  }

  /**
   * Reads a policy file: a YAML or JSON document with the fields of {@link Policy} at its root.
   * Checks the rules that need no scenario (see {@link ScenarioValidator#validatePolicy}).
   *
   * @throws ScenarioException with every problem in the file
   */
  public static Policy readPolicy(Path file) throws ScenarioException {
    return readPolicy(file, null);
  }

  /**
   * Reads a policy file and checks it against the scenario it will be simulated in: blocks
   * exist, open water points fit the blocks, closure years fall in the horizon.
   *
   * @param scenario the scenario, or {@code null} to check only the policy itself
   * @throws ScenarioException with every problem in the file
   */
  public static Policy readPolicy(Path file, Scenario scenario) throws ScenarioException {
    List<ScenarioProblem> problems = new ArrayList<>();
    byte[] bytes = readBytes(file, problems);
    Parsed<Policy> parsed = bytes == null ? null : parse(file, bytes, Policy.class, problems);
    if (parsed == null) {
      throw new ScenarioException(file, problems);
    }
    problems.addAll(ScenarioValidator.validatePolicy(parsed.value(), scenario, "",
        parsed.where()));
    if (!problems.isEmpty()) {
      throw new ScenarioException(file, problems);
    }
    return parsed.value();
  }

  /** A converted document and where its parts are in the file. */
  private record Parsed<T>(T value, SourceLocations where) {}

  /**
   * Steps 1 and 2, then conversion. Returns {@code null} after adding problems, if any.
   */
  private static <T> Parsed<T> parse(Path file, byte[] bytes, Class<T> type,
      List<ScenarioProblem> problems) {
    DocumentParser.Format format = DocumentParser.formatOf(file);
    if (format == null) {
      problems.add(ScenarioProblem.ofFile(file,
          "unsupported file type (expected a name ending in .yaml, .yml or .json)"));
      return null;
    }
    DocumentParser.Result result = DocumentParser.parse(file, bytes, format);
    problems.addAll(result.problems());
    if (result.root() == null) {
      return null;
    }
    new TreeChecker(result.where(), result.raw(), result.reported(), problems)
        .check(result.root(), type, "");
    if (!problems.isEmpty()) {
      return null;
    }
    try {
      return new Parsed<>(MAPPER.treeToValue(result.root(), type), result.where());
    } catch (JsonProcessingException | IllegalArgumentException e) {
      // Not expected after the tree check; reported rather than thrown so the user sees where.
      String pointer = e instanceof JsonMappingException ? pointer((JsonMappingException) e) : "";
      String message = e instanceof JsonProcessingException
          ? ((JsonProcessingException) e).getOriginalMessage() : e.getMessage();
      problems.add(result.where().at(pointer, "cannot convert the value: " + message));
      return null;
    }
  }

  private static String pointer(JsonMappingException e) {
    StringBuilder out = new StringBuilder();
    for (JsonMappingException.Reference reference : e.getPath()) {
      out.append(reference.getFieldName() != null
          ? Texts.child("", reference.getFieldName())
          : Texts.child("", reference.getIndex()));
    }
    return out.toString();
  }

  /** Loads a CSV named in the scenario if it exists (the validator reports it if not). */
  private static ClimateTable table(Path scenarioFile, String name,
      List<ScenarioProblem> problems) {
    Path csv = name.isBlank() ? null : ScenarioValidator.resolve(scenarioFile, name);
    if (csv == null || !Files.isRegularFile(csv)) {
      return null;
    }
    return ClimateTable.read(csv, problems);
  }

  private static byte[] readBytes(Path file, List<ScenarioProblem> problems) {
    if (Files.isDirectory(file)) {
      problems.add(ScenarioProblem.ofFile(file,
          "is a directory (expected a .yaml, .yml or .json file)"));
      return null;
    }
    try {
      return Files.readAllBytes(file);
    } catch (NoSuchFileException e) {
      problems.add(ScenarioProblem.ofFile(file, "file not found"));
    } catch (AccessDeniedException e) {
      problems.add(ScenarioProblem.ofFile(file, "cannot read the file: permission denied"));
    } catch (IOException e) {
      problems.add(ScenarioProblem.ofFile(file, "cannot read the file: " + e.getMessage()));
    }
    return null;
  }

  /** Lower-case hex SHA-256 of {@code bytes}. */
  static String sha256(byte[] bytes) {
    try {
      return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(bytes));
    } catch (NoSuchAlgorithmException e) {
      throw new IllegalStateException("every Java platform must support SHA-256", e);
    }
  }
}
