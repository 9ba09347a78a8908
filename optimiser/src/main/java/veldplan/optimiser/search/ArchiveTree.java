package veldplan.optimiser.search;

import java.util.Arrays;

/**
 * The members of a {@link ParetoArchive} with three or more objectives, indexed for the two
 * queries an offer makes: "does a member weakly dominate p?" and "which members does p
 * dominate?". A linear scan answers each in O(size × M); with the thousands of mutually
 * non-dominated points an archive reaches on a 3-objective problem that scan was most of the
 * search's time.
 *
 * <p><b>Structure.</b> Members live in a k-d tree rebuilt from time to time, plus a small buffer of
 * the members added since the last rebuild (the logarithmic-method idea of keeping a static
 * structure and a buffer; Bentley &amp; Saxe 1980 [1]). The tree is stored implicitly: the node of
 * a range [a, b) of positions is its middle position, its subtrees the two halves, split at the
 * median of the coordinate with the widest spread in the range [2]. Every node of more than
 * {@link #LEAF} positions stores the bounding box (componentwise minimum and maximum) of its
 * range. A subtree whose minimum corner does not weakly dominate p holds no member weakly
 * dominating p; one whose maximum corner is not weakly dominated by p holds no member p
 * dominates. This is the pruning of the ND-Tree of Jaszkiewicz &amp; Lust (2018) [3], whose nodes
 * keep the local ideal and nadir points of their members. A removed member is only marked dead
 * (the boxes stay valid, if loose) until the next rebuild, which happens when the buffer is full
 * and keeps the live members only. The buffer holds up to about 4√size members, sorted by
 * f<sub>1</sub>; a query scans the part of it on the relevant side of p<sub>1</sub>.
 *
 * <p><b>Order.</b> Every member keeps the sequence number of its arrival; {@link #sorted} returns
 * the members sorted by f<sub>1</sub>, ties by arrival, so the order never depends on the tree's
 * shape and is a pure function of the sequence of offers.
 *
 * <p>References:
 * <ol>
 *   <li>Bentley, J.L., Saxe, J.B. (1980). Decomposable searching problems I: static-to-dynamic
 *       transformation. Journal of Algorithms 1(4): 301–358.</li>
 *   <li>Bentley, J.L. (1975). Multidimensional binary search trees used for associative
 *       searching. Communications of the ACM 18(9): 509–517.</li>
 *   <li>Jaszkiewicz, A., Lust, T. (2018). ND-Tree-based update: a fast algorithm for the dynamic
 *       nondominance problem. IEEE TEC 22(5): 778–791. doi:10.1109/TEVC.2018.2799684</li>
 * </ol>
 */
final class ArchiveTree {
  /** Ranges of at most this many positions are scanned, not split further. */
  static final int LEAF = 8;
  /**
   * The buffer is rebuilt into the tree when it holds more than max(32, 4√size) members. Each
   * offer scans the buffer and each rebuild costs O(size log size), so a buffer of order √size
   * balances the two; the factor 4 was the fastest of 2, 4, 8, 16 and 32 on the 3-objective
   * DTLZ2 archive (about 6,000 members). The contents and order never depend on it.
   */
  private static final int MIN_BUFFER = 32;
  private static final int BUFFER_FACTOR = 4;

  private final int m;

  // The tree: positions [0, treeSize), in the implicit layout described above.
  private int treeSize;
  private double[] treeObjectives = new double[0];
  private Individual[] treeMembers = new Individual[0];
  private long[] treeArrival = new long[0];
  private boolean[] treeAlive = new boolean[0];
  /** Bounding boxes of the ranges of more than LEAF positions, at the range's middle. */
  private double[] boxMin = new double[0];
  private double[] boxMax = new double[0];

  // The buffer of members added since the last rebuild, sorted by f1 (ties in no particular
  // order), so that an offer scans only the part with f1 <= p1, or >= p1.
  private int bufferSize;
  private double[] bufferObjectives;
  private Individual[] bufferMembers = new Individual[MIN_BUFFER];
  private long[] bufferArrival = new long[MIN_BUFFER];

  private int size;
  private long arrivals;
  /** The members in output order; null when a change has made it stale. */
  private Individual[] sorted;

  ArchiveTree(int objectives) {
    this.m = objectives;
    this.bufferObjectives = new double[MIN_BUFFER * objectives];
  }

  int size() {
    return size;
  }

  /** Removes every member (arrival numbers keep counting). */
  void clear() {
    Arrays.fill(treeMembers, 0, treeSize, null);
    Arrays.fill(bufferMembers, 0, bufferSize, null);
    treeSize = 0;
    bufferSize = 0;
    size = 0;
    sorted = null;
  }

  /** Whether some member weakly dominates p (is &le; p in every objective). */
  boolean weaklyDominated(double[] p) {
    for (int k = 0; k < bufferSize && bufferObjectives[k * m] <= p[0]; k++) {
      if (leq(bufferObjectives, k * m, p)) {
        return true;
      }
    }
    return weaklyDominatedIn(p, 0, treeSize);
  }

  private boolean weaklyDominatedIn(double[] p, int from, int to) {
    if (to - from <= LEAF) {
      for (int k = from; k < to; k++) {
        if (treeAlive[k] && leq(treeObjectives, k * m, p)) {
          return true;
        }
      }
      return false;
    }
    int mid = (from + to) >>> 1;
    if (!leq(boxMin, mid * m, p)) {
      return false;
    }
    if (treeAlive[mid] && leq(treeObjectives, mid * m, p)) {
      return true;
    }
    return weaklyDominatedIn(p, from, mid) || weaklyDominatedIn(p, mid + 1, to);
  }

  /**
   * Whether some member has the objective values p, compared bit for bit as
   * {@link Arrays#equals(double[], double[])} does.
   */
  boolean containsEqual(double[] p) {
    for (int k = 0; k < bufferSize; k++) {
      if (sameBits(bufferObjectives, k * m, p)) {
        return true;
      }
    }
    return containsEqualIn(p, 0, treeSize);
  }

  private boolean containsEqualIn(double[] p, int from, int to) {
    if (to - from <= LEAF) {
      for (int k = from; k < to; k++) {
        if (treeAlive[k] && sameBits(treeObjectives, k * m, p)) {
          return true;
        }
      }
      return false;
    }
    int mid = (from + to) >>> 1;
    if (!leq(boxMin, mid * m, p) || !geq(boxMax, mid * m, p)) {
      return false;
    }
    if (treeAlive[mid] && sameBits(treeObjectives, mid * m, p)) {
      return true;
    }
    return containsEqualIn(p, from, mid) || containsEqualIn(p, mid + 1, to);
  }

  /**
   * Removes every member that p weakly dominates (&ge; p in every objective); the caller has
   * made sure that no member equals p, so these are the members p dominates.
   *
   * @return how many were removed
   */
  int removeWeaklyDominatedBy(double[] p) {
    int kept = bufferFloor(p[0]); // buffer members with f1 < p1 cannot be dominated by p
    for (int k = kept; k < bufferSize; k++) {
      if (!geq(bufferObjectives, k * m, p)) {
        if (kept != k) {
          System.arraycopy(bufferObjectives, k * m, bufferObjectives, kept * m, m);
          bufferMembers[kept] = bufferMembers[k];
          bufferArrival[kept] = bufferArrival[k];
        }
        kept++;
      }
    }
    int removed = bufferSize - kept;
    Arrays.fill(bufferMembers, kept, bufferSize, null);
    bufferSize = kept;
    removed += removeIn(p, 0, treeSize);
    size -= removed;
    if (removed > 0) {
      sorted = null;
    }
    return removed;
  }

  private int removeIn(double[] p, int from, int to) {
    int removed = 0;
    if (to - from <= LEAF) {
      for (int k = from; k < to; k++) {
        removed += removeAt(k, p);
      }
      return removed;
    }
    int mid = (from + to) >>> 1;
    if (!geq(boxMax, mid * m, p)) {
      return 0;
    }
    return removeAt(mid, p) + removeIn(p, from, mid) + removeIn(p, mid + 1, to);
  }

  private int removeAt(int k, double[] p) {
    if (treeAlive[k] && geq(treeObjectives, k * m, p)) {
      treeAlive[k] = false;
      treeMembers[k] = null;
      return 1;
    }
    return 0;
  }

  /** Adds a member (the caller has checked that it belongs in the archive). */
  void add(Individual member) {
    if (bufferSize == bufferMembers.length) {
      int capacity = 2 * bufferSize;
      bufferObjectives = Arrays.copyOf(bufferObjectives, capacity * m);
      bufferMembers = Arrays.copyOf(bufferMembers, capacity);
      bufferArrival = Arrays.copyOf(bufferArrival, capacity);
    }
    int at = bufferFloor(member.objectives()[0]);
    System.arraycopy(bufferObjectives, at * m, bufferObjectives, (at + 1) * m,
        (bufferSize - at) * m);
    System.arraycopy(bufferMembers, at, bufferMembers, at + 1, bufferSize - at);
    System.arraycopy(bufferArrival, at, bufferArrival, at + 1, bufferSize - at);
    System.arraycopy(member.objectives(), 0, bufferObjectives, at * m, m);
    bufferMembers[at] = member;
    bufferArrival[at] = arrivals++;
    bufferSize++;
    size++;
    sorted = null;
    if (bufferSize > Math.max(MIN_BUFFER, BUFFER_FACTOR * (int) Math.sqrt(size))) {
      rebuild();
    }
  }

  /** The first buffer position whose f1 is &ge; x (the buffer is sorted by f1). */
  private int bufferFloor(double x) {
    int lo = 0;
    int hi = bufferSize;
    while (lo < hi) {
      int mid = (lo + hi) >>> 1;
      if (bufferObjectives[mid * m] < x) {
        lo = mid + 1;
      } else {
        hi = mid;
      }
    }
    return lo;
  }

  /** Builds the tree anew from the live members of the tree and the buffer; empties the buffer. */
  private void rebuild() {
    int n = size;
    double[] objectives = new double[n * m];
    Individual[] members = new Individual[n];
    long[] arrival = new long[n];
    int count = 0;
    for (int k = 0; k < treeSize; k++) {
      if (treeAlive[k]) {
        System.arraycopy(treeObjectives, k * m, objectives, count * m, m);
        members[count] = treeMembers[k];
        arrival[count++] = treeArrival[k];
      }
    }
    System.arraycopy(bufferObjectives, 0, objectives, count * m, bufferSize * m);
    System.arraycopy(bufferMembers, 0, members, count, bufferSize);
    System.arraycopy(bufferArrival, 0, arrival, count, bufferSize);
    Arrays.fill(bufferMembers, 0, bufferSize, null);
    bufferSize = 0;

    int[] index = new int[n];
    for (int k = 0; k < n; k++) {
      index[k] = k;
    }
    boxMin = new double[n * m];
    boxMax = new double[n * m];
    double[] min = new double[m];
    double[] max = new double[m];
    Arrays.fill(min, Double.POSITIVE_INFINITY);
    Arrays.fill(max, Double.NEGATIVE_INFINITY);
    for (int k = 0; k < n; k++) {
      include(objectives, k * m, min, max);
    }
    split(index, objectives, 0, n, min.clone(), max.clone(), min, max);
    treeObjectives = new double[n * m];
    treeMembers = new Individual[n];
    treeArrival = new long[n];
    treeAlive = new boolean[n];
    for (int k = 0; k < n; k++) {
      int i = index[k];
      System.arraycopy(objectives, i * m, treeObjectives, k * m, m);
      treeMembers[k] = members[i];
      treeArrival[k] = arrival[i];
      treeAlive[k] = true;
    }
    treeSize = n;
  }

  /**
   * Arranges {@code index[from..to)} into the implicit layout: the median of the coordinate
   * along which the range's cell is widest in the middle, smaller values before it and larger
   * after; records the bounding box of the range (bottom-up) into {@code min}, {@code max}.
   *
   * @param cellMin the lower corner of the cell the splits so far confine the range to
   * @param cellMax its upper corner (the root's cell is the members' bounding box)
   */
  private void split(int[] index, double[] objectives, int from, int to, double[] cellMin,
      double[] cellMax, double[] min, double[] max) {
    if (to - from <= LEAF) {
      Arrays.fill(min, Double.POSITIVE_INFINITY);
      Arrays.fill(max, Double.NEGATIVE_INFINITY);
      for (int k = from; k < to; k++) {
        include(objectives, index[k] * m, min, max);
      }
      return;
    }
    int widest = 0;
    for (int j = 1; j < m; j++) {
      if (cellMax[j] - cellMin[j] > cellMax[widest] - cellMin[widest]) {
        widest = j;
      }
    }
    int mid = (from + to) >>> 1;
    select(index, objectives, widest, from, to - 1, mid);
    double median = objectives[index[mid] * m + widest];
    double[] childMin = new double[m];
    double[] childMax = new double[m];
    double saved = cellMax[widest];
    cellMax[widest] = median;
    split(index, objectives, from, mid, cellMin, cellMax, min, max);
    cellMax[widest] = saved;
    saved = cellMin[widest];
    cellMin[widest] = median;
    split(index, objectives, mid + 1, to, cellMin, cellMax, childMin, childMax);
    cellMin[widest] = saved;
    for (int j = 0; j < m; j++) {
      min[j] = Math.min(min[j], childMin[j]);
      max[j] = Math.max(max[j], childMax[j]);
    }
    include(objectives, index[mid] * m, min, max);
    System.arraycopy(min, 0, boxMin, mid * m, m);
    System.arraycopy(max, 0, boxMax, mid * m, m);
  }

  private void include(double[] objectives, int at, double[] min, double[] max) {
    for (int j = 0; j < m; j++) {
      min[j] = Math.min(min[j], objectives[at + j]);
      max[j] = Math.max(max[j], objectives[at + j]);
    }
  }

  /** Quickselect: puts the k-th smallest (by coordinate j) of index[lo..hi] at k. */
  private void select(int[] index, double[] objectives, int j, int lo, int hi, int k) {
    while (hi > lo) {
      int middle = (lo + hi) >>> 1;
      // median of three as the pivot, moved to hi
      double a = objectives[index[lo] * m + j];
      double b = objectives[index[middle] * m + j];
      double c = objectives[index[hi] * m + j];
      int pivotAt = (a < b) == (b < c) ? middle : (b < a) == (a < c) ? lo : hi;
      swap(index, pivotAt, hi);
      double pivot = objectives[index[hi] * m + j];
      int store = lo;
      for (int i = lo; i < hi; i++) {
        if (objectives[index[i] * m + j] < pivot) {
          swap(index, i, store++);
        }
      }
      swap(index, store, hi);
      if (store == k) {
        return;
      } else if (store < k) {
        lo = store + 1;
      } else {
        hi = store - 1;
      }
    }
  }

  private static void swap(int[] a, int i, int j) {
    int t = a[i];
    a[i] = a[j];
    a[j] = t;
  }

  /** The members sorted by f1, ties by arrival (the array is shared: do not modify). */
  Individual[] sorted() {
    if (sorted != null) {
      return sorted;
    }
    Individual[] members = new Individual[size];
    double[] keys = new double[size];
    int[] index = new int[size];
    long[] arrival = new long[size];
    int count = 0;
    for (int k = 0; k < treeSize; k++) {
      if (treeAlive[k]) {
        members[count] = treeMembers[k];
        arrival[count++] = treeArrival[k];
      }
    }
    System.arraycopy(bufferMembers, 0, members, count, bufferSize);
    System.arraycopy(bufferArrival, 0, arrival, count, bufferSize);
    // By arrival first (numbers below 2^53 are exact as doubles), then stably by f1.
    for (int k = 0; k < size; k++) {
      index[k] = k;
      keys[k] = arrival[k];
    }
    IndexSort.sort(index, keys, size);
    for (int k = 0; k < size; k++) {
      keys[k] = members[index[k]].objectives()[0];
    }
    IndexSort.sort(index, keys, size);
    Individual[] out = new Individual[size];
    for (int k = 0; k < size; k++) {
      out[k] = members[index[k]];
    }
    sorted = out;
    return out;
  }

  /** Whether a[at..at+m) &le; p componentwise. */
  private boolean leq(double[] a, int at, double[] p) {
    for (int j = 0; j < m; j++) {
      if (a[at + j] > p[j]) {
        return false;
      }
    }
    return true;
  }

  /** Whether a[at..at+m) and p hold the same values bit for bit (no NaN occurs). */
  private boolean sameBits(double[] a, int at, double[] p) {
    for (int j = 0; j < m; j++) {
      if (Double.doubleToLongBits(a[at + j]) != Double.doubleToLongBits(p[j])) {
        return false;
      }
    }
    return true;
  }

  /** Whether a[at..at+m) &ge; p componentwise. */
  private boolean geq(double[] a, int at, double[] p) {
    for (int j = 0; j < m; j++) {
      if (a[at + j] < p[j]) {
        return false;
      }
    }
    return true;
  }
}
