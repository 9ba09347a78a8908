package veldplan.optimiser.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;
import static veldplan.optimiser.cli.CliTestSupport.examplesDir;
import static veldplan.optimiser.cli.CliTestSupport.run;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import veldplan.optimiser.cli.CliTestSupport.Result;
import veldplan.shared.scenario.Scenario;
import veldplan.shared.scenario.ScenarioException;
import veldplan.shared.scenario.ScenarioReader;

/**
 * Guards "every file in {@code examples/} loads and runs": every scenario file under
 * {@code examples/} (a {@code .yaml}, {@code .yml} or {@code .json} file with a top-level
 * {@code park} key) loads without problems; every policy file in a {@code policies/} folder loads
 * against the scenarios next to that folder; and each scenario, with its own policy and with each
 * of those policy files, runs through {@code veldplan simulate} with one replicate and exits 0.
 * The files are found by walking the tree, so a new example is covered without editing this test;
 * a data file that is neither a scenario nor a policy fails the test rather than being skipped.
 */
class ExamplesTest {

  /** A top-level {@code park} key in YAML ({@code park:}) or JSON ({@code "park":}). */
  private static final Pattern PARK_KEY =
      Pattern.compile("(?m)^(park|\\s*\"park\")\\s*:");

  @TempDir
  Path tmp;

  // ---------------------------------------------------------------------------------------------
  // Finding the files

  private static boolean isDataFile(Path file) {
    String name = file.getFileName().toString().toLowerCase(Locale.ROOT);
    return Files.isRegularFile(file)
        && (name.endsWith(".yaml") || name.endsWith(".yml") || name.endsWith(".json"));
  }

  private static boolean isScenario(Path file) {
    try {
      return PARK_KEY.matcher(Files.readString(file, StandardCharsets.UTF_8)).find();
    } catch (IOException e) {
      throw new UncheckedIOException("cannot read " + file, e);
    }
  }

  private static boolean isPolicy(Path file) {
    Path parent = file.getParent();
    return parent != null && parent.getFileName().toString().equals("policies");
  }

  private static List<Path> dataFiles() {
    try (Stream<Path> files = Files.walk(examplesDir())) {
      return files.filter(ExamplesTest::isDataFile).sorted().toList();
    } catch (IOException e) {
      throw new UncheckedIOException("cannot walk " + examplesDir(), e);
    }
  }

  private static List<Path> scenarioFiles() {
    return dataFiles().stream().filter(f -> !isPolicy(f) && isScenario(f)).toList();
  }

  /** Policy files in the {@code policies/} folder next to a scenario. */
  private static List<Path> policiesFor(Path scenario) {
    Path folder = scenario.getParent().resolve("policies");
    return dataFiles().stream().filter(f -> f.getParent().equals(folder)).toList();
  }

  private static String label(Path file) {
    return examplesDir().relativize(file).toString().replace('\\', '/');
  }

  static Stream<Arguments> scenarios() {
    return scenarioFiles().stream().map(f -> Arguments.of(label(f), f));
  }

  static Stream<Arguments> policies() {
    List<Arguments> cases = new ArrayList<>();
    for (Path scenario : scenarioFiles()) {
      for (Path policy : policiesFor(scenario)) {
        cases.add(Arguments.of(label(policy) + " with " + label(scenario), scenario, policy));
      }
    }
    return cases.stream();
  }

  /** Each scenario with its own policy ({@code null}) and with each policy file next to it. */
  static Stream<Arguments> runs() {
    List<Arguments> cases = new ArrayList<>();
    for (Path scenario : scenarioFiles()) {
      cases.add(Arguments.of(label(scenario) + " (own policy)", scenario, null));
      for (Path policy : policiesFor(scenario)) {
        cases.add(Arguments.of(label(scenario) + " --policy " + label(policy), scenario,
            policy));
      }
    }
    return cases.stream();
  }

  // ---------------------------------------------------------------------------------------------
  // Tests

  @Test
  void examplesTree_everyDataFile_isAScenarioOrAPolicyNextToOne() {
    List<Path> files = dataFiles();
    assertFalse(scenarioFiles().isEmpty(), "no scenario file (with a park key) under "
        + examplesDir());
    List<String> stray = new ArrayList<>();
    for (Path file : files) {
      if (isPolicy(file)) {
        Path home = file.getParent().getParent();
        boolean hasScenario = scenarioFiles().stream().anyMatch(s -> s.getParent().equals(home));
        if (!hasScenario) {
          stray.add(label(file) + ": policy file with no scenario in " + label(home));
        }
      } else if (!isScenario(file)) {
        stray.add(label(file) + ": neither a scenario (no top-level park key) nor in a "
            + "policies/ folder");
      }
    }
    assertTrue(stray.isEmpty(), "example files that no test loads:\n  "
        + String.join("\n  ", stray));
  }

  @ParameterizedTest(name = "{0}")
  @MethodSource("scenarios")
  void exampleScenario_load_hasNoProblems(String label, Path scenario) {
    try {
      Scenario sc = ScenarioReader.load(scenario).scenario();
      assertFalse(sc.climate().paths().isEmpty(), label + ": no climate path");
    } catch (ScenarioException e) {
      fail("example scenario " + label + " does not load:\n" + e.report());
    }
  }

  @ParameterizedTest(name = "{0}")
  @MethodSource("policies")
  void examplePolicy_readAgainstItsScenario_hasNoProblems(String label, Path scenario,
      Path policy) {
    Scenario sc;
    try {
      sc = ScenarioReader.load(scenario).scenario();
    } catch (ScenarioException e) {
      fail("example scenario " + label(scenario) + " does not load:\n" + e.report());
      return;
    }
    try {
      ScenarioReader.readPolicy(policy, sc);
    } catch (ScenarioException e) {
      fail("example policy " + label(policy) + " does not load against " + label(scenario)
          + ":\n" + e.report());
    }
  }

  @ParameterizedTest(name = "{0}")
  @MethodSource("runs")
  void examplePair_simulateOneReplicate_exitsZero(String label, Path scenario, Path policy) {
    Path out = tmp.resolve("out");
    List<String> args = new ArrayList<>(List.of("simulate", scenario.toString()));
    if (policy != null) {
      args.addAll(List.of("--policy", policy.toString()));
    }
    args.addAll(List.of("--replicates", "1", "--no-progress", "--out", out.toString()));

    Result r = run(args.toArray(String[]::new));

    assertEquals(ExitCodes.OK, r.exitCode(), "veldplan " + String.join(" ", args)
        + " failed for " + label + "\n" + r.transcript());
    assertTrue(Files.isRegularFile(out.resolve("trajectories.csv")),
        label + ": no trajectories.csv");
    assertTrue(Files.isRegularFile(out.resolve("run.json")), label + ": no run.json");
  }
}
