package veldplan.shared.scenario;

import java.util.List;

/**
 * One climate path: how rainfall and temperature depart from the baseline over the horizon, and
 * the CO2 concentration. Give either {@code deltaChange} or {@code monthlySeriesCsv}, not both.
 *
 * @param name             unique name, e.g. "mild" or "hot-dry"
 * @param co2Pathway       CO2 trajectory: one of SSP1-2.6, SSP2-4.5, SSP3-7.0, SSP5-8.5
 *                         (Meinshausen et al. 2020, shipped with the tool)
 * @param deltaChange      change relative to the baseline at anchor years, linearly interpolated
 *                         between anchors and held constant outside them
 * @param monthlySeriesCsv explicit monthly series over the horizon, same columns as the baseline
 *                         (path relative to the scenario file)
 */
public record ClimatePath(
    String name,
    String co2Pathway,
    @Optional List<DeltaChange> deltaChange,
    @Optional String monthlySeriesCsv) {

  public ClimatePath {
    deltaChange = deltaChange == null ? null : List.copyOf(deltaChange);
  }
}
