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
    int[] dominatedByCount = new int[n];
    int[][] dominates = new int[n][];
    int[] dominatesSize = new int[n];
    for (int p = 0; p < n; p++) {
      for (int q = p + 1; q < n; q++) {
        int c = Dominance.constrained(objectives, p * m, violations[p], objectives, q * m,
            violations[q], m);
        if (c < 0) {
          add(dominates, dominatesSize, p, q);
          dominatedByCount[q]++;
        } else if (c > 0) {
          add(dominates, dominatesSize, q, p);
          dominatedByCount[p]++;
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
