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
 * <pre>mvn -q -B -Pbench-search -pl optimiser -am verify [-Dbench.search.args="--seeds 3 --threads 2"]</pre>
 */
public final class SearchBench {
  private SearchBench() {}

  /** Options: --scenario FILE (default the example), --seeds N (3), --threads N (all cores). */
  public static void main(String[] args) throws Exception {
    Path file = ExampleScenario.file();
    int seeds = 3;
    int threads = Runtime.getRuntime().availableProcessors();
    for (int i = 0; i + 1 < args.length; i += 2) {
      switch (args[i]) {
        case "--scenario":
          file = Path.of(args[i + 1]);
          break;
        case "--seeds":
          seeds = Integer.parseInt(args[i + 1]);
          break;
        case "--threads":
          threads = Integer.parseInt(args[i + 1]);
          break;
        default:
          throw new IllegalArgumentException("unknown option " + args[i]
              + " (expected --scenario, --seeds, --threads)");
      }
    }
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
