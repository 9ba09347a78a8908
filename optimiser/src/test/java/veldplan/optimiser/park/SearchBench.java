package veldplan.optimiser.park;

import java.nio.file.Path;
import java.util.Arrays;
import java.util.Locale;
import veldplan.objectives.PathStep;
import veldplan.optimiser.search.SearchListener;
import veldplan.optimiser.search.SearchResult;
import veldplan.shared.scenario.LoadedScenario;
import veldplan.shared.scenario.Optimisation;
import veldplan.shared.scenario.ScenarioReader;

/**
 * A benchmark, not a test: the policy search on a scenario (the example park by default) with
 * its own search settings, for several seeds. Prints, per seed, the search's wall time, the share
 * of it spent outside the simulations (the genetic algorithm's bookkeeping), the hypervolume of
 * the feasible archive, and the hypervolume random search reaches with the same budget.
 *
 * <pre>mvn -q -B -Pbench-search -pl optimiser -am verify [-Dbench.search.args="SCENARIO SEEDS THREADS"]</pre>
 */
public final class SearchBench {
  private SearchBench() {}

  /** Arguments: scenario file, number of seeds (default 3), threads (default all cores). */
  public static void main(String[] args) throws Exception {
    Path file = args.length > 0 && !args[0].isEmpty() ? Path.of(args[0]) : ExampleScenario.file();
    int seeds = args.length > 1 ? Integer.parseInt(args[1]) : 3;
    int threads = args.length > 2 ? Integer.parseInt(args[2])
        : Runtime.getRuntime().availableProcessors();
    LoadedScenario loaded = ScenarioReader.load(file);
    Optimisation o = loaded.scenario().optimisation();
    System.out.printf(Locale.ROOT, "%s: population %d, generations %d, %d paths x %d replicates,"
        + " %d threads, %s%n", file, o.search().population(), o.search().generations(),
        loaded.scenario().climate().paths().size(), o.search().replicates(), threads,
        System.getProperty("java.vm.name") + " " + System.getProperty("java.version"));
    System.out.println("seed        search_s  outside_simulations_%  evaluations  simulated"
        + "  archive_hv  random_hv");
    double[] share = new double[seeds];
    double[] hv = new double[seeds];
    double[] rhv = new double[seeds];
    for (int k = 0; k < seeds; k++) {
      long seed = loaded.scenario().stochastic().seed() + k;
      PolicySearch.Settings s = new PolicySearch.Settings(o.search().population(),
          o.search().generations(), o.search().replicates(), o.search().validationReplicates(),
          seed, new PathStep(o.overPaths(), o.pathPercentile() == null ? Double.NaN
              : o.pathPercentile()), threads);
      try (PolicySearch search = new PolicySearch(loaded, s)) {
        SearchResult r = search.search(null, () -> { }, SearchListener.NONE);
        share[k] = r.bookkeepingShare();
        hv[k] = PolicySearch.hypervolume(r.archive());
        rhv[k] = PolicySearch.hypervolume(search.randomSearch(r.evaluations(), seed));
        System.out.printf(Locale.ROOT, "%-10d  %8.1f  %21.2f  %11d  %9d  %10.4f  %9.4f%n", seed,
            r.totalNanos() / 1e9, 100 * share[k], r.evaluations(), r.simulatedEvaluations(),
            hv[k], rhv[k]);
      }
    }
    Arrays.sort(share);
    Arrays.sort(hv);
    Arrays.sort(rhv);
    System.out.printf(Locale.ROOT, "median: outside simulations %.2f %%, archive hypervolume"
        + " %.4f, random search %.4f%n", 100 * share[seeds / 2], hv[seeds / 2], rhv[seeds / 2]);
  }
}
