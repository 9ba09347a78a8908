package veldplan.model;

import java.nio.file.Files;
import java.nio.file.Path;
import veldplan.shared.scenario.LoadedScenario;
import veldplan.shared.scenario.Scenario;
import veldplan.shared.scenario.ScenarioReader;

/** The example park as the benchmarks use it: its study and status-quo plan. */
final class ExamplePark {
  final Study study;
  final ManagementPlan plan;

  private ExamplePark(Study study, ManagementPlan plan) {
    this.study = study;
    this.plan = plan;
  }

  /**
   * Loads examples/duskveld/scenario.yaml (from the repository root or the model module).
   *
   * @param years horizon to simulate, or 0 for the scenario's own
   */
  static ExamplePark load(int years) throws Exception {
    Path file = Path.of("examples/duskveld/scenario.yaml");
    if (!Files.exists(file)) {
      file = Path.of("../examples/duskveld/scenario.yaml");
    }
    LoadedScenario loaded = ScenarioReader.load(file);
    Scenario sc = loaded.scenario();
    if (years > 0) {
      sc = new Scenario(sc.name(), sc.startYear(), years, sc.park(), sc.guilds(),
          sc.predators(), sc.elephants(), sc.climate(), sc.stochastic(), sc.policy(), sc.costs());
    }
    Study study = ParametersFromScenario.study(new LoadedScenario(loaded.file(), sc,
        loaded.baseline(), loaded.pathSeries(), loaded.sha256()));
    return new ExamplePark(study, ParametersFromScenario.plan(sc.policy(), sc));
  }

  /** A state after {@code years} years of the status quo on path 0, replicate 0. */
  EcosystemState stateAfter(int years) {
    ModelParameters p = study.parameters();
    EcosystemState state = new EcosystemState(p);
    state.reset(p);
    for (int year = 0; year < years; year++) {
      AnnualCycle.advance(p, plan, study.forcing(0, 0), year, state);
    }
    return state;
  }
}
