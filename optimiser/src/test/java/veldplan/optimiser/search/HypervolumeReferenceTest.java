package veldplan.optimiser.search;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.uma.jmetal.qualityindicator.impl.hypervolume.impl.PISAHypervolume;

/**
 * Cross-check of {@link Hypervolume} against an independent implementation: jMetal 6.6's
 * {@code PISAHypervolume.calculateHypervolume}, the Java port of Zitzler &amp; Thiele's (1999)
 * hypervolume code (test scope only). That code measures, for maximisation, the union of the boxes
 * [0, q]; a minimisation point p with reference r becomes q = r − p.
 */
class HypervolumeReferenceTest {

  @ParameterizedTest
  @CsvSource({
      // d, points, fronts: random non-dominated and mixed sets
      "2, 200, 20", "3, 120, 20", "4, 60, 15"})
  void randomFronts_agreeWithJMetalPisa(int d, int points, int fronts) {
    SplittableRandom random = new SplittableRandom(31 * d + points);
    double[] reference = new double[d];
    java.util.Arrays.fill(reference, 1.1);
    for (int trial = 0; trial < fronts; trial++) {
      List<double[]> set = new ArrayList<>();
      boolean onFront = trial % 2 == 0; // half the sets on a spherical front, half scattered
      for (int i = 0; i < points; i++) {
        double[] p = new double[d];
        double norm = 0;
        for (int j = 0; j < d; j++) {
          p[j] = random.nextDouble();
          norm += p[j] * p[j];
        }
        if (onFront) {
          norm = Math.sqrt(norm);
          for (int j = 0; j < d; j++) {
            p[j] /= norm;
          }
        }
        set.add(p);
      }
      double ours = Hypervolume.of(set, reference);
      double theirs = pisa(set, reference);
      assertEquals(theirs, ours, 1e-12 * Math.max(1, theirs), "d=" + d + " trial " + trial);
    }
  }

  private static double pisa(List<double[]> points, double[] reference) {
    int d = reference.length;
    List<double[]> inverted = new ArrayList<>();
    for (double[] p : points) {
      double[] q = new double[d];
      boolean inside = true;
      for (int j = 0; j < d; j++) {
        q[j] = reference[j] - p[j];
        inside &= q[j] > 0;
      }
      if (inside) {
        inverted.add(q);
      }
    }
    if (inverted.isEmpty()) {
      return 0;
    }
    double[][] front = inverted.toArray(new double[0][]);
    return new PISAHypervolume().calculateHypervolume(front, front.length, d);
  }
}
