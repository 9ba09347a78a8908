package veldplan.model;

import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * How the number of artificial water points shapes the guilds, other things equal (same seeds:
 * common random numbers). An expectation of the model's design, described in the class comment
 * of {@link Herbivory}: where water is plentiful the bulk grazers reach the whole block, and the
 * rare selective grazer, which forages farther from water, loses its refuge. The literature basis
 * given there is Redfern et al. (2003, 2005) on surface water and herbivore distributions and
 * Harrington et al. (1999) on roan antelope, both cited from memory; the test checks the model's
 * mechanism, not those studies' numbers.
 */
class WaterPointsBehaviourTest {
  private static final int YEARS = 40;
  /** The means leave out the first years, while the guilds move away from their start. */
  private static final int FROM_YEAR = 10;

  /** Mean over replicates and years FROM_YEAR.. of each herbivore and of the predator guild. */
  private static double[] meanAbundance(int waterPointsPerBlock) {
    TestParks park = new TestParks();
    park.blocks = 2;
    park.waterPoints = waterPointsPerBlock;
    park.years = YEARS;
    park.replicates = 8;
    Trajectory[] runs = park.run();
    int herbivores = runs[0].herbivores();
    double[] mean = new double[herbivores + 1];
    int n = 0;
    for (Trajectory t : runs) {
      for (int y = FROM_YEAR; y < YEARS; y++) {
        for (int h = 0; h < herbivores; h++) {
          mean[h] += t.abundance(y, h);
        }
        mean[herbivores] += t.predatorAbundance(y, 0);
        n++;
      }
    }
    for (int i = 0; i < mean.length; i++) {
      mean[i] /= n;
    }
    return mean;
  }

  private static int index(ModelParameters p, String name) {
    for (int h = 0; h < p.herbivores().count(); h++) {
      if (p.herbivores().name(h).equals(name)) {
        return h;
      }
    }
    throw new IllegalArgumentException("no herbivore " + name);
  }

  @Test
  void waterPoints_eightInsteadOfOnePerBlock_moreBulkGrazersAndPredatorsFewerRareGrazers() {
    // Model-design expectation (Herbivory class comment; its basis, Redfern et al. 2003, 2005
    // and Harrington et al. 1999, from memory): plentiful water favours bulk grazers and their
    // predators at the cost of the rare selective grazer. In the builder's 200 km2 blocks one
    // point leaves part of each block beyond the bulk grazers' 8 km but within the rare guild's
    // 14 km; eight points leave none.
    ModelParameters p = new TestParks().parameters();
    int bulk = index(p, "grazers");
    int rare = index(p, "rare");
    int predators = p.herbivores().count();
    double[] few = meanAbundance(1);
    double[] many = meanAbundance(8);
    String shown = "1 point per block: bulk " + few[bulk] + ", rare " + few[rare]
        + ", predators " + few[predators] + "; 8 points: bulk " + many[bulk] + ", rare "
        + many[rare] + ", predators " + many[predators];
    assertTrue(many[bulk] > few[bulk], "bulk grazers: " + shown);
    assertTrue(many[predators] > few[predators], "predators: " + shown);
    assertTrue(many[rare] < few[rare], "rare grazers: " + shown);
  }
}
