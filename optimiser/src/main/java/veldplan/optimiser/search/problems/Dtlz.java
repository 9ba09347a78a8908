package veldplan.optimiser.search.problems;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import veldplan.optimiser.search.Evaluation;
import veldplan.optimiser.search.SearchProblem;

/**
 * DTLZ1 and DTLZ2 of Deb, Thiele, Laumanns &amp; Zitzler (2002/2005) [1, 2] (decision-methods
 * §3.6), scalable to M objectives. The last k genes form x<sub>M</sub>, n = M + k − 1.
 * <pre>
 *   DTLZ1 (k = 5):  g = 100 [k + Σ_{x_M} ((x_i − 0.5)² − cos(20 π (x_i − 0.5)))]
 *                   f_1 = 0.5 x_1 … x_{M−1} (1 + g)
 *                   f_i = 0.5 x_1 … x_{M−i} (1 − x_{M−i+1}) (1 + g),   f_M = 0.5 (1 − x_1)(1 + g)
 *                   front: x_M = 0.5, Σ f_i = 0.5
 *   DTLZ2 (k = 10): g = Σ_{x_M} (x_i − 0.5)²
 *                   f_1 = (1 + g) cos(x_1 π/2) … cos(x_{M−1} π/2)
 *                   f_i = (1 + g) cos(x_1 π/2) … cos(x_{M−i} π/2) sin(x_{M−i+1} π/2)
 *                   f_M = (1 + g) sin(x_1 π/2);   front: Σ f_i² = 1, f ≥ 0
 * </pre>
 * Ideal 0 and nadir 1 in every objective, so the reported hypervolume is the raw one with
 * r = (1.1, …, 1.1) of decision-methods §3.6.
 *
 * <p>References:
 * <ol>
 *   <li>Deb, K., Thiele, L., Laumanns, M., Zitzler, E. (2002). Scalable multi-objective
 *       optimization test problems. Proc. CEC 2002: 825–830.</li>
 *   <li>Deb, K., Thiele, L., Laumanns, M., Zitzler, E. (2005). Scalable test problems for
 *       evolutionary multiobjective optimization. In Abraham, Jain, Goldberg (eds), Evolutionary
 *       Multiobjective Optimization, Springer: 105–145.</li>
 * </ol>
 */
public final class Dtlz implements SearchProblem {
  /** Which DTLZ problem. */
  public enum Kind {
    /** Linear front, 11^k − 1 local fronts; k = 5 suggested. */
    DTLZ1(5),
    /** Spherical front; k = 10 suggested. */
    DTLZ2(10);

    final int defaultK;

    Kind(int defaultK) {
      this.defaultK = defaultK;
    }
  }

  private final Kind kind;
  private final int m;
  private final int k;

  /**
   * A DTLZ problem.
   *
   * @param kind       DTLZ1 or DTLZ2
   * @param objectives M &ge; 2
   * @param k          size of x<sub>M</sub>, &ge; 1
   */
  public Dtlz(Kind kind, int objectives, int k) {
    if (objectives < 2 || k < 1) {
      throw new IllegalArgumentException("need M >= 2 and k >= 1: " + objectives + ", " + k);
    }
    this.kind = kind;
    this.m = objectives;
    this.k = k;
  }

  /** DTLZ1 with M objectives and the suggested k = 5. */
  public static Dtlz dtlz1(int objectives) {
    return new Dtlz(Kind.DTLZ1, objectives, Kind.DTLZ1.defaultK);
  }

  /** DTLZ2 with M objectives and the suggested k = 10. */
  public static Dtlz dtlz2(int objectives) {
    return new Dtlz(Kind.DTLZ2, objectives, Kind.DTLZ2.defaultK);
  }

  @Override
  public int variables() {
    return m + k - 1;
  }

  @Override
  public int objectives() {
    return m;
  }

  @Override
  public double[] ideal() {
    return new double[m];
  }

  @Override
  public double[] nadir() {
    double[] nadir = new double[m];
    Arrays.fill(nadir, 1.0);
    return nadir;
  }

  @Override
  public List<Evaluation> evaluate(List<double[]> genes) {
    List<Evaluation> out = new ArrayList<>(genes.size());
    for (double[] x : genes) {
      out.add(Evaluation.of(objectives(x)));
    }
    return out;
  }

  /** The M objectives of one gene vector of length n = M + k − 1. */
  public double[] objectives(double[] x) {
    int n = variables();
    if (x.length != n) {
      throw new IllegalArgumentException(kind + " has " + n + " variables, got " + x.length);
    }
    double g = 0.0;
    for (int i = m - 1; i < n; i++) {
      double d = x[i] - 0.5;
      g += kind == Kind.DTLZ1 ? d * d - Math.cos(20.0 * Math.PI * d) : d * d;
    }
    if (kind == Kind.DTLZ1) {
      g = 100.0 * (k + g);
    }
    double[] f = new double[m];
    for (int i = 0; i < m; i++) {
      // f_{i+1}: product over the first M-1-i genes, times the "closing" factor of gene M-1-i.
      double value = kind == Kind.DTLZ1 ? 0.5 * (1.0 + g) : 1.0 + g;
      for (int j = 0; j < m - 1 - i; j++) {
        value *= kind == Kind.DTLZ1 ? x[j] : Math.cos(x[j] * Math.PI / 2);
      }
      if (i > 0) {
        int j = m - 1 - i;
        value *= kind == Kind.DTLZ1 ? 1.0 - x[j] : Math.sin(x[j] * Math.PI / 2);
      }
      f[i] = value;
    }
    return f;
  }

  @Override
  public String toString() {
    return kind + "(M=" + m + ", k=" + k + ")";
  }
}
