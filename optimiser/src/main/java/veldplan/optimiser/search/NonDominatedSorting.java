package veldplan.optimiser.search;

import java.util.Arrays;

/**
 * Fast non-dominated sorting of Deb et al. (2002) [1, §III-A] under constrained domination
 * (decision-methods §2.1, §2.4).
 *
 * <p>For each solution p it counts n<sub>p</sub>, the solutions that dominate p, and lists
 * S<sub>p</sub>, those p dominates; front 1 is every p with n<sub>p</sub> = 0, and each next front
 * is found by decrementing the counts of the members' S<sub>p</sub>. O(M N²) time and O(N²)
 * space for N solutions and M objectives. Fronts list their members in ascending index order.
 *
 * <p>References:
 * <ol>
 *   <li>Deb, K., Pratap, A., Agarwal, S., Meyarivan, T. (2002). A fast and elitist
 *       multiobjective genetic algorithm: NSGA-II. IEEE TEC 6(2): 182–197.</li>
 * </ol>
 */
public final class NonDominatedSorting {
  private NonDominatedSorting() {}

  /**
   * Sorts evaluations into fronts.
   *
   * @return the fronts, best first; each holds indices into {@code evaluations}
   */
  public static int[][] fronts(java.util.List<Evaluation> evaluations) {
    int n = evaluations.size();
    if (n == 0) {
      return new int[0][];
    }
    int m = evaluations.get(0).objectives().length;
    double[] objectives = new double[n * m];
    double[] violations = new double[n];
    for (int i = 0; i < n; i++) {
      Evaluation e = evaluations.get(i);
      if (e.objectives().length != m) {
        throw new IllegalArgumentException("evaluation " + i + " has "
            + e.objectives().length + " objectives, expected " + m);
      }
      System.arraycopy(e.objectives(), 0, objectives, i * m, m);
      violations[i] = e.violation();
    }
    return fronts(objectives, violations, n, m);
  }

  /**
   * Sorts n flat-stored objective vectors (with their violations) into fronts.
   *
   * @param objectives n × m values, vector i at [i m, i m + m)
   * @param violations n constraint violations (0 = feasible)
   * @return the fronts, best first
   */
  public static int[][] fronts(double[] objectives, double[] violations, int n, int m) {
    // Visit the solutions in lexicographic order of (violation, f1, ..., fM), a linear extension
    // of constrained domination: a later one can never dominate an earlier one, so each pair needs
    // a one-way test, which usually fails at its first objective.
    Integer[] byValue = new Integer[n];
    for (int i = 0; i < n; i++) {
      byValue[i] = i;
    }
    Arrays.sort(byValue, (a, b) -> {
      int c = Double.compare(violations[a], violations[b]);
      return c != 0 ? c
          : Arrays.compare(objectives, a * m, a * m + m, objectives, b * m, b * m + m);
    });
    int[] dominatedByCount = new int[n];
    int[][] dominates = new int[n][];
    int[] dominatesSize = new int[n];
    for (int a = 0; a < n; a++) {
      int p = byValue[a];
      double vp = violations[p];
      int base = p * m;
      for (int b = a + 1; b < n; b++) {
        int q = byValue[b];
        if (dominatesLater(objectives, base, vp, q * m, violations[q], m)) {
          add(dominates, dominatesSize, p, q);
          dominatedByCount[q]++;
        }
      }
    }
    int[][] fronts = new int[n][];
    int frontCount = 0;
    int[] current = new int[n];
    int currentSize = 0;
    for (int p = 0; p < n; p++) {
      if (dominatedByCount[p] == 0) {
        current[currentSize++] = p;
      }
    }
    while (currentSize > 0) {
      int[] front = Arrays.copyOf(current, currentSize);
      fronts[frontCount++] = front;
      currentSize = 0;
      for (int p : front) {
        int[] list = dominates[p];
        for (int k = 0; k < dominatesSize[p]; k++) {
          int q = list[k];
          if (--dominatedByCount[q] == 0) {
            current[currentSize++] = q;
          }
        }
      }
      Arrays.sort(current, 0, currentSize);
    }
    return Arrays.copyOf(fronts, frontCount);
  }

  /**
   * Whether p constrained-dominates q, given that p does not come after q in lexicographic order
   * of (violation, objectives).
   */
  private static boolean dominatesLater(double[] f, int p, double vp, int q, double vq, int m) {
    if (vp > 0 || vq > 0) {
      return vp < vq;
    }
    boolean strictly = false;
    for (int j = 0; j < m; j++) {
      double a = f[p + j];
      double b = f[q + j];
      if (a > b) {
        return false;
      }
      strictly |= a < b;
    }
    return strictly;
  }

  /** Rank (0 = first front) of every solution, from its fronts. */
  public static int[] ranks(int[][] fronts, int n) {
    int[] rank = new int[n];
    for (int r = 0; r < fronts.length; r++) {
      for (int i : fronts[r]) {
        rank[i] = r;
      }
    }
    return rank;
  }

  private static void add(int[][] lists, int[] sizes, int owner, int value) {
    int[] list = lists[owner];
    if (list == null) {
      list = new int[8];
      lists[owner] = list;
    } else if (sizes[owner] == list.length) {
      list = Arrays.copyOf(list, list.length * 2);
      lists[owner] = list;
    }
    list[sizes[owner]++] = value;
  }
}
