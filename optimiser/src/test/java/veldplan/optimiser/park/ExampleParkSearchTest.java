package veldplan.optimiser.park;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.junit.jupiter.api.Test;
import veldplan.objectives.Estimate;
import veldplan.objectives.Objective;
import veldplan.objectives.PathStep;
import veldplan.optimiser.report.FrontEntry;
import veldplan.optimiser.report.FrontReport;
import veldplan.optimiser.search.SearchListener;
import veldplan.optimiser.search.SearchResult;
import veldplan.shared.scenario.LoadedScenario;

/**
 * The search on the example park, at a small budget, against the two yardsticks of the issue:
 * random search with the same budget (hypervolume of the feasible archive, median over seeds),
 * and the reference policies (the front holds, for each of "status quo" and "no intervention",
 * a policy better on at least one objective that loses on no other objective by more than the
 * two references differ there). The park is invented; nothing here checks the model against an
 * outside value.
 */
class ExampleParkSearchTest {
  private static final LoadedScenario LOADED = ExampleScenario.load();

  @Test
  void geneticAlgorithmBeatsRandomSearchAndTheReferences() {
    double[] nsga = new double[3];
    double[] random = new double[3];
    for (int k = 0; k < 3; k++) {
      long seed = LOADED.scenario().stochastic().seed() + k;
      PolicySearch.Settings settings = new PolicySearch.Settings(16, 12, 4, 10, seed,
          PathStep.WORST, 2);
      try (PolicySearch search = new PolicySearch(LOADED, settings)) {
        SearchResult result = search.search(null, () -> { }, SearchListener.NONE);
        nsga[k] = PolicySearch.hypervolume(result.archive());
        random[k] = PolicySearch.hypervolume(search.randomSearch(result.evaluations(), seed));
        if (k == 0) {
          beatsTheReferences(search.validate(search.front(result), () -> { }));
        }
      }
    }
    Arrays.sort(nsga);
    Arrays.sort(random);
    assertTrue(nsga[1] > random[1], "median hypervolume: NSGA-II " + nsga[1] + ", random "
        + random[1] + " (all: " + Arrays.toString(nsga) + " vs " + Arrays.toString(random) + ")");
  }

  private static void beatsTheReferences(FrontReport report) {
    List<FrontEntry> refs = report.references();
    Estimate[] a = refs.get(0).score().combined();
    Estimate[] b = refs.get(1).score().combined();
    List<Objective> measures = report.measures();
    for (FrontEntry ref : refs) {
      Estimate[] r = ref.score().combined();
      List<String> candidates = new ArrayList<>();
      for (FrontEntry f : report.front()) {
        Estimate[] e = f.score().combined();
        boolean better = false;
        boolean losesTooMuch = false;
        for (int k = 0; k < report.objectives(); k++) {
          var d = measures.get(k).direction();
          double tolerance = Math.abs(a[k].value() - b[k].value());
          better |= d.better(e[k].value(), r[k].value());
          double loss = d == veldplan.objectives.Direction.MAXIMISE
              ? r[k].value() - e[k].value() : e[k].value() - r[k].value();
          losesTooMuch |= loss > tolerance;
        }
        if (better && !losesTooMuch) {
          candidates.add(f.id());
        }
      }
      assertTrue(!candidates.isEmpty(), "no front policy beats \"" + ref.id() + "\"");
    }
  }
}
