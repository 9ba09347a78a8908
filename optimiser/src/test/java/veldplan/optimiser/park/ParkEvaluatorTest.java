package veldplan.optimiser.park;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;
import java.util.concurrent.atomic.AtomicInteger;
import org.junit.jupiter.api.Test;
import veldplan.model.Ensemble;
import veldplan.model.ParametersFromScenario;
import veldplan.model.Study;
import veldplan.model.Trajectory;
import veldplan.objectives.Catalogue;
import veldplan.objectives.Estimate;
import veldplan.objectives.Objective;
import veldplan.objectives.PathStep;
import veldplan.shared.scenario.LoadedScenario;
import veldplan.shared.scenario.Measure;
import veldplan.shared.scenario.Policy;
import veldplan.shared.scenario.Scenario;
import veldplan.shared.scenario.Stochastic;

class ParkEvaluatorTest {
  private static final LoadedScenario LOADED = withReplicates(ExampleScenario.load(), 5);
  private static final Scenario SC = LOADED.scenario();
  private static final Study STUDY = ParametersFromScenario.study(LOADED);
  private static final Catalogue CATALOGUE = new Catalogue(SC, 1e7);
  private static final List<Objective> MEASURES = List.of(
      CATALOGUE.of(Measure.GUILDS_PERSIST, null),
      CATALOGUE.of(Measure.LARGE_TREES_KEPT, null),
      CATALOGUE.of(Measure.MANAGEMENT_COST, null));

  static LoadedScenario withReplicates(LoadedScenario l, int replicates) {
    Stochastic st = l.scenario().stochastic();
    Scenario sc = l.scenario().withStochastic(new Stochastic(replicates, st.seed(),
        st.interannualVariabilityFactor()));
    return new LoadedScenario(l.file(), sc, l.baseline(), l.pathSeries(), l.sha256());
  }

  private static PolicyScore[] score(int threads, List<Policy> policies, int first, int n) {
    try (ParkEvaluator e = new ParkEvaluator(SC, STUDY, MEASURES, PathStep.WORST, threads)) {
      return e.score(policies, first, n, () -> { });
    }
  }

  @Test
  void scoresAreTheCatalogueOverTheEnsemble() {
    Policy status = SC.policy();
    PolicyScore s = score(2, List.of(status), 0, 5)[0];
    Trajectory[][] runs = Ensemble.run(STUDY, ParametersFromScenario.plan(status, SC), 1,
        () -> { });
    for (int k = 0; k < MEASURES.size(); k++) {
      Objective o = MEASURES.get(k);
      Estimate[] perPath = new Estimate[runs.length];
      for (int p = 0; p < runs.length; p++) {
        double[] values = new double[runs[p].length];
        for (int r = 0; r < values.length; r++) {
          values[r] = o.of(runs[p][r]);
        }
        perPath[p] = o.step().summarise(values);
        assertEquals(perPath[p], s.perPath()[k][p], o.name() + " path " + p);
      }
      assertEquals(PathStep.WORST.combine(perPath, o.direction()), s.combined()[k]);
    }
  }

  @Test
  void scoresDoNotDependOnThreadsOrBatch() {
    Policy status = SC.policy();
    Policy none = new Policy("none", List.of(), new veldplan.shared.scenario.ElephantPlan(0, 0,
        null), List.of());
    PolicyScore[] one = score(1, List.of(status, none), 1, 3);
    PolicyScore[] two = score(2, List.of(none, status), 1, 3);
    assertArrayEquals(one[0].combined(), two[1].combined());
    assertArrayEquals(one[1].combined(), two[0].combined());
  }

  @Test
  void countsEveryRun() {
    AtomicInteger runs = new AtomicInteger();
    try (ParkEvaluator e = new ParkEvaluator(SC, STUDY, MEASURES, PathStep.MEAN, 2)) {
      e.score(List.of(SC.policy(), SC.policy()), 3, 2, runs::incrementAndGet);
    }
    assertEquals(2 * STUDY.paths().size() * 2, runs.get());
  }

  @Test
  void refusesReplicatesTheStudyLacks() {
    try (ParkEvaluator e = new ParkEvaluator(SC, STUDY, MEASURES, PathStep.MEAN, 1)) {
      assertThrows(IllegalArgumentException.class,
          () -> e.score(List.of(SC.policy()), 4, 2, () -> { }));
    }
  }
}
