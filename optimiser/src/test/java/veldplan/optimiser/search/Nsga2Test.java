package veldplan.optimiser.search;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.ObjectMapper;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.concurrent.ForkJoinPool;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Test;
import veldplan.optimiser.search.problems.Zdt;

/**
 * Behaviour of {@link Nsga2}: determinism whatever the evaluation threads, exact resumption from
 * every checkpoint (also after a JSON round trip), evaluation counting and the cache, the
 * archive, constraints and the listener. Small runs (N = 20, a few dozen generations) keep it
 * fast; the quality of the search is {@link Nsga2ValidationTest}.
 */
class Nsga2Test {
  private static final Nsga2Settings SMALL = Nsga2Settings.defaults(20, 25, 12345);

  /** Evaluates a problem's batch in parallel on a pool of the given size. */
  private static SearchProblem parallel(Zdt problem, int threads) {
    return new Delegate(problem) {
      @Override
      public List<Evaluation> evaluate(List<double[]> genes) {
        ForkJoinPool pool = new ForkJoinPool(threads);
        try {
          return pool.submit(() -> genes.parallelStream()
              .map(g -> Evaluation.of(problem.objectives(g)))
              .collect(Collectors.toList())).get();
        } catch (Exception e) {
          throw new IllegalStateException(e);
        } finally {
          pool.shutdown();
        }
      }
    };
  }

  /** Records every batch passed to evaluate. */
  private static final class Recording extends Delegate {
    final List<List<double[]>> batches = new ArrayList<>();

    Recording(SearchProblem problem) {
      super(problem);
    }

    @Override
    public List<Evaluation> evaluate(List<double[]> genes) {
      List<double[]> copy = new ArrayList<>();
      for (double[] g : genes) {
        copy.add(g.clone());
      }
      batches.add(copy);
      return super.evaluate(genes);
    }
  }

  private static class Delegate implements SearchProblem {
    private final SearchProblem problem;

    Delegate(SearchProblem problem) {
      this.problem = problem;
    }

    @Override
    public int variables() {
      return problem.variables();
    }

    @Override
    public int objectives() {
      return problem.objectives();
    }

    @Override
    public double[] ideal() {
      return problem.ideal();
    }

    @Override
    public double[] nadir() {
      return problem.nadir();
    }

    @Override
    public List<Evaluation> evaluate(List<double[]> genes) {
      return problem.evaluate(genes);
    }
  }

  @Test
  void run_sameSeedAnyThreadCount_identicalResult() {
    SearchResult serial = new Nsga2(SMALL, Zdt.ZDT1).run(SearchListener.NONE);
    SearchResult again = new Nsga2(SMALL, Zdt.ZDT1).run(SearchListener.NONE);
    SearchResult oneThread = new Nsga2(SMALL, parallel(Zdt.ZDT1, 1)).run(SearchListener.NONE);
    SearchResult fourThreads = new Nsga2(SMALL, parallel(Zdt.ZDT1, 4)).run(SearchListener.NONE);
    for (SearchResult other : List.of(again, oneThread, fourThreads)) {
      assertEquals(serial.population(), other.population());
      assertEquals(serial.archive(), other.archive());
      assertEquals(serial.evaluations(), other.evaluations());
      assertEquals(serial.simulatedEvaluations(), other.simulatedEvaluations());
    }
  }

  @Test
  void run_otherSeed_otherResult() {
    SearchResult a = new Nsga2(SMALL, Zdt.ZDT1).run(SearchListener.NONE);
    SearchResult b = new Nsga2(new Nsga2Settings(20, 25, 0.9, 20, Double.NaN, 20, 12346),
        Zdt.ZDT1).run(SearchListener.NONE);
    assertNotEquals(a.population(), b.population());
  }

  @Test
  void resume_fromEveryCheckpoint_endsBitIdentical() {
    List<SearchState> states = new ArrayList<>();
    SearchResult whole = new Nsga2(SMALL, Zdt.ZDT2).run((report, state) -> states.add(state));
    assertEquals(SMALL.generations() + 1, states.size());
    for (SearchState state : states) {
      SearchResult resumed = new Nsga2(SMALL, Zdt.ZDT2).resume(state, SearchListener.NONE);
      assertEquals(whole.population(), resumed.population(), "from " + state.generation());
      assertEquals(whole.archive(), resumed.archive(), "from " + state.generation());
      assertEquals(whole.evaluations(), resumed.evaluations());
      // The cache is rebuilt from the checkpoint's population and archive; on these runs no
      // child ever duplicated a dropped individual, so the counts agree too.
      assertEquals(whole.simulatedEvaluations(), resumed.simulatedEvaluations());
      assertEquals(whole.generation(), resumed.generation());
    }
  }

  @Test
  void resume_afterJsonRoundTrip_endsBitIdentical() throws Exception {
    List<SearchState> states = new ArrayList<>();
    SearchResult whole = new Nsga2(SMALL, Zdt.ZDT3).run((report, state) -> states.add(state));
    ObjectMapper json = new ObjectMapper();
    SearchState state = states.get(7);
    String text = json.writeValueAsString(state);
    SearchState read = json.readValue(text, SearchState.class);
    assertEquals(state, read, "doubles, infinities (crowding) and NaN (settings) round-trip");
    SearchResult resumed = new Nsga2(SMALL, Zdt.ZDT3).resume(read, SearchListener.NONE);
    assertEquals(whole.population(), resumed.population());
    assertEquals(whole.archive(), resumed.archive());
  }

  @Test
  void resume_withMoreGenerations_continuesLikeALongerRun() {
    List<SearchState> states = new ArrayList<>();
    new Nsga2(SMALL.withGenerations(10), Zdt.ZDT1).run((r, s) -> states.add(s));
    SearchState last = states.get(states.size() - 1);
    SearchResult continued = new Nsga2(SMALL, Zdt.ZDT1).resume(last, SearchListener.NONE);
    SearchResult longer = new Nsga2(SMALL, Zdt.ZDT1).run(SearchListener.NONE);
    assertEquals(longer.population(), continued.population());
    assertEquals(longer.archive(), continued.archive());
  }

  @Test
  void resume_otherSettingsOrProblem_isRejected() {
    List<SearchState> states = new ArrayList<>();
    new Nsga2(SMALL, Zdt.ZDT1).run((r, s) -> states.add(s));
    SearchState state = states.get(3);
    Nsga2Settings otherSeed = new Nsga2Settings(20, 25, 0.9, 20, Double.NaN, 20, 1);
    assertThrows(IllegalArgumentException.class,
        () -> new Nsga2(otherSeed, Zdt.ZDT1).resume(state, SearchListener.NONE));
    assertThrows(IllegalArgumentException.class,
        () -> new Nsga2(SMALL, Zdt.ZDT4).resume(state, SearchListener.NONE));
  }

  @Test
  void evaluations_oneBatchPerGeneration_neverTheSameGenesTwice() {
    Recording problem = new Recording(Zdt.ZDT1);
    SearchResult result = new Nsga2(SMALL, problem).run(SearchListener.NONE);
    // Generation 0 plus 25 generations: no extra generation is evaluated past the limit.
    assertEquals(SMALL.generations() + 1, problem.batches.size());
    assertEquals(20L * 26, result.evaluations());
    Set<List<Double>> seen = new HashSet<>();
    long passed = 0;
    for (List<double[]> batch : problem.batches) {
      for (double[] genes : batch) {
        assertTrue(seen.add(Arrays.stream(genes).boxed().toList()), "evaluated twice");
        passed++;
      }
    }
    assertEquals(passed, result.simulatedEvaluations());
    assertTrue(result.simulatedEvaluations() < result.evaluations(),
        "children that copy a parent (no crossover, no mutation) come from the cache");
  }

  @Test
  void listener_everyGeneration_archiveHypervolumeNeverDecreases() {
    List<GenerationReport> reports = new ArrayList<>();
    SearchResult result = new Nsga2(SMALL, Zdt.ZDT1).run((r, s) -> reports.add(r));
    assertEquals(SMALL.generations() + 1, reports.size());
    for (int g = 0; g < reports.size(); g++) {
      GenerationReport r = reports.get(g);
      assertEquals(g, r.generation());
      assertEquals(SMALL.generations(), r.generations());
      assertEquals(20L * (g + 1), r.evaluations());
      assertTrue(r.hypervolume() >= r.populationHypervolume() - 1e-15);
      if (g > 0) {
        // The archive's dominated region only grows, so its hypervolume cannot fall.
        assertTrue(r.hypervolume() >= reports.get(g - 1).hypervolume());
      }
    }
    GenerationReport last = reports.get(reports.size() - 1);
    assertEquals(result.archive().size(), last.archiveSize());
    List<double[]> archive = result.archive().stream().map(Individual::objectives).toList();
    assertEquals(Hypervolume.of(archive, new double[] {1.1, 1.1}), last.hypervolume(), 1e-15);
  }

  @Test
  void archive_mutuallyNonDominated_andCoversTheFinalPopulation() {
    SearchResult result = new Nsga2(SMALL, Zdt.ZDT1).run(SearchListener.NONE);
    List<Individual> archive = result.archive();
    for (Individual a : archive) {
      for (Individual b : archive) {
        assertTrue(a == b || Dominance.constrained(a.evaluation(), b.evaluation()) >= 0);
      }
    }
    for (Individual p : result.population()) {
      boolean covered = archive.stream().anyMatch(a ->
          Dominance.constrained(a.evaluation(), p.evaluation()) < 0
              || a.evaluation().equals(p.evaluation()));
      assertTrue(covered, "population member neither in nor dominated by the archive");
    }
  }

  @Test
  void archive_equalsTheArchiveOfEverySolutionEvaluated() {
    // Nsga2 offers only the children in the first front of P ∪ Q; anything else is dominated by
    // something offered before, so the archive must be that of every evaluated solution, in the
    // same order (3 objectives: the ArchiveTree path; a constraint: feasibility is reached late).
    List<Individual> evaluated = new ArrayList<>();
    SearchProblem dtlz2 = veldplan.optimiser.search.problems.Dtlz.dtlz2(3);
    SearchProblem recorded = new SearchProblem() {
      public int variables() { return dtlz2.variables(); }
      public int objectives() { return 3; }
      public double[] ideal() { return dtlz2.ideal(); }
      public double[] nadir() { return dtlz2.nadir(); }
      public List<Evaluation> evaluate(List<double[]> genes) {
        List<Evaluation> out = new ArrayList<>();
        for (Evaluation e : dtlz2.evaluate(genes)) {
          double[] f = e.objectives(); // feasible iff f1 <= 0.2, violation on a coarse grid
          out.add(new Evaluation(f, Math.ceil(Math.max(0, f[0] - 0.2) * 10) / 10));
        }
        for (int i = 0; i < genes.size(); i++) {
          evaluated.add(new Individual(genes.get(i), out.get(i)));
        }
        return out;
      }
    };
    SearchResult result = new Nsga2(Nsga2Settings.defaults(40, 60, 7), recorded)
        .run(SearchListener.NONE);
    ParetoArchive all = new ParetoArchive(3);
    all.offerAll(evaluated);
    assertTrue(all.feasible() && all.size() > 100, "size " + all.size());
    assertEquals(all.members(), result.archive());
  }

  @Test
  void constraints_infeasibleRegionIsLeft() {
    // ZDT1 with the constraint f1 >= 0.5, violation max(0, 0.5 - f1): everything in the final
    // population and archive must be feasible (constrained domination, Deb et al. 2002).
    SearchProblem constrained = new Delegate(Zdt.ZDT1) {
      @Override
      public List<Evaluation> evaluate(List<double[]> genes) {
        List<Evaluation> out = new ArrayList<>();
        for (double[] g : genes) {
          double[] f = Zdt.ZDT1.objectives(g);
          out.add(new Evaluation(f, Math.max(0, 0.5 - f[0])));
        }
        return out;
      }
    };
    SearchResult result = new Nsga2(SMALL, constrained).run(SearchListener.NONE);
    for (Individual i : result.population()) {
      assertTrue(i.evaluation().feasible(), "infeasible survivor " + i);
    }
    for (Individual i : result.archive()) {
      assertTrue(i.evaluation().feasible() && i.objectives()[0] >= 0.5);
    }
  }

  @Test
  void problemReturningTooFewEvaluations_failsClearly() {
    SearchProblem broken = new Delegate(Zdt.ZDT1) {
      @Override
      public List<Evaluation> evaluate(List<double[]> genes) {
        return super.evaluate(genes.subList(0, genes.size() - 1));
      }
    };
    IllegalStateException e = assertThrows(IllegalStateException.class,
        () -> new Nsga2(SMALL, broken).run(SearchListener.NONE));
    assertTrue(e.getMessage().contains("19 evaluations for 20 gene vectors"), e.getMessage());
  }

  @Test
  void settings_defaultsAreDebEtAl2002_andBadValuesAreRejected() {
    // decision-methods §2.6: real-coded NSGA-II p_c 0.9, eta_c 20, p_m 1/n, eta_m 20 [mem].
    Nsga2Settings d = Nsga2Settings.defaults(100, 249, 1);
    assertEquals(0.9, d.crossoverProbability());
    assertEquals(20, d.crossoverEta());
    assertEquals(1.0 / 30, d.mutationProbability(30));
    assertEquals(20, d.mutationEta());
    assertEquals(25_000, d.totalEvaluations());
    assertThrows(IllegalArgumentException.class, () -> Nsga2Settings.defaults(21, 10, 1));
    assertThrows(IllegalArgumentException.class, () -> Nsga2Settings.defaults(2, 10, 1));
    assertThrows(IllegalArgumentException.class,
        () -> new Nsga2Settings(20, 10, 1.5, 20, Double.NaN, 20, 1));
    assertThrows(IllegalArgumentException.class,
        () -> new Evaluation(new double[] {Double.NaN, 1}, 0));
    assertThrows(IllegalArgumentException.class, () -> new Evaluation(new double[] {1, 1}, -1));
  }

  @Test
  void generator_dependsOnlyOnSeedAndGeneration() {
    long a = Nsga2.generator(7, 3).nextLong();
    assertEquals(a, Nsga2.generator(7, 3).nextLong());
    assertNotEquals(a, Nsga2.generator(7, 4).nextLong());
    assertNotEquals(a, Nsga2.generator(8, 3).nextLong());
  }
}
