package veldplan.optimiser.search;

/**
 * Crowding distance of Deb et al. (2002) [1, §III-B], computed per front (decision-methods §2.2).
 *
 * <p>For each objective m the front is sorted by f<sub>m</sub>; its two boundary members get
 * +&infin;, and each interior member i adds (f<sub>m</sub>[i+1] − f<sub>m</sub>[i−1]) /
 * (f<sub>m</sub><sup>max</sup> − f<sub>m</sub><sup>min</sup>), max and min taken over the front.
 * An objective with f<sup>max</sup> = f<sup>min</sup> on the front is skipped entirely (no 0/0,
 * and no arbitrary member made a boundary). Members with equal values keep their order in the
 * front (a stable sort), so the result is a pure function of the front's order.
 *
 * <p>References:
 * <ol>
 *   <li>Deb, K., Pratap, A., Agarwal, S., Meyarivan, T. (2002). A fast and elitist
 *       multiobjective genetic algorithm: NSGA-II. IEEE TEC 6(2): 182–197.</li>
 * </ol>
 */
public final class CrowdingDistance {
  private CrowdingDistance() {}

  /**
   * Crowding distances of a front given as objective vectors.
   *
   * @param front objective vectors of one front, all of the same length
   * @return one distance per member, in the same order
   */
  public static double[] of(double[][] front) {
    int n = front.length;
    if (n == 0) {
      return new double[0];
    }
    int m = front[0].length;
    double[] flat = new double[n * m];
    int[] members = new int[n];
    for (int i = 0; i < n; i++) {
      System.arraycopy(front[i], 0, flat, i * m, m);
      members[i] = i;
    }
    double[] distance = new double[n];
    assign(flat, m, members, members.length, distance, new int[n], new double[n]);
    return distance;
  }

  /**
   * Writes the crowding distance of every member of one front into {@code distance[member]}.
   *
   * @param objectives flat objective vectors, vector i at [i m, i m + m)
   * @param m          objectives per vector
   * @param front      member indices
   * @param size       number of members used from {@code front}
   * @param distance   output, indexed by member index; members' entries are overwritten
   * @param order      scratch of length &ge; size
   * @param keys       scratch of length &ge; size
   */
  static void assign(double[] objectives, int m, int[] front, int size, double[] distance,
      int[] order, double[] keys) {
    for (int k = 0; k < size; k++) {
      distance[front[k]] = 0.0;
    }
    for (int j = 0; j < m; j++) {
      for (int k = 0; k < size; k++) {
        order[k] = front[k];
        keys[k] = objectives[front[k] * m + j];
      }
      IndexSort.sort(order, keys, size);
      double min = keys[0];
      double max = keys[size - 1];
      if (!(max > min)) {
        continue;
      }
      distance[order[0]] = Double.POSITIVE_INFINITY;
      distance[order[size - 1]] = Double.POSITIVE_INFINITY;
      double range = max - min;
      for (int k = 1; k < size - 1; k++) {
        distance[order[k]] += (keys[k + 1] - keys[k - 1]) / range;
      }
    }
  }
}
