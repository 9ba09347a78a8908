package veldplan.optimiser.search;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;

/**
 * The baseline a genetic algorithm must beat: gene vectors drawn uniformly from the unit
 * hypercube, evaluated in batches, the non-dominated ones kept in a {@link ParetoArchive}. Same
 * budget, same problem, same archive rule as {@link Nsga2}, so the two archives' hypervolumes
 * compare like with like.
 */
public final class RandomSearch {
  private RandomSearch() {}

  /**
   * Evaluates {@code budget} random gene vectors.
   *
   * @param problem the problem
   * @param budget  evaluations
   * @param batch   gene vectors per call of {@link SearchProblem#evaluate}
   * @param seed    seed of the draws
   * @return the archive of every non-dominated vector found
   */
  public static List<Individual> run(SearchProblem problem, long budget, int batch, long seed) {
    if (budget < 1 || batch < 1) {
      throw new IllegalArgumentException("budget and batch must be >= 1: " + budget + ", " + batch);
    }
    SplittableRandom random = new SplittableRandom(seed);
    ParetoArchive archive = new ParetoArchive(problem.objectives());
    int n = problem.variables();
    for (long done = 0; done < budget; ) {
      int size = (int) Math.min(batch, budget - done);
      List<double[]> genes = new ArrayList<>(size);
      for (int i = 0; i < size; i++) {
        double[] g = new double[n];
        for (int j = 0; j < n; j++) {
          g[j] = random.nextDouble();
        }
        genes.add(g);
      }
      List<Evaluation> evaluations = problem.evaluate(genes);
      for (int i = 0; i < size; i++) {
        archive.offer(new Individual(genes.get(i), evaluations.get(i)));
      }
      done += size;
    }
    return archive.members();
  }
}
