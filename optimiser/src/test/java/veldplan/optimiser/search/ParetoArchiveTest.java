package veldplan.optimiser.search;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.junit.jupiter.api.Test;

/** Tests for {@link ParetoArchive}: constrained domination (decision-methods §2.4). */
class ParetoArchiveTest {

  private static Individual individual(double violation, double... objectives) {
    return new Individual(new double[] {0.5}, new Evaluation(objectives, violation));
  }

  @Test
  void offer_keepsNonDominated_dropsDominated_keepsOneCopyOfADuplicate() {
    ParetoArchive archive = new ParetoArchive(2);
    assertTrue(archive.offer(individual(0, 2, 2)));
    assertTrue(archive.offer(individual(0, 1, 3)));
    assertFalse(archive.offer(individual(0, 2, 3)), "dominated");
    assertFalse(archive.offer(individual(0, 2, 2)), "duplicate objective vector");
    assertTrue(archive.offer(individual(0, 1, 1)), "dominates both members");
    assertEquals(1, archive.size());
    assertEquals(List.of(individual(0, 1, 1)), archive.members());
  }

  @Test
  void offer_feasibleDominatesInfeasible_smallerViolationDominatesLarger() {
    // decision-methods §2.4: CV 0.2 beats CV 0.5; any feasible beats any infeasible.
    ParetoArchive archive = new ParetoArchive(2);
    assertTrue(archive.offer(individual(0.5, 0, 0)));
    assertTrue(archive.offer(individual(0.2, 9, 9)));
    assertEquals(List.of(individual(0.2, 9, 9)), archive.members());
    assertTrue(archive.offer(individual(0.2, 10, 0)), "equal violations: incomparable");
    assertFalse(archive.offer(individual(0.2, 9, 9)), "duplicate");
    assertFalse(archive.feasible());
    assertEquals(List.of(), archive.feasibleObjectives());
    assertTrue(archive.offer(individual(0, 100, 100)));
    assertEquals(1, archive.size());
    assertTrue(archive.feasible());
    assertFalse(archive.offer(individual(1e-12, -5, -5)), "infeasible after a feasible one");
  }

  @ParameterizedTest
  @ValueSource(ints = {1, 2, 3, 4})
  void offer_randomSequences_equalTheNonDominatedSetOfAllOffers(int m) {
    // Brute-force reference: the constrained-non-dominated members of everything offered, one per
    // (objective vector, violation), compared as sets.
    SplittableRandom random = new SplittableRandom(42 + m);
    for (int trial = 0; trial < 50; trial++) {
      ParetoArchive archive = new ParetoArchive(m);
      List<Individual> offered = new ArrayList<>();
      int n = 1 + random.nextInt(200);
      for (int i = 0; i < n; i++) {
        double[] f = new double[m];
        for (int j = 0; j < m; j++) {
          f[j] = random.nextInt(8); // small grid: ties and duplicates
        }
        double violation = random.nextInt(5) == 0 ? random.nextInt(3) * 0.5 : 0;
        Individual ind = individual(violation, f);
        offered.add(ind);
        archive.offer(ind);
      }
      List<Evaluation> expected = new ArrayList<>();
      for (Individual a : offered) {
        boolean dominated = false;
        for (Individual b : offered) {
          dominated |= Dominance.constrained(b.evaluation(), a.evaluation()) < 0;
        }
        if (!dominated && !expected.contains(a.evaluation())) {
          expected.add(a.evaluation());
        }
      }
      List<Evaluation> actual = new ArrayList<>();
      for (Individual a : archive.members()) {
        actual.add(a.evaluation());
      }
      Comparator<Evaluation> order = Comparator.comparing(Evaluation::toString);
      expected.sort(order);
      actual.sort(order);
      assertEquals(expected, actual, "m=" + m + " trial " + trial);
      // members are sorted by the first objective
      for (int k = 1; k < archive.size(); k++) {
        assertTrue(archive.members().get(k - 1).objectives()[0]
            <= archive.members().get(k).objectives()[0]);
      }
    }
  }

  @Test
  void offer_sameSequence_sameOrder() {
    SplittableRandom random = new SplittableRandom(8);
    List<Individual> sequence = new ArrayList<>();
    for (int i = 0; i < 500; i++) {
      double x = random.nextDouble();
      sequence.add(individual(0, x, 1 - Math.sqrt(x) + 0.1 * random.nextDouble(),
          random.nextDouble()));
    }
    ParetoArchive a = new ParetoArchive(3);
    ParetoArchive b = new ParetoArchive(3);
    a.offerAll(sequence);
    b.offerAll(sequence);
    assertEquals(a.members(), b.members());
    ParetoArchive c = new ParetoArchive(3);
    c.offerAll(a.members()); // a checkpoint's archive restores to the same order
    assertEquals(a.members(), c.members());
  }

  /**
   * The archive defined by its documented rule alone, kept as a plain list: a newcomer is rejected
   * if a member constrained-dominates it or has the same objective vector and violation;
   * otherwise the members it dominates go and it is appended. Members are listed by f1, ties in
   * order of arrival. "The same vector" is == in every objective among feasible members (a
   * member weakly dominating the newcomer rejects it, so -0.0 and 0.0 are the same) and bit for
   * bit among infeasible ones (which are compared only for duplicates).
   */
  private static List<Individual> referenceArchive(List<Individual> offers) {
    List<Individual> list = new ArrayList<>();
    for (Individual c : offers) {
      boolean rejected = false;
      for (Individual a : list) {
        rejected |= Dominance.constrained(a.evaluation(), c.evaluation()) < 0
            || sameVector(a.evaluation(), c.evaluation());
      }
      if (!rejected) {
        list.removeIf(a -> Dominance.constrained(c.evaluation(), a.evaluation()) < 0);
        list.add(c);
      }
    }
    List<Individual> sorted = new ArrayList<>(list); // stable: ties keep arrival order
    sorted.sort((a, b) -> a.objectives()[0] < b.objectives()[0] ? -1
        : a.objectives()[0] > b.objectives()[0] ? 1 : 0);
    return sorted;
  }

  private static boolean sameVector(Evaluation a, Evaluation b) {
    if (a.violation() != b.violation()) {
      return false;
    }
    if (a.violation() > 0) {
      return a.equals(b);
    }
    for (int j = 0; j < a.objectives().length; j++) {
      if (a.objectives()[j] != b.objectives()[j]) {
        return false;
      }
    }
    return true;
  }

  @ParameterizedTest
  @ValueSource(ints = {2, 3, 4, 5})
  void offer_longSequences_sameMembersInTheSameOrderAsTheRule(int m) {
    // Long enough for the M >= 3 index to be rebuilt many times (ArchiveTree); points near a
    // sphere (thousands of mutually non-dominated ones), on a coarse grid (ties, duplicates,
    // -0.0 against 0.0) and infeasible ones with equal violations.
    SplittableRandom random = new SplittableRandom(1000 + m);
    for (int trial = 0; trial < 12; trial++) {
      List<Individual> offers = new ArrayList<>();
      int n = 500 + random.nextInt(3000);
      for (int i = 0; i < n; i++) {
        double[] f = new double[m];
        double norm = 0;
        for (int j = 0; j < m; j++) {
          f[j] = trial % 3 == 0 ? random.nextInt(6) : Math.abs(random.nextGaussian());
          norm += f[j] * f[j];
        }
        if (trial % 3 == 1) {
          double radius = (1 + 0.05 * random.nextDouble()) / Math.sqrt(norm);
          for (int j = 0; j < m; j++) {
            f[j] *= radius;
          }
        }
        if (trial % 3 == 0 && f[0] == 0 && random.nextBoolean()) {
          f[0] = -0.0;
        }
        double violation = trial % 4 == 3 && i < n / 2 ? 0.5 * (1 + random.nextInt(2)) : 0;
        offers.add(new Individual(new double[] {i}, new Evaluation(f, violation)));
      }
      ParetoArchive archive = new ParetoArchive(m);
      for (int i = 0; i < n; i++) {
        archive.offer(offers.get(i));
        if (i == n / 3) { // reading the members in between changes nothing
          assertEquals(referenceArchive(offers.subList(0, i + 1)), archive.members());
        }
      }
      List<Individual> expected = referenceArchive(offers);
      assertEquals(expected, archive.members(), "m=" + m + " trial " + trial);
      assertEquals(expected.size(), archive.size());
      ParetoArchive restored = new ParetoArchive(m); // as from a checkpoint
      restored.offerAll(archive.members());
      assertEquals(expected, restored.members());
    }
  }
}
