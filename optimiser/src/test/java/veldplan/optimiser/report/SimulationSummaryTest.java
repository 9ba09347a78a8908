package veldplan.optimiser.report;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import veldplan.model.Trajectory;

/** The quasi-extinction count of the summary, on hand-built trajectories. */
class SimulationSummaryTest {

  private static Trajectory guild(double... abundance) {
    Trajectory t = new Trajectory(abundance.length, 1, 1, 0);
    for (int y = 0; y < abundance.length; y++) {
      t.setAbundance(y, 0, abundance[y]);
    }
    return t;
  }

  @Test
  void fellBelow_dipInYearThree_counted() {
    assertTrue(SimulationSummary.fellBelow(guild(120, 110, 60, 49, 200), 0, 50));
  }

  @Test
  void fellBelow_neverUnderThreshold_notCounted() {
    assertFalse(SimulationSummary.fellBelow(guild(120, 110, 60, 50, 200), 0, 50));
  }

  @Test
  void fellBelow_zeroThreshold_onlyExtinctionCounts() {
    assertFalse(SimulationSummary.fellBelow(guild(3, 2, 1), 0, 0));
    assertTrue(SimulationSummary.fellBelow(guild(3, 0, 0), 0, 0));
  }
}
