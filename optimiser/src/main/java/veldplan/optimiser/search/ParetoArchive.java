package veldplan.optimiser.search;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.List;

/**
 * An unbounded external archive of every non-dominated individual offered to it, under
 * constrained domination ({@link Dominance}; feasible ones dominate infeasible ones).
 *
 * <p>A newcomer is rejected if a member constrained-dominates it or has the same objective vector
 * and violation (a duplicate objective vector is kept once, the first found); otherwise it is
 * added and every member it dominates is removed.
 *
 * <p>Invariant: every individual ever offered is a member, or is constrained-dominated by a
 * member, or duplicates one. Because constrained domination is transitive, anything dominated by
 * an individual already offered may be skipped without changing the archive; {@link Nsga2} uses
 * this to offer only the offspring in the first front of P ∪ Q.
 *
 * <p><b>Layout.</b> All members always share one violation: 0 once a feasible individual has
 * been found, before that the smallest violation seen (infeasible individuals with equal
 * violations do not dominate each other, so all of them are kept, one per objective vector).
 * Members are kept sorted by f<sub>1</sub> (ties in order of arrival), with their objectives in
 * one flat primitive array. A member that could dominate a newcomer p has f<sub>1</sub> &le;
 * p<sub>1</sub> and one that p could dominate has f<sub>1</sub> &ge; p<sub>1</sub>, so each
 * member needs a one-way test that usually fails at its first objective. With two objectives the
 * members' f<sub>2</sub> strictly decrease, and an offer is a binary search plus the removal of
 * one contiguous run: O(log size) comparisons. With three or more objectives the members are
 * kept in an {@link ArchiveTree} instead (a k-d tree with bounding boxes plus a small buffer),
 * which answers both questions of an offer without looking at most members; it returns them in
 * the same order (by f<sub>1</sub>, ties by arrival). The order of members is a pure function of
 * the sequence of offers.
 */
public final class ParetoArchive {
  private final int m;
  private Individual[] members = new Individual[64];
  private double[] objectives;
  private int size;
  private double violation;
  /** The members when M &ge; 3 (then the arrays above stay empty); null when M &le; 2. */
  private final ArchiveTree tree;

  /**
   * An empty archive.
   *
   * @param objectives number of objectives M &ge; 1
   */
  public ParetoArchive(int objectives) {
    if (objectives < 1) {
      throw new IllegalArgumentException("objectives must be >= 1: " + objectives);
    }
    this.m = objectives;
    this.objectives = new double[objectives <= 2 ? 64 * objectives : 0];
    this.tree = objectives <= 2 ? null : new ArchiveTree(objectives);
  }

  /**
   * Offers one individual.
   *
   * @return whether it was added
   * @throws IllegalArgumentException if its number of objectives is not M
   */
  public boolean offer(Individual candidate) {
    double[] p = candidate.objectives();
    if (p.length != m) {
      throw new IllegalArgumentException(
          "individual with " + p.length + " objectives in an archive of " + m);
    }
    double v = candidate.evaluation().violation();
    if (size() > 0 && v != violation) {
      if (v > violation) {
        return false; // a member's violation is smaller
      }
      // the newcomer's violation is smaller than every member's: it dominates all
      if (tree != null) {
        tree.clear();
      }
      size = 0;
      Arrays.fill(members, null);
    }
    violation = v;
    if (tree != null) {
      if (v > 0 ? tree.containsEqual(p) : tree.weaklyDominated(p)) {
        return false;
      }
      if (v == 0) {
        tree.removeWeaklyDominatedBy(p);
      }
      tree.add(candidate);
      return true;
    }
    int lo = lowerBound(p[0]);
    int hi = upperBound(p[0], lo);
    if (v > 0) {
      return addIncomparable(candidate, p, lo, hi);
    }
    if (dominatedOrDuplicate(p, hi)) {
      return false;
    }
    int removed = m == 2 ? removeDominated2(p, lo) : removeDominated(p, lo);
    insert(candidate, p, removed == 0 ? hi : upperBound(p[0], 0));
    return true;
  }

  /** Offers each individual in order; returns how many were added. */
  public int offerAll(Iterable<Individual> candidates) {
    int added = 0;
    for (Individual i : candidates) {
      if (offer(i)) {
        added++;
      }
    }
    return added;
  }

  /** Number of members. */
  public int size() {
    return tree != null ? tree.size() : size;
  }

  /** Whether the members are feasible (false while empty). */
  public boolean feasible() {
    return size() > 0 && violation == 0;
  }

  /** The members, sorted by the first objective (an unmodifiable snapshot). */
  public List<Individual> members() {
    Individual[] sorted = tree != null ? tree.sorted() : members;
    return Collections.unmodifiableList(Arrays.asList(Arrays.copyOf(sorted, size())));
  }

  /**
   * Objective vectors of the feasible members (the individuals' own arrays; do not modify).
   * Empty while no feasible individual has been found.
   */
  public List<double[]> feasibleObjectives() {
    if (!feasible()) {
      return List.of();
    }
    Individual[] sorted = tree != null ? tree.sorted() : members;
    int count = size();
    List<double[]> out = new ArrayList<>(count);
    for (int k = 0; k < count; k++) {
      out.add(sorted[k].objectives());
    }
    return out;
  }

  /** First index whose f1 is &ge; x. */
  private int lowerBound(double x) {
    int lo = 0;
    int hi = size;
    while (lo < hi) {
      int mid = (lo + hi) >>> 1;
      if (objectives[mid * m] < x) {
        lo = mid + 1;
      } else {
        hi = mid;
      }
    }
    return lo;
  }

  /** First index at or after {@code from} whose f1 is &gt; x. */
  private int upperBound(double x, int from) {
    int lo = from;
    int hi = size;
    while (lo < hi) {
      int mid = (lo + hi) >>> 1;
      if (objectives[mid * m] <= x) {
        lo = mid + 1;
      } else {
        hi = mid;
      }
    }
    return lo;
  }

  /** Whether a member with f1 &le; p1 (index &lt; hi) weakly dominates p. */
  private boolean dominatedOrDuplicate(double[] p, int hi) {
    if (m == 2) {
      // f2 strictly decreases with the index: the last member with f1 <= p1 has the least f2.
      return hi > 0 && objectives[(hi - 1) * 2 + 1] <= p[1];
    }
    for (int k = 0; k < hi; k++) {
      int base = k * m;
      int j = 1;
      while (j < m && objectives[base + j] <= p[j]) {
        j++;
      }
      if (j == m) {
        return true;
      }
    }
    return false;
  }

  /** Removes the members p dominates (all at index &ge; lo); returns how many were removed. */
  private int removeDominated(double[] p, int lo) {
    if (m == 1) {
      return removeRange(lo, size);
    }
    int kept = lo;
    for (int k = lo; k < size; k++) {
      int base = k * m;
      int j = 1;
      while (j < m && p[j] <= objectives[base + j]) {
        j++;
      }
      if (j < m) { // not dominated by p: keep
        if (kept != k) {
          members[kept] = members[k];
          System.arraycopy(objectives, base, objectives, kept * m, m);
        }
        kept++;
      }
    }
    int removed = size - kept;
    Arrays.fill(members, kept, size, null);
    size = kept;
    return removed;
  }

  /** Two objectives: the members p dominates are one run starting at lo (f2 &ge; p2). */
  private int removeDominated2(double[] p, int lo) {
    int end = lo;
    while (end < size && objectives[end * 2 + 1] >= p[1]) {
      end++;
    }
    return removeRange(lo, end);
  }

  /** Removes members [from, to); returns how many. */
  private int removeRange(int from, int to) {
    int removed = to - from;
    if (removed > 0) {
      System.arraycopy(members, to, members, from, size - to);
      System.arraycopy(objectives, to * m, objectives, from * m, (size - to) * m);
      Arrays.fill(members, size - removed, size, null);
      size -= removed;
    }
    return removed;
  }

  /** Infeasible members with equal violations are incomparable: add unless a duplicate. */
  private boolean addIncomparable(Individual candidate, double[] p, int lo, int hi) {
    for (int k = lo; k < hi; k++) {
      if (Arrays.equals(p, 0, m, objectives, k * m, k * m + m)) {
        return false;
      }
    }
    insert(candidate, p, hi);
    return true;
  }

  private void insert(Individual candidate, double[] p, int at) {
    if (size == members.length) {
      members = Arrays.copyOf(members, size * 2);
      objectives = Arrays.copyOf(objectives, size * 2 * m);
    }
    System.arraycopy(members, at, members, at + 1, size - at);
    System.arraycopy(objectives, at * m, objectives, (at + 1) * m, (size - at) * m);
    members[at] = candidate;
    System.arraycopy(p, 0, objectives, at * m, m);
    size++;
  }
}
