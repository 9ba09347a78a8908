package veldplan.shared.scenario;

import java.util.List;

/**
 * Baseline climate and the climate paths to simulate.
 *
 * @param baselineCsv observed monthly climate, a CSV with columns
 *                    {@code year,month,rainfall_mm,tmin_c,tmax_c} (path relative to the scenario
 *                    file); at least 10 whole years
 * @param paths       climate paths, at least one; names are unique
 */
public record Climate(String baselineCsv, List<ClimatePath> paths) {
  public Climate {
    paths = List.copyOf(paths);
  }
}
