package veldplan.optimiser.search.problems;

import java.util.ArrayList;
import java.util.List;
import veldplan.optimiser.search.Evaluation;
import veldplan.optimiser.search.SearchProblem;

/**
 * The two-objective test problems of Zitzler, Deb &amp; Thiele (2000) [1] (decision-methods
 * §3.5), minimise f<sub>1</sub> and f<sub>2</sub> = g·h:
 * <pre>
 *   ZDT1  n = 30, x ∈ [0,1]^n       f1 = x1, g = 1 + 9 Σ_{i≥2} x_i/(n−1), h = 1 − sqrt(f1/g)
 *   ZDT2  as ZDT1 with h = 1 − (f1/g)²
 *   ZDT3  as ZDT1 with h = 1 − sqrt(f1/g) − (f1/g) sin(10 π f1)
 *   ZDT4  n = 10, x1 ∈ [0,1], x2..x10 ∈ [−5,5], g = 1 + 10(n−1) + Σ_{i≥2}(x_i² − 10 cos(4 π x_i)),
 *         h = 1 − sqrt(f1/g)
 *   ZDT6  n = 10, x ∈ [0,1]^n, f1 = 1 − exp(−4 x1) sin⁶(6 π x1),
 *         g = 1 + 9 [Σ_{i≥2} x_i/(n−1)]^0.25, h = 1 − (f1/g)²
 * </pre>
 * Genes on [0, 1] are mapped affinely to each variable's range. The normalisation bounds are
 * ideal (0, 0) and nadir (1, 1), so the reported hypervolume (reference 1.1 after normalising) is
 * the raw hypervolume with r = (1.1, 1.1) of decision-methods §3.5. (ZDT3's f<sub>2</sub> goes
 * below 0 on the front; that changes nothing for the hypervolume.) ZDT5 is binary and not here.
 *
 * <p>References:
 * <ol>
 *   <li>Zitzler, E., Deb, K., Thiele, L. (2000). Comparison of multiobjective evolutionary
 *       algorithms: empirical results. Evolutionary Computation 8(2): 173–195.
 *       doi:10.1162/106365600568202</li>
 * </ol>
 */
public enum Zdt implements SearchProblem {
  /** Convex front f2 = 1 − sqrt(f1). */
  ZDT1(30),
  /** Non-convex front f2 = 1 − f1². */
  ZDT2(30),
  /** Disconnected front, five pieces. */
  ZDT3(30),
  /** Multimodal (21⁹ local fronts); front as ZDT1. */
  ZDT4(10),
  /** Non-uniform density; front f2 = 1 − f1², f1 ≥ 0.2807753. */
  ZDT6(10);

  private final int variables;

  Zdt(int variables) {
    this.variables = variables;
  }

  @Override
  public int variables() {
    return variables;
  }

  @Override
  public int objectives() {
    return 2;
  }

  @Override
  public double[] ideal() {
    return new double[] {0, 0};
  }

  @Override
  public double[] nadir() {
    return new double[] {1, 1};
  }

  @Override
  public List<Evaluation> evaluate(List<double[]> genes) {
    List<Evaluation> out = new ArrayList<>(genes.size());
    for (double[] x : genes) {
      out.add(Evaluation.of(objectives(x)));
    }
    return out;
  }

  /**
   * The objectives of one gene vector.
   *
   * @param genes n genes in [0, 1]
   * @return {f1, f2}
   */
  public double[] objectives(double[] genes) {
    if (genes.length != variables) {
      throw new IllegalArgumentException(name() + " has " + variables + " variables, got "
          + genes.length);
    }
    int n = variables;
    double x1 = genes[0];
    double sum = 0.0;
    double f1;
    double g;
    switch (this) {
      case ZDT4: {
        f1 = x1;
        for (int i = 1; i < n; i++) {
          double x = -5.0 + 10.0 * genes[i];
          sum += x * x - 10.0 * Math.cos(4.0 * Math.PI * x);
        }
        g = 1.0 + 10.0 * (n - 1) + sum;
        break;
      }
      case ZDT6: {
        f1 = 1.0 - Math.exp(-4.0 * x1) * Math.pow(Math.sin(6.0 * Math.PI * x1), 6);
        for (int i = 1; i < n; i++) {
          sum += genes[i];
        }
        g = 1.0 + 9.0 * Math.pow(sum / (n - 1), 0.25);
        break;
      }
      default: {
        f1 = x1;
        for (int i = 1; i < n; i++) {
          sum += genes[i];
        }
        g = 1.0 + 9.0 * sum / (n - 1);
        break;
      }
    }
    double ratio = f1 / g;
    double h;
    switch (this) {
      case ZDT2:
      case ZDT6:
        h = 1.0 - ratio * ratio;
        break;
      case ZDT3:
        h = 1.0 - Math.sqrt(ratio) - ratio * Math.sin(10.0 * Math.PI * f1);
        break;
      default:
        h = 1.0 - Math.sqrt(ratio);
        break;
    }
    return new double[] {f1, g * h};
  }
}
