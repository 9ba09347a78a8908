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
}
