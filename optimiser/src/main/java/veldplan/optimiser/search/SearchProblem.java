package veldplan.optimiser.search;

import java.util.List;

/**
 * A multi-objective minimisation problem over the unit hypercube, as {@link Nsga2} sees it.
 *
 * <p>Every objective is minimised (negate an objective to be maximised). The genes are a point of
 * [0, 1]<sup>n</sup>; the problem decodes and scales them itself (an affine map to a variable's
 * own range loses nothing: bounded SBX and polynomial mutation are affine-invariant).
 *
 * <p>Constraints are reported as one number per solution, the sum of normalised constraint
 * violations (0 = feasible), and handled by constrained domination [Deb et al. 2002].
 */
public interface SearchProblem {
  /** Number of genes n, &ge; 1. */
  int variables();

  /** Number of objectives M, &ge; 1. */
  int objectives();

  /**
   * Fixed normalisation bounds for the hypervolume (decision-methods §3.2): per objective, the
   * best plausible value. Must be identical for all runs being compared, never a per-run minimum.
   *
   * @return M finite values, each strictly below the matching {@link #nadir()} value
   */
  double[] ideal();

  /**
   * Fixed normalisation bounds for the hypervolume: per objective, the worst plausible value.
   * The reported hypervolume uses the reference point 1.1 in normalised space, i.e. nadir plus
   * 10 % of the range.
   *
   * @return M finite values
   */
  double[] nadir();

  /**
   * Evaluates a batch of gene vectors. Result i belongs to {@code genes.get(i)}.
   *
   * <p>Implementations may evaluate in parallel inside, but the result must be a pure function of
   * each gene vector: the same genes give the same objectives whatever the batch, its order or
   * the thread count. The arrays passed in must not be modified.
   *
   * @param genes gene vectors of length {@link #variables()}, each in [0, 1]
   * @return one evaluation per gene vector, in the same order
   */
  List<Evaluation> evaluate(List<double[]> genes);
}
