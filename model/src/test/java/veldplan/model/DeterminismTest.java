package veldplan.model;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import java.util.Arrays;
import org.junit.jupiter.api.Test;

/** The reproducibility contract: same inputs and seed, bit-identical output, any thread count. */
class DeterminismTest {

  private static double[] flatten(Trajectory[][] runs) {
    return Arrays.stream(runs).flatMap(Arrays::stream).map(Trajectory::values)
        .flatMapToDouble(Arrays::stream).toArray();
  }

  @Test
  void run_sameSeedTwice_identicalTrajectories() {
    TestParks park = new TestParks();
    park.blocks = 3;
    double[] first = flatten(Ensemble.run(park.study(), park.plan(), 1, () -> { }));
    double[] second = flatten(Ensemble.run(park.study(), park.plan(), 1, () -> { }));
    assertArrayEquals(first, second, 0.0);
  }

  @Test
  void run_oneVersusThreeThreads_identicalTrajectories() {
    TestParks park = new TestParks();
    park.blocks = 2;
    park.replicates = 7;
    Study study = park.study();
    double[] serial = flatten(Ensemble.run(study, park.plan(), 1, () -> { }));
    double[] parallel = flatten(Ensemble.run(study, park.plan(), 3, () -> { }));
    assertArrayEquals(serial, parallel, 0.0);
  }

  @Test
  void run_differentSeeds_differentTrajectories() {
    TestParks park = new TestParks();
    double[] a = flatten(Ensemble.run(park.study(), park.plan(), 1, () -> { }));
    park.seed = 43;
    double[] b = flatten(Ensemble.run(park.study(), park.plan(), 1, () -> { }));
    assertFalse(Arrays.equals(a, b));
  }

  @Test
  void study_moreReplicates_keepsTheFirstReplicatesUnchanged() {
    TestParks park = new TestParks();
    park.replicates = 2;
    Trajectory[][] few = Ensemble.run(park.study(), park.plan(), 1, () -> { });
    park.replicates = 5;
    Trajectory[][] many = Ensemble.run(park.study(), park.plan(), 1, () -> { });
    for (int r = 0; r < 2; r++) {
      assertArrayEquals(flatten(new Trajectory[][] {{few[0][r]}}),
          flatten(new Trajectory[][] {{many[0][r]}}), 0.0);
    }
  }
}
