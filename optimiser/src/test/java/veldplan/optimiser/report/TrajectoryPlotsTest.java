package veldplan.optimiser.report;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.OutputStream;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import veldplan.model.Ensemble;
import veldplan.model.ParametersFromScenario;
import veldplan.model.Study;
import veldplan.model.Trajectory;
import veldplan.shared.io.IoConsumer;
import veldplan.shared.scenario.LoadedScenario;
import veldplan.shared.scenario.Scenario;
import veldplan.shared.scenario.ScenarioReader;
import veldplan.shared.scenario.Stochastic;

/** Chart file names, the percentile used for the bands, and that a chart is a PNG. */
class TrajectoryPlotsTest {

  @Test
  void fileName_spacesAndSymbols_becomeHyphens() {
    assertEquals("guild-rare-antelope.png", TrajectoryPlots.fileName("guild-Rare  antelope!"));
    assertEquals("indicator.png", TrajectoryPlots.fileName("€€"));
  }

  @Test
  void percentile_knownSample_linearBetweenOrderStatistics() {
    double[] sorted = {10, 20, 30, 40, 50};
    assertEquals(30, TrajectoryPlots.percentile(sorted, 0.5), 1e-12);
    assertEquals(12, TrajectoryPlots.percentile(sorted, 0.05), 1e-12);
    assertEquals(48, TrajectoryPlots.percentile(sorted, 0.95), 1e-12);
    assertEquals(7, TrajectoryPlots.percentile(new double[] {7}, 0.95), 1e-12);
  }

  @Test
  void charts_fixtureScenario_oneValidPngPerIndicator() throws Exception {
    LoadedScenario loaded = ScenarioReader.load(
        Path.of(TrajectoryPlotsTest.class.getResource("/scenarios/valid/scenario.yaml").toURI()));
    Scenario sc = loaded.scenario();
    Stochastic st = sc.stochastic();
    sc = sc.withStochastic(new Stochastic(3, st.seed(), st.interannualVariabilityFactor()));
    LoadedScenario three = new LoadedScenario(loaded.file(), sc, loaded.baseline(),
        loaded.pathSeries(), loaded.sha256());
    Study study = ParametersFromScenario.study(three);
    Trajectory[][] runs = Ensemble.run(study, ParametersFromScenario.plan(sc.policy(), sc), 1,
        () -> { });
    List<String> names = study.paths().stream().map(path -> path.name()).toList();
    Map<String, IoConsumer<OutputStream>> charts =
        TrajectoryPlots.charts(study.parameters(), names, runs, "test");
    int expected = study.parameters().herbivores().count()
        + study.parameters().predators().count() + 2;
    assertEquals(expected, charts.size(), charts.keySet().toString());
    for (Map.Entry<String, IoConsumer<OutputStream>> chart : charts.entrySet()) {
      ByteArrayOutputStream png = new ByteArrayOutputStream();
      chart.getValue().accept(png);
      byte[] bytes = png.toByteArray();
      assertTrue(bytes.length > 1000, chart.getKey() + " is tiny: " + bytes.length);
      assertArrayEquals(new byte[] {(byte) 0x89, 'P', 'N', 'G'}, Arrays.copyOf(bytes, 4),
          chart.getKey() + " is not a PNG");
    }
  }
}
