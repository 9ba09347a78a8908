package veldplan.optimiser.park;

import java.nio.file.Files;
import java.nio.file.Path;
import veldplan.shared.scenario.LoadedScenario;
import veldplan.shared.scenario.ScenarioException;
import veldplan.shared.scenario.ScenarioReader;

/** The bundled example scenario, for tests that need a whole park (its numbers are invented
 * and are never check values). */
final class ExampleScenario {
  private ExampleScenario() {}

  static Path file() {
    Path dir = Path.of("").toAbsolutePath();
    while (dir != null && !Files.isDirectory(dir.resolve("examples/duskveld"))) {
      dir = dir.getParent();
    }
    if (dir == null) {
      throw new AssertionError("no examples/duskveld above " + Path.of("").toAbsolutePath());
    }
    return dir.resolve("examples/duskveld/scenario.yaml");
  }

  static LoadedScenario load() {
    try {
      return ScenarioReader.load(file());
    } catch (ScenarioException e) {
      throw new AssertionError(e.report(), e);
    }
  }
}
