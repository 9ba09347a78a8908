package veldplan.optimiser.search;

import java.util.Arrays;
import java.util.Iterator;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

/**
 * Exact hypervolume (S-metric) of a point set for minimisation: the Lebesgue measure of the
 * region dominated by the set and bounded by a reference point r [1; decision-methods §3.1].
 *
 * <p>Only points that strictly dominate r in every objective (p<sub>j</sub> &lt; r<sub>j</sub>)
 * contribute; a point on or beyond r in some objective adds nothing. Dominated and duplicated
 * points are allowed and add nothing. Algorithms by dimension d:
 * <ul>
 *   <li>d = 1: r − min.</li>
 *   <li>d = 2: sort by f<sub>1</sub> and sweep, keeping the best f<sub>2</sub> seen,
 *       &Theta;(n log n) (decision-methods §3.1).</li>
 *   <li>d = 3: dimension sweep along f<sub>3</sub> keeping the 2-D staircase of the points seen
 *       in a balanced tree and updating its area incrementally, O(n log n) [2].</li>
 *   <li>d &ge; 4: WFG [3]: points sorted by the last objective, each point's slab contributes its
 *       exclusive (d−1)-dimensional hypervolume, computed as its box minus the hypervolume of the
 *       "limit set" (the earlier points clipped to it), recursing down to the 3-D sweep.
 *       Worst case exponential in d; fast in practice for the 4–6 objectives of policy
 *       search.</li>
 * </ul>
 *
 * <p>References:
 * <ol>
 *   <li>Zitzler, E., Thiele, L. (1999). Multiobjective evolutionary algorithms: a comparative case
 *       study and the strength Pareto approach. IEEE TEC 3(4): 257–271.</li>
 *   <li>Beume, N., Fonseca, C.M., López-Ibáñez, M., Paquete, L., Vahrenhold, J. (2009). On the
 *       complexity of computing the hypervolume indicator. IEEE TEC 13(5): 1075–1082.</li>
 *   <li>While, L., Bradstreet, L., Barone, L. (2012). A fast way of calculating exact
 *       hypervolumes. IEEE TEC 16(1): 86–95. doi:10.1109/TEVC.2010.2077298</li>
 * </ol>
 */
public final class Hypervolume {
  /** Reference point in normalised space used for reported hypervolumes (decision-methods §3.2). */
  public static final double NORMALISED_REFERENCE = 1.1;

  private Hypervolume() {}

  /**
   * Exact hypervolume of {@code points} with respect to {@code reference}, minimisation.
   *
   * @param points    objective vectors, each of the reference's length, no NaN
   * @param reference the reference point, finite
   * @return the hypervolume, &ge; 0
   * @throws IllegalArgumentException on a length mismatch, NaN, or a non-finite reference
   */
  public static double of(List<double[]> points, double[] reference) {
    int d = reference.length;
    if (d == 0) {
      throw new IllegalArgumentException("the reference point has no coordinates");
    }
    for (double r : reference) {
      if (!Double.isFinite(r)) {
        throw new IllegalArgumentException("reference point not finite: "
            + Arrays.toString(reference));
      }
    }
    double[] flat = new double[points.size() * d];
    int n = 0;
    for (double[] p : points) {
      if (p.length != d) {
        throw new IllegalArgumentException(
            "point of dimension " + p.length + " with a reference point of dimension " + d);
      }
      boolean inside = true;
      for (int j = 0; j < d; j++) {
        if (Double.isNaN(p[j])) {
          throw new IllegalArgumentException("NaN in point " + Arrays.toString(p));
        }
        inside &= p[j] < reference[j];
      }
      if (inside) {
        System.arraycopy(p, 0, flat, n * d, d);
        n++;
      }
    }
    return volume(flat, n, d, reference);
  }

  /**
   * Hypervolume after normalising each objective j to (f<sub>j</sub> − ideal<sub>j</sub>) /
   * (nadir<sub>j</sub> − ideal<sub>j</sub>), with every reference coordinate equal to
   * {@code reference} (decision-methods §3.2; customary value {@link #NORMALISED_REFERENCE}).
   *
   * @throws IllegalArgumentException if some nadir<sub>j</sub> &le; ideal<sub>j</sub>
   */
  public static double normalised(List<double[]> points, double[] ideal, double[] nadir,
      double reference) {
    int d = ideal.length;
    if (nadir.length != d) {
      throw new IllegalArgumentException("ideal and nadir differ in length");
    }
    double[] scale = new double[d];
    for (int j = 0; j < d; j++) {
      if (!(nadir[j] > ideal[j]) || !Double.isFinite(nadir[j] - ideal[j])) {
        throw new IllegalArgumentException("nadir must exceed ideal in objective " + j + ": "
            + ideal[j] + " vs " + nadir[j]);
      }
      scale[j] = 1.0 / (nadir[j] - ideal[j]);
    }
    List<double[]> scaled = new java.util.ArrayList<>(points.size());
    for (double[] p : points) {
      if (p.length != d) {
        throw new IllegalArgumentException(
            "point of dimension " + p.length + ", expected " + d);
      }
      double[] q = new double[d];
      for (int j = 0; j < d; j++) {
        q[j] = (p[j] - ideal[j]) * scale[j];
      }
      scaled.add(q);
    }
    double[] r = new double[d];
    Arrays.fill(r, reference);
    return of(scaled, r);
  }

  /** Volume of n flat points, all strictly inside the reference box. */
  private static double volume(double[] points, int n, int d, double[] reference) {
    if (n == 0) {
      return 0.0;
    }
    switch (d) {
      case 1: {
        double min = points[0];
        for (int i = 1; i < n; i++) {
          min = Math.min(min, points[i]);
        }
        return reference[0] - min;
      }
      case 2:
        return volume2(points, n, reference);
      case 3:
        return volume3(points, n, reference);
      default:
        return wfg(points, n, d, reference);
    }
  }

  /** 2-D sweep: ascending f1, each point adds (r1 − f1)(best f2 so far − f2). */
  private static double volume2(double[] points, int n, double[] reference) {
    int[] order = new int[n];
    double[] keys = new double[n];
    for (int i = 0; i < n; i++) {
      order[i] = i;
      keys[i] = points[2 * i];
    }
    IndexSort.sort(order, keys, n);
    double volume = 0.0;
    double previous = reference[1];
    for (int k = 0; k < n; k++) {
      int i = order[k];
      double y = points[2 * i + 1];
      if (y < previous) {
        volume += (reference[0] - points[2 * i]) * (previous - y);
        previous = y;
      }
    }
    return volume;
  }

  /**
   * 3-D dimension sweep: ascending f3; the projections on (f1, f2) seen so far form a staircase
   * (f1 ascending, f2 strictly descending) whose dominated area is kept up to date as points
   * arrive; each slab between consecutive f3 values adds area × thickness.
   */
  private static double volume3(double[] points, int n, double[] reference) {
    int[] order = new int[n];
    double[] keys = new double[n];
    for (int i = 0; i < n; i++) {
      order[i] = i;
      keys[i] = points[3 * i + 2];
    }
    IndexSort.sort(order, keys, n);
    TreeMap<Double, Double> staircase = new TreeMap<>();
    double rx = reference[0];
    double ry = reference[1];
    double area = 0.0;
    double volume = 0.0;
    for (int k = 0; k < n; k++) {
      int i = order[k];
      area += insert(staircase, points[3 * i], points[3 * i + 1], rx, ry);
      double next = k + 1 < n ? keys[k + 1] : reference[2];
      volume += area * (next - keys[k]);
    }
    return volume;
  }

  /**
   * Inserts (x, y) into a 2-D staircase and returns the area it adds: the integral over f1 of
   * how far the point lowers the covered boundary, walking the points it passes.
   */
  private static double insert(TreeMap<Double, Double> staircase, double x, double y, double rx,
      double ry) {
    Map.Entry<Double, Double> floor = staircase.floorEntry(x);
    if (floor != null && floor.getValue() <= y) {
      return 0.0; // weakly dominated
    }
    Map.Entry<Double, Double> lower = staircase.lowerEntry(x);
    double low = lower == null ? ry : lower.getValue();
    double currentX = x;
    double gain = 0.0;
    Iterator<Map.Entry<Double, Double>> tail =
        staircase.tailMap(x, true).entrySet().iterator();
    boolean covered = false;
    while (tail.hasNext()) {
      Map.Entry<Double, Double> e = tail.next();
      double ex = e.getKey();
      double ey = e.getValue();
      gain += (ex - currentX) * (low - y);
      currentX = ex;
      if (ey >= y) {
        low = ey;
        tail.remove(); // dominated by the new point
      } else {
        covered = true; // from ex on, the boundary is already below y
        break;
      }
    }
    if (!covered) {
      gain += (rx - currentX) * (low - y);
    }
    staircase.put(x, y);
    return gain;
  }

  /**
   * WFG [3] for d &ge; 4: sort by the last objective; point i contributes
   * (r<sub>d</sub> − f<sub>d</sub>(i)) × its exclusive (d−1)-dimensional hypervolume with respect
   * to the points before it, which is its box minus the hypervolume of the limit set
   * {max(p<sub>j</sub>, p<sub>i</sub>) : j &lt; i} in the first d−1 objectives.
   */
  private static double wfg(double[] points, int n, int d, double[] reference) {
    int[] order = new int[n];
    double[] keys = new double[n];
    for (int i = 0; i < n; i++) {
      order[i] = i;
      keys[i] = points[i * d + d - 1];
    }
    IndexSort.sort(order, keys, n);
    int e = d - 1;
    double[] sorted = new double[n * e];
    for (int k = 0; k < n; k++) {
      System.arraycopy(points, order[k] * d, sorted, k * e, e);
    }
    double[] limit = new double[n * e];
    double total = 0.0;
    for (int i = 0; i < n; i++) {
      double height = reference[d - 1] - keys[i];
      if (height <= 0) {
        continue;
      }
      double box = 1.0;
      for (int j = 0; j < e; j++) {
        box *= reference[j] - sorted[i * e + j];
      }
      int size = 0;
      for (int k = 0; k < i; k++) {
        for (int j = 0; j < e; j++) {
          limit[size * e + j] = Math.max(sorted[k * e + j], sorted[i * e + j]);
        }
        size++;
      }
      if (e >= 4) {
        size = nonDominated(limit, size, e);
      }
      double covered = size == 0 ? 0.0 : volume(limit, size, e, reference);
      total += height * (box - covered);
    }
    return total;
  }

  /**
   * Keeps the points of {@code flat[0..n)} not weakly dominated by another (one copy of
   * duplicates), compacting them to the front; returns how many remain.
   */
  private static int nonDominated(double[] flat, int n, int d) {
    boolean[] removed = new boolean[n];
    for (int a = 0; a < n; a++) {
      if (removed[a]) {
        continue;
      }
      for (int b = a + 1; b < n; b++) {
        if (removed[b]) {
          continue;
        }
        int c = Dominance.pareto(flat, a * d, flat, b * d, d);
        if (c < 0) {
          removed[b] = true;
        } else if (c > 0) {
          removed[a] = true;
          break;
        } else if (Arrays.equals(flat, a * d, a * d + d, flat, b * d, b * d + d)) {
          removed[b] = true;
        }
      }
    }
    int kept = 0;
    for (int a = 0; a < n; a++) {
      if (!removed[a]) {
        if (kept != a) {
          System.arraycopy(flat, a * d, flat, kept * d, d);
        }
        kept++;
      }
    }
    return kept;
  }
}
