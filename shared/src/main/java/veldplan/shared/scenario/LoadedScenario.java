package veldplan.shared.scenario;

import java.nio.file.Path;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Objects;

/**
 * A scenario file that has been read and checked, with the climate tables it refers to.
 *
 * @param file       the scenario file as given
 * @param scenario   the scenario
 * @param baseline   the baseline monthly climate ({@code climate.baselineCsv})
 * @param pathSeries the monthly series of each climate path that has a
 *                   {@code monthlySeriesCsv}, by path name, in file order; each covers at least
 *                   the simulated years {@code startYear .. startYear + horizonYears - 1}
 * @param sha256     lower-case hex SHA-256 of the scenario file's bytes, for provenance
 */
public record LoadedScenario(
    Path file,
    Scenario scenario,
    ClimateTable baseline,
    Map<String, ClimateTable> pathSeries,
    String sha256) {

  /** Checks for nulls and makes an unmodifiable copy of {@code pathSeries} that keeps order. */
  public LoadedScenario {
    Objects.requireNonNull(file, "file");
    Objects.requireNonNull(scenario, "scenario");
    Objects.requireNonNull(baseline, "baseline");
    Objects.requireNonNull(sha256, "sha256");
    pathSeries = Collections.unmodifiableMap(new LinkedHashMap<>(pathSeries));
  }
}
