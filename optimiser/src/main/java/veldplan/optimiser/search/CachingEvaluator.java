package veldplan.optimiser.search;

import io.jenetics.DoubleGene;
import io.jenetics.Phenotype;
import io.jenetics.engine.Evaluator;
import io.jenetics.engine.InvertibleCodec;
import io.jenetics.util.ISeq;
import io.jenetics.util.MSeq;
import io.jenetics.util.Seq;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The Jenetics {@link Evaluator} of a run: sends every not-yet-evaluated phenotype whose gene
 * vector has not been seen before to {@link SearchProblem#evaluate} in one batch, and serves the
 * others from a cache keyed by the exact gene vector (bit for bit).
 *
 * <p>The batch lists each new gene vector once, in order of first appearance, so it is a pure
 * function of the population. Not thread-safe: one run uses it from one thread.
 */
final class CachingEvaluator implements Evaluator<DoubleGene, Fitness> {
  private final SearchProblem problem;
  private final InvertibleCodec<double[], DoubleGene> codec;
  private final int objectives;
  private final Map<GeneKey, Fitness> cache;
  private long requested;
  private long simulated;
  private long evaluateNanos;

  CachingEvaluator(SearchProblem problem, InvertibleCodec<double[], DoubleGene> codec,
      long requested, long simulated, long evaluateNanos, long expectedSize) {
    // Sized for the whole run, so the map never rehashes.
    this.cache = new HashMap<>((int) Math.min(1 << 30, expectedSize * 4 / 3 + 16));
    this.problem = problem;
    this.codec = codec;
    this.objectives = problem.objectives();
    this.requested = requested;
    this.simulated = simulated;
    this.evaluateNanos = evaluateNanos;
  }

  /** Makes an already evaluated individual a cache entry (used when resuming). */
  Fitness remember(Individual individual) {
    return cache.computeIfAbsent(new GeneKey(individual.genes()), k -> new Fitness(individual));
  }

  @Override
  public ISeq<Phenotype<DoubleGene, Fitness>> eval(Seq<Phenotype<DoubleGene, Fitness>> population) {
    int size = population.size();
    MSeq<Phenotype<DoubleGene, Fitness>> out = MSeq.ofLength(size);
    GeneKey[] keys = new GeneKey[size];
    Map<GeneKey, double[]> batch = new LinkedHashMap<>();
    for (int i = 0; i < size; i++) {
      Phenotype<DoubleGene, Fitness> pt = population.get(i);
      if (pt.isEvaluated()) {
        out.set(i, pt);
        continue;
      }
      requested++;
      double[] genes = codec.decode(pt.genotype());
      GeneKey key = new GeneKey(genes);
      keys[i] = key;
      if (!cache.containsKey(key)) {
        batch.putIfAbsent(key, genes);
      }
    }
    if (!batch.isEmpty()) {
      evaluateBatch(batch);
    }
    for (int i = 0; i < size; i++) {
      if (keys[i] != null) {
        out.set(i, population.get(i).withFitness(cache.get(keys[i])));
      }
    }
    return out.toISeq();
  }

  private void evaluateBatch(Map<GeneKey, double[]> batch) {
    List<double[]> genes = new ArrayList<>(batch.size());
    for (double[] g : batch.values()) {
      genes.add(g.clone()); // the problem cannot alter our copy
    }
    long start = System.nanoTime();
    List<Evaluation> results = problem.evaluate(java.util.Collections.unmodifiableList(genes));
    evaluateNanos += System.nanoTime() - start;
    simulated += batch.size();
    if (results == null || results.size() != batch.size()) {
      throw new IllegalStateException("the problem returned "
          + (results == null ? "null" : results.size() + " evaluations") + " for "
          + batch.size() + " gene vectors");
    }
    int i = 0;
    for (Map.Entry<GeneKey, double[]> e : batch.entrySet()) {
      Evaluation evaluation = results.get(i++);
      if (evaluation == null || evaluation.objectives().length != objectives) {
        throw new IllegalStateException("the problem returned "
            + (evaluation == null ? "null" : evaluation.objectives().length + " objectives")
            + " for gene vector " + Arrays.toString(e.getValue()) + ", expected " + objectives
            + " objectives");
      }
      cache.put(e.getKey(), new Fitness(new Individual(e.getValue(), evaluation)));
    }
  }

  long requested() {
    return requested;
  }

  long simulated() {
    return simulated;
  }

  long evaluateNanos() {
    return evaluateNanos;
  }

  /** A gene vector as a hash key, compared bit for bit. */
  private static final class GeneKey {
    private final double[] genes;
    private final int hash;

    GeneKey(double[] genes) {
      this.genes = genes;
      this.hash = Arrays.hashCode(genes);
    }

    @Override
    public boolean equals(Object o) {
      return o instanceof GeneKey k && hash == k.hash && Arrays.equals(genes, k.genes);
    }

    @Override
    public int hashCode() {
      return hash;
    }
  }
}
