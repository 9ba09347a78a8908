package veldplan.optimiser.search;

import java.util.Arrays;
import java.util.Objects;

/**
 * A gene vector with its evaluation.
 *
 * <p>The genes are copied on construction; the accessor returns the record's own array, which
 * callers must not modify. {@code equals} compares genes bit for bit and the evaluation by value.
 *
 * @param genes      the point of [0, 1]<sup>n</sup> the problem decodes
 * @param evaluation its objectives and constraint violation
 */
public record Individual(double[] genes, Evaluation evaluation) {
  /** Copies the genes. */
  public Individual {
    genes = genes.clone();
    Objects.requireNonNull(evaluation, "evaluation");
  }

  /** The objective values (the evaluation's array; do not modify). */
  public double[] objectives() {
    return evaluation.objectives();
  }

  @Override
  public boolean equals(Object o) {
    return o instanceof Individual i
        && Arrays.equals(genes, i.genes)
        && evaluation.equals(i.evaluation);
  }

  @Override
  public int hashCode() {
    return 31 * Arrays.hashCode(genes) + evaluation.hashCode();
  }

  @Override
  public String toString() {
    return "Individual[genes=" + Arrays.toString(genes) + ", evaluation=" + evaluation + "]";
  }
}
