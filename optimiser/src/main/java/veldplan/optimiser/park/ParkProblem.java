package veldplan.optimiser.park;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import veldplan.objectives.Estimate;
import veldplan.objectives.Objective;
import veldplan.optimiser.search.Evaluation;
import veldplan.optimiser.search.SearchProblem;
import veldplan.shared.scenario.Policy;

/**
 * The park as a search problem: genes decode to a policy ({@link PolicySpace}), the policy runs
 * on the search replicates of every climate path, and the objectives and thresholds become the
 * minimised, normalised values and the constraint violation the search works with.
 *
 * <p>Each objective value v is mapped to (v - best) / (worst - best), so 0 is the best plausible
 * value and 1 the worst, whatever its direction and unit ({@link Objective#normalised}); the
 * hypervolume therefore uses the ideal (0, ..., 0) and the nadir (1, ..., 1). A threshold
 * "at least L" adds max(0, L - v) / |worst - best| to the violation, "at most U" adds
 * max(0, v - U) / |worst - best| (constrained domination, Deb et al. 2002).
 *
 * <p>Policies that decode the same are simulated once: scores are cached by policy for the run.
 */
public final class ParkProblem implements SearchProblem {
  private final PolicySpace space;
  private final ParkEvaluator evaluator;
  private final List<Objective> objectives;
  private final List<Limit> limits;
  private final int replicates;
  private final ParkEvaluator.Progress progress;
  private final Map<Policy, Evaluation> cache = new HashMap<>();
  private long simulatedPolicies;

  /**
   * @param space      the levers
   * @param evaluator  scores policies; its first measures are the objectives, in order
   * @param objectives how many of the evaluator's measures (from the first) are objectives
   * @param limits     thresholds on the evaluator's measures
   * @param replicates search replicates per path (replicates 0 .. replicates-1)
   * @param progress   called after each simulated run
   */
  public ParkProblem(PolicySpace space, ParkEvaluator evaluator, int objectives,
      List<Limit> limits, int replicates, ParkEvaluator.Progress progress) {
    this.space = space;
    this.evaluator = evaluator;
    this.objectives = evaluator.measures().subList(0, objectives);
    this.limits = List.copyOf(limits);
    this.replicates = replicates;
    this.progress = progress;
  }

  @Override
  public int variables() {
    return space.size();
  }

  @Override
  public int objectives() {
    return objectives.size();
  }

  @Override
  public double[] ideal() {
    return new double[objectives.size()];
  }

  @Override
  public double[] nadir() {
    double[] one = new double[objectives.size()];
    java.util.Arrays.fill(one, 1);
    return one;
  }

  /** Policies simulated so far (distinct decoded policies). */
  public long simulatedPolicies() {
    return simulatedPolicies;
  }

  @Override
  public List<Evaluation> evaluate(List<double[]> genes) {
    List<Policy> policies = new ArrayList<>(genes.size());
    Map<Policy, Integer> fresh = new LinkedHashMap<>();
    for (double[] g : genes) {
      Policy policy = space.decode(g, "");
      policies.add(policy);
      if (!cache.containsKey(policy)) {
        fresh.putIfAbsent(policy, fresh.size());
      }
    }
    if (!fresh.isEmpty()) {
      List<Policy> batch = new ArrayList<>(fresh.keySet());
      PolicyScore[] scores = evaluator.score(batch, 0, replicates, progress);
      for (int i = 0; i < batch.size(); i++) {
        cache.put(batch.get(i), evaluation(scores[i].combined()));
      }
      simulatedPolicies += batch.size();
    }
    List<Evaluation> out = new ArrayList<>(genes.size());
    for (Policy policy : policies) {
      out.add(cache.get(policy));
    }
    return out;
  }

  /** The search's view of a score: normalised objectives and the summed violation. */
  Evaluation evaluation(Estimate[] combined) {
    double[] f = new double[objectives.size()];
    for (int k = 0; k < f.length; k++) {
      f[k] = objectives.get(k).normalised(combined[k].value());
    }
    return new Evaluation(f,
        Limit.violation(Limit.values(combined), limits, evaluator.measures()));
  }
}
