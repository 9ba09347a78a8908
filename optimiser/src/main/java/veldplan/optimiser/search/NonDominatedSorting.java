package veldplan.optimiser.search;

import java.util.Arrays;

/**
 * Fast non-dominated sorting of Deb et al. (2002) [1, §III-A] under constrained domination
 * (decision-methods §2.1, §2.4).
 *
 * <p>For each solution p it counts n<sub>p</sub>, the solutions that dominate p, and lists
 * S<sub>p</sub>, those p dominates; front 1 is every p with n<sub>p</sub> = 0, and each next front
 * is found by decrementing the counts of the members' S<sub>p</sub>. O(M N²) time and O(N²)
 * space for N solutions and M objectives. With two or three objectives the same fronts are found
 * by a sweep in O(N log² N) ([2]; see {@code ranksBySweep}). Fronts list their members in
 * ascending index order.
 *
 * <p>References:
 * <ol>
 *   <li>Deb, K., Pratap, A., Agarwal, S., Meyarivan, T. (2002). A fast and elitist
 *       multiobjective genetic algorithm: NSGA-II. IEEE TEC 6(2): 182–197.</li>
 *   <li>Zhang, X., Tian, Y., Cheng, R., Jin, Y. (2015). An efficient approach to nondominated
 *       sorting for evolutionary multiobjective optimization. IEEE TEC 19(2): 201–213.
 *       doi:10.1109/TEVC.2014.2308305</li>
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
    return fronts(objectives, violations, n, m, false);
  }

  /**
   * As {@link #fronts(double[], double[], int, int)}; {@code byCounting} forces the counting
   * procedure whatever M (for tests of the sweep).
   */
  static int[][] fronts(double[] objectives, double[] violations, int n, int m,
      boolean byCounting) {
    // Visit the solutions in lexicographic order of (violation, f1, ..., fM), a linear extension
    // of constrained domination: a later one can never dominate an earlier one, so each pair needs
    // a one-way test.
    Integer[] byValue = lexicographic(objectives, violations, n, m);
    int[] rank = (m == 2 || m == 3) && !byCounting
        ? ranksBySweep(objectives, violations, n, m, byValue)
        : ranksByCounting(objectives, violations, n, m, byValue);
    int frontCount = 0;
    int[] frontSize = new int[n + 1];
    for (int p = 0; p < n; p++) {
      frontSize[rank[p]]++;
      frontCount = Math.max(frontCount, rank[p] + 1);
    }
    int[][] fronts = new int[frontCount][];
    for (int r = 0; r < frontCount; r++) {
      fronts[r] = new int[frontSize[r]];
      frontSize[r] = 0;
    }
    for (int p = 0; p < n; p++) { // ascending index order within each front
      fronts[rank[p]][frontSize[rank[p]]++] = p;
    }
    return fronts;
  }

  private static Integer[] lexicographic(double[] objectives, double[] violations, int n, int m) {
    Integer[] byValue = new Integer[n];
    for (int i = 0; i < n; i++) {
      byValue[i] = i;
    }
    Arrays.sort(byValue, (a, b) -> {
      int c = Double.compare(violations[a], violations[b]);
      return c != 0 ? c
          : Arrays.compare(objectives, a * m, a * m + m, objectives, b * m, b * m + m);
    });
    return byValue;
  }

  /**
   * Ranks by the counting procedure of Deb et al. (2002): each pair in lexicographic order is
   * tested once; the fronts are peeled by decrementing the counts.
   */
  private static int[] ranksByCounting(double[] objectives, double[] violations, int n, int m,
      Integer[] byValue) {
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
    int[] rank = new int[n];
    int[] current = new int[n];
    int currentSize = 0;
    for (int p = 0; p < n; p++) {
      if (dominatedByCount[p] == 0) {
        current[currentSize++] = p;
      }
    }
    int[] next = new int[n];
    for (int r = 0; currentSize > 0; r++) {
      int nextSize = 0;
      for (int i = 0; i < currentSize; i++) {
        int p = current[i];
        rank[p] = r;
        int[] list = dominates[p];
        for (int k = 0; k < dominatesSize[p]; k++) {
          int q = list[k];
          if (--dominatedByCount[q] == 0) {
            next[nextSize++] = q;
          }
        }
      }
      int[] t = current;
      current = next;
      next = t;
      currentSize = nextSize;
    }
    return rank;
  }

  /**
   * Ranks for two or three objectives by a sweep in lexicographic order that puts each solution
   * in the first front none of whose members seen so far dominates it, found by binary search
   * over the fronts: the efficient non-dominated sort (ENS-BS) of Zhang et al. (2015) [2]. With
   * the solutions visited in order of f<sub>1</sub>, "a member with smaller f<sub>1</sub>
   * dominates p" is a 2-D question answered by a staircase of the front's (f<sub>2</sub>,
   * f<sub>3</sub>) minima (for M = 2, f<sub>3</sub> = 0), in O(log size); members with the same
   * f<sub>1</sub> as p (usually none) are tested pairwise. It uses the same relation as
   * {@link #ranksByCounting}: "q comes before p in lexicographic order and q constrained-dominates
   * p", so the ranks are the same; O(N log² N) instead of O(M N²).
   */
  private static int[] ranksBySweep(double[] objectives, double[] violations, int n, int m,
      Integer[] byValue) {
    int[] rank = new int[n];
    Staircase[] fronts = new Staircase[n];
    int frontCount = 0;
    int a = 0;
    // Feasible solutions come first in lexicographic order; sweep them in groups of equal f1.
    while (a < n && !(violations[byValue[a]] > 0)) {
      double f1 = objectives[byValue[a] * m];
      int b = a + 1;
      while (b < n && !(violations[byValue[b]] > 0) && objectives[byValue[b] * m] == f1) {
        b++;
      }
      for (int i = a; i < b; i++) {
        int p = byValue[i];
        double p2 = objectives[p * m + 1];
        double p3 = m == 3 ? objectives[p * m + 2] : 0;
        int lo = 0;
        int hi = frontCount;
        while (lo < hi) { // the first front k with no dominator of p
          int k = (lo + hi) >>> 1;
          if (fronts[k].coversWeakly(p2, p3)
              || dominatedInGroup(objectives, violations, byValue, a, i, rank, k, m)) {
            lo = k + 1;
          } else {
            hi = k;
          }
        }
        rank[p] = lo;
        if (lo == frontCount) {
          fronts[frontCount++] = new Staircase();
        }
      }
      for (int i = a; i < b; i++) {
        int p = byValue[i];
        fronts[rank[p]].add(objectives[p * m + 1], m == 3 ? objectives[p * m + 2] : 0);
      }
      a = b;
    }
    // Infeasible ones: after every feasible front, one front per violation, smallest first.
    int r = frontCount - 1;
    double previous = Double.NaN;
    for (; a < n; a++) {
      int p = byValue[a];
      if (violations[p] != previous) {
        r++;
        previous = violations[p];
      }
      rank[p] = r;
    }
    return rank;
  }

  /** Whether a member of front k among byValue[from..i) constrained-dominates byValue[i]. */
  private static boolean dominatedInGroup(double[] objectives, double[] violations,
      Integer[] byValue, int from, int i, int[] rank, int k, int m) {
    int p = byValue[i];
    for (int j = from; j < i; j++) {
      int q = byValue[j];
      if (rank[q] == k
          && dominatesLater(objectives, q * m, violations[q], p * m, violations[p], m)) {
        return true;
      }
    }
    return false;
  }

  /**
   * The minimal points (x, y) of a set in the plane: x strictly increasing, y strictly
   * decreasing. {@link #coversWeakly} asks whether some point of the set is &le; (x, y).
   */
  private static final class Staircase {
    private double[] xs = new double[8];
    private double[] ys = new double[8];
    private int size;

    /** Index of the last point with x' &le; x, or −1. */
    private int floor(double x) {
      int lo = 0;
      int hi = size;
      while (lo < hi) {
        int mid = (lo + hi) >>> 1;
        if (xs[mid] <= x) {
          lo = mid + 1;
        } else {
          hi = mid;
        }
      }
      return lo - 1;
    }

    boolean coversWeakly(double x, double y) {
      int k = floor(x);
      return k >= 0 && ys[k] <= y; // the least y among the points with x' <= x
    }

    void add(double x, double y) {
      int k = floor(x);
      if (k >= 0 && ys[k] <= y) {
        return; // weakly dominated by a point already in: changes no answer
      }
      int from = k >= 0 && xs[k] == x ? k : k + 1; // (x, y) replaces a point with the same x
      int to = k + 1;
      while (to < size && ys[to] >= y) {
        to++;
      }
      int newSize = size - (to - from) + 1;
      if (newSize > xs.length) {
        xs = Arrays.copyOf(xs, 2 * newSize);
        ys = Arrays.copyOf(ys, 2 * newSize);
      }
      System.arraycopy(xs, to, xs, from + 1, size - to);
      System.arraycopy(ys, to, ys, from + 1, size - to);
      xs[from] = x;
      ys[from] = y;
      size = newSize;
    }
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
