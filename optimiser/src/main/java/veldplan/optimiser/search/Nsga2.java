package veldplan.optimiser.search;

import io.jenetics.DoubleChromosome;
import io.jenetics.DoubleGene;
import io.jenetics.Genotype;
import io.jenetics.Optimize;
import io.jenetics.Phenotype;
import io.jenetics.engine.EvolutionDurations;
import io.jenetics.engine.EvolutionResult;
import io.jenetics.engine.EvolutionStart;
import io.jenetics.engine.EvolutionStream;
import io.jenetics.engine.InvertibleCodec;
import io.jenetics.util.DoubleRange;
import io.jenetics.util.ISeq;
import io.jenetics.util.MSeq;
import io.jenetics.util.RandomRegistry;
import java.time.Duration;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Objects;
import java.util.SplittableRandom;
import java.util.random.RandomGenerator;
import java.util.random.RandomGeneratorFactory;

/**
 * NSGA-II of Deb et al. (2002) [1] with textbook (μ+λ) elitism, run as a Jenetics evolution
 * stream, with an external archive of every non-dominated individual found.
 *
 * <h2>One generation</h2>
 * Given the population P<sub>t</sub> of N individuals:
 * <ol>
 *   <li><i>Ranking.</i> Fast non-dominated sort of P<sub>t</sub> under constrained domination
 *       ({@link NonDominatedSorting}, {@link Dominance}) and crowding distance per front
 *       ({@link CrowdingDistance}) [1, §III].</li>
 *   <li><i>Mating.</i> Crowded binary tournaments [1, §III-C]: lower rank wins, then larger
 *       crowding distance, then a fair coin. As in the authors' C code, two random permutations
 *       of P<sub>t</sub> are paired off, so every individual plays exactly two tournaments and N
 *       parents are chosen.</li>
 *   <li><i>Variation.</i> Parents 2k and 2k+1 give two children by bounded SBX
 *       ({@link Sbx#crossPair}, probability p<sub>c</sub>) [2]; each variable goes to either
 *       child at random, crossed or not (see {@link Sbx}), then each child gene undergoes
 *       bounded polynomial mutation with probability p<sub>m</sub>
 *       ({@link PolynomialMutation}) [3].</li>
 *   <li><i>Evaluation</i> of the N children Q<sub>t</sub> in one batch through the Jenetics
 *       {@link io.jenetics.engine.Evaluator} of the run, which never sends a gene vector it has
 *       seen before to the problem.</li>
 *   <li><i>Survival.</i> R = P<sub>t</sub> ∪ Q<sub>t</sub> is sorted into fronts; fronts are
 *       taken whole, best first, while they fit; the first front that does not fit is cut by
 *       descending crowding distance (computed on that whole front) [1, §III-C].</li>
 *   <li><i>Archive.</i> The children in R's first front are offered to the {@link ParetoArchive}
 *       (the others are dominated by something already offered, so they cannot enter).</li>
 * </ol>
 * As in the paper and its reference code, the crowding distances used for mating in step 2 are
 * those of step 5 of the previous generation, computed on the whole fronts of R (for the front
 * that was cut, on all of it, survivors or not); for generation 0 they are computed on the
 * initial population. The ranks are those of R too; on P<sub>t</sub> alone they would be the
 * same (whole fronts survive, and the cut front is still dominated only by earlier fronts), which
 * is how a resumed run recomputes them.
 * (Recomputing the distances on P<sub>t</sub> alone was measured as worse: median population
 * hypervolume over 15 seeds on 3-objective DTLZ2 0.6998 instead of 0.7042.) Because these
 * distances depend on individuals that did not survive, a {@link SearchState} carries them.
 *
 * <h2>Jenetics</h2>
 * Genotypes are Jenetics {@code Genotype<DoubleGene>}: one {@code DoubleChromosome} of n genes on
 * [0, 1] (the gene range is [0, nextUp(1)) because Jenetics' upper bound is exclusive and the
 * operators may return exactly 1). An {@link InvertibleCodec} turns them into {@code double[]}
 * and back. The generation step above is an {@link io.jenetics.engine.Evolution},
 * driven by {@link EvolutionStream#ofEvolution}. Jenetics' built-in engine is not used: its
 * survivors are selected from the old population only and its crowding distance is computed
 * over the whole population, not per front (deps.md §1), and its SBX is not textbook
 * (decision-methods §2.10).
 *
 * <p><i>Stopping.</i> The stream is cut with {@code Stream.limit(long)} at the configured
 * generation. Jenetics' own limits ({@code EvolutionStream.limit(Predicate)} with
 * {@code Limits.byFixedGeneration} and friends) exist in 7.2.0 but test each result
 * <em>after</em> it has been computed (its {@code LimitSpliterator} evolves first, then asks),
 * so they would evaluate one generation that is then thrown away; with park simulations that is
 * a whole generation of wasted runs, and its children would still have reached the archive.
 * {@code Stream.limit(long)} stops before asking for the next element.
 *
 * <h2>Reproducibility</h2>
 * Generation g draws all its random numbers from its own L64X256MixRandom, seeded with the
 * (g + 1)-th {@code nextLong()} of a {@link SplittableRandom} seeded with the run's seed (the
 * project's seed-tree convention); generation 0 draws the initial genotypes through
 * {@link RandomRegistry#with}. The evolution steps run on the calling thread (there is no
 * executor to hand a thread-local generator to another thread, the trap of deps.md §1), nothing
 * is drawn during evaluation, and the problem must be deterministic, so the same seed gives the
 * same result whatever the problem does in parallel inside {@code evaluate}. A run resumed from
 * the {@link SearchState} of generation g continues bit for bit.
 *
 * <p>References:
 * <ol>
 *   <li>Deb, K., Pratap, A., Agarwal, S., Meyarivan, T. (2002). A fast and elitist
 *       multiobjective genetic algorithm: NSGA-II. IEEE TEC 6(2): 182–197.
 *       doi:10.1109/4235.996017</li>
 *   <li>Deb, K., Agrawal, R.B. (1995). Simulated binary crossover for continuous search space.
 *       Complex Systems 9(2): 115–148.</li>
 *   <li>Deb, K., Goyal, M. (1996). A combined genetic adaptive search (GeneAS) for engineering
 *       design. Computer Science and Informatics 26(4): 30–45.</li>
 * </ol>
 */
public final class Nsga2 {
  /** Jenetics' default generator in 7.x; statistically strong and seedable from one long. */
  private static final String GENERATOR = "L64X256MixRandom";
  private static final DoubleRange UNIT = DoubleRange.of(0.0, Math.nextUp(1.0));

  private final Nsga2Settings settings;
  private final SearchProblem problem;
  private final int n;
  private final int m;
  private final double mutationProbability;
  private final double[] ideal;
  private final double[] nadir;
  private final InvertibleCodec<double[], DoubleGene> codec;

  /**
   * A search of {@code problem} with {@code settings}.
   *
   * @throws IllegalArgumentException if the problem's sizes or normalisation bounds are invalid
   */
  public Nsga2(Nsga2Settings settings, SearchProblem problem) {
    this.settings = Objects.requireNonNull(settings, "settings");
    this.problem = Objects.requireNonNull(problem, "problem");
    this.n = problem.variables();
    this.m = problem.objectives();
    if (n < 1 || m < 1) {
      throw new IllegalArgumentException(
          "the problem needs >= 1 variable and >= 1 objective: " + n + ", " + m);
    }
    this.ideal = problem.ideal().clone();
    this.nadir = problem.nadir().clone();
    if (ideal.length != m || nadir.length != m) {
      throw new IllegalArgumentException("ideal and nadir must have " + m + " values");
    }
    for (int j = 0; j < m; j++) {
      if (!Double.isFinite(ideal[j]) || !Double.isFinite(nadir[j]) || !(nadir[j] > ideal[j])) {
        throw new IllegalArgumentException("objective " + j + ": nadir " + nadir[j]
            + " must be finite and above the ideal " + ideal[j]);
      }
    }
    this.mutationProbability = settings.mutationProbability(n);
    this.codec = unitCodec(n);
  }

  /**
   * The codec of n genes on [0, 1]: the same mapping as {@code Codecs.ofVector(UNIT, n)}, with
   * plain loops instead of streams (it runs twice per child) and one shared gene range.
   */
  static InvertibleCodec<double[], DoubleGene> unitCodec(int n) {
    return InvertibleCodec.of(
        Genotype.of(DoubleChromosome.of(UNIT, n)),
        gt -> ((DoubleChromosome) gt.chromosome()).toArray(),
        values -> {
          DoubleGene[] genes = new DoubleGene[values.length];
          for (int i = 0; i < values.length; i++) {
            genes[i] = DoubleGene.of(values[i], UNIT);
          }
          return Genotype.of(DoubleChromosome.of(genes));
        });
  }

  /**
   * Runs the search from a random initial population.
   *
   * @param listener called after every generation, 0 included; {@link SearchListener#NONE} for
   *                 none
   * @return the final population and the archive
   */
  public SearchResult run(SearchListener listener) {
    return run(List.of(), listener);
  }

  /**
   * Runs the search from an initial population that starts with known gene vectors (for
   * example the policy in use today), the rest random. The random individuals are drawn as in
   * {@link #run(SearchListener)}, and the first {@code seeds.size()} of them are replaced by the
   * seeds, so a run with no seeds is that run.
   *
   * @param seeds    at most N gene vectors of length n, each gene in [0, 1]
   * @param listener called after every generation, 0 included
   * @return the final population and the archive
   */
  public SearchResult run(List<double[]> seeds, SearchListener listener) {
    if (seeds.size() > settings.populationSize()) {
      throw new IllegalArgumentException(seeds.size() + " seeds for a population of "
          + settings.populationSize());
    }
    for (double[] seed : seeds) {
      if (seed.length != n) {
        throw new IllegalArgumentException("a seed has " + seed.length + " genes, expected " + n);
      }
      for (double g : seed) {
        if (!(g >= 0 && g <= 1)) {
          throw new IllegalArgumentException("a seed gene is not in [0, 1]: " + g);
        }
      }
    }
    long startNanos = System.nanoTime();
    Run run = new Run(new CachingEvaluator(problem, codec, 0, 0, 0,
        settings.totalEvaluations()), new ParetoArchive(m), 0,
        startNanos, listener);
    RandomGenerator random = generator(settings.seed(), 0);
    ISeq<Phenotype<DoubleGene, Fitness>> initial = RandomRegistry.with(random, r ->
        codec.encoding().instances()
            .limit(settings.populationSize())
            .map(gt -> Phenotype.<DoubleGene, Fitness>of(gt, 0))
            .collect(ISeq.toISeq()));
    if (!seeds.isEmpty()) {
      MSeq<Phenotype<DoubleGene, Fitness>> seeded = initial.copy();
      for (int k = 0; k < seeds.size(); k++) {
        seeded.set(k, Phenotype.of(codec.encode(seeds.get(k)), 0));
      }
      initial = seeded.toISeq();
    }
    ISeq<Phenotype<DoubleGene, Fitness>> population = run.evaluator.eval(initial);
    for (Phenotype<DoubleGene, Fitness> pt : population) {
      run.archive.offer(pt.fitness().individual());
    }
    run.population = population;
    run.crowding = initialCrowding(population);
    run.report(0);
    return run.continueFrom(1);
  }

  /**
   * Continues a run from a checkpoint. With the same settings (the number of generations may
   * differ) the result is identical to that of an uninterrupted run, bit for bit; only
   * {@code simulatedEvaluations} may be higher, because the cache is rebuilt from the
   * checkpoint's population and archive (a child identical to an individual that was dropped
   * earlier would be evaluated again; children that copy a parent are always found).
   *
   * @param checkpoint a state given to a {@link SearchListener} by a run with these settings
   * @param listener   called after every further generation
   * @throws IllegalArgumentException if the checkpoint does not fit these settings or problem
   */
  public SearchResult resume(SearchState checkpoint, SearchListener listener) {
    long startNanos = System.nanoTime();
    Nsga2Settings theirs = checkpoint.settings();
    if (!theirs.withGenerations(settings.generations()).equals(settings)) {
      throw new IllegalArgumentException("the checkpoint was made with other settings: "
          + theirs + ", now " + settings);
    }
    if (checkpoint.population().size() != settings.populationSize()) {
      throw new IllegalArgumentException("the checkpoint's population has "
          + checkpoint.population().size() + " individuals, expected "
          + settings.populationSize());
    }
    CachingEvaluator evaluator = new CachingEvaluator(problem, codec, checkpoint.evaluations(),
        checkpoint.simulatedEvaluations(), checkpoint.evaluateNanos(),
        settings.totalEvaluations());
    ParetoArchive archive = new ParetoArchive(m);
    for (Individual i : checkpoint.archive()) {
      checkShape(i);
      evaluator.remember(i);
      if (!archive.offer(i)) {
        throw new IllegalArgumentException("the checkpoint's archive holds a dominated or "
            + "duplicated member: " + i);
      }
    }
    MSeq<Phenotype<DoubleGene, Fitness>> population =
        MSeq.ofLength(checkpoint.population().size());
    for (int k = 0; k < population.length(); k++) {
      Individual i = checkpoint.population().get(k);
      checkShape(i);
      population.set(k, Phenotype.of(codec.encode(i.genes()), checkpoint.generation(),
          evaluator.remember(i)));
    }
    if (checkpoint.crowding().length != population.length()) {
      throw new IllegalArgumentException("the checkpoint has " + checkpoint.crowding().length
          + " crowding distances for " + population.length() + " individuals");
    }
    Run run = new Run(evaluator, archive, checkpoint.elapsedNanos(), startNanos, listener);
    run.population = population.toISeq();
    run.crowding = checkpoint.crowding().clone();
    return run.continueFrom(checkpoint.generation() + 1);
  }

  /** Crowding distance per front of the initial population, for its mating. */
  private double[] initialCrowding(ISeq<Phenotype<DoubleGene, Fitness>> population) {
    int size = population.size();
    double[] objectives = new double[size * m];
    double[] violations = new double[size];
    flatten(population, objectives, violations, 0, m);
    double[] crowding = new double[size];
    int[] order = new int[size];
    double[] keys = new double[size];
    for (int[] front : NonDominatedSorting.fronts(objectives, violations, size, m)) {
      CrowdingDistance.assign(objectives, m, front, front.length, crowding, order, keys);
    }
    return crowding;
  }

  private static void flatten(ISeq<Phenotype<DoubleGene, Fitness>> population,
      double[] objectives, double[] violations, int offset, int m) {
    for (int i = 0; i < population.size(); i++) {
      Evaluation e = population.get(i).fitness().individual().evaluation();
      System.arraycopy(e.objectives(), 0, objectives, (offset + i) * m, m);
      violations[offset + i] = e.violation();
    }
  }

  private void checkShape(Individual i) {
    if (i.genes().length != n || i.objectives().length != m) {
      throw new IllegalArgumentException("the checkpoint holds an individual with "
          + i.genes().length + " genes and " + i.objectives().length
          + " objectives; the problem has " + n + " and " + m);
    }
  }

  /**
   * The generator of generation g: L64X256MixRandom seeded with the (g + 1)-th long of a
   * SplittableRandom seeded with the run's seed.
   */
  static RandomGenerator generator(long seed, long generation) {
    SplittableRandom parent = new SplittableRandom(seed);
    long child = 0;
    for (long i = 0; i <= generation; i++) {
      child = parent.nextLong();
    }
    return RandomGeneratorFactory.of(GENERATOR).create(child);
  }

  /** The mutable state of one run; used from the calling thread only. */
  private final class Run {
    final CachingEvaluator evaluator;
    final ParetoArchive archive;
    final long previousElapsedNanos;
    final long startNanos;
    final SearchListener listener;
    ISeq<Phenotype<DoubleGene, Fitness>> population;
    /** Crowding distances of {@code population} for mating (see the class comment). */
    double[] crowding;
    /** Ranks of {@code population} (0 = first front), from its survival; null = compute. */
    int[] rank;
    int generation;

    Run(CachingEvaluator evaluator, ParetoArchive archive, long previousElapsedNanos,
        long startNanos, SearchListener listener) {
      this.evaluator = evaluator;
      this.archive = archive;
      this.previousElapsedNanos = previousElapsedNanos;
      this.startNanos = startNanos;
      this.listener = Objects.requireNonNull(listener, "listener");
    }

    long elapsedNanos() {
      return previousElapsedNanos + (System.nanoTime() - startNanos);
    }

    SearchResult continueFrom(int firstGeneration) {
      generation = firstGeneration - 1;
      long remaining = settings.generations() - (long) generation;
      if (remaining > 0) {
        ISeq<Phenotype<DoubleGene, Fitness>> start = population;
        EvolutionStream.<DoubleGene, Fitness>ofEvolution(
                () -> EvolutionStart.of(start, firstGeneration), this::evolve)
            .limit(remaining)
            .forEach(result -> report((int) result.generation()));
      }
      return new SearchResult(individuals(population), archive.members(),
          evaluator.requested(), evaluator.simulated(), generation,
          evaluator.evaluateNanos(), elapsedNanos());
    }

    void report(int g) {
      generation = g;
      if (listener == SearchListener.NONE) {
        return; // nobody reads the report: skip the hypervolumes and the snapshot
      }
      List<Individual> members = archive.members();
      List<double[]> feasibleArchive = archive.feasibleObjectives();
      List<double[]> feasiblePopulation = new ArrayList<>(population.size());
      for (Phenotype<DoubleGene, Fitness> pt : population) {
        Individual i = pt.fitness().individual();
        if (i.evaluation().feasible()) {
          feasiblePopulation.add(i.objectives());
        }
      }
      double r = Hypervolume.NORMALISED_REFERENCE;
      long elapsed = elapsedNanos();
      GenerationReport report = new GenerationReport(g, settings.generations(),
          evaluator.requested(), evaluator.simulated(), members.size(), feasibleArchive.size(),
          Hypervolume.normalised(feasibleArchive, ideal, nadir, r),
          Hypervolume.normalised(feasiblePopulation, ideal, nadir, r),
          evaluator.evaluateNanos(), elapsed);
      SearchState state = new SearchState(g, evaluator.requested(), evaluator.simulated(),
          individuals(population), crowding, members, evaluator.evaluateNanos(), elapsed,
          settings);
      listener.generationDone(report, state);
    }

    /** One NSGA-II generation (see the class comment). */
    EvolutionResult<DoubleGene, Fitness> evolve(EvolutionStart<DoubleGene, Fitness> start) {
      long t0 = System.nanoTime();
      long g = start.generation();
      RandomGenerator random = generator(settings.seed(), g);
      ISeq<Phenotype<DoubleGene, Fitness>> parents = start.population();
      int size = parents.size();

      // 1-2. Crowded tournaments on the ranks and crowding of the previous survival.
      double[] objectives = new double[size * m];
      double[] violations = new double[size];
      flatten(parents, objectives, violations, 0, m);
      if (rank == null) { // generation 1, or resumed: ranks on P_t equal those on R (see above)
        rank = NonDominatedSorting.ranks(
            NonDominatedSorting.fronts(objectives, violations, size, m), size);
      }
      int[] mates = tournaments(rank, crowding, random);
      long t1 = System.nanoTime();

      // 3. SBX and polynomial mutation, pair by pair.
      MSeq<Phenotype<DoubleGene, Fitness>> children = MSeq.ofLength(size);
      double[] child1 = new double[n];
      double[] child2 = new double[n];
      for (int k = 0; k < size; k += 2) {
        double[] p1 = parents.get(mates[k]).fitness().individual().genes();
        double[] p2 = parents.get(mates[k + 1]).fitness().individual().genes();
        Sbx.crossPair(p1, p2, settings.crossoverProbability(), settings.crossoverEta(), random,
            child1, child2);
        PolynomialMutation.mutate(child1, mutationProbability, settings.mutationEta(), random);
        PolynomialMutation.mutate(child2, mutationProbability, settings.mutationEta(), random);
        children.set(k, Phenotype.of(codec.encode(child1), g));
        children.set(k + 1, Phenotype.of(codec.encode(child2), g));
      }
      long t2 = System.nanoTime();

      // 4. Evaluate Q_t (cache first).
      ISeq<Phenotype<DoubleGene, Fitness>> offspring = evaluator.eval(children);
      long t3 = System.nanoTime();

      // 5-6. Survival of the best N of R = P_t ∪ Q_t; Q_t's first-front members to the archive.
      ISeq<Phenotype<DoubleGene, Fitness>> merged = parents.append(offspring);
      int total = merged.size();
      double[] mergedObjectives = Arrays.copyOf(objectives, total * m);
      double[] mergedViolations = Arrays.copyOf(violations, total);
      flatten(offspring, mergedObjectives, mergedViolations, size, m);
      int[][] mergedFronts =
          NonDominatedSorting.fronts(mergedObjectives, mergedViolations, total, m);
      double[] mergedCrowding = new double[total];
      int[] order = new int[total];
      double[] keys = new double[total];
      int[] survivors = truncate(mergedFronts, mergedObjectives, mergedCrowding, order, keys,
          size);
      for (int i : mergedFronts[0]) {
        if (i >= size) {
          archive.offer(merged.get(i).fitness().individual());
        }
      }
      MSeq<Phenotype<DoubleGene, Fitness>> next = MSeq.ofLength(size);
      double[] nextCrowding = new double[size];
      int[] nextRank = new int[size];
      int[] mergedRank = NonDominatedSorting.ranks(mergedFronts, total);
      for (int k = 0; k < size; k++) {
        next.set(k, merged.get(survivors[k]));
        nextCrowding[k] = mergedCrowding[survivors[k]];
        nextRank[k] = mergedRank[survivors[k]];
      }
      population = next.toISeq();
      crowding = nextCrowding;
      rank = nextRank;
      long t4 = System.nanoTime();

      EvolutionDurations durations = new EvolutionDurations(Duration.ofNanos(t1 - t0),
          Duration.ofNanos(t4 - t3), Duration.ofNanos(t2 - t1), Duration.ZERO, Duration.ZERO,
          Duration.ofNanos(t3 - t2), Duration.ofNanos(t4 - t0));
      return EvolutionResult.of(Optimize.MINIMUM, population, g, durations, 0, 0, size);
    }

    /**
     * N crowded binary tournaments between consecutive entries of two random permutations of
     * the population; entry k of the result is parent k.
     */
    private int[] tournaments(int[] rank, double[] crowding, RandomGenerator random) {
      int size = rank.length;
      int[] contestants = new int[2 * size];
      for (int half = 0; half < 2; half++) {
        int base = half * size;
        for (int i = 0; i < size; i++) {
          contestants[base + i] = i;
        }
        for (int i = size - 1; i > 0; i--) { // Fisher-Yates
          int j = random.nextInt(i + 1);
          int t = contestants[base + i];
          contestants[base + i] = contestants[base + j];
          contestants[base + j] = t;
        }
      }
      int[] winners = new int[size];
      for (int k = 0; k < size; k++) {
        int a = contestants[2 * k];
        int b = contestants[2 * k + 1];
        if (rank[a] != rank[b]) {
          winners[k] = rank[a] < rank[b] ? a : b;
        } else if (crowding[a] != crowding[b]) {
          winners[k] = crowding[a] > crowding[b] ? a : b;
        } else {
          winners[k] = random.nextBoolean() ? a : b;
        }
      }
      return winners;
    }

    /**
     * Indices of the N survivors of R: whole fronts while they fit, then the first front that
     * does not fit by descending crowding distance (ties keep front order). Writes the crowding
     * distance of every member of the fronts it looked at into {@code crowding}.
     */
    private int[] truncate(int[][] fronts, double[] objectives, double[] crowding, int[] order,
        double[] keys, int keep) {
      int[] survivors = new int[keep];
      int count = 0;
      for (int[] front : fronts) {
        int size = front.length;
        CrowdingDistance.assign(objectives, m, front, size, crowding, order, keys);
        if (count + size <= keep) {
          System.arraycopy(front, 0, survivors, count, size);
          count += size;
          if (count == keep) {
            break;
          }
          continue;
        }
        int[] byCrowding = front.clone();
        double[] negated = new double[size];
        for (int k = 0; k < size; k++) {
          negated[k] = -crowding[byCrowding[k]];
        }
        IndexSort.sort(byCrowding, negated, size);
        System.arraycopy(byCrowding, 0, survivors, count, keep - count);
        break;
      }
      return survivors;
    }
  }

  private static List<Individual> individuals(ISeq<Phenotype<DoubleGene, Fitness>> population) {
    List<Individual> out = new ArrayList<>(population.size());
    for (Phenotype<DoubleGene, Fitness> pt : population) {
      out.add(pt.fitness().individual());
    }
    return out;
  }
}
