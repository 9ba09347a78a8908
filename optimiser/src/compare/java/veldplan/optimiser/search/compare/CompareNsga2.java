package veldplan.optimiser.search.compare;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.function.IntFunction;
import org.moeaframework.core.PRNG;
import org.moeaframework.core.Solution;
import org.moeaframework.core.operator.CompoundVariation;
import org.moeaframework.core.operator.real.PM;
import org.moeaframework.core.operator.real.SBX;
import org.uma.jmetal.algorithm.multiobjective.nsgaii.NSGAII;
import org.uma.jmetal.algorithm.multiobjective.nsgaii.NSGAIIBuilder;
import org.uma.jmetal.operator.crossover.impl.SBXCrossover;
import org.uma.jmetal.operator.mutation.impl.PolynomialMutation;
import org.uma.jmetal.problem.doubleproblem.DoubleProblem;
import org.uma.jmetal.solution.doublesolution.DoubleSolution;
import org.uma.jmetal.util.pseudorandom.JMetalRandom;
import org.uma.jmetal.util.bounds.Bounds;
import veldplan.optimiser.search.Comparisons;
import veldplan.optimiser.search.Evaluation;
import veldplan.optimiser.search.Hypervolume;
import veldplan.optimiser.search.Individual;
import veldplan.optimiser.search.Nsga2;
import veldplan.optimiser.search.Nsga2Settings;
import veldplan.optimiser.search.ParetoArchive;
import veldplan.optimiser.search.SearchListener;
import veldplan.optimiser.search.SearchProblem;
import veldplan.optimiser.search.SearchResult;
import veldplan.optimiser.search.problems.Dtlz;
import veldplan.optimiser.search.problems.Zdt;

/**
 * Side-by-side NSGA-II comparison (a benchmark, not a test): veldplan's {@link Nsga2} against the
 * NSGA-II of jMetal 6.6 and of MOEA Framework 5.0 on ZDT1, ZDT2 and 3-objective DTLZ2, 25,000
 * evaluations, population 100, the same operators everywhere (SBX p<sub>c</sub> 0.9,
 * &eta;<sub>c</sub> 20; polynomial mutation p<sub>m</sub> 1/n, &eta;<sub>m</sub> 20; Deb et al.
 * 2002). Prints, per problem and library, the median over seeds of the final population's
 * hypervolume (r = 1.1 in every objective; ideal 0 and nadir 1 for all three problems, so this is
 * the raw hypervolume) and of the wall time per run, after one warm-up run of every
 * configuration. It also prints the hypervolume of the archive of every non-dominated solution
 * found: veldplan's external archive (its upkeep is inside the timed run), and for the other two,
 * which keep no such archive, the non-dominated set of every objective vector their problem was
 * asked to evaluate, recorded during the run and formed afterwards, outside the timing. Runs are
 * interleaved (seed by seed, library by library) so that load
 * from other processes on the machine falls on all three alike.
 *
 * <pre>{@code
 * mvn -q -B -Pcompare -pl optimiser -am verify                       # seeds 1..5
 * mvn -q -B -Pcompare -pl optimiser -am verify -Dcompare.args=11     # seeds 1..11
 * }</pre>
 */
public final class CompareNsga2 {
  private static final int POPULATION = 100;
  private static final int EVALUATIONS = 25_000;
  /** Offspring generations after the initial population: 100 × (249 + 1) = 25,000. */
  private static final int GENERATIONS = EVALUATIONS / POPULATION - 1;
  private static final double PC = 0.9;
  private static final double ETA_C = 20;
  private static final double ETA_M = 20;

  private CompareNsga2() {}

  /**
   * One configuration: runs with a seed. The result holds the final population's HV and either
   * the HV of the library's own archive (veldplan) or every objective vector the library
   * evaluated (the others), whose non-dominated set is formed after the run, outside the timing.
   */
  private interface Runner {
    Outcome run(long seed);
  }

  private record Outcome(double populationHv, double archiveHv, List<double[]> evaluated) {}

  private record Case(String problem, String library, double[] reference, Runner runner) {}

  public static void main(String[] args) {
    int seeds = args.length > 0 ? Integer.parseInt(args[0]) : 5;
    String only = args.length > 1 ? args[1] : "";
    List<Case> cases = new ArrayList<>();
    addProblem(cases, "ZDT1", Zdt.ZDT1, n -> new org.uma.jmetal.problem.multiobjective.zdt.ZDT1(n),
        n -> new org.moeaframework.problem.ZDT.ZDT1(n));
    addProblem(cases, "ZDT2", Zdt.ZDT2, n -> new org.uma.jmetal.problem.multiobjective.zdt.ZDT2(n),
        n -> new org.moeaframework.problem.ZDT.ZDT2(n));
    addProblem(cases, "DTLZ2 (M=3)", Dtlz.dtlz2(3),
        n -> new org.uma.jmetal.problem.multiobjective.dtlz.DTLZ2(n, 3),
        n -> new org.moeaframework.problem.DTLZ.DTLZ2(n, 3));

    System.out.printf(Locale.ROOT, "Java %s, %d cores; %d seeds, population %d, %d evaluations%n",
        System.getProperty("java.version"), Runtime.getRuntime().availableProcessors(), seeds,
        POPULATION, EVALUATIONS);
    cases.removeIf(c -> !c.problem.startsWith(only));
    for (Case c : cases) { // JIT warm-up, not measured
      c.runner.run(1000);
    }
    int size = cases.size();
    double[][] hv = new double[size][seeds];
    double[][] archiveHv = new double[size][seeds];
    double[][] seconds = new double[size][seeds];
    for (int s = 0; s < seeds; s++) {
      for (int k = 0; k < size; k++) {
        long start = System.nanoTime();
        Outcome r = cases.get(k).runner.run(s + 1);
        seconds[k][s] = (System.nanoTime() - start) / 1e9;
        hv[k][s] = r.populationHv();
        archiveHv[k][s] = r.evaluated() == null ? r.archiveHv()
            : nonDominatedHypervolume(r.evaluated(), cases.get(k).reference());
      }
    }
    System.out.println();
    System.out.println("| problem | library | median HV, final population (min–max) | "
        + "median HV, archive | median time per run (min–max) |");
    System.out.println("|---|---|---|---|---|");
    for (int k = 0; k < size; k++) {
      Case c = cases.get(k);
      String archive = String.format(Locale.ROOT, "%.4f", median(archiveHv[k]));
      System.out.printf(Locale.ROOT, "| %s | %s | %.4f (%.4f–%.4f) | %s | %.3f s (%.3f–%.3f) |%n",
          c.problem, c.library, median(hv[k]), min(hv[k]), max(hv[k]), archive,
          median(seconds[k]), min(seconds[k]), max(seconds[k]));
    }
    significance(cases, hv, seconds);
  }

  /**
   * Per problem, ours against each other library over the seeds: Vargha-Delaney A12 (above 0.5:
   * ours tends to be higher) and the two-sided Mann-Whitney p of the final population's HV, and
   * the same for time (A12 below 0.5: ours tends to be faster).
   */
  private static void significance(List<Case> cases, double[][] hv, double[][] seconds) {
    System.out.println();
    System.out.println("| problem | ours against | HV: A12 (ours higher > 0.5) | HV: Mann-Whitney p"
        + " | time: A12 (ours slower > 0.5) | time: Mann-Whitney p |");
    System.out.println("|---|---|---|---|---|---|");
    for (int k = 0; k < cases.size(); k++) {
      if (!cases.get(k).library.startsWith("veldplan")) {
        continue;
      }
      for (int j = 0; j < cases.size(); j++) {
        if (j == k || !cases.get(j).problem.equals(cases.get(k).problem)) {
          continue;
        }
        System.out.printf(Locale.ROOT, "| %s | %s | %.2f | %.3f | %.2f | %.3f |%n",
            cases.get(k).problem, cases.get(j).library, Comparisons.a12(hv[k], hv[j]),
            Comparisons.mannWhitneyP(hv[k], hv[j]), Comparisons.a12(seconds[k], seconds[j]),
            Comparisons.mannWhitneyP(seconds[k], seconds[j]));
      }
    }
  }

  private static void addProblem(List<Case> cases, String name, SearchProblem ours,
      IntFunction<DoubleProblem> jmetal,
      IntFunction<org.moeaframework.problem.Problem> moea) {
    int n = ours.variables();
    double[] reference = new double[ours.objectives()];
    Arrays.fill(reference, Hypervolume.NORMALISED_REFERENCE);
    cases.add(new Case(name, "veldplan Nsga2", reference, seed -> {
      SearchResult r = new Nsga2(
          new Nsga2Settings(POPULATION, GENERATIONS, PC, ETA_C, 1.0 / n, ETA_M, seed), ours)
          .run(SearchListener.NONE);
      return new Outcome(Hypervolume.of(objectives(r.population()), reference),
          Hypervolume.of(objectives(r.archive()), reference), null);
    }));
    cases.add(new Case(name, "jMetal 6.6 NSGAII", reference, seed -> {
      JMetalRandom.getInstance().setSeed(seed);
      List<double[]> evaluated = new ArrayList<>(EVALUATIONS);
      DoubleProblem problem = recording(jmetal.apply(n), evaluated);
      NSGAII<DoubleSolution> algorithm = new NSGAIIBuilder<>(problem,
          new SBXCrossover(PC, ETA_C), new PolynomialMutation(1.0 / n, ETA_M), POPULATION)
          .setMaxEvaluations(EVALUATIONS)
          .build();
      algorithm.run();
      List<double[]> points = new ArrayList<>();
      for (DoubleSolution s : algorithm.result()) {
        points.add(s.objectives().clone());
      }
      return new Outcome(Hypervolume.of(points, reference), Double.NaN, evaluated);
    }));
    cases.add(new Case(name, "MOEA Framework 5.0 NSGAII", reference, seed -> {
      PRNG.setSeed(seed);
      List<double[]> evaluated = new ArrayList<>(EVALUATIONS);
      org.moeaframework.algorithm.NSGAII algorithm =
          new org.moeaframework.algorithm.NSGAII(recording(moea.apply(n), evaluated));
      algorithm.setInitialPopulationSize(POPULATION);
      algorithm.setVariation(new CompoundVariation(new SBX(PC, ETA_C), new PM(1.0 / n, ETA_M)));
      algorithm.run(EVALUATIONS);
      List<double[]> points = new ArrayList<>();
      for (Solution s : algorithm.getPopulation()) {
        points.add(s.getObjectiveValues());
      }
      return new Outcome(Hypervolume.of(points, reference), Double.NaN, evaluated);
    }));
  }

  /** Hypervolume of the non-dominated vectors among {@code points}, formed by our archive. */
  private static double nonDominatedHypervolume(List<double[]> points, double[] reference) {
    ParetoArchive archive = new ParetoArchive(reference.length);
    for (double[] p : points) {
      archive.offer(new Individual(new double[0], Evaluation.of(p)));
    }
    return Hypervolume.of(archive.feasibleObjectives(), reference);
  }

  /** jMetal's problem, also copying every objective vector it evaluates into {@code sink}. */
  private static DoubleProblem recording(DoubleProblem problem, List<double[]> sink) {
    return new DoubleProblem() {
      @Override
      public DoubleSolution evaluate(DoubleSolution solution) {
        problem.evaluate(solution);
        sink.add(solution.objectives().clone());
        return solution;
      }

      @Override
      public DoubleSolution createSolution() {
        return problem.createSolution();
      }

      @Override
      public int numberOfVariables() {
        return problem.numberOfVariables();
      }

      @Override
      public int numberOfObjectives() {
        return problem.numberOfObjectives();
      }

      @Override
      public int numberOfConstraints() {
        return problem.numberOfConstraints();
      }

      @Override
      public String name() {
        return problem.name();
      }

      @Override
      public List<Bounds<Double>> variableBounds() {
        return problem.variableBounds();
      }
    };
  }

  /** MOEA Framework's problem, also copying every objective vector it evaluates into sink. */
  private static org.moeaframework.problem.Problem recording(
      org.moeaframework.problem.Problem problem, List<double[]> sink) {
    return new org.moeaframework.problem.Problem() {
      @Override
      public void evaluate(Solution solution) {
        problem.evaluate(solution);
        sink.add(solution.getObjectiveValues().clone());
      }

      @Override
      public Solution newSolution() {
        return problem.newSolution();
      }

      @Override
      public String getName() {
        return problem.getName();
      }

      @Override
      public int getNumberOfVariables() {
        return problem.getNumberOfVariables();
      }

      @Override
      public int getNumberOfObjectives() {
        return problem.getNumberOfObjectives();
      }

      @Override
      public int getNumberOfConstraints() {
        return problem.getNumberOfConstraints();
      }

      @Override
      public void close() {
        problem.close();
      }
    };
  }

  private static List<double[]> objectives(List<Individual> individuals) {
    List<double[]> out = new ArrayList<>(individuals.size());
    for (Individual i : individuals) {
      out.add(i.objectives());
    }
    return out;
  }

  private static double median(double[] values) {
    double[] sorted = values.clone();
    Arrays.sort(sorted);
    int n = sorted.length;
    return n % 2 == 1 ? sorted[n / 2] : 0.5 * (sorted[n / 2 - 1] + sorted[n / 2]);
  }

  private static double min(double[] values) {
    return Arrays.stream(values).min().orElse(Double.NaN);
  }

  private static double max(double[] values) {
    return Arrays.stream(values).max().orElse(Double.NaN);
  }
}
